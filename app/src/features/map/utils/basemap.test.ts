import { describe, expect, it } from 'vitest';
import { loadBasemap } from './basemap';

describe('loadBasemap', () => {
  const { land, borders } = loadBasemap();

  it('has land polygons and border lines from the bundled Natural Earth data', () => {
    // world-atlas 2.0.2 countries-110m: 124 land rings before splitting at the antimeridian.
    expect(land.geometry.coordinates.length).toBeGreaterThan(124);
    expect(borders.geometry.coordinates.length).toBeGreaterThan(100);
  });

  it('has no step across the antimeridian except along a pole (STACK gotcha 11)', () => {
    for (const polygon of land.geometry.coordinates) {
      for (const ring of polygon) {
        for (let i = 1; i < ring.length; i += 1) {
          if (Math.abs(ring[i][0] - ring[i - 1][0]) > 180) {
            expect(Math.abs(ring[i][1])).toBe(90);
          }
        }
      }
    }
    for (const line of borders.geometry.coordinates) {
      for (let i = 1; i < line.length; i += 1) {
        expect(Math.abs(line[i][0] - line[i - 1][0])).toBeLessThanOrEqual(180);
      }
    }
  });
});
