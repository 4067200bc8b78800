/**
 * True-height inversion of a vertical-incidence trace by lamination (SPEC §3 "invert").
 *
 * Model: no ionization below the lowest sounded frequency f₀ (its true height is its virtual
 * height, h₀ = h'₀); above, N is linear in height between the true heights h_k of the sounded
 * frequencies f_k (N_k = N(f_k)), i.e. the `samples` model of profile.ts. For that model the
 * virtual height of f_k is (see vertical.ts; Budden 1985 ch. 10; Davies 1990 §4 for lamination)
 *   h'_k = h₀ + Σ_{i=1}^{k−1} 2Δ_i/(p_i + q_i) + 2Δ_k/p_k,
 *   p_i = sqrt(1 − N_{i−1}/N_k),  q_i = sqrt(1 − N_i/N_k),  Δ_i = h_i − h_{i−1},
 * where the last lamina's term (X linear from X₀ to 1: ∫dh/sqrt(1 − X) = 2Δ/sqrt(1 − X₀)) is
 * linear in its unknown thickness, so each Δ_k follows exactly, one frequency at a time:
 *   Δ_k = (h'_k − h₀ − Σ…)·p_k/2.
 * Ordinary ray, no magnetic field, monotonic profile (no valley).
 */
import { NoSolutionError } from './errors.js';
import { electronDensityFromPlasmaFrequencyMHz } from './plasma.js';

export interface TracePoint {
  frequencyMHz: number;
  virtualHeightKm: number;
}

export interface InvertedSample {
  heightKm: number;
  plasmaFrequencyMHz: number;
  electronDensityPerM3: number;
}

export function invertTrace(trace: readonly TracePoint[]): { samples: InvertedSample[] } {
  const n = trace.length;
  const densities = trace.map((p) => electronDensityFromPlasmaFrequencyMHz(p.frequencyMHz));
  const heights = new Float64Array(n);
  heights[0] = trace[0].virtualHeightKm;
  for (let k = 1; k < n; k++) {
    const nk = densities[k];
    let sumKm = heights[0];
    let p = Math.sqrt(1 - densities[0] / nk);
    for (let i = 1; i < k; i++) {
      const q = Math.sqrt(1 - densities[i] / nk);
      sumKm += (2 * (heights[i] - heights[i - 1])) / (p + q);
      p = q;
    }
    const thicknessKm = ((trace[k].virtualHeightKm - sumKm) * p) / 2;
    if (!(thicknessKm > 0)) {
      throw new NoSolutionError(
        `trace[${k}]: virtual height ${trace[k].virtualHeightKm} km is too low for the profile below it (the lamina would have thickness ${thicknessKm.toFixed(3)} km); the trace is not that of a monotonic profile`,
        `trace[${k}].virtualHeightKm`,
      );
    }
    heights[k] = heights[k - 1] + thicknessKm;
  }
  return {
    samples: trace.map((point, k) => ({
      heightKm: heights[k],
      plasmaFrequencyMHz: point.frequencyMHz,
      electronDensityPerM3: densities[k],
    })),
  };
}
