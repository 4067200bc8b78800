/**
 * Test-only reference ray tracer, deliberately independent of the production quadrature
 * (common/src/physics/oblique.ts): it integrates the ray equations themselves, with no turning-point
 * substitution and no breakpoint handling, by an adaptive Dormand–Prince 5(4) Runge–Kutta method
 * (Dormand & Prince 1980; Hairer, Nørsett & Wanner, "Solving ODEs I", §II.5) at tight tolerance.
 *
 * Hamiltonian ray equations for an isotropic medium with μ² = 1 − X(r) (Budden 1985, ch. 14;
 * Haselgrove 1955), parameter τ with H = ½(k_r² + L²/r² − μ²) = 0:
 *   dr/dτ = k_r,  dθ/dτ = L/r²,  dk_r/dτ = L²/r³ − ½·dX/dr,
 *   ds/dτ = μ  ⇒  dP′/dτ = 1 (P′ = ∫ds/μ),  dP/dτ = μ² (P = ∫μ ds).
 * L = R₀·cos β₀ (Bouguer's invariant, μ₀ = 1), k_r(0) = sin β₀. Ground range = R₀·θ at landing.
 * Plane Earth: z instead of r, dx/dτ = L = cos β₀, dk_z/dτ = −½·dX/dz.
 * dX/dh by a central difference (step 1e-5 km) of the given f_p²(h). Steps that would cross a kink
 * of the profile (given by the caller) are shortened to end on it, so every step sees a smooth
 * right-hand side (otherwise the embedded error estimate is unreliable there).
 */

export interface ReferenceRay {
  groundRangeKm: number;
  groupPathKm: number;
  phasePathKm: number;
  apexHeightKm: number;
}

export interface ReferenceOptions {
  earth: 'spherical' | 'flat';
  earthRadiusKm?: number;
  relTolerance?: number;
  /** Heights where f_p² or its slope jumps (layer bases and tops): steps are cut to end on them. */
  kinksKm?: readonly number[];
}

type Vec = Float64Array;

// Dormand–Prince 5(4) tableau.
/** Largest step in τ [km of group path]. */
const MAX_STEP = 2;
const A = [
  [],
  [1 / 5],
  [3 / 40, 9 / 40],
  [44 / 45, -56 / 15, 32 / 9],
  [19372 / 6561, -25360 / 2187, 64448 / 6561, -212 / 729],
  [9017 / 3168, -355 / 33, 46732 / 5247, 49 / 176, -5103 / 18656],
  [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84],
];
const B5 = [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84, 0];
const B4 = [5179 / 57600, 0, 7571 / 16695, 393 / 640, -92097 / 339200, 187 / 2100, 1 / 40];

/**
 * Traces one hop for the plasma-frequency profile `fp2MHz2(heightKm)` at `frequencyMHz` and
 * elevation `elevationDeg`; null when the ray does not come back (penetrates).
 */
export function traceReferenceRay(
  fp2MHz2: (heightKm: number) => number,
  frequencyMHz: number,
  elevationDeg: number,
  options: ReferenceOptions,
): ReferenceRay | null {
  const spherical = options.earth === 'spherical';
  const R0 = options.earthRadiusKm ?? 6371;
  const rtol = options.relTolerance ?? 1e-12;
  const invF2 = 1 / (frequencyMHz * frequencyMHz);
  const beta = (elevationDeg * Math.PI) / 180;
  const L = spherical ? R0 * Math.cos(beta) : Math.cos(beta);
  const X = (h: number) => fp2MHz2(h) * invF2;
  const kinks = [...(options.kinksKm ?? [])].sort((p, q) => p - q);
  // The smooth piece [pieceLo, pieceHi] of the current step: derivatives near its ends are taken
  // one-sided from inside it (second-order three-point formulas), so no stage sees the other side.
  let pieceLo = -Infinity;
  let pieceHi = Infinity;
  const d = 1e-5;
  const dXdh = (h: number) => {
    if (h - pieceLo < 2 * d) return (-3 * X(h) + 4 * X(h + d) - X(h + 2 * d)) / (2 * d);
    if (pieceHi - h < 2 * d) return (3 * X(h) - 4 * X(h - d) + X(h - 2 * d)) / (2 * d);
    return (X(h + d) - X(h - d)) / (2 * d);
  };
  const setPiece = (h: number, upward: boolean) => {
    pieceLo = -Infinity;
    pieceHi = Infinity;
    for (const k of kinks) {
      // A step that starts exactly on a kink belongs to the piece it is heading into.
      if (k < h || (k === h && upward)) pieceLo = k;
      else {
        pieceHi = k;
        break;
      }
    }
  };

  // y = [height, angle (rad) or x (km), k, P′, P]
  const rhs = (y: Vec, out: Vec) => {
    const h = y[0];
    const k = y[2];
    const x = X(h);
    if (spherical) {
      const r = R0 + h;
      out[0] = k;
      out[1] = L / (r * r);
      out[2] = (L * L) / (r * r * r) - 0.5 * dXdh(h);
    } else {
      out[0] = k;
      out[1] = L;
      out[2] = -0.5 * dXdh(h);
    }
    out[3] = 1;
    out[4] = 1 - x;
  };

  const n = 5;
  const ks = Array.from({ length: 7 }, () => new Float64Array(n));
  const tmp = new Float64Array(n);
  const y5 = new Float64Array(n);
  const step = (y: Vec, hs: number): number => {
    rhs(y, ks[0]);
    for (let s = 1; s < 7; s++) {
      for (let i = 0; i < n; i++) {
        let acc = y[i];
        for (let j = 0; j < s; j++) acc += hs * A[s][j] * ks[j][i];
        tmp[i] = acc;
      }
      rhs(tmp, ks[s]);
    }
    let err = 0;
    for (let i = 0; i < n; i++) {
      let s5 = 0;
      let s4 = 0;
      for (let s = 0; s < 7; s++) {
        s5 += B5[s] * ks[s][i];
        s4 += B4[s] * ks[s][i];
      }
      y5[i] = y[i] + hs * s5;
      const scale = 1e-9 + rtol * Math.max(Math.abs(y[i]), Math.abs(y5[i]), i === 1 ? 0 : 1);
      err = Math.max(err, Math.abs(hs * (s5 - s4)) / scale);
    }
    return err;
  };

  const y = new Float64Array([0, 0, Math.sin(beta), 0, 0]);
  let hs = 0.05;
  let apex = 0;
  for (let iter = 0; iter < 2_000_000; iter++) {
    setPiece(y[0], y[2] > 0);
    const err = step(y, hs);
    if (err > 1) {
      hs *= Math.max(0.1, 0.9 * err ** -0.2);
      continue;
    }
    const kink = kinks.find((k) => (y[0] - k) * (y5[0] - k) < 0);
    if (kink !== undefined && Math.abs(y[0] - kink) > 1e-9) {
      // Shorten the step so that it ends on the kink (bisection on the step length).
      let lo = 0;
      let hi = hs;
      const y0 = Float64Array.from(y);
      const side = Math.sign(y0[0] - kink);
      for (let b = 0; b < 80; b++) {
        const mid = 0.5 * (lo + hi);
        step(y0, mid);
        if (Math.sign(y5[0] - kink) === side) lo = mid;
        else hi = mid;
      }
      step(y0, hi); // ends just past the kink, so the next step starts in the next piece
      y.set(y5);
      continue;
    }
    if (y5[0] < 0 && y5[2] < 0) {
      // Landing inside this step: find the step length that lands exactly at height 0 (bisection).
      let lo = 0;
      let hi = hs;
      const y0 = Float64Array.from(y);
      for (let b = 0; b < 80; b++) {
        const mid = 0.5 * (lo + hi);
        step(y0, mid);
        if (y5[0] > 0) lo = mid;
        else hi = mid;
      }
      step(y0, 0.5 * (lo + hi));
      const range = spherical ? R0 * y5[1] : y5[1];
      return { groundRangeKm: range, groupPathKm: y5[3], phasePathKm: y5[4], apexHeightKm: apex };
    }
    if (y[2] > 0 && y5[2] <= 0) {
      // Apex inside this step: bisect for k = 0.
      let lo = 0;
      let hi = hs;
      const y0 = Float64Array.from(y);
      for (let b = 0; b < 80; b++) {
        const mid = 0.5 * (lo + hi);
        step(y0, mid);
        if (y5[2] > 0) lo = mid;
        else hi = mid;
      }
      step(y0, 0.5 * (lo + hi));
      apex = y5[0];
      step(y0, hs);
    }
    y.set(y5);
    if (y[0] > 5000) return null; // escaped
    hs *= Math.min(5, 0.9 * Math.max(err, 1e-10) ** -0.2);
    hs = Math.min(hs, MAX_STEP);
  }
  return null;
}
