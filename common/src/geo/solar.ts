/**
 * Where the Sun is, for the day/night terminator on the map and the solar zenith angle χ of the
 * diurnal E-layer model (SPEC §4), from the astronomy-engine library (D. Cross; VSOP87 and
 * IAU 2000B nutation; its own tests check it against JPL Horizons).
 *
 * Subsolar point: latitude = the Sun's apparent declination δ (of date); longitude = α − GAST
 * (right ascension minus Greenwich apparent sidereal time), both from astronomy-engine.
 * Solar zenith angle at a point (spherical astronomy, e.g. Meeus, Astronomical Algorithms, ch. 13):
 *   cos χ = sin φ sin δ + cos φ cos δ cos H,   H = λ − λ_subsolar (local hour angle).
 * Angles in degrees.
 */
import * as astronomy from 'astronomy-engine';
import type { GeoPoint } from './great-circle.js';
import { normalizeLonDeg } from './great-circle.js';

const DEG = Math.PI / 180;
const geocentre = new astronomy.Observer(0, 0, 0);

/** The point on the Earth where the Sun is at the zenith at `at`. */
export function subsolarPoint(at: Date): GeoPoint {
  const equ = astronomy.Equator(astronomy.Body.Sun, at, geocentre, true, true);
  const gastHours = astronomy.SiderealTime(at);
  return { latDeg: equ.dec, lonDeg: normalizeLonDeg((equ.ra - gastHours) * 15) };
}

/** Solar zenith angle χ [deg] at a point and time (0 overhead, 90 on the horizon, > 90 at night). */
export function solarZenithAngleDeg(point: GeoPoint, at: Date): number {
  const sub = subsolarPoint(at);
  const cosChi =
    Math.sin(point.latDeg * DEG) * Math.sin(sub.latDeg * DEG) +
    Math.cos(point.latDeg * DEG) *
      Math.cos(sub.latDeg * DEG) *
      Math.cos((point.lonDeg - sub.lonDeg) * DEG);
  return Math.acos(Math.min(1, Math.max(-1, cosChi))) / DEG;
}

/**
 * The day/night terminator (χ = 90°) as a closed ring of points, one per `stepDeg` of longitude,
 * closed over the night pole, for drawing the night side on an equirectangular or Mercator map.
 */
export function nightPolygon(at: Date, stepDeg = 2): GeoPoint[] {
  const sub = subsolarPoint(at);
  // Keep tan δ away from 0 at the equinoxes (the terminator is then a meridian pair).
  const decDeg = Math.abs(sub.latDeg) < 1e-6 ? 1e-6 : sub.latDeg;
  const ring: GeoPoint[] = [];
  for (let lon = -180; lon <= 180; lon += stepDeg) {
    const hourAngle = (lon - sub.lonDeg) * DEG;
    // cos χ = 0  ⇒  tan φ = −cos H / tan δ
    const latDeg = Math.atan(-Math.cos(hourAngle) / Math.tan(decDeg * DEG)) / DEG;
    ring.push({ latDeg, lonDeg: lon });
  }
  const nightPoleLatDeg = decDeg > 0 ? -90 : 90;
  ring.push({ latDeg: nightPoleLatDeg, lonDeg: 180 }, { latDeg: nightPoleLatDeg, lonDeg: -180 });
  return ring;
}
