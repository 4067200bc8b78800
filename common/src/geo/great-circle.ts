/**
 * Station-to-station geometry for HF links, from GeographicLib's geodesic routines
 * (C. F. F. Karney, "Algorithms for geodesics", J. Geodesy 87 (2013), doi:10.1007/s00190-012-0578-z).
 *
 * - The physics uses a sphere of radius R₀ (SPEC §2.2; 6371 km as in ITU-R P.533): a geodesic on
 *   an ellipsoid with flattening 0 is the great circle, so the same library gives the spherical
 *   ground range, the initial bearings and the path midpoint (the control point).
 * - The WGS-84 geodesic length is reported alongside for reference.
 * Angles in degrees (latitude north +, longitude east +, bearings clockwise from true north).
 */
import geodesic from 'geographiclib-geodesic';
import { EARTH_RADIUS_KM, M_PER_KM } from '../physics/constants.js';

export interface GeoPoint {
  latDeg: number;
  lonDeg: number;
}

export interface PathGeometry {
  /** Great-circle distance on the sphere of radius earthRadiusKm [km]. */
  distanceKm: number;
  /** WGS-84 geodesic distance [km]. */
  geodesicDistanceKm: number;
  /** Initial bearing from `from` towards `to` [deg, 0–360). */
  bearingDeg: number;
  /** Initial bearing from `to` back towards `from` [deg, 0–360). */
  reverseBearingDeg: number;
  /** The point half-way along the great circle (the control point of a one-hop path). */
  midpoint: GeoPoint;
}

const sphereCache = new Map<number, InstanceType<typeof geodesic.Geodesic.Geodesic>>();

function sphere(earthRadiusKm: number) {
  let g = sphereCache.get(earthRadiusKm);
  if (!g) {
    g = new geodesic.Geodesic.Geodesic(earthRadiusKm * M_PER_KM, 0);
    sphereCache.set(earthRadiusKm, g);
  }
  return g;
}

const normalizeBearingDeg = (deg: number): number => ((deg % 360) + 360) % 360;

export function pathGeometry(
  from: GeoPoint,
  to: GeoPoint,
  earthRadiusKm: number = EARTH_RADIUS_KM,
): PathGeometry {
  const g = sphere(earthRadiusKm);
  const inverse = g.Inverse(from.latDeg, from.lonDeg, to.latDeg, to.lonDeg);
  const line = g.InverseLine(from.latDeg, from.lonDeg, to.latDeg, to.lonDeg);
  const mid = line.Position(line.s13 / 2);
  const wgs84 = geodesic.Geodesic.WGS84.Inverse(from.latDeg, from.lonDeg, to.latDeg, to.lonDeg);
  return {
    distanceKm: (inverse.s12 ?? 0) / M_PER_KM,
    geodesicDistanceKm: (wgs84.s12 ?? 0) / M_PER_KM,
    bearingDeg: normalizeBearingDeg(inverse.azi1 ?? 0),
    // azi2 is the forward azimuth at `to`; the way back starts opposite to it.
    reverseBearingDeg: normalizeBearingDeg((inverse.azi2 ?? 0) + 180),
    midpoint: { latDeg: mid.lat2 ?? from.latDeg, lonDeg: normalizeLonDeg(mid.lon2 ?? from.lonDeg) },
  };
}

/** Points along the great circle, `segments + 1` of them, for drawing a link on a map. */
export function greatCirclePoints(
  from: GeoPoint,
  to: GeoPoint,
  segments = 64,
  earthRadiusKm: number = EARTH_RADIUS_KM,
): GeoPoint[] {
  const line = sphere(earthRadiusKm).InverseLine(from.latDeg, from.lonDeg, to.latDeg, to.lonDeg);
  const points: GeoPoint[] = [];
  for (let i = 0; i <= segments; i += 1) {
    const p = line.Position((line.s13 * i) / segments);
    points.push({ latDeg: p.lat2 ?? 0, lonDeg: normalizeLonDeg(p.lon2 ?? 0) });
  }
  return points;
}

/** Longitude folded into [−180, 180). */
export function normalizeLonDeg(lonDeg: number): number {
  return ((((lonDeg + 180) % 360) + 360) % 360) - 180;
}
