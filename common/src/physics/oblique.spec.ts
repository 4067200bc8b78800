import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  QUIET_DAY,
  referenceFp2,
  referenceKinks,
  type ReferenceLayer,
} from '../../test/reference-profiles.js';
import { traceReferenceRay } from '../../test/reference-ray.js';
import { hopIntegrals, prepareMedium } from './oblique.js';
import { buildProfile, type LayerInput } from './profile.js';

const DEG = Math.PI / 180;
const rel = (a: number, b: number) => Math.abs(a / b - 1);

function layersProfile(layers: ReferenceLayer[]) {
  return buildProfile({
    layers: layers.map((l, i): LayerInput => ({ name: `L${i}`, ...l })),
  });
}

/** Parabolic layer, vertical incidence (Davies 1990; Budden 1985; SPEC §9):
 *  h′(f) = h_b + (y_m/2)(f/f_c)·ln((f_c + f)/(f_c − f)). */
const parabolicVirtualHeightKm = (fMHz: number, fcMHz: number, hmKm: number, ymKm: number) =>
  hmKm - ymKm + (ymKm / 2) * (fMHz / fcMHz) * Math.log((fcMHz + fMHz) / (fcMHz - fMHz));

describe('flat-Earth theorems on random parabolic layers', () => {
  const layerArb = fc.record({
    fcMHz: fc.double({ min: 2, max: 14, noNaN: true }),
    hmKm: fc.double({ min: 150, max: 450, noNaN: true }),
    ymKm: fc.double({ min: 10, max: 140, noNaN: true }),
    // the vertical-equivalent frequency f·sin β₀ as a fraction of f_c (reflected rays only)
    fraction: fc.double({ min: 0.05, max: 0.98, noNaN: true }),
    elevationDeg: fc.double({ min: 2, max: 88, noNaN: true }),
  });

  it('Breit–Tuve: P′ = D/cos β₀ (Davies 1990, §6.2; SPEC §9)', () => {
    let worst = 0;
    fc.assert(
      fc.property(layerArb, ({ fcMHz, hmKm, ymKm, fraction, elevationDeg }) => {
        const profile = layersProfile([
          {
            shape: 'parabolic',
            criticalFrequencyMHz: fcMHz,
            peakHeightKm: hmKm,
            semiThicknessKm: ymKm,
          },
        ]);
        const f = (fraction * fcMHz) / Math.sin(elevationDeg * DEG);
        const hop = hopIntegrals(prepareMedium(profile, f, 'flat'), elevationDeg * DEG);
        expect(hop).not.toBeNull();
        const e = rel(hop!.groupPathKm, hop!.groundRangeKm / Math.cos(elevationDeg * DEG));
        worst = Math.max(worst, e);
        expect(e).toBeLessThan(1e-9);
      }),
      { numRuns: 200, seed: 1990 },
    );
    console.log(`Breit–Tuve largest relative error ${worst.toExponential(2)}`);
  });

  it("Martyn's theorem: h′_oblique(f) = h′_vertical(f·sin β₀) (Davies 1990, §6.2; SPEC §9)", () => {
    let worst = 0;
    fc.assert(
      fc.property(layerArb, ({ fcMHz, hmKm, ymKm, fraction, elevationDeg }) => {
        const profile = layersProfile([
          {
            shape: 'parabolic',
            criticalFrequencyMHz: fcMHz,
            peakHeightKm: hmKm,
            semiThicknessKm: ymKm,
          },
        ]);
        const sinB = Math.sin(elevationDeg * DEG);
        const f = (fraction * fcMHz) / sinB;
        const hop = hopIntegrals(prepareMedium(profile, f, 'flat'), elevationDeg * DEG)!;
        // Equivalent-triangle height of the oblique path: h′ = (P′/2)·sin β₀.
        const obliqueVirtualKm = (hop.groupPathKm / 2) * sinB;
        const verticalKm = parabolicVirtualHeightKm(f * sinB, fcMHz, hmKm, ymKm);
        const e = rel(obliqueVirtualKm, verticalKm);
        worst = Math.max(worst, e);
        expect(e).toBeLessThan(1e-8);
      }),
      { numRuns: 200, seed: 1937 },
    );
    console.log(`Martyn largest relative error ${worst.toExponential(2)}`);
  });
});

describe('against the independent Runge–Kutta ray tracer (test/reference-ray.ts)', () => {
  const cases: { name: string; layers: ReferenceLayer[] }[] = [
    { name: 'quiet day (E, F1 parabolic, F2 Chapman)', layers: QUIET_DAY },
    {
      name: 'quasi-parabolic F2 over parabolic E',
      layers: [
        { shape: 'parabolic', criticalFrequencyMHz: 3.2, peakHeightKm: 110, semiThicknessKm: 20 },
        {
          shape: 'quasiParabolic',
          criticalFrequencyMHz: 5.6,
          peakHeightKm: 380,
          semiThicknessKm: 140,
        },
      ],
    },
  ];
  for (const { name, layers } of cases) {
    for (const earth of ['spherical', 'flat'] as const) {
      it(`${name}, ${earth} Earth: D₁, P′, P within 1e-6 relative (SPEC §2.3 asks 1e-5)`, () => {
        const profile = layersProfile(layers);
        const fp2 = referenceFp2(layers);
        const kinksKm = referenceKinks(layers);
        let worst = 0;
        let compared = 0;
        for (const f of [3, 5, 7.5, 10, 14, 20]) {
          const medium = prepareMedium(profile, f, earth);
          for (const b of [0.5, 2, 5, 10, 18, 27, 40, 60, 80]) {
            const hop = hopIntegrals(medium, b * DEG);
            const ref = traceReferenceRay(fp2, f, b, { earth, kinksKm });
            // Both agree on whether the ray comes back (a ray within ~1e-6 of a critical
            // elevation could differ; none of these is).
            expect(hop === null).toBe(ref === null);
            if (!hop || !ref) continue;
            compared++;
            const e = Math.max(
              rel(hop.groundRangeKm, ref.groundRangeKm),
              rel(hop.groupPathKm, ref.groupPathKm),
              rel(hop.phasePathKm, ref.phasePathKm),
            );
            worst = Math.max(worst, e);
            expect(e).toBeLessThan(1e-6);
            expect(Math.abs(hop.apexHeightKm - ref.apexHeightKm)).toBeLessThan(1e-3);
            // Invariant: group path ≥ phase path (SPEC §2).
            expect(hop.groupPathKm).toBeGreaterThanOrEqual(hop.phasePathKm);
          }
        }
        expect(compared).toBeGreaterThan(20);
        console.log(
          `${name} (${earth}): ${compared} rays, largest relative error ${worst.toExponential(2)}`,
        );
      });
    }
  }
});

describe('penetration structure', () => {
  const profile = layersProfile(QUIET_DAY);

  it('rays above the highest critical elevation escape; f ≤ foF2 reflects vertically', () => {
    const high = prepareMedium(profile, 12, 'spherical');
    expect(high.reflectsVertically).toBe(false);
    const top = high.criticalElevationsRad[high.criticalElevationsRad.length - 1];
    expect(hopIntegrals(high, top + 0.01)).toBeNull();
    expect(hopIntegrals(high, top - 0.01)).not.toBeNull();
    const low = prepareMedium(profile, 9, 'spherical');
    expect(low.reflectsVertically).toBe(true);
    expect(hopIntegrals(low, 89.9 * DEG)).not.toBeNull();
  });

  it('D₁ grows without bound towards a critical elevation, from both sides', () => {
    const medium = prepareMedium(profile, 10, 'spherical');
    const c = medium.criticalElevationsRad[1];
    const below = [1e-2, 1e-3, 1e-4].map((d) => hopIntegrals(medium, c - d)!.groundRangeKm);
    const above = [1e-2, 1e-3, 1e-4].map((d) => hopIntegrals(medium, c + d)!.groundRangeKm);
    expect(below[1]).toBeGreaterThan(below[0]);
    expect(below[2]).toBeGreaterThan(below[1]);
    expect(above[1]).toBeGreaterThan(above[0]);
    expect(above[2]).toBeGreaterThan(above[1]);
  });

  it('D₁ is continuous inside an interval (no jumps between close elevations)', () => {
    const medium = prepareMedium(profile, 10, 'spherical');
    const [c0, c1] = medium.criticalElevationsRad;
    // Away from the (logarithmic) ends, steps of 1e-4 rad change D₁ by well under 1 %.
    let prev = hopIntegrals(medium, c0 + 0.01)!.groundRangeKm;
    let steps = 0;
    for (let x = c0 + 0.01; x < c1 - 0.01; x += 1e-4) {
      const d = hopIntegrals(medium, x)!.groundRangeKm;
      expect(Math.abs(d - prev) / prev).toBeLessThan(0.01);
      prev = d;
      steps++;
    }
    expect(steps).toBeGreaterThan(100);
  });

  it('a grazing ray (β₀ = 0) on a spherical Earth has a finite one-hop range', () => {
    const medium = prepareMedium(profile, 7, 'spherical');
    const hop = hopIntegrals(medium, 0)!;
    expect(hop.groundRangeKm).toBeGreaterThan(2000);
    expect(hop.groundRangeKm).toBeLessThan(5000);
    // Continuous at β₀ → 0 (the free-space part is closed-form, exact at a = R₀).
    const near = hopIntegrals(medium, 1e-6)!;
    expect(rel(near.groundRangeKm, hop.groundRangeKm)).toBeLessThan(1e-5);
    // And the reference agrees at a nearly grazing elevation (its start at k = 0 is degenerate).
    const ref = traceReferenceRay(referenceFp2(QUIET_DAY), 7, 0.05, {
      earth: 'spherical',
      kinksKm: referenceKinks(QUIET_DAY),
    })!;
    expect(rel(hopIntegrals(medium, 0.05 * DEG)!.groundRangeKm, ref.groundRangeKm)).toBeLessThan(
      1e-6,
    );
  });
});
