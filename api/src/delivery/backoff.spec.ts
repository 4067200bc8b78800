import { describe, expect, it } from 'vitest';
import { backoffDelayMs, nextAttemptAt, type BackoffOptions } from './backoff.js';

const OPTS: BackoffOptions = { baseMs: 1000, capMs: 60_000, maxAttempts: 5 };

describe('outbox backoff', () => {
  it('doubles the delay after each failed attempt (truncated exponential backoff)', () => {
    expect([1, 2, 3, 4, 5, 6].map((n) => backoffDelayMs(n, OPTS))).toEqual([
      1000, 2000, 4000, 8000, 16000, 32000,
    ]);
  });

  it('never exceeds the cap, even for huge attempt counts', () => {
    expect(backoffDelayMs(7, OPTS)).toBe(60_000);
    expect(backoffDelayMs(5000, OPTS)).toBe(60_000);
  });

  it('treats attempts below 1 as the first attempt', () => {
    expect(backoffDelayMs(0, OPTS)).toBe(1000);
  });

  it('keeps equal jitter between half and the whole delay', () => {
    expect(backoffDelayMs(3, OPTS, () => 0)).toBe(2000);
    expect(backoffDelayMs(3, OPTS, () => 1)).toBe(4000);
    expect(backoffDelayMs(3, OPTS, () => 0.5)).toBe(3000);
  });

  it('schedules the next attempt from now, and gives up after maxAttempts', () => {
    const now = new Date('2026-12-02T12:00:00.000Z');
    expect(nextAttemptAt(2, now, OPTS)?.toISOString()).toBe('2026-12-02T12:00:02.000Z');
    expect(nextAttemptAt(4, now, OPTS)?.toISOString()).toBe('2026-12-02T12:00:08.000Z');
    expect(nextAttemptAt(5, now, OPTS)).toBeUndefined();
  });
});
