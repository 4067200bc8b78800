/**
 * Single-hop oblique ray integrals through a concentric (or plane) stratified, unmagnetised
 * ionosphere (SPEC §2, §2.2, §2.3).
 *
 * Spherical Earth (Bouguer's rule, e.g. Davies 1990 §6; Budden 1985 §14): along the ray
 *   r·μ·cos β = a = R₀·μ₀·cos β₀.  With g(r) = μ²r² = r²(1 − X(r)) the ray turns at r_t, the first
 *   radius above the ground where g(r_t) = a², and one hop (up and down) has
 *     ground range D₁ = 2R₀ ∫ a dr / (r·sqrt(g − a²))
 *     group path   P′ = 2 ∫ r dr / sqrt(g − a²)
 *     phase path   P  = 2 ∫ μ² r dr / sqrt(g − a²)
 *   (ds = μ r dr/sqrt(g − a²); dθ = a dr/(r sqrt(g − a²)); P′ = ∫ds/μ, P = ∫μ ds).
 *   Below the profile (μ = 1) in closed form: ∫ r dr/sqrt(r² − a²) = sqrt(r² − a²) and
 *   ∫ a dr/(r sqrt(r² − a²)) = arctan(sqrt(r² − a²)/a).
 * Plane Earth (SPEC `earth: 'flat'`): a = μ₀ cos β₀,
 *     D₁ = 2∫ a dh/sqrt(μ² − a²),  P′ = 2∫ dh/sqrt(μ² − a²),  P = 2∫ μ² dh/sqrt(μ² − a²).
 *
 * Numerics. The integrals are split at the profile's breakpoints (where N or dN/dh is not smooth).
 * Pieces wholly below the turning height use adaptive G7/K15 panels on a dyadic tree whose nodal
 * plasma frequencies are cached per profile (they depend neither on f nor on β₀). The piece that
 * ends at the turning height is integrated in t with h = h_t − t² (dh = 2t dt), which removes the
 * 1/sqrt(g − a²) singularity analytically (g − a² ≈ |g′(h_t)|·t²); no clipping.
 * The turning height is bracketed on a per-frequency table of the running minimum of g(h) (a
 * non-increasing sequence, so a binary search finds the first crossing) and refined by Brent.
 *
 * Penetration structure: a ray at elevation β₀ passes a local minimum g_min of g (going up from
 * the ground, a record low) iff a² < g_min. The elevations with a² = g_min (cos β_c =
 * sqrt(g_min/(W₀μ₀²))) are the critical (penetration) elevations; D₁ → ∞ (logarithmically) there.
 */
import { PLASMA_FREQUENCY_SQUARED_PER_DENSITY } from './plasma.js';
import type { Profile } from './profile.js';
import { brentRoot, GAUSS7_WEIGHTS, KRONROD15_NODES, KRONROD15_WEIGHTS } from './quadrature.js';

export type EarthModel = 'spherical' | 'flat';

/** f_p² [MHz²] per electron density [m⁻³]. */
const FP2_MHZ2_PER_DENSITY = PLASMA_FREQUENCY_SQUARED_PER_DENSITY / 1e12;
/** Relative |K15 − G7| accepted per panel (the K15 value is then far more accurate). */
const PANEL_REL_TOLERANCE = 1e-8;
/** Absolute |K15 − G7| [km] accepted per panel (far below the 1e-5 relative contract). */
const PANEL_ABS_TOLERANCE_KM = 1e-9;
/** Dyadic depth limits: cached fixed panels, and all panels. */
const MAX_CACHED_DEPTH = 14;
const MAX_DEPTH = 48;
/** Panel budget per ray (a guard against non-smooth integrands; never reached in the tests). */
const MAX_PANELS = 4000;
/** Height-grid steps [km] used to bracket turning heights and find minima of g. */
const GRID_STEP_KM = 1;
const GRID_STEP_HIGH_KM = 10;
const GRID_MIN_PIECES = 8;

// ---------------------------------------------------------------------------------------------
// Per-profile tables (independent of frequency and elevation)

interface Segment {
  readonly loKm: number;
  readonly hiKm: number;
  /** f_p² [MHz²] at the 15 Kronrod nodes of each dyadic panel, keyed by heap index. */
  readonly cache: Map<number, Float64Array>;
}

interface ProfileTable {
  readonly gridKm: Float64Array;
  readonly gridFp2: Float64Array;
  readonly segments: readonly Segment[];
  readonly groundFp2: number;
}

const tables = new WeakMap<Profile, ProfileTable>();

function fp2At(profile: Profile, heightKm: number): number {
  return profile.electronDensityPerM3(heightKm) * FP2_MHZ2_PER_DENSITY;
}

function profileTable(profile: Profile): ProfileTable {
  const cached = tables.get(profile);
  if (cached) return cached;
  const breaks = [...profile.breakpointsKm];
  const fine = new Set<number>([...breaks, ...profile.monotonicBreaksKm]);
  const highestPeakKm = profile.peaks.reduce((m, p) => Math.max(m, p.heightKm), profile.bottomKm);
  const grid: number[] = [];
  const knots = [...fine].sort((x, y) => x - y);
  // Fine steps up to 200 km above the highest peak, coarse above (g only grows up there).
  const fineTopKm = highestPeakKm + 200;
  for (let i = 0; i + 1 < knots.length; i++) {
    const lo = knots[i];
    const hi = knots[i + 1];
    const fineHi = Math.min(hi, Math.max(lo, fineTopKm));
    const fine = Math.max(GRID_MIN_PIECES, Math.ceil((fineHi - lo) / GRID_STEP_KM));
    if (fineHi > lo) for (let k = 0; k < fine; k++) grid.push(lo + ((fineHi - lo) * k) / fine);
    if (hi > fineHi) {
      const coarse = Math.max(1, Math.ceil((hi - fineHi) / GRID_STEP_HIGH_KM));
      for (let k = 0; k < coarse; k++) grid.push(fineHi + ((hi - fineHi) * k) / coarse);
    }
  }
  grid.push(knots[knots.length - 1]);
  const gridKm = Float64Array.from(grid);
  const gridFp2 = gridKm.map((h) => fp2At(profile, h));
  const segments: Segment[] = [];
  for (let i = 0; i + 1 < breaks.length; i++) {
    segments.push({ loKm: breaks[i], hiKm: breaks[i + 1], cache: new Map() });
  }
  const table = { gridKm, gridFp2, segments, groundFp2: fp2At(profile, 0) };
  tables.set(profile, table);
  return table;
}

/**
 * The per-profile height grid (≤ 1 km steps up to 200 km above the highest peak, 10 km above,
 * with every breakpoint and extremum of N) and f_p² [MHz²] on it; shared with the MUF bound.
 */
export function profileGrid(profile: Profile): { gridKm: Float64Array; gridFp2: Float64Array } {
  const { gridKm, gridFp2 } = profileTable(profile);
  return { gridKm, gridFp2 };
}

// ---------------------------------------------------------------------------------------------
// Per-frequency medium

export interface ObliqueMedium {
  readonly profile: Profile;
  readonly earth: EarthModel;
  readonly frequencyMHz: number;
  readonly earthRadiusKm: number;
  /** 1/f² [MHz⁻²]. */
  readonly invF2: number;
  /** X at the ground (0 unless the profile has electrons at 0 km). */
  readonly groundX: number;
  /** True when the wave cannot propagate at the ground (f ≤ f_p(0)). */
  readonly blocked: boolean;
  /** Critical (penetration) elevations [rad], ascending, each with the height of its minimum of g. */
  readonly criticalElevationsRad: readonly number[];
  readonly criticalHeightsKm: readonly number[];
  /** True when a vertical ray reflects (f ≤ the profile's maximum plasma frequency). */
  readonly reflectsVertically: boolean;
  /** Heights and running minimum of g(h) for bracketing turning heights. */
  readonly hs: Float64Array;
  readonly runningMinG: Float64Array;
  readonly table: ProfileTable;
}

/** g(h) = W(h)·(1 − X(h)); W = r² (spherical) or 1 (flat). */
function gOf(
  earth: EarthModel,
  earthRadiusKm: number,
  heightKm: number,
  fp2: number,
  invF2: number,
): number {
  const w = earth === 'spherical' ? (earthRadiusKm + heightKm) ** 2 : 1;
  return w * (1 - fp2 * invF2);
}

/** Brent's minimiser (Brent 1973, ch. 5) on [a, b]; returns the abscissa and value. */
export function brentMinimum(
  f: (x: number) => number,
  a: number,
  b: number,
  toleranceX = 1e-10,
  maxIterations = 100,
): { x: number; fx: number } {
  const x = a + GOLDEN_SECTION * (b - a);
  const fx = f(x);
  const state: MinimiserState = { a, b, x, fx, w: x, fw: fx, v: x, fv: fx, e: 0 };
  brentIterate(f, state, toleranceX, maxIterations, -Infinity, false);
  return { x: state.x, fx: state.fx };
}

const GOLDEN_SECTION = 0.381966011250105;

/** Bracket [a, b], best point x, second and third best w, v, last-but-one step e. */
interface MinimiserState {
  a: number;
  b: number;
  x: number;
  fx: number;
  w: number;
  fw: number;
  v: number;
  fv: number;
  e: number;
}

/**
 * Brent's iteration (Brent 1973, ch. 5) from a given state; stops early when a value ≤ stopBelow is
 * found, or (with `valueOnly`) when a parabolic step shorter than the tolerance is proposed from
 * points close to x (the minimum value is then known to second order in the step). Returns true
 * when it stopped at a minimum (not by `stopBelow`).
 */
function brentIterate(
  f: (x: number) => number,
  s: MinimiserState,
  toleranceX: number,
  maxIterations: number,
  stopBelow: number,
  valueOnly: boolean,
  stopAbove = -Infinity,
): boolean {
  let { a, b, x, fx, w, fw, v, fv, e } = s;
  let d = 0;
  let converged = true;
  for (let iter = 0; iter < maxIterations; iter++) {
    if (fx <= stopBelow) {
      converged = false;
      break;
    }
    const m = 0.5 * (a + b);
    const tol = toleranceX + 1e-12 * Math.abs(x);
    if (Math.abs(x - m) <= 2 * tol - 0.5 * (b - a)) break;
    let useGolden = true;
    if (Math.abs(e) > tol) {
      let r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      r = e;
      e = d;
      if (Math.abs(p) < Math.abs(0.5 * q * r) && p > q * (a - x) && p < q * (b - x)) {
        d = p / q;
        if (stopAbove > -Infinity && settledAbove(x, fx, w, fw, v, fv, d, stopAbove)) {
          converged = false;
          break;
        }
        if (
          valueOnly &&
          Math.abs(d) < tol &&
          Math.abs(x - w) < LOCAL_SPREAD * tol &&
          Math.abs(x - v) < LOCAL_SPREAD * tol
        ) {
          break;
        }
        const u = x + d;
        if (u - a < 2 * tol || b - u < 2 * tol) d = x < m ? tol : -tol;
        useGolden = false;
      }
    }
    if (useGolden) {
      e = (x < m ? b : a) - x;
      d = GOLDEN_SECTION * e;
    }
    const u = Math.abs(d) >= tol ? x + d : x + (d > 0 ? tol : -tol);
    const fu = f(u);
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
  Object.assign(s, { a, b, x, fx, w, fw, v, fv, e });
  return converged && fx > stopBelow;
}

/**
 * True when the parabola through (x, w, v), all within SETTLED_SPREAD_RAD of x, puts the minimum
 * above `level` by a wide margin: fx minus ten times the predicted further drop, less 0.1 %.
 */
function settledAbove(
  x: number,
  fx: number,
  w: number,
  fw: number,
  v: number,
  fv: number,
  d: number,
  level: number,
): boolean {
  if (Math.abs(x - w) > SETTLED_SPREAD_RAD || Math.abs(x - v) > SETTLED_SPREAD_RAD || w === v) {
    return false;
  }
  const fxw = (fw - fx) / (w - x);
  const c2 = (fxw - (fv - fx) / (v - x)) / (w - v);
  if (!(c2 > 0)) return false;
  const drop = fx - (fx + fxw * d + c2 * d * (d + x - w));
  return drop >= 0 && fx - 10 * drop > level + 1e-3 * Math.abs(level);
}

/** Largest spread [rad] of the three points for the test above. */
const SETTLED_SPREAD_RAD = 1e-3;

/** Spread [tolerances] of the three points within which a short parabolic step ends a search. */
const LOCAL_SPREAD = 200;

export interface LocalMinimumOptions {
  /** Tolerance on the abscissa. */
  toleranceX: number;
  /** A point near the minimum (e.g. the minimiser at a nearby frequency). */
  guess: number;
  /** First bracketing step from the guess. */
  step: number;
  /** Return as soon as a value ≤ stopBelow is seen (default −∞). */
  stopBelow?: number;
}

/**
 * A local minimum of f on [lo, hi] searched from a guess: downhill bracketing with golden growth
 * (Press et al., Numerical Recipes 3rd ed. §10.1), then Brent's iteration started from the bracket
 * with a parabolic step, ended as soon as the minimum value is settled. An end of [lo, hi] where f
 * keeps falling is returned as the minimum. `converged` is false after a `stopBelow` exit.
 */
export function localMinimum(
  f: (x: number) => number,
  lo: number,
  hi: number,
  options: LocalMinimumOptions,
): { x: number; fx: number; converged: boolean } {
  const { toleranceX } = options;
  const stop = options.stopBelow ?? -Infinity;
  let b = Math.min(hi, Math.max(lo, options.guess));
  let fb = f(b);
  if (fb <= stop) return { x: b, fx: fb, converged: false };
  const step = Math.max(2 * toleranceX, Math.min(options.step, 0.5 * (hi - lo)));
  let a = Math.max(lo, b - step);
  let fa = a === b ? fb : f(a);
  if (fa <= stop) return { x: a, fx: fa, converged: false };
  let c = Math.min(hi, b + step);
  let fc = c === b ? fb : f(c);
  if (fc <= stop) return { x: c, fx: fc, converged: false };
  const GROW = 3; // bracket growth per step (golden 1.618 in NR; larger: guesses are near)
  for (let k = 0; k < 80 && !(fb <= fa && fb <= fc); k++) {
    if (fa < fb) {
      if (a === lo) return endMinimum(f, lo, b, fa, fb, toleranceX, stop);
      c = b;
      fc = fb;
      b = a;
      fb = fa;
      a = Math.max(lo, b - GROW * (c - b));
      fa = f(a);
      if (fa <= stop) return { x: a, fx: fa, converged: false };
    } else {
      if (c === hi) {
        const r = endMinimum((x) => f(-x), -hi, -b, fc, fb, toleranceX, stop);
        return { ...r, x: -r.x };
      }
      a = b;
      fa = fb;
      b = c;
      fb = fc;
      c = Math.min(hi, b + GROW * (b - a));
      fc = f(c);
      if (fc <= stop) return { x: c, fx: fc, converged: false };
    }
  }
  if (!(fb <= fa && fb <= fc)) return { x: b, fx: fb, converged: true }; // flat: b will do
  return bracketedMinimum(f, a, fa, b, fb, c, fc, toleranceX, stop);
}

/**
 * Brent's iteration from a bracket a < b < c with f(b) ≤ f(a), f(c), starting with a parabolic
 * step and ended as soon as the minimum value is settled (or a value ≤ stopBelow is seen, or the
 * minimum is safely above stopAbove: see settledAbove). `converged` is false after such a stop.
 */
export function bracketedMinimum(
  f: (x: number) => number,
  a: number,
  fa: number,
  b: number,
  fb: number,
  c: number,
  fc: number,
  toleranceX: number,
  stopBelow = -Infinity,
  stopAbove = -Infinity,
): { x: number; fx: number; converged: boolean } {
  const [w, fw, v, fv] = fa <= fc ? [a, fa, c, fc] : [c, fc, a, fa];
  const state: MinimiserState = { a, b: c, x: b, fx: fb, w, fw, v, fv, e: c - a };
  const converged = brentIterate(f, state, toleranceX, 100, stopBelow, true, stopAbove);
  return { x: state.x, fx: state.fx, converged };
}

/**
 * f falls towards the end lo of [lo, b] (f(lo) < f(b)): the minimum is at lo unless f dips below
 * f(lo) inside; one midpoint test decides (Brent on [lo, b] if it does).
 */
function endMinimum(
  f: (x: number) => number,
  lo: number,
  b: number,
  fLo: number,
  fb: number,
  toleranceX: number,
  stop: number,
): { x: number; fx: number; converged: boolean } {
  if (b - lo > 4 * toleranceX) {
    const mid = 0.5 * (lo + b);
    const fMid = f(mid);
    if (fMid <= stop) return { x: mid, fx: fMid, converged: false };
    if (fMid < fLo) {
      const state: MinimiserState = {
        a: lo,
        b,
        x: mid,
        fx: fMid,
        w: lo,
        fw: fLo,
        v: b,
        fv: fb,
        e: b - lo,
      };
      const converged = brentIterate(f, state, toleranceX, 100, stop, true);
      return { x: state.x, fx: state.fx, converged };
    }
  }
  return { x: lo, fx: fLo, converged: true };
}

/** Prepares the frequency-dependent tables (penetration structure, turning-height brackets). */
export function prepareMedium(
  profile: Profile,
  frequencyMHz: number,
  earth: EarthModel,
): ObliqueMedium {
  const table = profileTable(profile);
  const earthRadiusKm = profile.earthRadiusKm;
  const invF2 = 1 / (frequencyMHz * frequencyMHz);
  const groundX = table.groundFp2 * invF2;
  const w0mu0sq = (earth === 'spherical' ? earthRadiusKm * earthRadiusKm : 1) * (1 - groundX);
  const { gridKm, gridFp2 } = table;
  const n = gridKm.length;
  const g = new Float64Array(n);
  for (let i = 0; i < n; i++) g[i] = gOf(earth, earthRadiusKm, gridKm[i], gridFp2[i], invF2);

  // Record-low local minima of g, refined between the neighbouring grid nodes.
  const gExact = (h: number) => gOf(earth, earthRadiusKm, h, fp2At(profile, h), invF2);
  const minima: { heightKm: number; g: number }[] = [];
  let record = Infinity;
  let reflectsVertically = false;
  for (let i = 0; i < n; i++) {
    if (g[i] <= 0) {
      reflectsVertically = true;
      break;
    }
    // The last node is a minimum too when g falls towards it: above topKm N = 0, so g jumps back
    // up to r² (a profile that ends with ionization, e.g. an inversion stopping at the peak).
    const isLast = i + 1 === n;
    const isMin = i > 0 && g[i] < g[i - 1] && (isLast || g[i] <= g[i + 1]);
    if (isMin && g[i] < record) {
      const m = brentMinimum(gExact, gridKm[i - 1], gridKm[isLast ? i : i + 1], 1e-9);
      const best = m.fx < g[i] ? m : { x: gridKm[i], fx: g[i] };
      if (best.fx <= 0) {
        reflectsVertically = true;
        minima.push({ heightKm: best.x, g: best.fx });
        break;
      }
      minima.push({ heightKm: best.x, g: best.fx });
      record = best.fx;
    }
  }

  // Heights and g with the refined minima inserted, then the running minimum.
  const hsList: number[] = [];
  const gsList: number[] = [];
  let mi = 0;
  for (let i = 0; i < n; i++) {
    while (mi < minima.length && minima[mi].heightKm < gridKm[i]) {
      if (hsList.length === 0 || minima[mi].heightKm > hsList[hsList.length - 1]) {
        hsList.push(minima[mi].heightKm);
        gsList.push(minima[mi].g);
      }
      mi++;
    }
    hsList.push(gridKm[i]);
    gsList.push(g[i]);
  }
  const hs = Float64Array.from(hsList);
  const runningMinG = Float64Array.from(gsList);
  for (let i = 1; i < runningMinG.length; i++) {
    if (runningMinG[i] > runningMinG[i - 1]) runningMinG[i] = runningMinG[i - 1];
  }

  const criticalElevationsRad: number[] = [];
  const criticalHeightsKm: number[] = [];
  for (const m of minima) {
    if (m.g > 0 && m.g < w0mu0sq) {
      criticalElevationsRad.push(Math.acos(Math.sqrt(m.g / w0mu0sq)));
      criticalHeightsKm.push(m.heightKm);
    }
  }
  return {
    profile,
    earth,
    frequencyMHz,
    earthRadiusKm,
    invF2,
    groundX,
    blocked: groundX >= 1,
    criticalElevationsRad,
    criticalHeightsKm,
    reflectsVertically,
    hs,
    runningMinG,
    table,
  };
}

// ---------------------------------------------------------------------------------------------
// Ray state and integrands (module scope: the integrator is not re-entrant, JS is single-threaded)

let sph = true;
let R0 = 0;
let rayA = 0; // spherical: a = R₀μ₀cos β₀ [km]; flat: a = μ₀ cos β₀
let rayC1 = 0; // spherical: R₀ − a [km] (computed without cancellation)
let rayS2 = 0; // flat: μ₀² − a² = μ₀² sin² β₀
let rayX0 = 0;
let curInvF2 = 0;
let accD = 0;
let accG = 0;
let accP = 0;
let panels = 0;
// Within turnDeltaKm of the turning height, q is interpolated linearly to turnQAtDelta (see findTurningKm).
let turnDeltaKm = 0;
let turnQAtDelta = 0;
// Turning radius r_t [km] (spherical) and 1 − X(h_t) = a²/r_t² (spherical) or a² (flat).
let turnRadiusKm = 0;
let turnOneMinusX = 0;
/** The turning panel takes q from the density drop (near a peak, see findTurningKm). */
let turnFromDrop = false;
/**
 * q′·(h_t − h_bottom) below this many rounding units of g: the relative rounding error of q at the
 * first Kronrod node of the turning panel (τ ≈ 2e-5·t²max) could exceed ~1e-9, against the panel
 * tolerance of 1e-8.
 */
const NOISY_TURN_FACTOR = 1e13;
const vD = new Float64Array(15);
const vG = new Float64Array(15);
const vP = new Float64Array(15);

/** g(h) − a² without cancellation: (r − a)(r + a) − r²X (spherical), μ₀²sin²β₀ + X₀ − X (flat). */
function qOf(heightKm: number, fp2: number): number {
  const x = fp2 * curInvF2;
  if (sph) {
    const r = R0 + heightKm;
    return (heightKm + rayC1) * (r + rayA) - r * r * x;
  }
  return rayS2 + rayX0 - x;
}

/**
 * Fills vD/vG/vP[j] with the one-way integrands (per km of height) at a node; `jac` = dh/dvar;
 * `tauKm` = h_t − h on the turning panel (−1 elsewhere).
 */
function nodeValues(j: number, heightKm: number, fp2: number, jac: number, tauKm = -1): void {
  const x = fp2 * curInvF2;
  let q: number;
  let r = 1;
  if (sph) {
    r = R0 + heightKm;
    q = (heightKm + rayC1) * (r + rayA) - r * r * x;
  } else {
    q = rayS2 + rayX0 - x;
  }
  if (tauKm >= 0 && tauKm < turnDeltaKm) q = (turnQAtDelta * tauKm) / turnDeltaKm;
  if (!(q > 0)) {
    vD[j] = 0;
    vG[j] = 0;
    vP[j] = 0;
    return;
  }
  const s = jac / Math.sqrt(q);
  if (sph) {
    vG[j] = r * s;
    vD[j] = ((R0 * rayA) / r) * s;
    vP[j] = r * (1 - x) * s;
  } else {
    vG[j] = s;
    vD[j] = rayA * s;
    vP[j] = (1 - x) * s;
  }
}

/**
 * q at depth τ = h_t − h below the turning height without cancellation. With g(h_t) = a² and
 * ΔX = X(h_t) − X(h) from the density drop N(h_t) − N(h_t − τ) (computed per layer, profile.ts):
 *   spherical  q = r²ΔX − τ(r + r_t)·a²/r_t²   (r = r_t − τ),   flat  q = ΔX.
 * (The direct form g − a² loses the digits of 1 − X next to a peak, where X ≈ 1: the noise made
 * the adaptive quadrature of the turning panel split down to its limits.)
 */
function qBelowTurn(tauKm: number, deltaX: number): number {
  if (!sph) return deltaX;
  const r = turnRadiusKm - tauKm;
  return r * r * deltaX - tauKm * (r + turnRadiusKm) * turnOneMinusX;
}

/** ΔX = X(h_t) − X(h_t − τ). */
function deltaXBelow(profile: Profile, turnKm: number, tauKm: number): number {
  return profile.densityDropPerM3(turnKm, tauKm) * FP2_MHZ2_PER_DENSITY * curInvF2;
}

/** nodeValues on the turning panel, from τ and ΔX (1 − X = 1 − X(h_t) + ΔX). */
function turningNodeValues(j: number, tauKm: number, deltaX: number, jac: number): void {
  let q = qBelowTurn(tauKm, deltaX);
  if (tauKm < turnDeltaKm) q = (turnQAtDelta * tauKm) / turnDeltaKm;
  if (!(q > 0)) {
    vD[j] = 0;
    vG[j] = 0;
    vP[j] = 0;
    return;
  }
  const s = jac / Math.sqrt(q);
  const oneMinusX = turnOneMinusX + deltaX;
  if (sph) {
    const r = turnRadiusKm - tauKm;
    vG[j] = r * s;
    vD[j] = ((R0 * rayA) / r) * s;
    vP[j] = r * oneMinusX * s;
  } else {
    vG[j] = s;
    vD[j] = rayA * s;
    vP[j] = oneMinusX * s;
  }
}

const KN = KRONROD15_NODES;
const KW = KRONROD15_WEIGHTS;
const GW = GAUSS7_WEIGHTS;

/** Node position index j ∈ [0, 15): 0..6 left of the centre, 7 centre, 8..14 right. */
function nodeOffset(j: number): number {
  return j < 7 ? -KN[j] : j === 7 ? 0 : KN[14 - j];
}

// Results of panelSums (module scope to avoid an allocation per panel).
let sumD = 0;
let sumG = 0;
let sumP = 0;
let sumErr = 0;

/** K15 sums of vD, vG, vP and the error estimate |K15 − G7| of the group-path integrand. */
function panelSums(half: number): void {
  let kD = KW[7] * vD[7];
  let kG = KW[7] * vG[7];
  let kP = KW[7] * vP[7];
  let gG = GW[3] * vG[7];
  for (let j = 0; j < 7; j++) {
    const i = 14 - j;
    kD += KW[j] * (vD[j] + vD[i]);
    kG += KW[j] * (vG[j] + vG[i]);
    kP += KW[j] * (vP[j] + vP[i]);
    if (j % 2 === 1) gG += GW[(j - 1) / 2] * (vG[j] + vG[i]);
  }
  sumD = kD * half;
  sumG = kG * half;
  sumP = kP * half;
  sumErr = Math.abs((kG - gG) * half);
}

/** Accepts the panel just summed (adds it) or returns false to ask for a bisection. */
function acceptPanel(depth: number): boolean {
  panels++;
  if (
    sumErr <= PANEL_REL_TOLERANCE * Math.abs(sumG) ||
    sumErr <= PANEL_ABS_TOLERANCE_KM ||
    depth >= MAX_DEPTH ||
    panels >= MAX_PANELS
  ) {
    accD += sumD;
    accG += sumG;
    accP += sumP;
    return true;
  }
  return false;
}

function fixedPanel(
  profile: Profile,
  seg: Segment,
  lo: number,
  hi: number,
  heap: number,
  depth: number,
): void {
  const half = 0.5 * (hi - lo);
  const mid = 0.5 * (lo + hi);
  let fp2 = depth <= MAX_CACHED_DEPTH ? seg.cache.get(heap) : undefined;
  if (!fp2) {
    fp2 = new Float64Array(15);
    for (let j = 0; j < 15; j++) fp2[j] = fp2At(profile, mid + half * nodeOffset(j));
    if (depth <= MAX_CACHED_DEPTH) seg.cache.set(heap, fp2);
  }
  for (let j = 0; j < 15; j++) nodeValues(j, mid + half * nodeOffset(j), fp2[j], 1);
  panelSums(half);
  if (acceptPanel(depth)) return;
  fixedPanel(profile, seg, lo, mid, 2 * heap, depth + 1);
  fixedPanel(profile, seg, mid, hi, 2 * heap + 1, depth + 1);
}

/**
 * Panel over t ∈ [lo, hi] with h = h_t − t², dh = 2t dt (the turning-point substitution); with
 * `scaleKm` > 0 the variable is u, t = s·sinh u (see turningScaleKm).
 */
function turningPanel(
  profile: Profile,
  turnKm: number,
  lo: number,
  hi: number,
  depth: number,
  scaleKm: number,
): void {
  const half = 0.5 * (hi - lo);
  const mid = 0.5 * (lo + hi);
  for (let j = 0; j < 15; j++) {
    const v = mid + half * nodeOffset(j);
    const t = scaleKm > 0 ? scaleKm * Math.sinh(v) : v;
    const dtdv = scaleKm > 0 ? scaleKm * Math.cosh(v) : 1;
    const tauKm = t * t;
    if (turnFromDrop) {
      turningNodeValues(j, tauKm, deltaXBelow(profile, turnKm, tauKm), 2 * t * dtdv);
    } else {
      const h = turnKm - tauKm;
      nodeValues(j, h, fp2At(profile, h), 2 * t * dtdv, tauKm);
    }
  }
  panelSums(half);
  if (acceptPanel(depth)) return;
  turningPanel(profile, turnKm, lo, mid, depth + 1, scaleKm);
  turningPanel(profile, turnKm, mid, hi, depth + 1, scaleKm);
}

/**
 * Near a peak of N the ray turns where g′ is small: with τ = h_t − h = t², q ≈ q₁τ + q₂τ² and the
 * integrand in t, 2/sqrt(q₁ + q₂t²), is a narrow peak of width s = sqrt(q₁/q₂) that costs many
 * bisections. Then t = s·sinh u makes it smooth (s·cosh u/sqrt(q₁ + q₂s²sinh²u) = s/sqrt(q₁)).
 * Returns s [km^½], or 0 when the plain t is as good (s not small against the t range).
 */
function turningScaleKm(profile: Profile, turnKm: number, tMax: number): number {
  const q1 = turnQAtDelta / turnDeltaKm;
  const tauKm = 0.25 * tMax * tMax;
  const h = turnKm - tauKm;
  const qMid = turnFromDrop
    ? qBelowTurn(tauKm, deltaXBelow(profile, turnKm, tauKm))
    : qOf(h, fp2At(profile, h));
  const q2 = (qMid - q1 * tauKm) / (tauKm * tauKm);
  if (!(q1 > 0 && q2 > 0)) return 0;
  const s = Math.sqrt(q1 / q2);
  return s < TURN_SCALE_FRACTION * tMax ? s : 0;
}

/** The sinh substitution is used when s < this fraction of the t range. */
const TURN_SCALE_FRACTION = 0.25;

function setRay(medium: ObliqueMedium, elevationRad: number): void {
  sph = medium.earth === 'spherical';
  R0 = medium.earthRadiusKm;
  curInvF2 = medium.invF2;
  rayX0 = medium.groundX;
  const mu0 = Math.sqrt(1 - medium.groundX);
  const cosB = Math.cos(elevationRad);
  const sinHalf = Math.sin(0.5 * elevationRad);
  if (sph) {
    rayA = R0 * mu0 * cosB;
    // R₀ − a = R₀(1 − μ₀cos β₀); with μ₀ = 1 it is 2R₀sin²(β₀/2), exact for grazing rays.
    rayC1 = medium.groundX === 0 ? 2 * R0 * sinHalf * sinHalf : R0 * (1 - mu0 * cosB);
    rayS2 = 0;
  } else {
    rayA = mu0 * cosB;
    rayC1 = 0;
    const sinB = Math.sin(elevationRad);
    rayS2 = (1 - medium.groundX) * sinB * sinB;
  }
}

/** a² compared with the grid of g: R₀²μ₀²cos²β₀ (spherical) or μ₀²cos²β₀ (flat). */
function aSquared(): number {
  return rayA * rayA;
}

/** Turning height [km] of the current ray, or null when it penetrates the whole profile. */
function findTurningKm(medium: ObliqueMedium): number | null {
  const { hs, runningMinG, profile } = medium;
  const a2 = aSquared();
  const n = hs.length;
  if (runningMinG[n - 1] > a2) return null;
  // First index with runningMinG ≤ a² (the sequence is non-increasing).
  let lo = 0;
  let hi = n - 1;
  if (runningMinG[0] <= a2) return null; // touches at the bottom: degenerate grazing ray
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (runningMinG[mid] <= a2) hi = mid;
    else lo = mid;
  }
  const qAt = (h: number) => qOf(h, fp2At(profile, h));
  let i = hi;
  let qHi = qAt(hs[i]);
  // Guard against rounding between g − a² on the grid and the cancellation-free q.
  while (i < n - 1 && qHi > 0) qHi = qAt(hs[++i]);
  if (qHi > 0) return null;
  // q with the bracket ends and the last value remembered (Brent and the checks below ask again).
  const loKm = hs[i - 1];
  const hiKm = hs[i];
  const qLo = qAt(loKm);
  let lastKm = Number.NaN;
  let lastQ = Number.NaN;
  const q = (h: number) => {
    if (h === loKm) return qLo;
    if (h === hiKm) return qHi;
    if (h !== lastKm) {
      lastKm = h;
      lastQ = qAt(h);
    }
    return lastQ;
  };
  const root = brentRoot(q, loKm, hiKm);
  if (root === null) return null;
  // Keep the root on the side where q ≥ 0: a turning height a rounding error too high would make
  // q < 0 at the first nodes of the turning panel (a spurious jump for the adaptive quadrature).
  let h = root;
  let step = Number.EPSILON * Math.max(1, Math.abs(h));
  for (let k = 0; k < 60 && q(h) < 0; k++) {
    h = Math.max(hs[i - 1], h - step);
    step *= 2;
  }
  // Below ~1e4 rounding units q(h) is noise (it is a difference of terms of size r²); there the
  // turning panel uses the linear interpolation q ≈ q(h_t − δ)·τ/δ, τ = h_t − h (exact to O(q″δ/q′)).
  const noise = 4 * Number.EPSILON * (sph ? (R0 + h) * (R0 + h) : 1);
  let delta = 16 * Number.EPSILON * Math.max(1, h);
  // Start the search for δ where the slope across the bracket puts q at 1e4 rounding units.
  const slope = q(hs[i - 1]) / (h - hs[i - 1]);
  if (slope > 0) {
    const k = Math.floor(Math.log((1e4 * noise) / slope / delta) / Math.log(4));
    if (k > 0 && h - delta * 4 ** k > hs[i - 1]) delta *= 4 ** k;
  }
  let qDelta = q(h - delta);
  while (qDelta < 1e4 * noise && h - 4 * delta > hs[i - 1]) {
    delta *= 4;
    qDelta = q(h - delta);
  }
  // Next to a peak q′ is small and the rounding of g − a² (≈ noise) is felt far from h_t: the
  // turning panel then takes q from the density drop (qBelowTurn), consistent at δ.
  turnRadiusKm = R0 + h;
  turnOneMinusX = sph ? (rayA / turnRadiusKm) ** 2 : rayA * rayA;
  const tMax2 = h - hs[0];
  turnFromDrop = (qDelta / delta) * tMax2 < NOISY_TURN_FACTOR * noise;
  if (turnFromDrop) qDelta = qBelowTurn(delta, deltaXBelow(profile, h, delta));
  turnDeltaKm = delta;
  turnQAtDelta = qDelta;
  return h;
}

/**
 * A lower bound on D₁ over elevations [loRad, hiRad] without integrating (0 when none is known):
 * as μ ≤ 1, dθ/dr = a/(r·sqrt(μ²r² − a²)) ≥ a/(r·sqrt(r² − a²)), so one hop covers at least the
 * free-space range up to the turning height, 2R₀(arccos(a/r_t) − β₀) (flat: 2h_t·cot β₀); r_t
 * does not decrease with β₀. On each piece [β₁, β₂] of the interval this gives
 * 2R₀(arccos(R₀cos β₁/r_t(β₁)) − β₂), r_t(β₁) taken two grid nodes below the first with g ≤ a².
 */
export function hopRangeLowerBoundKm(medium: ObliqueMedium, loRad: number, hiRad: number): number {
  if (medium.groundX !== 0 || medium.blocked || !(hiRad >= loRad)) return 0;
  const { hs, runningMinG } = medium;
  const R0 = medium.earthRadiusKm;
  const spherical = medium.earth === 'spherical';
  const n = hs.length;
  const pieces = Math.min(
    LOWER_BOUND_MAX_PIECES,
    Math.ceil((hiRad - loRad) / LOWER_BOUND_PIECE_RAD),
  );
  let bound = Infinity;
  for (let k = 0; k < Math.max(1, pieces); k++) {
    const b1 = loRad + ((hiRad - loRad) * k) / pieces;
    const b2 = pieces > 0 ? loRad + ((hiRad - loRad) * (k + 1)) / pieces : hiRad;
    const cos1 = Math.cos(b1);
    const a2 = spherical ? (R0 * cos1) ** 2 : cos1 * cos1;
    // First index with runningMinG ≤ a² (non-increasing sequence).
    let lo = 0;
    let hi = n - 1;
    if (runningMinG[hi] > a2) lo = hi;
    else {
      while (hi - lo > 1) {
        const mid = (lo + hi) >> 1;
        if (runningMinG[mid] <= a2) hi = mid;
        else lo = mid;
      }
    }
    const turnKm = Math.max(0, hs[Math.max(0, lo - 1)]);
    const pieceKm = spherical
      ? 2 * R0 * (Math.acos(Math.min(1, (R0 * cos1) / (R0 + turnKm))) - b2)
      : (2 * turnKm) / Math.tan(b2);
    bound = Math.min(bound, pieceKm);
    if (!(bound > 0)) return 0;
  }
  return Number.isFinite(bound) ? bound : 0;
}

/** Pieces of the lower bound above: width [rad] and count limit. */
const LOWER_BOUND_PIECE_RAD = 0.002;
const LOWER_BOUND_MAX_PIECES = 400;

export interface HopIntegrals {
  /** One-hop ground range D₁ [km]. */
  groundRangeKm: number;
  /** One-hop group path P′ [km]. */
  groupPathKm: number;
  /** One-hop phase path P [km]. */
  phasePathKm: number;
  /** Turning (apex) height h_t [km]. */
  apexHeightKm: number;
}

/**
 * One-hop integrals for a ray leaving the ground at `elevationRad`; null when it is not reflected
 * (penetrates every layer, or cannot propagate at the ground).
 */
export function hopIntegrals(medium: ObliqueMedium, elevationRad: number): HopIntegrals | null {
  if (medium.blocked) return null;
  setRay(medium, elevationRad);
  if (!sph && !(rayS2 > 0)) return null; // flat Earth, horizontal ray: never turns
  const turnKm = findTurningKm(medium);
  if (turnKm === null) return null;
  const { profile, table } = medium;
  accD = 0;
  accG = 0;
  accP = 0;
  panels = 0;
  // Free space below the profile (μ = 1), closed form.
  const bottomKm = profile.bottomKm;
  if (bottomKm > 0 && medium.groundX === 0) {
    if (sph) {
      const rb = R0 + bottomKm;
      const sb = Math.sqrt((bottomKm + rayC1) * (rb + rayA)); // sqrt(r_b² − a²)
      const s0 = Math.sqrt(rayC1 * (R0 + rayA)); // sqrt(R₀² − a²)
      accD += R0 * (Math.atan2(sb, rayA) - Math.atan2(s0, rayA));
      accG += sb - s0;
      accP += sb - s0;
    } else {
      const sinB = Math.sqrt(rayS2);
      accD += (bottomKm * rayA) / sinB;
      accG += bottomKm / sinB;
      accP += bottomKm / sinB;
    }
  }
  // Whole segments below the turning height, then the turning segment in t.
  let lastKm = bottomKm;
  for (const seg of table.segments) {
    if (seg.hiKm > turnKm) break;
    fixedPanel(profile, seg, seg.loKm, seg.hiKm, 1, 0);
    lastKm = seg.hiKm;
  }
  if (turnKm > lastKm) {
    const tMax = Math.sqrt(turnKm - lastKm);
    const scaleKm = turningScaleKm(profile, turnKm, tMax);
    const hi = scaleKm > 0 ? Math.asinh(tMax / scaleKm) : tMax;
    turningPanel(profile, turnKm, 0, hi, 0, scaleKm);
  }
  return {
    groundRangeKm: 2 * accD,
    groupPathKm: 2 * accG,
    phasePathKm: 2 * accP,
    apexHeightKm: turnKm,
  };
}

/** One-hop ground range only (same computation; a convenience for scans). */
export function hopGroundRangeKm(medium: ObliqueMedium, elevationRad: number): number | null {
  const r = hopIntegrals(medium, elevationRad);
  return r ? r.groundRangeKm : null;
}

/**
 * One-way ground range [km] covered while the ray climbs from `fromKm` to its apex (for ray
 * diagrams): Gauss–Legendre in t = sqrt(h_t − h) between the given t nodes.
 */
export function climbIntegrand(
  medium: ObliqueMedium,
  elevationRad: number,
  apexKm: number,
): (t: number) => number {
  setRay(medium, elevationRad);
  const profile = medium.profile;
  const saved = { sph, R0, rayA, rayC1, rayS2, rayX0, curInvF2 };
  return (t: number) => {
    sph = saved.sph;
    R0 = saved.R0;
    rayA = saved.rayA;
    rayC1 = saved.rayC1;
    rayS2 = saved.rayS2;
    rayX0 = saved.rayX0;
    curInvF2 = saved.curInvF2;
    const h = apexKm - t * t;
    const fp2 = h < profile.bottomKm || h > profile.topKm ? 0 : fp2At(profile, h);
    nodeValues(0, h, fp2, 2 * t, t * t);
    return vD[0];
  };
}
