/**
 * The one-hop ground range D₁(β₀) over the admissible elevations at one frequency, split at the
 * critical (penetration) elevations where D₁ → ∞ (see oblique.ts), sampled densely near those
 * ends (log-spaced offsets) and with its interior extrema refined by Brent's minimiser, so that
 * every solution of n·D₁(β₀) = G, for any n, lies between two samples with a sign change.
 * Elevations within 0.001° of a critical elevation are left out (ducted along the layer peak,
 * ill-conditioned; SPEC §3 allows omitting them).
 */
import { bracketedMinimum, hopIntegrals, type ObliqueMedium } from './oblique.js';

/** Offset [rad] from a critical elevation inside which rays are not considered (0.001°). */
export const CRITICAL_EXCLUSION_RAD = (0.001 * Math.PI) / 180;
const LINEAR_SAMPLES = 12;
const LOG_SAMPLES = 8;
const EXTREMUM_TOLERANCE_RAD = 1e-9;

export interface RangeSample {
  elevationRad: number;
  groundRangeKm: number;
}

export interface ElevationInterval {
  loRad: number;
  hiRad: number;
  /** D₁ → ∞ at this end (a critical elevation, or a grazing ray on a flat Earth). */
  loCritical: boolean;
  hiCritical: boolean;
  /** Height [km] of the minimum of g that sets the upper critical end (null: vertical end). */
  hiCriticalHeightKm: number | null;
  /** Ascending by elevation, including the refined interior extrema. */
  samples: RangeSample[];
}

/** The admissible elevation intervals (without samples) at this frequency. */
export function elevationIntervals(
  medium: ObliqueMedium,
  minElevationRad: number,
): Omit<ElevationInterval, 'samples'>[] {
  if (medium.blocked) return [];
  const ends: { rad: number; critical: boolean; heightKm: number | null }[] = [
    {
      rad: minElevationRad,
      critical: medium.earth === 'flat' && minElevationRad <= 0,
      heightKm: null,
    },
  ];
  medium.criticalElevationsRad.forEach((c, i) => {
    if (c > minElevationRad) {
      ends.push({ rad: c, critical: true, heightKm: medium.criticalHeightsKm[i] });
    }
  });
  if (medium.reflectsVertically) ends.push({ rad: Math.PI / 2, critical: false, heightKm: null });
  const out: Omit<ElevationInterval, 'samples'>[] = [];
  for (let i = 0; i + 1 < ends.length; i++) {
    const lo = ends[i];
    const hi = ends[i + 1];
    const loEff = lo.rad + (lo.critical ? CRITICAL_EXCLUSION_RAD : 0);
    const hiEff = hi.rad - (hi.critical ? CRITICAL_EXCLUSION_RAD : 0);
    if (hiEff > loEff) {
      out.push({
        loRad: lo.rad,
        hiRad: hi.rad,
        loCritical: lo.critical,
        hiCritical: hi.critical,
        hiCriticalHeightKm: hi.critical ? hi.heightKm : null,
      });
    }
  }
  return out;
}

function sampleElevations(iv: Omit<ElevationInterval, 'samples'>): number[] {
  const lo = iv.loRad + (iv.loCritical ? CRITICAL_EXCLUSION_RAD : 0);
  const hi = iv.hiRad - (iv.hiCritical ? CRITICAL_EXCLUSION_RAD : 0);
  const width = hi - lo;
  const xs: number[] = [];
  for (let k = 0; k <= LINEAR_SAMPLES; k++) xs.push(lo + (width * k) / LINEAR_SAMPLES);
  // Log-spaced offsets from a critical end, from the exclusion offset to a quarter of the width.
  const span = width / 4;
  if (span > 0) {
    for (let k = 1; k < LOG_SAMPLES; k++) {
      const off = Math.exp(Math.log(1e-7) + ((Math.log(span) - Math.log(1e-7)) * k) / LOG_SAMPLES);
      if (iv.loCritical) xs.push(lo + off);
      if (iv.hiCritical) xs.push(hi - off);
    }
  }
  xs.sort((a, b) => a - b);
  return xs.filter((x, i) => i === 0 || x > xs[i - 1] + 1e-12);
}

/**
 * Samples D₁ on every interval. `refineExtremum(sampleKm)` decides whether an interior local
 * extremum of the samples is refined (default: always). With `targetsKm`, a refinement stops as
 * soon as it has passed every target beyond the sample (a minimum below all targets under it, a
 * maximum above all targets over it): the sign changes, the only use of the refined sample, are
 * then those of the exact extremum.
 */
export function scanElevations(
  medium: ObliqueMedium,
  minElevationRad: number,
  refineExtremum: (sampleKm: number, isMinimum: boolean) => boolean = () => true,
  targetsKm?: readonly number[],
): ElevationInterval[] {
  const out: ElevationInterval[] = [];
  for (const iv of elevationIntervals(medium, minElevationRad)) {
    const samples: RangeSample[] = [];
    for (const x of sampleElevations(iv)) {
      const hop = hopIntegrals(medium, x);
      if (hop && Number.isFinite(hop.groundRangeKm)) {
        samples.push({ elevationRad: x, groundRangeKm: hop.groundRangeKm });
      }
    }
    const refined: RangeSample[] = [];
    for (let i = 1; i + 1 < samples.length; i++) {
      const d0 = samples[i - 1].groundRangeKm;
      const d1 = samples[i].groundRangeKm;
      const d2 = samples[i + 1].groundRangeKm;
      const isMin = d1 < d0 && d1 <= d2;
      const isMax = d1 > d0 && d1 >= d2;
      if (!(isMin || isMax) || !refineExtremum(d1, isMin)) continue;
      const sign = isMin ? 1 : -1;
      // Stop beyond the farthest target past d1 (in the sign-flipped values: below all of them).
      // Or once the extremum is safely short of the nearest target past d1.
      let stopBelow = -Infinity;
      let stopAbove = -Infinity;
      if (targetsKm) {
        const beyond = targetsKm.filter((t) => (isMin ? t < d1 : t > d1)).map((t) => sign * t);
        if (beyond.length) {
          stopBelow = Math.min(...beyond);
          stopAbove = Math.max(...beyond);
        }
      }
      // The three samples bracket the extremum: start there with a parabolic step.
      const m = bracketedMinimum(
        (x) => {
          const hop = hopIntegrals(medium, x);
          return hop ? sign * hop.groundRangeKm : Infinity;
        },
        samples[i - 1].elevationRad,
        sign * d0,
        samples[i].elevationRad,
        sign * d1,
        samples[i + 1].elevationRad,
        sign * d2,
        EXTREMUM_TOLERANCE_RAD,
        stopBelow,
        stopAbove,
      );
      if (Number.isFinite(m.fx) && sign * m.fx < sign * d1) {
        refined.push({ elevationRad: m.x, groundRangeKm: sign * m.fx });
      }
    }
    if (refined.length) {
      samples.push(...refined);
      samples.sort((a, b) => a.elevationRad - b.elevationRad);
    }
    if (samples.length) out.push({ ...iv, samples });
  }
  return out;
}
