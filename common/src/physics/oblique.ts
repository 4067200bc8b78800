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
  const golden = 0.381966011250105;
  let x = a + golden * (b - a);
  let w = x;
  let v = x;
  let fx = f(x);
  let fw = fx;
  let fv = fx;
  let d = 0;
  let e = 0;
  for (let iter = 0; iter < maxIterations; iter++) {
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
        const u = x + d;
        if (u - a < 2 * tol || b - u < 2 * tol) d = x < m ? tol : -tol;
        useGolden = false;
      }
    }
    if (useGolden) {
      e = (x < m ? b : a) - x;
      d = golden * e;
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
  return { x, fx };
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
    const isMin = i > 0 && i + 1 < n && g[i] < g[i - 1] && g[i] <= g[i + 1];
    if (isMin && g[i] < record) {
      const m = brentMinimum(gExact, gridKm[i - 1], gridKm[i + 1], 1e-9);
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

/** Panel over t ∈ [lo, hi] with h = h_t − t², dh = 2t dt (the turning-point substitution). */
function turningPanel(
  profile: Profile,
  turnKm: number,
  lo: number,
  hi: number,
  depth: number,
): void {
  const half = 0.5 * (hi - lo);
  const mid = 0.5 * (lo + hi);
  for (let j = 0; j < 15; j++) {
    const t = mid + half * nodeOffset(j);
    const h = turnKm - t * t;
    nodeValues(j, h, fp2At(profile, h), 2 * t, t * t);
  }
  panelSums(half);
  if (acceptPanel(depth)) return;
  turningPanel(profile, turnKm, lo, mid, depth + 1);
  turningPanel(profile, turnKm, mid, hi, depth + 1);
}

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
  const q = (h: number) => qOf(h, fp2At(profile, h));
  let i = hi;
  // Guard against rounding between g − a² on the grid and the cancellation-free q.
  while (i < n - 1 && q(hs[i]) > 0) i++;
  if (q(hs[i]) > 0) return null;
  const root = brentRoot(q, hs[i - 1], hs[i]);
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
  let qDelta = q(h - delta);
  while (qDelta < 1e4 * noise && h - 4 * delta > hs[i - 1]) {
    delta *= 4;
    qDelta = q(h - delta);
  }
  turnDeltaKm = delta;
  turnQAtDelta = qDelta;
  return h;
}

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
  if (turnKm > lastKm) turningPanel(profile, turnKm, 0, Math.sqrt(turnKm - lastKm), 0);
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
