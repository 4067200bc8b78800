import { describe, expect, it } from 'vitest';
import { formatUtcAndLocal } from './format-time';

describe('formatUtcAndLocal', () => {
  it('shows a summer instant in UTC and in Berlin summer time', () => {
    // EU summer time (Directive 2000/84/EC): Central European Summer Time is UTC+2 from the last
    // Sunday of March to the last Sunday of October.
    const shown = formatUtcAndLocal('2025-07-01T12:00:00Z', 'Europe/Berlin');
    expect(shown.utc).toBe('2025-07-01 12:00 UTC');
    expect(shown.local).toBe('2025-07-01 14:00 UTC+02:00');
    expect(shown.localShort).toBe('14:00 UTC+02:00');
    expect(shown.text).toBe('2025-07-01 12:00 UTC (14:00 UTC+02:00 local)');
  });

  it('shows the local date when the local day differs from the UTC day', () => {
    // US Eastern Standard Time is UTC−5 in January (US Energy Policy Act of 2005 dates).
    const shown = formatUtcAndLocal('2025-01-15T02:30:00Z', 'America/New_York');
    expect(shown.local).toBe('2025-01-14 21:30 UTC-05:00');
    expect(shown.localShort).toBe('2025-01-14 21:30 UTC-05:00');
    expect(shown.text).toBe('2025-01-15 02:30 UTC (2025-01-14 21:30 UTC-05:00 local)');
  });

  it('says UTC for a zone at zero offset and accepts offsets other than Z', () => {
    const shown = formatUtcAndLocal('2025-01-15T10:00:00+02:00', 'UTC');
    expect(shown.utc).toBe('2025-01-15 08:00 UTC');
    expect(shown.local).toBe('2025-01-15 08:00 UTC');
  });

  it('does not throw on missing or malformed input', () => {
    expect(formatUtcAndLocal(undefined).text).toBe('unknown time');
    expect(formatUtcAndLocal('not a date').utc).toBe('—');
  });
});
