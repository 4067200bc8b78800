// Regression: a samples profile that stops at its peak (what a true-height inversion gives: no
// topside) found no modes at high elevations and MUFs equal to foF2, because the minimum of
// g = μ²r² at the profile's top node was never recorded as a penetration point.
// Invariant used (ray optics, e.g. Davies 1990 ch. 6): a ray that turns below the layer peak never
// meets the topside, so removing the topside must not change any reflected mode or any MUF.
import { describe, expect, it } from 'vitest';
import { runCompute } from '../compute/run.js';

type Sample = { heightKm: number; plasmaFrequencyMHz: number };

function parabolicSamples(topsideToo: boolean): Sample[] {
  const fcMHz = 9;
  const hmKm = 300;
  const ymKm = 100;
  const samples: Sample[] = [];
  for (let h = hmKm - ymKm; h <= (topsideToo ? hmKm + ymKm : hmKm); h += 5) {
    const x = (h - hmKm) / ymKm;
    samples.push({ heightKm: h, plasmaFrequencyMHz: fcMHz * Math.sqrt(Math.max(0, 1 - x * x)) });
  }
  return samples;
}

interface ObliqueResult {
  modes: { label: string; ray: string; elevationDeg: number; groupPathKm: number }[];
  mufMHz: Record<string, number | null>;
}

describe('a profile that ends at its peak (regression)', () => {
  for (const groundRangeKm of [1000, 3000]) {
    it(`has the same modes and MUFs as the full layer at ${groundRangeKm} km`, () => {
      const run = (samples: Sample[]) =>
        runCompute('oblique', {
          profile: { samples },
          frequencyMHz: 10,
          groundRangeKm,
        }) as ObliqueResult;
      const full = run(parabolicSamples(true));
      const bottomside = run(parabolicSamples(false));
      expect(full.modes.length).toBeGreaterThan(0);
      expect(bottomside.modes.map((m) => `${m.label}${m.ray}`)).toEqual(
        full.modes.map((m) => `${m.label}${m.ray}`),
      );
      full.modes.forEach((m, i) => {
        expect(bottomside.modes[i].elevationDeg).toBeCloseTo(m.elevationDeg, 6);
        expect(Math.abs(bottomside.modes[i].groupPathKm / m.groupPathKm - 1)).toBeLessThan(1e-9);
      });
      for (const hops of ['1', '2', '3', '4']) {
        const a = full.mufMHz[hops];
        const b = bottomside.mufMHz[hops];
        expect(a).not.toBeNull();
        expect(Math.abs((b as number) / (a as number) - 1)).toBeLessThan(1e-4);
      }
    });
  }
});
