import { describe, expect, it } from 'vitest';
import { groupDelaySweep, sweepFrequencies } from './frequencies';

describe('sweepFrequencies', () => {
  it('includes both ends and rounds to 1 kHz', () => {
    expect(sweepFrequencies(3, 4, 0.1)).toEqual([
      3, 3.1, 3.2, 3.3, 3.4, 3.5, 3.6, 3.7, 3.8, 3.9, 4,
    ]);
    expect(sweepFrequencies(5, 15, 5)).toEqual([5, 10, 15]);
  });
  it('gives nothing for an empty or reversed range', () => {
    expect(sweepFrequencies(10, 5, 1)).toEqual([]);
    expect(sweepFrequencies(5, 10, 0)).toEqual([]);
  });
});

describe('groupDelaySweep', () => {
  it('starts at 2 MHz, ends just under the MUF and keeps within the point budget', () => {
    const list = groupDelaySweep(12.862);
    expect(list[0]).toBe(2);
    expect(list[list.length - 1]).toBeCloseTo(12.861, 6);
    expect(list.length).toBeLessThanOrEqual(64);
    for (let i = 1; i < list.length; i += 1) expect(list[i]).toBeGreaterThan(list[i - 1]);
  });
  it('is empty when the MUF is below the start', () => {
    expect(groupDelaySweep(1.5)).toEqual([]);
  });
});
