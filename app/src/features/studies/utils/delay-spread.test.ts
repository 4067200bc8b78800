import { describe, expect, it } from 'vitest';
import { classifyDelaySpread } from './delay-spread';

// Class edges: ITU-R F.1487 HF test channels, quiet ≈ 0.5 ms, moderate 1–2 ms, disturbed 2–7 ms
// (values from memory, SPEC §9: verify before quoting).
describe('classifyDelaySpread', () => {
  it.each([
    [null, 'none'],
    [0, 'single'],
    [0.5, 'quiet'],
    [1, 'moderate'],
    [2, 'moderate'],
    [2.5, 'disturbed'],
    [7, 'disturbed'],
    [7.84, 'beyond'],
  ] as const)('%s ms → %s', (spreadMs, expected) => {
    expect(classifyDelaySpread(spreadMs).spreadClass).toBe(expected);
  });
});
