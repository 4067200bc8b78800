/**
 * Ray path of a mode for the client's ray diagram: height above ground against ground range over
 * all hops. One leg is traced in t = sqrt(h_t − h) (uniform steps in t crowd points near the apex,
 * where the path curves most), the ground range from the apex being the running integral
 * ∫ (dD/dh)·2t dt of the one-way ground-range integrand (oblique.ts) by 16-point Gauss–Legendre
 * per step; the leg is then scaled to the exact D₁/2 (a plotting accuracy of ≪ 0.1 % is enough)
 * and mirrored for the descent.
 */
import { climbIntegrand, type ObliqueMedium } from './oblique.js';
import { gaussLegendre } from './quadrature.js';

export interface RayPathPoint {
  groundRangeKm: number;
  heightKm: number;
}

/** Points per leg (ground to apex); a hop has 2·LEG_POINTS + 1 points. */
const LEG_POINTS = 20;

export function rayPathPoints(
  medium: ObliqueMedium,
  elevationRad: number,
  apexHeightKm: number,
  hopGroundRangeKm: number,
  hops: number,
): RayPathPoint[] {
  const integrand = climbIntegrand(medium, elevationRad, apexHeightKm);
  const { nodes, weights } = gaussLegendre(16);
  const tGround = Math.sqrt(apexHeightKm);
  // fromApexKm[k]: ground range between the apex and the point at t_k = k·tGround/LEG_POINTS.
  const fromApexKm = new Float64Array(LEG_POINTS + 1);
  for (let k = 1; k <= LEG_POINTS; k++) {
    const a = (tGround * (k - 1)) / LEG_POINTS;
    const b = (tGround * k) / LEG_POINTS;
    const half = 0.5 * (b - a);
    const mid = 0.5 * (a + b);
    let sum = 0;
    for (let j = 0; j < nodes.length; j++) sum += weights[j] * integrand(mid + half * nodes[j]);
    fromApexKm[k] = fromApexKm[k - 1] + sum * half;
  }
  const halfHopKm = 0.5 * hopGroundRangeKm;
  const scale = fromApexKm[LEG_POINTS] > 0 ? halfHopKm / fromApexKm[LEG_POINTS] : 0;
  const leg: RayPathPoint[] = [];
  for (let k = LEG_POINTS; k >= 0; k--) {
    const t = (tGround * k) / LEG_POINTS;
    leg.push({ groundRangeKm: halfHopKm - scale * fromApexKm[k], heightKm: apexHeightKm - t * t });
  }
  const out: RayPathPoint[] = [];
  for (let hop = 0; hop < hops; hop++) {
    const start = hop * hopGroundRangeKm;
    for (let k = hop === 0 ? 0 : 1; k < leg.length; k++) {
      out.push({ groundRangeKm: start + leg[k].groundRangeKm, heightKm: leg[k].heightKm });
    }
    for (let k = leg.length - 2; k >= 0; k--) {
      out.push({
        groundRangeKm: start + hopGroundRangeKm - leg[k].groundRangeKm,
        heightKm: leg[k].heightKm,
      });
    }
  }
  out[0].heightKm = 0;
  return out;
}
