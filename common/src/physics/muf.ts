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
 *
 * Cost. One minimisation of D₁ per interval and trial frequency serves every hop count (the test is
 * min D₁ ≤ G/n ≤ sup D₁), and is skipped when the admissible ends or the free-space lower bound
 * on D₁ (oblique.ts hopRangeLowerBoundKm) settle the test; in the scan a coarse minimisation is
 * trusted when it lands well above the targets, and minimisations stop as soon as a value decides. In the refinement ψ_n is evaluated on the one interval that
 * had the solution, its minimisation started from the minimiser at the nearest frequency already
 * solved, and only the terms of max(min − T, T − sup) that can be the larger one are computed
 * (same value as the full formula). A bracket holding the highest plasma frequency is first split
 * just above it, where rays start to pass the top peak at vertical incidence and the interval
 * structure changes (ψ is only piecewise smooth across it).
 */
import { RAD_PER_DEG } from './constants.js';
import { elevationIntervals, scanElevations, CRITICAL_EXCLUSION_RAD } from './elevation-scan.js';
import {
  hopIntegrals,
  hopRangeLowerBoundKm,
  localMinimum,
  prepareMedium,
  profileGrid,
  type EarthModel,
  type ObliqueMedium,
} from './oblique.js';
import type { Profile } from './profile.js';
import { brentRoot } from './quadrature.js';

const SCAN_RATIO = 0.9;
const MINIMISER_TOLERANCE_RAD = 1e-5;
const RELATIVE_TOLERANCE = 1e-6;
const MIN_FREQUENCY_MHZ = 0.05;
/**
 * Coarse minimiser tolerance [rad] of the scan, and the relative margin above a target beyond
 * which its result is trusted (the value error is about D₁″·(2e-3 rad)²/2, far below 2 % of D₁).
 */
const COARSE_TOLERANCE_RAD = 1e-3;
const COARSE_MARGIN = 0.02;
/** Bracketing steps [rad] of a minimisation started from a guess: widest and narrowest. */
const MAX_GUESS_STEP_RAD = 0.05;
const MIN_GUESS_STEP_RAD = 2e-4;
/** Relative offset above the highest plasma frequency at which a bracket is split (see header). */
const PENETRATION_OFFSET = 2e-6;
/** Critical heights [km] closer than this are taken as the same interval across frequencies. */
const SAME_INTERVAL_KM = 20;

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

/** ψ = min over intervals of max(min − T, T − sup), relative to T; ≤ 0 ⇔ a solution exists. */
function margin(spans: RangeSpan[], targetKm: number): number {
  let best = 1; // no interval: no solution (a finite value keeps Brent's interpolation sane)
  for (const s of spans) {
    best = Math.min(best, Math.max(s.minKm - targetKm, targetKm - s.supKm) / targetKm);
  }
  return best;
}

/** An admissible elevation interval at one frequency, with what is known of D₁ on it. */
interface Interval {
  /** Admissible ends [rad] (0.001° inside a critical elevation). */
  loRad: number;
  hiRad: number;
  hiCritical: boolean;
  hiCriticalHeightKm: number | null;
  loKm?: number;
  hiKm?: number;
  /** The minimum of D₁ once converged. */
  min?: { x: number; fx: number };
}

interface FrequencyState {
  frequencyMHz: number;
  medium: ObliqueMedium;
  intervals: Interval[];
}

/** Minimiser of D₁ [rad] on an interval (identified by its upper critical height) at a frequency. */
interface KnownMinimum {
  heightKm: number | null;
  frequencyMHz: number;
  x: number;
}

function sameInterval(a: number | null, b: number | null): boolean {
  return a === null || b === null ? a === b : Math.abs(a - b) < SAME_INTERVAL_KM;
}

/** Interval of `intervals` whose upper critical height is nearest `heightKm` (as in the scan). */
function nearestInterval<T extends { hiCriticalHeightKm: number | null }>(
  intervals: T[],
  heightKm: number | null,
): T | undefined {
  const distance = (h: number | null) =>
    h === null || heightKm === null ? (h === heightKm ? 0 : Infinity) : Math.abs(h - heightKm);
  let best: T | undefined;
  for (const iv of intervals) {
    const d = distance(iv.hiCriticalHeightKm);
    if (d < Infinity && (!best || d < distance(best.hiCriticalHeightKm))) best = iv;
  }
  return best;
}

/** The MUF search of one link: per-frequency media, ranges and minima shared by all hop counts. */
class MufSearch {
  private readonly states = new Map<number, FrequencyState>();
  private readonly known: KnownMinimum[] = [];

  constructor(
    private readonly profile: Profile,
    private readonly earth: EarthModel,
    private readonly minElevationRad: number,
  ) {}

  state(frequencyMHz: number): FrequencyState {
    let st = this.states.get(frequencyMHz);
    if (!st) {
      const medium = prepareMedium(this.profile, frequencyMHz, this.earth);
      const intervals = elevationIntervals(medium, this.minElevationRad).map((iv) => ({
        loRad: iv.loRad + (iv.loCritical ? CRITICAL_EXCLUSION_RAD : 0),
        hiRad: iv.hiRad - (iv.hiCritical ? CRITICAL_EXCLUSION_RAD : 0),
        hiCritical: iv.hiCritical,
        hiCriticalHeightKm: iv.hiCriticalHeightKm,
      }));
      st = { frequencyMHz, medium, intervals };
      this.states.set(frequencyMHz, st);
    }
    return st;
  }

  private range(st: FrequencyState, elevationRad: number): number {
    const hop = hopIntegrals(st.medium, elevationRad);
    return hop ? hop.groundRangeKm : Infinity;
  }

  private loKm(st: FrequencyState, iv: Interval): number {
    return (iv.loKm ??= this.range(st, iv.loRad));
  }

  private hiKm(st: FrequencyState, iv: Interval): number {
    return (iv.hiKm ??= this.range(st, iv.hiRad));
  }

  /** Start point and first step of a minimisation from the minima known at other frequencies. */
  private guess(st: FrequencyState, iv: Interval): { guess: number; step: number } {
    const f = st.frequencyMHz;
    const near = this.known
      .filter((k) => sameInterval(k.heightKm, iv.hiCriticalHeightKm))
      .sort((p, q) => Math.abs(p.frequencyMHz - f) - Math.abs(q.frequencyMHz - f));
    if (!near.length) {
      const width = iv.hiRad - iv.loRad;
      return { guess: iv.loRad + 0.381966 * width, step: 0.1 * width };
    }
    let guess = near[0].x;
    // One known minimiser: it moves by about a radian per unit of relative frequency (an
    // empirical scale; the bracketing step only sets the cost, not the result).
    let step = Math.abs(f - near[0].frequencyMHz) / f;
    const other = near.find((k) => k.frequencyMHz !== near[0].frequencyMHz);
    if (other) {
      // Linear in frequency through the two nearest; the step covers a quarter of the correction.
      const slope = (other.x - near[0].x) / (other.frequencyMHz - near[0].frequencyMHz);
      guess = near[0].x + slope * (f - near[0].frequencyMHz);
      step = 0.25 * Math.abs(guess - near[0].x);
    }
    step = Math.min(MAX_GUESS_STEP_RAD, Math.max(MIN_GUESS_STEP_RAD, step));
    return { guess: Math.min(iv.hiRad, Math.max(iv.loRad, guess)), step };
  }

  /**
   * min D₁ on the interval, or (with stopBelow) any value ≤ stopBelow as soon as one is seen.
   * Minimum values are insensitive (quadratically) to the abscissa, so 1e-5 rad will do. With
   * `aboveKm`, a coarse search first: a minimum well above it (more than the coarse search's value
   * error) is returned as is.
   */
  minimum(st: FrequencyState, iv: Interval, stopBelow = -Infinity, aboveKm?: number): number {
    if (iv.min) return iv.min.fx;
    let { guess, step } = this.guess(st, iv);
    if (aboveKm !== undefined) {
      const coarse = localMinimum((x) => this.range(st, x), iv.loRad, iv.hiRad, {
        toleranceX: COARSE_TOLERANCE_RAD,
        guess,
        step,
        stopBelow,
      });
      if (!coarse.converged) return coarse.fx;
      this.known.push({
        heightKm: iv.hiCriticalHeightKm,
        frequencyMHz: st.frequencyMHz,
        x: coarse.x,
      });
      if (coarse.fx > aboveKm * (1 + COARSE_MARGIN)) return coarse.fx;
      guess = coarse.x;
      step = 4 * COARSE_TOLERANCE_RAD;
    }
    const m = localMinimum((x) => this.range(st, x), iv.loRad, iv.hiRad, {
      toleranceX: MINIMISER_TOLERANCE_RAD,
      guess,
      step,
      stopBelow,
    });
    if (m.converged) {
      iv.min = { x: m.x, fx: m.fx };
      this.known.push({
        heightKm: iv.hiCriticalHeightKm,
        frequencyMHz: st.frequencyMHz,
        x: m.x,
      });
    }
    return m.fx;
  }

  /** Min and sup of D₁ on one interval (min includes the admissible ends). */
  span(st: FrequencyState, iv: Interval): RangeSpan {
    const loKm = this.loKm(st, iv);
    const hiKm = this.hiKm(st, iv);
    const m = this.minimum(st, iv);
    return { minKm: Math.min(m, loKm, hiKm), supKm: Math.max(loKm, hiKm, m) };
  }

  hasInterval(frequencyMHz: number, bindingKm: number | null): boolean {
    return nearestInterval(this.state(frequencyMHz).intervals, bindingKm) !== undefined;
  }

  /**
   * Which targets have a solution at this frequency: for each, the upper critical height of the
   * interval that has it (the one with the smallest margin), or undefined.
   */
  solvable(st: FrequencyState, targetsKm: number[]): (number | null | undefined)[] {
    const hits = targetsKm.map(() => [] as Interval[]);
    for (const iv of st.intervals) {
      // D₁ ≥ the free-space bound everywhere on the interval: targets below it need no integral.
      const boundKm = hopRangeLowerBoundKm(st.medium, iv.loRad, iv.hiRad);
      if (!targetsKm.some((t) => t >= boundKm)) continue;
      const loKm = this.loKm(st, iv);
      const hiKm = this.hiKm(st, iv);
      const supKm = Math.max(loKm, hiKm);
      const endMinKm = Math.min(loKm, hiKm);
      // An end at or below T (with the other at or above it) settles it; else the minimum must.
      const pending = targetsKm.filter((t) => t >= boundKm && t <= supKm && t < endMinKm);
      const minKm = pending.length
        ? Math.min(endMinKm, this.minimum(st, iv, Math.min(...pending), Math.max(...pending)))
        : endMinKm;
      targetsKm.forEach((t, k) => {
        if (t <= supKm && minKm <= t) hits[k].push(iv);
      });
    }
    return hits.map((list, k) => {
      if (!list.length) return undefined;
      if (list.length === 1) return list[0].hiCriticalHeightKm;
      // Several intervals have a solution: the one with the smallest margin (as in refine).
      let best = list[0];
      let bestMargin = Infinity;
      for (const iv of list) {
        const m = margin([this.span(st, iv)], targetsKm[k]);
        if (m < bestMargin) {
          best = iv;
          bestMargin = m;
        }
      }
      return best.hiCriticalHeightKm;
    });
  }

  /** ψ over all intervals (Brent minima), as in the scan. */
  marginAll(frequencyMHz: number, targetKm: number): number {
    const st = this.state(frequencyMHz);
    return margin(
      st.intervals.map((iv) => this.span(st, iv)),
      targetKm,
    );
  }

  /**
   * ψ on the interval nearest `bindingKm` only (1 if there is none); computes only the terms of
   * max(min − T, T − sup) that can be the larger. `endsFirst` picks the order (the ends when the
   * sup was binding last time, which then spares most of the minimisation).
   */
  marginOn(
    frequencyMHz: number,
    targetKm: number,
    bindingKm: number | null,
    endsFirst: boolean,
  ): { psi: number; supBinding: boolean } {
    const st = this.state(frequencyMHz);
    const iv = nearestInterval(st.intervals, bindingKm);
    if (!iv) return { psi: 1, supBinding: false };
    const T = targetKm;
    if (endsFirst || iv.min) {
      const supKm = Math.max(this.loKm(st, iv), this.hiKm(st, iv));
      const endMinKm = Math.min(this.loKm(st, iv), this.hiKm(st, iv));
      // min − T ≤ T − sup ⇔ min ≤ 2T − sup: then ψ = T − sup whatever the exact minimum.
      const threshold = 2 * T - supKm;
      const minKm =
        endMinKm <= threshold ? endMinKm : Math.min(endMinKm, this.minimum(st, iv, threshold));
      const supBinding = T - supKm >= minKm - T;
      return { psi: Math.max(minKm - T, T - supKm) / T, supBinding };
    }
    const minKm = this.minimum(st, iv);
    // min ≥ T: sup ≥ min ≥ T, so ψ = min − T without the ends.
    if (minKm >= T) return { psi: (minKm - T) / T, supBinding: false };
    const first = iv.hiCritical ? this.hiKm(st, iv) : this.loKm(st, iv);
    if (first >= 2 * T - minKm) return { psi: (minKm - T) / T, supBinding: false };
    const loKm = this.loKm(st, iv);
    const hiKm = this.hiKm(st, iv);
    const lowKm = Math.min(minKm, loKm, hiKm);
    const supKm = Math.max(loKm, hiKm, minKm);
    return { psi: Math.max(lowKm - T, T - supKm) / T, supBinding: T - supKm >= lowKm - T };
  }
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

/**
 * Heights [km] and plasma frequencies [MHz] sampled for the upper bound, per profile: the oblique
 * height grid (already built for the ray integrals; ≤ 1 km steps near the peaks, every extremum
 * of N included) and the height of the highest plasma frequency.
 */
const boundSamples = new WeakMap<Profile, { heightsKm: number[]; plasmaMHz: number[] }>();

function upperBoundSamples(profile: Profile): { heightsKm: number[]; plasmaMHz: number[] } {
  let samples = boundSamples.get(profile);
  if (!samples) {
    const { gridKm, gridFp2 } = profileGrid(profile);
    const heightsKm = [...gridKm, profile.maxPlasmaFrequencyHeightKm];
    const plasmaMHz = [...gridFp2].map(Math.sqrt);
    plasmaMHz.push(profile.maxPlasmaFrequencyMHz);
    samples = { heightsKm, plasmaMHz };
    boundSamples.set(profile, samples);
  }
  return samples;
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
  const { heightsKm, plasmaMHz } = upperBoundSamples(profile);
  for (let i = 0; i < heightsKm.length; i++) {
    const fp = plasmaMHz[i];
    if (fp <= 0) continue;
    const c = earth === 'spherical' ? (R0 * cosB) / (R0 + heightsKm[i]) : cosB;
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
  const search = new MufSearch(profile, earth, minElevationRad);
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
    const active: number[] = [];
    for (let n = 1; n <= maxHops; n++) {
      if (!resolved[n - 1] && f <= bounds[n - 1]) active.push(n);
    }
    if (active.length) {
      const found = search.solvable(
        search.state(f),
        active.map((n) => groundRangeKm / n),
      );
      active.forEach((n, k) => {
        if (found[k] === undefined) return;
        resolved[n - 1] = true;
        binding[n - 1] = found[k];
        brackets[n - 1] = { loMHz: f, hiMHz: Math.min(previous, bounds[n - 1]) };
      });
    }
    previous = f;
  }
  for (let n = 1; n <= maxHops; n++) {
    const bracket = brackets[n - 1];
    result[String(n)] = bracket
      ? refine(search, profile, earth, minElevationRad, groundRangeKm / n, bracket, binding[n - 1])
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
  search: MufSearch,
  profile: Profile,
  earth: EarthModel,
  minElevationRad: number,
  targetKm: number,
  bracket: { loMHz: number; hiMHz: number },
  bindingBelowKm: number | null,
): number {
  let { loMHz, hiMHz } = bracket;
  if (hiMHz <= loMHz) return loMHz;
  const toleranceMHz = RELATIVE_TOLERANCE * bracket.loMHz;
  let restrict: number | null | undefined = bindingBelowKm;
  const splitMHz = profile.maxPlasmaFrequencyMHz * (1 + PENETRATION_OFFSET);
  if (loMHz < splitMHz && splitMHz < hiMHz) {
    const st = search.state(splitMHz);
    const found = search.solvable(st, [targetKm])[0];
    if (found !== undefined) {
      loMHz = splitMHz;
      restrict = found;
    } else {
      hiMHz = splitMHz;
    }
  }
  // Only the interval that had the solution, unless its identity changes inside the bracket.
  let endsFirst = false;
  const light = (f: number) => {
    if (restrict === undefined) return search.marginAll(f, targetKm);
    const r = search.marginOn(f, targetKm, restrict, endsFirst);
    endsFirst = r.supBinding;
    return r.psi;
  };
  const full = (f: number) =>
    margin(spansByScan(prepareMedium(profile, f, earth), minElevationRad), targetKm);
  let psiLo = light(loMHz);
  let psiHi = light(hiMHz);
  if (!(
    psiLo <= 0 &&
    psiHi > 0 &&
    (restrict === undefined || search.hasInterval(hiMHz, restrict))
  )) {
    restrict = undefined;
    psiLo = light(loMHz);
    psiHi = light(hiMHz);
  }
  const psi = psiLo <= 0 && psiHi > 0 ? light : full;
  const root = brentRoot(psi, loMHz, hiMHz, { tolerance: toleranceMHz });
  if (root === null) return loMHz;
  // Brent's answer lies within the tolerance of the transition, on either side: step below it.
  return Math.max(loMHz, root - toleranceMHz);
}

/** MUF sets kept per profile (each is a few numbers). */
const MUFS_KEPT_PER_PROFILE = 64;
const mufsByProfile = new WeakMap<Profile, Map<string, Record<string, number | null>>>();

/**
 * mufPerHops, remembered per profile: the MUFs depend on the profile and the path, not on the
 * frequency, so a frequency sweep over one path (the usual study) searches them once. Keyed by
 * the Profile object (compute/run.ts reuses built profiles); a copy is returned each time.
 */
export function mufPerHopsCached(
  profile: Profile,
  groundRangeKm: number,
  maxHops: number,
  minElevationDeg: number,
  earth: EarthModel,
): Record<string, number | null> {
  let kept = mufsByProfile.get(profile);
  if (!kept) {
    kept = new Map();
    mufsByProfile.set(profile, kept);
  }
  const key = `${groundRangeKm}|${maxHops}|${minElevationDeg}|${earth}`;
  let mufs = kept.get(key);
  if (!mufs) {
    mufs = mufPerHops(profile, groundRangeKm, maxHops, minElevationDeg, earth);
    if (kept.size >= MUFS_KEPT_PER_PROFILE) kept.delete(kept.keys().next().value as string);
    kept.set(key, mufs);
  }
  return { ...mufs };
}
