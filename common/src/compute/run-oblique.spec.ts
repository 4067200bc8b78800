import { describe, expect, it, vi } from 'vitest';

// Unit test of the wiring only: computeOblique itself is tested beside physics/homing.ts.
vi.mock('../physics/homing.js', () => ({
  computeOblique: vi.fn((profile: { earthRadiusKm: number }, params: unknown) => ({
    profileR0: profile.earthRadiusKm,
    params,
  })),
}));

const { runCompute } = await import('./run.js');

describe('runCompute oblique wiring', () => {
  it('passes the parsed params with defaults, and earthRadiusKm to the profile', () => {
    const profile = {
      layers: [
        {
          name: 'F2',
          shape: 'quasiParabolic',
          criticalFrequencyMHz: 8,
          peakHeightKm: 300,
          semiThicknessKm: 80,
        },
      ],
    };
    const r = runCompute('oblique', {
      profile,
      frequencyMHz: 7,
      groundRangeKm: 1000,
      earthRadiusKm: 6000,
    }) as unknown;
    expect(r).toEqual({
      profileR0: 6000,
      params: {
        frequencyMHz: 7,
        groundRangeKm: 1000,
        maxHops: 4,
        minElevationDeg: 3,
        earth: 'spherical',
        mufs: true,
        includeRayPath: false,
      },
    });
  });
});
