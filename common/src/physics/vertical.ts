/**
 * Vertical incidence from the ground (SPEC §2, §3 "vertical").
 *
 *   true height h_r: the first height where f_p(h) = f (bracketed root, Brent)
 *   virtual height   h' = ∫₀^h_r μ' dh = ∫₀^h_r dh / sqrt(1 − X(h))    (Davies 1990, §4; Budden 1985)
 *   phase height     h  = ∫₀^h_r μ dh  = ∫₀^h_r sqrt(1 − X(h)) dh
 *   group delay      τ  = 2·h'/c (round trip)
 *
 * The integrand of h' is singular (∝ 1/sqrt(h_r − h)) at the reflection height. It is handled
 * analytically, never by clipping:
 * - layers: on the last monotonic piece [a, h_r] substitute h = h_r − t², dh = −2t dt, which makes
 *   both integrands smooth in t (1 − X ≈ X'(h_r)·t²); adaptive Gauss–Kronrod on that.
 *   The pieces wholly below h_r use a fixed G7/K15 panel on precomputed densities, falling back
 *   to adaptive quadrature when |K15 − G7| is not small (e.g. passing just above a lower peak).
 * - samples: N is linear in each lamina, so X is linear and per lamina (p = sqrt(1 − X_a),
 *   q = sqrt(1 − X_b), thickness Δ)
 *     ∫ dh/μ = 2Δ/(p + q),     ∫ μ dh = (2/3)·Δ·(p² + pq + q²)/(p + q)
 *   (the rationalised forms of 2Δ(p − q)/(X_b − X_a) and (2/3)Δ(p³ − q³)/(X_b − X_a), free of
 *   cancellation when X_a ≈ X_b). In the reflecting lamina q = 0.
 */
import { SPEED_OF_LIGHT_KM_PER_MS } from './constants.js';
import { InputError } from './errors.js';
import { electronDensityFromPlasmaFrequencyMHz } from './plasma.js';
import type { Profile } from './profile.js';
import {
  brentRoot,
  GAUSS7_WEIGHTS,
  integratePair,
  KRONROD15_NODES,
  KRONROD15_WEIGHTS,
} from './quadrature.js';

export interface VerticalEcho {
  frequencyMHz: number;
  reflected: boolean;
  trueHeightKm: number | null;
  virtualHeightKm: number | null;
  phaseHeightKm: number | null;
  groupDelayMs: number | null;
}

export interface VerticalResponse {
  criticalFrequenciesMHz: Record<string, number>;
  echoes: VerticalEcho[];
}

/** Longest piece [km] of the precomputed G7/K15 grid of a layers profile. */
const MAX_PIECE_KM = 10;
/** Relative |K15 − G7| above which a piece is re-integrated adaptively. */
const PIECE_REL_TOLERANCE = 1e-8;
/** Relative tolerance of the adaptive quadratures. */
const REL_TOLERANCE = 1e-9;

const noEcho = (frequencyMHz: number): VerticalEcho => ({
  frequencyMHz,
  reflected: false,
  trueHeightKm: null,
  virtualHeightKm: null,
  phaseHeightKm: null,
  groupDelayMs: null,
});

function echo(
  frequencyMHz: number,
  trueKm: number,
  virtualKm: number,
  phaseKm: number,
): VerticalEcho {
  if (!Number.isFinite(virtualKm) || !Number.isFinite(phaseKm)) return noEcho(frequencyMHz); // f exactly at a smooth peak
  return {
    frequencyMHz,
    reflected: true,
    trueHeightKm: trueKm,
    virtualHeightKm: virtualKm,
    phaseHeightKm: phaseKm,
    groupDelayMs: (2 * virtualKm) / SPEED_OF_LIGHT_KM_PER_MS,
  };
}

export type VerticalSounder = (frequencyMHz: number) => VerticalEcho;

/** Precomputes what does not depend on frequency and returns a per-frequency evaluator. */
export function createVerticalSounder(profile: Profile): VerticalSounder {
  const sounder = profile.samples ? samplesSounder(profile) : layersSounder(profile);
  return (frequencyMHz) => {
    if (!(Number.isFinite(frequencyMHz) && frequencyMHz > 0)) {
      throw new InputError('frequencyMHz must be a positive number', {
        frequencyMHz: 'must be a positive number',
      });
    }
    return sounder(frequencyMHz);
  };
}

/** Synthetic ionogram: one echo per frequency, plus the critical frequency of each peak. */
export function verticalIonogram(
  profile: Profile,
  frequenciesMHz: readonly number[],
): VerticalResponse {
  const sound = createVerticalSounder(profile);
  const criticalFrequenciesMHz: Record<string, number> = {};
  for (const peak of profile.peaks) criticalFrequenciesMHz[peak.name] = peak.plasmaFrequencyMHz;
  return { criticalFrequenciesMHz, echoes: frequenciesMHz.map(sound) };
}

/** Index of the first entry of an ascending array that is ≥ value (array length if none). */
function firstAtLeast(ascending: Float64Array, value: number): number {
  let lo = 0;
  let hi = ascending.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (ascending[mid] >= value) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

function samplesSounder(profile: Profile): (frequencyMHz: number) => VerticalEcho {
  const { heightsKm, densitiesPerM3 } = profile.samples!;
  const count = heightsKm.length;
  const runningMax = new Float64Array(count);
  for (let i = 0; i < count; i++)
    runningMax[i] = Math.max(densitiesPerM3[i], i > 0 ? runningMax[i - 1] : 0);

  return (frequencyMHz) => {
    const nf = electronDensityFromPlasmaFrequencyMHz(frequencyMHz);
    const i = firstAtLeast(runningMax, nf);
    if (i === count) return noEcho(frequencyMHz);
    if (i === 0) return echo(frequencyMHz, heightsKm[0], heightsKm[0], heightsKm[0]); // reflected at a density step
    let virtualKm = heightsKm[0]; // free space below the profile
    let phaseKm = heightsKm[0];
    let p = Math.sqrt(1 - densitiesPerM3[0] / nf);
    for (let k = 1; k < i; k++) {
      const q = Math.sqrt(1 - densitiesPerM3[k] / nf);
      const thicknessKm = heightsKm[k] - heightsKm[k - 1];
      virtualKm += (2 * thicknessKm) / (p + q);
      phaseKm += ((2 / 3) * thicknessKm * (p * p + p * q + q * q)) / (p + q);
      p = q;
    }
    const n0 = densitiesPerM3[i - 1];
    const n1 = densitiesPerM3[i];
    const trueKm = heightsKm[i - 1] + ((nf - n0) / (n1 - n0)) * (heightsKm[i] - heightsKm[i - 1]);
    const lastKm = trueKm - heightsKm[i - 1];
    virtualKm += (2 * lastKm) / p; // X linear from X₀ to 1: ∫ dh/sqrt(1 − X) = 2Δ/sqrt(1 − X₀)
    phaseKm += (2 / 3) * lastKm * p;
    return echo(frequencyMHz, trueKm, virtualKm, phaseKm);
  };
}

function layersSounder(profile: Profile): (frequencyMHz: number) => VerticalEcho {
  const density = (h: number) => profile.electronDensityPerM3(h);
  // Pieces over which N is monotonic, at most MAX_PIECE_KM long.
  const ends: number[] = [];
  // Nothing reflects above the global maximum of N: the grid stops there.
  const topKm = profile.maxPlasmaFrequencyHeightKm;
  const breaks = [...profile.monotonicBreaksKm.filter((h) => h < topKm), topKm];
  for (let s = 0; s + 1 < breaks.length; s++) {
    const a = breaks[s];
    const b = breaks[s + 1];
    const n = Math.max(1, Math.ceil((b - a) / MAX_PIECE_KM));
    for (let k = 0; k < n; k++) ends.push(a + ((b - a) * k) / n);
  }
  ends.push(breaks[breaks.length - 1]);
  const pieceCount = ends.length - 1;
  const smoothBreaks = new Set(breaks.filter((h) => !profile.breakpointsKm.includes(h)));
  const lo = Float64Array.from(ends.slice(0, -1));
  const hi = Float64Array.from(ends.slice(1));
  // Densities at the piece ends, evaluated just inside the piece (a Chapman cut-off is a tiny step).
  const nLo = new Float64Array(pieceCount);
  const nHi = new Float64Array(pieceCount);
  const runningMax = new Float64Array(pieceCount);
  const isSmoothMaximum = new Uint8Array(pieceCount);
  const nodeDensity = new Float64Array(pieceCount * 15);
  for (let j = 0; j < pieceCount; j++) {
    const a = lo[j];
    const b = hi[j];
    nLo[j] = density(a);
    nHi[j] = density(b);
    runningMax[j] = Math.max(nLo[j], nHi[j], j > 0 ? runningMax[j - 1] : 0);
    isSmoothMaximum[j] = smoothBreaks.has(b) && nHi[j] > nLo[j] ? 1 : 0;
    const mid = 0.5 * (a + b);
    const half = 0.5 * (b - a);
    for (let k = 0; k < 7; k++) {
      nodeDensity[j * 15 + k] = density(mid - half * KRONROD15_NODES[k]);
      nodeDensity[j * 15 + 14 - k] = density(mid + half * KRONROD15_NODES[k]);
    }
    nodeDensity[j * 15 + 7] = density(mid);
  }

  return (frequencyMHz) => {
    const nf = electronDensityFromPlasmaFrequencyMHz(frequencyMHz);
    const j = firstAtLeast(runningMax, nf);
    if (j === pieceCount) return noEcho(frequencyMHz);
    // f at (within rounding of) a smooth maximum of N: X' = 0 there, the group integral diverges
    // logarithmically and no echo returns in finite time.
    if (isSmoothMaximum[j] && nHi[j] - nf <= 1e-12 * nf) return noEcho(frequencyMHz);
    // Reflection height: N(a_j) < N_f ≤ N(b_j) with N monotonic on the piece.
    let trueKm: number;
    if (nLo[j] >= nf) {
      trueKm = lo[j];
    } else {
      trueKm = brentRoot((h) => density(h) - nf, lo[j], hi[j]) ?? hi[j];
    }

    let virtualKm = profile.bottomKm; // free space below the profile
    let phaseKm = profile.bottomKm;
    for (let k = 0; k < j; k++) {
      const half = 0.5 * (hi[k] - lo[k]);
      let gv = 0;
      let kv = 0;
      let gp = 0;
      let kp = 0;
      for (let m = 0; m < 15; m++) {
        const mu = Math.sqrt(1 - nodeDensity[k * 15 + m] / nf);
        const w = KRONROD15_WEIGHTS[m < 8 ? m : 14 - m];
        kv += w / mu;
        kp += w * mu;
        if (m % 2 === 1) {
          const wg = GAUSS7_WEIGHTS[(m < 8 ? m - 1 : 13 - m) / 2];
          gv += wg / mu;
          gp += wg * mu;
        }
      }
      if (
        Math.abs(kv - gv) <= PIECE_REL_TOLERANCE * kv &&
        Math.abs(kp - gp) <= PIECE_REL_TOLERANCE * kp
      ) {
        virtualKm += kv * half;
        phaseKm += kp * half;
      } else {
        // Integrand peaked inside the piece (the wave passes just above a lower maximum).
        const [v, p] = integratePair(
          (h, out) => {
            const mu = Math.sqrt(1 - density(h) / nf);
            out[0] = 1 / mu;
            out[1] = mu;
          },
          lo[k],
          hi[k],
          { relTolerance: REL_TOLERANCE },
        );
        virtualKm += v;
        phaseKm += p;
      }
    }
    // Last piece [a_j, h_r] with h = h_r − t²: ∫ dh/μ = ∫ 2t/μ dt, ∫ μ dh = ∫ 2t·μ dt.
    const tMax = Math.sqrt(trueKm - lo[j]);
    if (tMax > 0) {
      // 1 − X(h_r − t²) = (N(h_r) − N(h_r − t²))/N_f, taking N(h_r) = N_f (h_r is exact to a few
      // ulps): the drop is computed per layer without cancellation, so 1 − X keeps full relative
      // precision down to t → 0 and the integrands 2t/μ, 2tμ stay smooth there.
      const [v, p] = integratePair(
        (t, out) => {
          const mu = Math.sqrt(profile.densityDropPerM3(trueKm, t * t) / nf);
          out[0] = t === 0 ? 0 : (2 * t) / mu;
          out[1] = 2 * t * mu;
        },
        0,
        tMax,
        { relTolerance: REL_TOLERANCE },
      );
      virtualKm += v;
      phaseKm += p;
    }
    return echo(frequencyMHz, trueKm, virtualKm, phaseKm);
  };
}
