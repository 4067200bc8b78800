import { describe, expect, it } from 'vitest';
import { QUIET_DAY, referenceFp2, referenceKinks } from '../../test/reference-profiles.js';
import { traceReferenceRay } from '../../test/reference-ray.js';
import { computeOblique } from './homing.js';
import { mufPerHops } from './muf.js';
import { brentMinimum } from './oblique.js';
import { buildProfile } from './profile.js';

// The layers of profiles/quiet-day.json (invented demo data), as in test/reference-profiles.ts.
const quietDay = buildProfile({
  layers: QUIET_DAY.map((l, i) => ({ name: ['E', 'F1', 'F2'][i], ...l })),
});

describe('MUF', () => {
  it('secant law for a thin layer on a flat Earth: f_MUF = f_c·sec φ₀ (Davies 1990; SPEC §9)', () => {
    // A parabolic layer 0.4 km thick at 300 km: the ray reflects at ≈ 300 km, so at range D the
    // angle of incidence is tan φ₀ = (D/2)/h and the highest reflected frequency is f_c·sec φ₀.
    const fcMHz = 6;
    const hmKm = 300;
    const profile = buildProfile({
      layers: [
        {
          name: 'F',
          shape: 'parabolic',
          criticalFrequencyMHz: fcMHz,
          peakHeightKm: hmKm,
          semiThicknessKm: 0.2,
        },
      ],
    });
    for (const D of [300, 1000, 2500]) {
      const muf = mufPerHops(profile, D, 1, 1, 'flat')['1']!;
      const secant = fcMHz * Math.sqrt(1 + (D / 2 / hmKm) ** 2);
      // Thin-layer limit: the residual is of order (y_m/h_m)·ln(…) ≈ a few 1e-3.
      expect(Math.abs(muf / secant - 1)).toBeLessThan(5e-3);
    }
  });

  it('modes exist just below MUF(n) and not just above (definition, SPEC §3)', () => {
    for (const G of [1500, 3000]) {
      const mufs = mufPerHops(quietDay, G, 4, 3, 'spherical');
      for (let n = 1; n <= 4; n++) {
        const muf = mufs[String(n)];
        expect(muf).not.toBeNull();
        const run = (f: number) =>
          computeOblique(quietDay, {
            frequencyMHz: f,
            groundRangeKm: G,
            maxHops: 4,
            minElevationDeg: 3,
            earth: 'spherical',
            mufs: false,
            includeRayPath: false,
          }).modes.filter((m) => m.hops === n);
        expect(run(muf! * (1 - 1e-4)).length).toBeGreaterThan(0);
        expect(run(muf! * (1 + 1e-4)).length).toBe(0);
      }
    }
  });

  it('MUF(1) at 3000 km agrees with the Runge–Kutta reference to 1e-4 (SPEC §2.3)', () => {
    // Reference: the skip distance (minimum one-hop range over elevation) at f equals G at the MUF.
    const fp2 = referenceFp2(QUIET_DAY);
    const kinksKm = referenceKinks(QUIET_DAY);
    const G = 3000;
    const muf = mufPerHops(quietDay, G, 1, 3, 'spherical')['1']!;
    const skip = (f: number) =>
      brentMinimum(
        (b) => traceReferenceRay(fp2, f, b, { earth: 'spherical', kinksKm })?.groundRangeKm ?? 1e9,
        3,
        14,
        1e-4,
      );
    const below = skip(muf * (1 - 1e-4));
    const above = skip(muf * (1 + 1e-4));
    expect(below.fx).toBeLessThanOrEqual(G);
    expect(above.fx).toBeGreaterThan(G);
  });

  it('MUF for the same hop length is the same: MUF(1) at G = MUF(2) at 2G', () => {
    const a = mufPerHops(quietDay, 1500, 1, 3, 'spherical')['1']!;
    const b = mufPerHops(quietDay, 3000, 2, 3, 'spherical')['2']!;
    expect(Math.abs(a / b - 1)).toBeLessThan(1e-5);
  });

  it('null when no admissible elevation gives the range (one hop of 12000 km)', () => {
    // D₁ → ∞ only within 0.001° of a critical elevation, where modes are omitted (SPEC §3), so the
    // admissible one-hop ranges are bounded and 12000 km has no one-hop MUF; two-hop neither,
    // while six hops of 2000 km do.
    const mufs = mufPerHops(quietDay, 12000, 6, 3, 'spherical');
    expect(mufs['1']).toBeNull();
    expect(mufs['6']).not.toBeNull();
  });
});
