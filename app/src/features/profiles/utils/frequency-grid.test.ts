import { describe, expect, it } from 'vitest';
import { frequencyGridMHz, sweepTopMHz } from './frequency-grid';

describe('frequencyGridMHz', () => {
  it('steps 0.05 MHz from 1 MHz with exact, rounded values', () => {
    const grid = frequencyGridMHz(1, 2);
    expect(grid).toHaveLength(21);
    expect(grid[1]).toBe(1.05);
    expect(grid.at(-1)).toBe(2);
  });

  it('keeps within the compute route limit of 2000 frequencies (SPEC §3)', () => {
    expect(frequencyGridMHz(1, 200)).toHaveLength(2000);
  });

  it('returns nothing for an empty range', () => {
    expect(frequencyGridMHz(5, 4)).toEqual([]);
  });

  it('puts the sweep top a little above the highest critical frequency', () => {
    expect(sweepTopMHz(8)).toBe(9);
    expect(sweepTopMHz(9.2)).toBe(11);
  });
});
