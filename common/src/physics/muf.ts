/**
 * Maximum usable frequency per hop count (SPEC §3 `mufMHz`): MUF(n) is the highest frequency with an
 * n-hop solution n·D₁(β₀) = G at some admissible elevation.
 *
 * At a frequency f, an n-hop solution exists iff some elevation interval (elevation-scan.ts) has
 * min D₁ ≤ G/n ≤ sup D₁ (D₁ is continuous inside an interval; near a critical end the sup is taken
 * 0.001° inside it, as homing omits the ducted rays closer than that).
 * Existence need not be monotonic in f across layers, so we scan down from an upper bound in
 * steps of 10 % and then solve ψ_n(f) = 0 between the last frequency without and the first with a
 * solution, where ψ_n(f) = min over intervals of max(min D₁ − G/n, G/n − sup D₁) (≤ 0 ⇔ a solution).
 *
 * Upper bound (Bouguer at the apex: f = f_p(h_t)/sqrt(1 − (R₀cos β₀/(R₀ + h_t))²), SPEC brief):
 *   f ≤ max_h f_p(h) / sqrt(1 − (R₀ cos β_lb / (R₀ + h))²), β_lb = max(β_min, β_geo(n)),
 * where β_geo(n) is the elevation whose straight ray reaches the bottom of the profile within half
 * the hop: since μ ≤ 1, D₁ ≥ 2R₀(arccos(a/r_b) − β₀) (spherical) or 2h_b·cot β₀ (flat), a lower
 * bound on the elevation of any hop of length G/n. (Our derivation from the integrals above.)
 * Frequency windows narrower than the 10 % scan step above the highest found solution can be
 * missed (documented limitation; they need an unusual profile).
 */
import { RAD_PER_DEG } from './constants.js';
import { elevationIntervals, scanElevations, CRITICAL_EXCLUSION_RAD } from './elevation-scan.js';
import {
  brentMinimum,
  hopIntegrals,
  prepareMedium,
  type EarthModel,
  type ObliqueMedium,
} from './oblique.js';
import type { Profile } from './profile.js';
import { brentRoot } from './quadrature.js';

const SCAN_RATIO = 0.9;
const MINIMISER_TOLERANCE_RAD = 1e-5;
const RELATIVE_TOLERANCE = 1e-6;
const MIN_FREQUENCY_MHZ = 0.05;

interface RangeSpan {
  minKm: number;
  supKm: number;
}

/** Min and sup of D₁ per interval from a full scan (extrema refined). */
function spansByScan(medium: ObliqueMedium, minElevationRad: number): RangeSpan[] {
  return scanElevations(medium, minElevationRad).map((iv) => {
    let minKm = Infinity;
    let maxKm = -Infinity;
    for (const s of iv.samples) {
      minKm = Math.min(minKm, s.groundRangeKm);
      maxKm = Math.max(maxKm, s.groundRangeKm);
    }
    // The samples include both admissible ends (0.001° inside a critical elevation), so the
    // largest sample is the largest admissible one-hop range.
    return { minKm, supKm: maxKm };
  });
}

/**
 * Min and sup of D₁ per interval by Brent's minimiser alone (a minimum value is insensitive,
 * quadratically, to the abscissa, so a loose tolerance will do). With `onlyBelowKm` (refinement of
 * one hop count), only the interval whose upper critical end is the minimum of g nearest that
 * height (null: the interval reaching the vertical) is evaluated.
 */
function spansByMinimiser(
  medium: ObliqueMedium,
  minElevationRad: number,
  onlyBelowKm?: number | null,
): (RangeSpan & { hiCriticalHeightKm: number | null })[] {
  const range = (x: number) => {
    const hop = hopIntegrals(medium, x);
    return hop ? hop.groundRangeKm : Infinity;
  };
  let intervals = elevationIntervals(medium, minElevationRad);
  if (onlyBelowKm !== undefined) {
    const distance = (h: number | null) =>
      h === null || onlyBelowKm === null
        ? h === onlyBelowKm
          ? 0
          : Infinity
        : Math.abs(h - onlyBelowKm);
    let best = intervals.find((iv) => distance(iv.hiCriticalHeightKm) < Infinity);
    for (const iv of intervals) {
      if (best && distance(iv.hiCriticalHeightKm) < distance(best.hiCriticalHeightKm)) best = iv;
    }
    intervals = best ? [best] : [];
  }
  return intervals.map((iv) => {
    const lo = iv.loRad + (iv.loCritical ? CRITICAL_EXCLUSION_RAD : 0);
    const hi = iv.hiRad - (iv.hiCritical ? CRITICAL_EXCLUSION_RAD : 0);
    const m = brentMinimum(range, lo, hi, MINIMISER_TOLERANCE_RAD);
    // Ranges at the admissible ends (0.001° inside a critical elevation, where D₁ is large but
    // finite: rays closer to it are not offered as modes).
    const loKm = range(lo);
    const hiKm = range(hi);
    const minKm = Math.min(m.fx, loKm, hiKm);
    const supKm = Math.max(loKm, hiKm, m.fx);
    return { minKm, supKm, hiCriticalHeightKm: iv.hiCriticalHeightKm };
  });
}

/** ψ = min over intervals of max(min − T, T − sup), relative to T; ≤ 0 ⇔ a solution exists. */
function margin(spans: RangeSpan[], targetKm: number): number {
  let best = 1; // no interval: no solution (a finite value keeps Brent's interpolation sane)
  for (const s of spans) {
    best = Math.min(best, Math.max(s.minKm - targetKm, targetKm - s.supKm) / targetKm);
  }
  return best;
}

/** Lower bound on the elevation [rad] of any hop of ground range `hopKm` (see header). */
function geometricElevationRad(profile: Profile, hopKm: number, earth: EarthModel): number {
  const hb = profile.bottomKm;
  if (hb <= 0) return 0;
  if (earth === 'flat') return Math.atan((2 * hb) / hopKm);
  const R0 = profile.earthRadiusKm;
  const rb = R0 + hb;
  const halfAngle = hopKm / (2 * R0);
  // φ(β) = arccos(R₀cos β / r_b) − β decreases from arccos(R₀/r_b) at β = 0 to 0 at 90°.
  const phi = (b: number) => Math.acos((R0 * Math.cos(b)) / rb) - b - halfAngle;
  if (phi(0) <= 0) return 0;
  return brentRoot(phi, 0, Math.PI / 2) ?? 0;
}

/** Upper bound [MHz] on any frequency with a hop of ground range `hopKm` (see header). */
export function mufUpperBoundMHz(
  profile: Profile,
  hopKm: number,
  minElevationRad: number,
  earth: EarthModel,
): number {
  const beta = Math.max(minElevationRad, geometricElevationRad(profile, hopKm, earth));
  const R0 = profile.earthRadiusKm;
  const cosB = Math.cos(beta);
  let best = 0;
  const steps = 2000;
  const lo = profile.bottomKm;
  const hi = profile.topKm;
  const heights = [...profile.monotonicBreaksKm, profile.maxPlasmaFrequencyHeightKm];
  for (let k = 0; k <= steps; k++) heights.push(lo + ((hi - lo) * k) / steps);
  for (const h of heights) {
    const fp = profile.plasmaFrequencyMHz(h);
    if (fp <= 0) continue;
    const c = earth === 'spherical' ? (R0 * cosB) / (R0 + h) : cosB;
    const s = Math.sqrt(Math.max(1e-30, 1 - c * c));
    best = Math.max(best, fp / s);
  }
  // Margin for the sampling of h (the bound must hold; the scan starts just above it).
  return best * 1.01;
}

/** MUF [MHz] for n = 1..maxHops at `groundRangeKm` (null where no frequency has a solution). */
export function mufPerHops(
  profile: Profile,
  groundRangeKm: number,
  maxHops: number,
  minElevationDeg: number,
  earth: EarthModel,
): Record<string, number | null> {
  const minElevationRad = minElevationDeg * RAD_PER_DEG;
  const bounds = Array.from({ length: maxHops }, (_, i) =>
    mufUpperBoundMHz(profile, groundRangeKm / (i + 1), minElevationRad, earth),
  );
  const result: Record<string, number | null> = {};
  const brackets: ({ loMHz: number; hiMHz: number } | null)[] = bounds.map(() => null);
  const resolved = bounds.map(() => false);
  const floorMHz = Math.max(MIN_FREQUENCY_MHZ, 0.2 * lowestPeakMHz(profile));
  let previous = Math.max(...bounds);
  const binding: (number | null)[] = bounds.map(() => null);
  for (let f = previous; f >= floorMHz && resolved.includes(false); f *= SCAN_RATIO) {
    const spans = spansByMinimiser(prepareMedium(profile, f, earth), minElevationRad);
    for (let n = 1; n <= maxHops; n++) {
      if (resolved[n - 1] || f > bounds[n - 1]) continue;
      const target = groundRangeKm / n;
      if (margin(spans, target) <= 0) {
        resolved[n - 1] = true;
        // The interval that has the solution (the one with the smallest margin).
        let bestSpan = spans[0];
        for (const sp of spans)
          if (margin([sp], target) < margin([bestSpan], target)) bestSpan = sp;
        binding[n - 1] = bestSpan.hiCriticalHeightKm;
        brackets[n - 1] = { loMHz: f, hiMHz: Math.min(previous, bounds[n - 1]) };
      }
    }
    previous = f;
  }
  for (let n = 1; n <= maxHops; n++) {
    const bracket = brackets[n - 1];
    result[String(n)] = bracket
      ? refine(profile, earth, minElevationRad, groundRangeKm / n, bracket, binding[n - 1])
      : null;
  }
  return result;
}

function lowestPeakMHz(profile: Profile): number {
  const fs = profile.peaks.map((p) => p.plasmaFrequencyMHz).filter((f) => f > 0);
  return fs.length ? Math.min(...fs) : profile.maxPlasmaFrequencyMHz;
}

/** Solves ψ(f) = 0 in the bracket (a solution at loMHz, none at hiMHz). */
function refine(
  profile: Profile,
  earth: EarthModel,
  minElevationRad: number,
  targetKm: number,
  bracket: { loMHz: number; hiMHz: number },
  bindingBelowKm: number | null,
): number {
  const { loMHz, hiMHz } = bracket;
  if (hiMHz <= loMHz) return loMHz;
  // Only the interval that had the solution, unless its identity changes inside the bracket.
  let restrict: number | null | undefined = bindingBelowKm;
  const light = (f: number) =>
    margin(spansByMinimiser(prepareMedium(profile, f, earth), minElevationRad, restrict), targetKm);
  const full = (f: number) =>
    margin(spansByScan(prepareMedium(profile, f, earth), minElevationRad), targetKm);
  let psiLo = light(loMHz);
  let psiHi = light(hiMHz);
  if (!(psiLo <= 0 && psiHi > 0 && psiHi < 1)) {
    restrict = undefined;
    psiLo = light(loMHz);
    psiHi = light(hiMHz);
  }
  const psi = psiLo <= 0 && psiHi > 0 ? light : full;
  const root = brentRoot(psi, loMHz, hiMHz, { tolerance: RELATIVE_TOLERANCE * loMHz });
  if (root === null) return loMHz;
  // Brent's answer lies within the tolerance of the transition, on either side: step below it.
  return Math.max(loMHz, root - RELATIVE_TOLERANCE * loMHz);
}
