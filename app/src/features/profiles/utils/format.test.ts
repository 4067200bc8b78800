import { describe, expect, it } from 'vitest';
import { fixed, signedDifference } from './format';

describe('number formatting for the compare table', () => {
  it('signs differences and marks unknowns', () => {
    expect(signedDifference(9.5, 9.2, 2)).toBe('+0.30');
    expect(signedDifference(8, 9.2, 1)).toBe('−1.2');
    expect(signedDifference(3, 3, 2)).toBe('±0.00');
    expect(signedDifference(null, 3, 2)).toBe('—');
    expect(fixed(undefined, 1)).toBe('—');
    expect(fixed(310.04, 1)).toBe('310.0');
  });
});
