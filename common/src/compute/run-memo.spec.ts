import { describe, expect, it } from 'vitest';
import { computeOblique } from '../physics/homing.js';
import { buildProfile } from '../physics/profile.js';
import { runCompute } from './run.js';

// Caching correctness (not physics): runCompute reuses built profiles and the MUFs of a path;
// its answers must equal those of a profile built afresh for each call.
const layers = [
  { name: 'E', shape: 'chapman', criticalFrequencyMHz: 3, peakHeightKm: 110, scaleHeightKm: 10 },
  { name: 'F2', shape: 'chapman', criticalFrequencyMHz: 8, peakHeightKm: 300, scaleHeightKm: 50 },
] as const;
const profile = { layers: layers.map((l) => ({ ...l })) };

const fresh = (frequencyMHz: number, groundRangeKm: number) =>
  computeOblique(buildProfile({ layers: layers.map((l) => ({ ...l })) }), {
    frequencyMHz,
    groundRangeKm,
    maxHops: 4,
    minElevationDeg: 3,
    earth: 'spherical',
    mufs: true,
    includeRayPath: false,
  });

describe('runCompute memoisation', () => {
  it('a frequency sweep on one path answers as a fresh profile would, every time', () => {
    for (const frequencyMHz of [6, 9, 12, 9]) {
      const cached = runCompute('oblique', { profile, frequencyMHz, groundRangeKm: 1800 });
      expect(cached).toEqual(fresh(frequencyMHz, 1800));
    }
  });

  it('hands out a copy of the remembered MUFs: changing one answer does not change the next', () => {
    const first = runCompute('oblique', { profile, frequencyMHz: 7, groundRangeKm: 1200 });
    const mufs = { ...first.mufMHz };
    first.mufMHz!['1'] = -1;
    const second = runCompute('oblique', { profile, frequencyMHz: 8, groundRangeKm: 1200 });
    expect(second.mufMHz).toEqual(mufs);
  });

  it('tells different profiles and radii apart', () => {
    const lower = { layers: [{ ...layers[1], criticalFrequencyMHz: 6 }] };
    const a = runCompute('oblique', { profile, frequencyMHz: 5, groundRangeKm: 1500 });
    const b = runCompute('oblique', { profile: lower, frequencyMHz: 5, groundRangeKm: 1500 });
    const c = runCompute('oblique', {
      profile,
      frequencyMHz: 5,
      groundRangeKm: 1500,
      earthRadiusKm: 6000,
    });
    expect(b.mufMHz!['1']).toBeLessThan(a.mufMHz!['1']!);
    expect(c.modes[0].elevationDeg).not.toBe(a.modes[0].elevationDeg);
  });
});
