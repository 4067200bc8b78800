/**
 * Numerical quadrature and root finding shared by the physics modules.
 *
 * - Gauss–Legendre rules of order n, nodes by Newton iteration on P_n (Abramowitz & Stegun 25.4.29;
 *   Press et al., Numerical Recipes 3rd ed. §4.6), cached per order.
 * - Adaptive Gauss–Kronrod G7/K15 (Piessens et al., QUADPACK 1983, routine QK15 nodes and weights),
 *   global bisection of the interval with the largest error estimate |K15 − G7|.
 * - Brent's root finder (Brent 1973, "Algorithms for Minimization without Derivatives", ch. 4).
 */
import { ConvergenceError } from './errors.js';

export interface GaussRule {
  readonly nodes: Float64Array; // on [−1, 1]
  readonly weights: Float64Array;
}

const gaussCache = new Map<number, GaussRule>();

/** Gauss–Legendre nodes and weights of order n on [−1, 1]. */
export function gaussLegendre(n: number): GaussRule {
  const cached = gaussCache.get(n);
  if (cached) return cached;
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < Math.ceil(n / 2); i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5)); // Tricomi's initial guess
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      const dx = p1 / ((n * (x * p1 - p0)) / (x * x - 1));
      x -= dx;
      if (Math.abs(dx) < 1e-16) break;
    }
    // Recompute P_n' at the converged node for the weight.
    let p0 = 1;
    let p1 = x;
    for (let k = 2; k <= n; k++) {
      const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
      p0 = p1;
      p1 = p2;
    }
    const dp = (n * (x * p1 - p0)) / (x * x - 1);
    nodes[i] = -x;
    nodes[n - 1 - i] = x;
    const w = 2 / ((1 - x * x) * dp * dp);
    weights[i] = w;
    weights[n - 1 - i] = w;
  }
  const rule = { nodes, weights };
  gaussCache.set(n, rule);
  return rule;
}

/** Fixed-order Gauss–Legendre integral of f over [a, b]. */
export function gaussIntegrate(f: (x: number) => number, a: number, b: number, order = 32): number {
  const { nodes, weights } = gaussLegendre(order);
  const half = 0.5 * (b - a);
  const mid = 0.5 * (a + b);
  let sum = 0;
  for (let i = 0; i < nodes.length; i++) sum += weights[i] * f(mid + half * nodes[i]);
  return sum * half;
}

/**
 * Kronrod 15-point nodes (abscissae ≥ 0, descending) and weights, QUADPACK QK15 values rounded to
 * double precision. Odd indices are the nodes of the embedded 7-point Gauss rule.
 */
export const KRONROD15_NODES = [
  0.9914553711208126, 0.9491079123427585, 0.8648644233597691, 0.7415311855993945,
  0.5860872354676911, 0.4058451513773972, 0.20778495500789848, 0,
] as const;
export const KRONROD15_WEIGHTS = [
  0.022935322010529224, 0.06309209262997856, 0.10479001032225019, 0.14065325971552592,
  0.1690047266392679, 0.19035057806478542, 0.20443294007529889, 0.20948214108472782,
] as const;
/** Gauss 7-point weights for the nodes KRONROD15_NODES[1], [3], [5], [7]. */
export const GAUSS7_WEIGHTS = [
  0.1294849661688697, 0.27970539148927664, 0.3818300505051189, 0.4179591836734694,
] as const;

/** One G7/K15 panel: the Kronrod value and the error estimate |K15 − G7|. */
export function gaussKronrod15(
  f: (x: number) => number,
  a: number,
  b: number,
): { value: number; error: number } {
  const half = 0.5 * (b - a);
  const mid = 0.5 * (a + b);
  const fc = f(mid);
  let kronrod = KRONROD15_WEIGHTS[7] * fc;
  let gauss = GAUSS7_WEIGHTS[3] * fc;
  for (let j = 0; j < 7; j++) {
    const dx = half * KRONROD15_NODES[j];
    const pair = f(mid - dx) + f(mid + dx);
    kronrod += KRONROD15_WEIGHTS[j] * pair;
    if (j % 2 === 1) gauss += GAUSS7_WEIGHTS[(j - 1) / 2] * pair;
  }
  return { value: kronrod * half, error: Math.abs((kronrod - gauss) * half) };
}

export interface IntegrateOptions {
  /** Relative tolerance on the total (default 1e-10). */
  relTolerance?: number;
  /** Absolute tolerance on the total (default 0). */
  absTolerance?: number;
  /** Maximum number of panels before giving up (default 2000). */
  maxPanels?: number;
}

/**
 * Adaptive G7/K15 quadrature: repeatedly bisect the panel with the largest error estimate until
 * the summed estimate ≤ max(absTolerance, relTolerance·|total|). Throws ConvergenceError when the
 * panel budget is exhausted or the integrand is not finite.
 */
export function integrate(
  f: (x: number) => number,
  a: number,
  b: number,
  options: IntegrateOptions = {},
): number {
  const relTolerance = options.relTolerance ?? 1e-10;
  const absTolerance = options.absTolerance ?? 0;
  const maxPanels = options.maxPanels ?? 2000;
  if (a === b) return 0;
  const first = gaussKronrod15(f, a, b);
  const lo = [a];
  const hi = [b];
  const val = [first.value];
  const err = [first.error];
  let total = first.value;
  let totalError = first.error;
  while (totalError > Math.max(absTolerance, relTolerance * Math.abs(total))) {
    if (!Number.isFinite(total) || !Number.isFinite(totalError)) {
      throw new ConvergenceError('integrand is not finite', { a, b, total, totalError });
    }
    if (lo.length >= maxPanels) {
      throw new ConvergenceError('adaptive quadrature did not converge', {
        a,
        b,
        total,
        totalError,
        panels: lo.length,
      });
    }
    let worst = 0;
    for (let i = 1; i < err.length; i++) if (err[i] > err[worst]) worst = i;
    const left = lo[worst];
    const right = hi[worst];
    const middle = 0.5 * (left + right);
    if (middle <= left || middle >= right) break; // panel at machine resolution
    const l = gaussKronrod15(f, left, middle);
    const r = gaussKronrod15(f, middle, right);
    total += l.value + r.value - val[worst];
    totalError += l.error + r.error - err[worst];
    hi[worst] = middle;
    val[worst] = l.value;
    err[worst] = l.error;
    lo.push(middle);
    hi.push(right);
    val.push(r.value);
    err.push(r.error);
    // Recompute the sums now and then so round-off in the running totals cannot accumulate.
    if (lo.length % 64 === 0) {
      total = val.reduce((s, v) => s + v, 0);
      totalError = err.reduce((s, v) => s + v, 0);
    }
  }
  return val.reduce((s, v) => s + v, 0);
}

/** One G7/K15 panel for two integrands evaluated together: f(x, out) fills out[0], out[1]. */
function gaussKronrod15Pair(
  f: (x: number, out: Float64Array) => void,
  a: number,
  b: number,
  scratch: Float64Array,
): [number, number, number, number] {
  const half = 0.5 * (b - a);
  const mid = 0.5 * (a + b);
  f(mid, scratch);
  let k0 = KRONROD15_WEIGHTS[7] * scratch[0];
  let k1 = KRONROD15_WEIGHTS[7] * scratch[1];
  let g0 = GAUSS7_WEIGHTS[3] * scratch[0];
  let g1 = GAUSS7_WEIGHTS[3] * scratch[1];
  for (let j = 0; j < 7; j++) {
    const dx = half * KRONROD15_NODES[j];
    f(mid - dx, scratch);
    let p0 = scratch[0];
    let p1 = scratch[1];
    f(mid + dx, scratch);
    p0 += scratch[0];
    p1 += scratch[1];
    k0 += KRONROD15_WEIGHTS[j] * p0;
    k1 += KRONROD15_WEIGHTS[j] * p1;
    if (j % 2 === 1) {
      g0 += GAUSS7_WEIGHTS[(j - 1) / 2] * p0;
      g1 += GAUSS7_WEIGHTS[(j - 1) / 2] * p1;
    }
  }
  return [k0 * half, k1 * half, Math.abs((k0 - g0) * half), Math.abs((k1 - g1) * half)];
}

/**
 * Adaptive G7/K15 for two integrands sharing one costly evaluation (e.g. group and phase path
 * from the same μ). Converges when each component meets max(absTolerance, relTolerance·|total|).
 */
export function integratePair(
  f: (x: number, out: Float64Array) => void,
  a: number,
  b: number,
  options: IntegrateOptions = {},
): [number, number] {
  const relTolerance = options.relTolerance ?? 1e-10;
  const absTolerance = options.absTolerance ?? 0;
  const maxPanels = options.maxPanels ?? 2000;
  if (a === b) return [0, 0];
  const scratch = new Float64Array(2);
  const panels = [{ lo: a, hi: b, r: gaussKronrod15Pair(f, a, b, scratch) }];
  const sums = () => {
    let v0 = 0;
    let v1 = 0;
    let e0 = 0;
    let e1 = 0;
    for (const p of panels) {
      v0 += p.r[0];
      v1 += p.r[1];
      e0 += p.r[2];
      e1 += p.r[3];
    }
    return [v0, v1, e0, e1];
  };
  for (;;) {
    const [v0, v1, e0, e1] = sums();
    const ok0 = e0 <= Math.max(absTolerance, relTolerance * Math.abs(v0));
    const ok1 = e1 <= Math.max(absTolerance, relTolerance * Math.abs(v1));
    if (ok0 && ok1) return [v0, v1];
    if (![v0, v1, e0, e1].every(Number.isFinite)) {
      throw new ConvergenceError('integrand is not finite', { a, b, v0, v1, e0, e1 });
    }
    if (panels.length >= maxPanels) {
      throw new ConvergenceError('adaptive quadrature did not converge', { a, b, v0, v1, e0, e1 });
    }
    // Split the panel with the largest error relative to its component's tolerance.
    const s0 = 1 / Math.max(Math.abs(v0), Number.MIN_VALUE);
    const s1 = 1 / Math.max(Math.abs(v1), Number.MIN_VALUE);
    let worst = 0;
    let worstScore = -1;
    for (let i = 0; i < panels.length; i++) {
      const score = Math.max(panels[i].r[2] * s0, panels[i].r[3] * s1);
      if (score > worstScore) {
        worstScore = score;
        worst = i;
      }
    }
    const { lo, hi } = panels[worst];
    const middle = 0.5 * (lo + hi);
    if (middle <= lo || middle >= hi) return [v0, v1]; // panel at machine resolution
    panels[worst] = { lo, hi: middle, r: gaussKronrod15Pair(f, lo, middle, scratch) };
    panels.push({ lo: middle, hi, r: gaussKronrod15Pair(f, middle, hi, scratch) });
  }
}

export interface RootOptions {
  /** Absolute tolerance on x (default: 4·ε·|x|, i.e. machine precision). */
  tolerance?: number;
  /** Maximum iterations (default 200). */
  maxIterations?: number;
}

/**
 * Brent's method on [a, b]. Returns null when f(a) and f(b) have the same sign (no bracketed root),
 * the root otherwise; throws ConvergenceError after maxIterations.
 */
export function brentRoot(
  f: (x: number) => number,
  a: number,
  b: number,
  options: RootOptions = {},
): number | null {
  const tolerance = options.tolerance ?? 0;
  const maxIterations = options.maxIterations ?? 200;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (fa > 0 === fb > 0 || Number.isNaN(fa) || Number.isNaN(fb)) return null;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iter = 0; iter < maxIterations; iter++) {
    if (fb > 0 === fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tolerance;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // Inverse quadratic interpolation (secant when a = c).
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  throw new ConvergenceError('Brent root finder did not converge', { a, b, c, fa, fb, fc });
}

/** Golden-section search for a maximum of a unimodal f on [a, b]; returns the abscissa. */
export function goldenMaximum(
  f: (x: number) => number,
  a: number,
  b: number,
  toleranceX = 1e-9,
): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let x1 = b - g * (b - a);
  let x2 = a + g * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let i = 0; i < 200 && b - a > toleranceX; i++) {
    if (f1 < f2) {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + g * (b - a);
      f2 = f(x2);
    } else {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - g * (b - a);
      f1 = f(x1);
    }
  }
  return f1 > f2 ? x1 : x2;
}
