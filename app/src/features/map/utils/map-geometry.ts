/**
 * Plane-map helpers for lines and rings given in degrees. Leaflet draws straight segments between
 * consecutive points in the projected plane, so a step from lon 179° to −179° would cross the whole
 * map: lines are split there, and rings that the world-atlas data cuts at the antimeridian are
 * regrouped per side (STACK gotcha 11).
 */
import type { GeoPoint } from '@hopwise/common';

/** [lat, lon] as Leaflet takes it. */
export type LatLonPair = [number, number];
/** [lon, lat] as GeoJSON stores it. */
export type LonLatPair = [number, number];

/** A step longer than half the world in longitude is taken as a crossing of the antimeridian. */
const isJump = (fromLonDeg: number, toLonDeg: number) => Math.abs(toLonDeg - fromLonDeg) > 180;

/**
 * Splits a line (e.g. a great-circle arc with longitudes in [−180, 180)) into pieces that do not
 * cross the antimeridian, adding the crossing point (linear in lat/lon between the two points,
 * enough for the ≤ 2° steps drawn here) at ±180° on both sides so the pieces meet the map edge.
 */
export function splitAtAntimeridian(points: readonly GeoPoint[]): LatLonPair[][] {
  const pieces: LatLonPair[][] = [];
  let current: LatLonPair[] = [];
  points.forEach((point, i) => {
    if (i > 0) {
      const previous = points[i - 1];
      if (isJump(previous.lonDeg, point.lonDeg)) {
        // Unwrap the step, find where it meets ±180°.
        const eastward = point.lonDeg < previous.lonDeg; // e.g. 179 → −179 goes east
        const edgeDeg = eastward ? 180 : -180;
        const toLonDeg = point.lonDeg + (eastward ? 360 : -360);
        const t = (edgeDeg - previous.lonDeg) / (toLonDeg - previous.lonDeg);
        const latDeg = previous.latDeg + t * (point.latDeg - previous.latDeg);
        current.push([latDeg, edgeDeg]);
        pieces.push(current);
        current = [[latDeg, -edgeDeg]];
      }
    }
    current.push([point.latDeg, point.lonDeg]);
  });
  if (current.length > 0) pieces.push(current);
  return pieces.filter((piece) => piece.length >= 2);
}

/**
 * Rings of the world-atlas land polygons that run along the antimeridian (Eurasia's Chukotka end,
 * Fiji, Wrangel Island, Antarctica) step from +180° to −180°. Each such ring is cut at its jumps;
 * the pieces on the same side are joined in order, which closes them along the ±180° meridian.
 * A ring with an odd number of jumps goes round a pole (Antarctica): its one piece is closed over
 * that pole.
 */
export function splitRingAtAntimeridian(ring: readonly LonLatPair[]): LonLatPair[][] {
  const cuts: number[] = [];
  for (let i = 1; i < ring.length; i += 1) {
    if (isJump(ring[i - 1][0], ring[i][0])) cuts.push(i);
  }
  if (cuts.length === 0) return [[...ring]];

  if (cuts.length % 2 === 1) {
    // Start right after the (single) jump so the sequence runs edge to edge without crossing.
    const start = cuts[0];
    const open = [...ring.slice(start), ...ring.slice(1, start)];
    const meanLatDeg = open.reduce((sum, [, lat]) => sum + lat, 0) / open.length;
    const poleDeg = meanLatDeg < 0 ? -90 : 90;
    const last = open[open.length - 1];
    const first = open[0];
    return [[...open, [last[0], poleDeg], [first[0], poleDeg], first]];
  }

  // Pieces between jumps (the ring is closed, so the last piece continues into the first).
  const pieces: LonLatPair[][] = [];
  let from = 0;
  for (const cut of cuts) {
    pieces.push(ring.slice(from, cut) as LonLatPair[]);
    from = cut;
  }
  pieces[0] = [...(ring.slice(from, ring.length - 1) as LonLatPair[]), ...pieces[0]];
  const side = (piece: LonLatPair[]) =>
    piece.reduce((sum, [lon]) => sum + lon, 0) / piece.length >= 0 ? 'east' : 'west';
  const east = pieces.filter((piece) => side(piece) === 'east').flat();
  const west = pieces.filter((piece) => side(piece) === 'west').flat();
  return [east, west].filter((part) => part.length >= 3).map((part) => [...part, part[0]]);
}

/** A graticule: meridians and parallels every `stepDeg`, as Leaflet polylines. */
export function graticuleLines(stepDeg = 15, maxLatDeg = 85): LatLonPair[][] {
  const lines: LatLonPair[][] = [];
  for (let lonDeg = -180; lonDeg <= 180; lonDeg += stepDeg) {
    lines.push([
      [-maxLatDeg, lonDeg],
      [0, lonDeg],
      [maxLatDeg, lonDeg],
    ]);
  }
  for (let latDeg = -90 + stepDeg; latDeg < 90; latDeg += stepDeg) {
    if (Math.abs(latDeg) > maxLatDeg) continue;
    const line: LatLonPair[] = [];
    for (let lonDeg = -180; lonDeg <= 180; lonDeg += stepDeg) line.push([latDeg, lonDeg]);
    lines.push(line);
  }
  return lines;
}
