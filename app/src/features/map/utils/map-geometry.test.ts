import { greatCirclePoints } from '@hopwise/common';
import { describe, expect, it } from 'vitest';
import { graticuleLines, splitAtAntimeridian, splitRingAtAntimeridian } from './map-geometry';

const maxStepDeg = (piece: [number, number][]) =>
  Math.max(...piece.slice(1).map(([, lon], i) => Math.abs(lon - piece[i][1])));

describe('splitAtAntimeridian', () => {
  it('leaves a line that does not cross the antimeridian in one piece', () => {
    const arc = greatCirclePoints({ latDeg: 47.2, lonDeg: 8.6 }, { latDeg: 52, lonDeg: -1 }, 16);
    const pieces = splitAtAntimeridian(arc);
    expect(pieces).toHaveLength(1);
    expect(pieces[0]).toHaveLength(17);
  });

  it('splits a trans-Pacific arc into two pieces that end on ±180°', () => {
    // Tokyo to San Francisco crosses 180° once (geometry: any great circle between them does).
    const arc = greatCirclePoints(
      { latDeg: 35.7, lonDeg: 139.7 },
      { latDeg: 37.8, lonDeg: -122.4 },
      64,
    );
    const pieces = splitAtAntimeridian(arc);
    expect(pieces).toHaveLength(2);
    expect(pieces[0][pieces[0].length - 1][1]).toBe(180);
    expect(pieces[1][0][1]).toBe(-180);
    // The crossing latitude is shared by both pieces, so the arc looks continuous.
    expect(pieces[1][0][0]).toBeCloseTo(pieces[0][pieces[0].length - 1][0], 10);
    for (const piece of pieces) expect(maxStepDeg(piece)).toBeLessThan(180);
  });
});

describe('splitRingAtAntimeridian', () => {
  it('keeps an ordinary ring as it is', () => {
    const ring: [number, number][] = [
      [0, 0],
      [10, 0],
      [10, 10],
      [0, 0],
    ];
    expect(splitRingAtAntimeridian(ring)).toEqual([ring]);
  });

  it('regroups a ring cut at ±180° into one closed ring per side', () => {
    // A box from 170° E to 170° W, stored as the world-atlas data does: along +180, jump, −180 side.
    const ring: [number, number][] = [
      [170, 60],
      [180, 60],
      [-180, 60],
      [-170, 60],
      [-170, 70],
      [-180, 70],
      [180, 70],
      [170, 70],
      [170, 60],
    ];
    const parts = splitRingAtAntimeridian(ring);
    expect(parts).toHaveLength(2);
    for (const part of parts) {
      expect(part[0]).toEqual(part[part.length - 1]);
      const lons = part.map(([lon]) => lon);
      expect(Math.max(...lons) - Math.min(...lons)).toBeLessThanOrEqual(10);
    }
  });

  it('closes a ring around the south pole over the pole', () => {
    const ring: [number, number][] = [
      [-180, -70],
      [-90, -72],
      [0, -69],
      [90, -71],
      [180, -70],
      [-180, -70],
    ];
    const [part] = splitRingAtAntimeridian(ring);
    expect(part.some(([, lat]) => lat === -90)).toBe(true);
    // The only long step runs along the pole itself (the map's bottom edge), never across land.
    const longSteps = part.slice(1).filter(([lon], i) => Math.abs(lon - part[i][0]) > 180);
    expect(longSteps.every(([, lat]) => lat === -90)).toBe(true);
  });
});

describe('graticuleLines', () => {
  it('gives 25 meridians and 11 parallels at 15°', () => {
    const lines = graticuleLines(15);
    // Meridians −180…180 (25), parallels −75…75 (11).
    expect(lines).toHaveLength(36);
  });
});
