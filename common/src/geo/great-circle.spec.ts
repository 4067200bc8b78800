import { describe, expect, it } from 'vitest';
import geodesic from 'geographiclib-geodesic';
import { greatCirclePoints, normalizeLonDeg, pathGeometry } from './great-circle.js';

const RAD = Math.PI / 180;

/** Haversine great-circle distance on a sphere — textbook closed form (e.g. R. W. Sinnott,
 *  "Virtues of the Haversine", Sky & Telescope 68 (1984) 159), written here independently. */
function haversineKm(lat1: number, lon1: number, lat2: number, lon2: number, radiusKm: number) {
  const dLat = (lat2 - lat1) * RAD;
  const dLon = (lon2 - lon1) * RAD;
  const a =
    Math.sin(dLat / 2) ** 2 + Math.cos(lat1 * RAD) * Math.cos(lat2 * RAD) * Math.sin(dLon / 2) ** 2;
  return 2 * radiusKm * Math.asin(Math.sqrt(a));
}

describe('pathGeometry', () => {
  it('spherical distance matches the haversine closed form (Sinnott 1984) to 1e-9', () => {
    const cases: [number, number, number, number][] = [
      [47.2, 8.6, 51.5, -0.1],
      [-33.9, 18.4, 40.7, -74.0],
      [10, 170, -10, -170],
      [60, 0, 60, 90],
    ];
    expect(cases).toHaveLength(4);
    for (const [lat1, lon1, lat2, lon2] of cases) {
      const g = pathGeometry({ latDeg: lat1, lonDeg: lon1 }, { latDeg: lat2, lonDeg: lon2 });
      const expected = haversineKm(lat1, lon1, lat2, lon2, 6371);
      expect(Math.abs(g.distanceKm - expected) / expected).toBeLessThan(1e-9);
    }
  });

  it('a quarter of the equator is πR₀/2 and heads due east (closed form)', () => {
    const g = pathGeometry({ latDeg: 0, lonDeg: 0 }, { latDeg: 0, lonDeg: 90 });
    expect(g.distanceKm).toBeCloseTo((Math.PI * 6371) / 2, 6);
    expect(g.bearingDeg).toBeCloseTo(90, 9);
    expect(g.reverseBearingDeg).toBeCloseTo(270, 9);
    expect(g.midpoint.latDeg).toBeCloseTo(0, 9);
    expect(g.midpoint.lonDeg).toBeCloseTo(45, 9);
  });

  it('WGS-84 geodesic: Wellington → Salamanca is 19 959 679.267 m (GeographicLib documentation example; value from memory)', () => {
    const g = pathGeometry({ latDeg: -41.32, lonDeg: 174.81 }, { latDeg: 40.96, lonDeg: -5.5 });
    expect(g.geodesicDistanceKm).toBeCloseTo(19959.679267, 5);
    // and the library's own answer, unchanged by our wrapper
    const direct = geodesic.Geodesic.WGS84.Inverse(-41.32, 174.81, 40.96, -5.5);
    expect(g.geodesicDistanceKm).toBe((direct.s12 ?? 0) / 1000);
  });

  it('the midpoint is equidistant from both ends', () => {
    const a = { latDeg: 47.2, lonDeg: 8.6 };
    const b = { latDeg: 28.1, lonDeg: -15.4 };
    const g = pathGeometry(a, b);
    const da = pathGeometry(a, g.midpoint).distanceKm;
    const db = pathGeometry(g.midpoint, b).distanceKm;
    expect(da).toBeCloseTo(g.distanceKm / 2, 6);
    expect(db).toBeCloseTo(g.distanceKm / 2, 6);
  });

  it('great-circle points start and end at the stations and stay on the circle', () => {
    const a = { latDeg: 47.2, lonDeg: 8.6 };
    const b = { latDeg: -33.9, lonDeg: 151.2 };
    const pts = greatCirclePoints(a, b, 32);
    expect(pts).toHaveLength(33);
    expect(pts[0].latDeg).toBeCloseTo(a.latDeg, 9);
    expect(pts[32].lonDeg).toBeCloseTo(b.lonDeg, 9);
    const total = pathGeometry(a, b).distanceKm;
    expect(pathGeometry(a, pts[16]).distanceKm).toBeCloseTo(total / 2, 5);
  });

  it('normalizes longitudes into [−180, 180)', () => {
    expect(normalizeLonDeg(190)).toBe(-170);
    expect(normalizeLonDeg(-180)).toBe(-180);
    expect(normalizeLonDeg(540)).toBe(-180);
  });
});
