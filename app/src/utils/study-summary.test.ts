import { describe, expect, it } from 'vitest';
import { bestMode, formatMHz, highestMufMHz } from './study-summary';

const mode = (label: string, hops: number, ray: 'low' | 'high', groupDelayMs: number) => ({
  label,
  hops,
  ray,
  elevationDeg: 10,
  groupDelayMs,
});

describe('bestMode', () => {
  it('prefers fewer hops, then the low ray, then the shorter delay (common practice)', () => {
    const modes = [
      mode('2F2', 2, 'low', 5.3),
      mode('1F2', 1, 'high', 4.09),
      mode('1F2', 1, 'low', 4.11),
      mode('1E', 1, 'low', 3.01),
    ];
    expect(bestMode(modes)).toMatchObject({ label: '1E', ray: 'low' });
    expect(bestMode(modes.slice(0, 3))).toMatchObject({ label: '1F2', ray: 'low' });
    expect(bestMode([])).toBeUndefined();
  });
});

describe('highestMufMHz', () => {
  it('takes the largest non-null MUF', () => {
    expect(highestMufMHz({ '1': 12.86, '2': 10.04, '3': null })).toBe(12.86);
    expect(highestMufMHz({ '1': null })).toBeNull();
    expect(highestMufMHz(undefined)).toBeNull();
  });
});

describe('formatMHz', () => {
  it('formats with the unit', () => {
    expect(formatMHz(12.8624)).toBe('12.86 MHz');
    expect(formatMHz(null)).toBe('—');
  });
});
