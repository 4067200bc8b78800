import { describe, expect, it } from 'vitest';
import { QUIET_DAY } from '../../test/reference-profiles.js';
import { computeOblique } from './homing.js';
import { buildProfile } from './profile.js';

// The layers of profiles/quiet-day.json (invented demo data), as in test/reference-profiles.ts.
const quietDay = buildProfile({
  layers: QUIET_DAY.map((l, i) => ({ name: ['E', 'F1', 'F2'][i], ...l })),
});
const base = {
  frequencyMHz: 10,
  groundRangeKm: 1500,
  maxHops: 4,
  minElevationDeg: 3,
  earth: 'spherical' as const,
  mufs: false,
  includeRayPath: true,
};

// Geometry checks only (common practice for plotting data): the path starts and ends on the
// ground at 0 and G, is monotonic in range and peaks at the mode's apex height.
describe('ray path for the diagram', () => {
  it('~41 points per hop from (0, 0) to (G, 0), apex at the mode apex height', () => {
    const r = computeOblique(quietDay, { ...base, includeRayPath: true });
    for (const m of r.modes) {
      const path = m.rayPath!;
      expect(path.length).toBe(40 * m.hops + 1);
      expect(path[0].groundRangeKm).toBeCloseTo(0, 9);
      expect(path[0].heightKm).toBeCloseTo(0, 9);
      expect(path[path.length - 1].groundRangeKm).toBeCloseTo(base.groundRangeKm, 4);
      expect(path[path.length - 1].heightKm).toBeCloseTo(0, 6);
      expect(Math.max(...path.map((p) => p.heightKm))).toBeCloseTo(m.apexHeightKm, 6);
      for (let i = 1; i < path.length; i++) {
        expect(path[i].groundRangeKm).toBeGreaterThanOrEqual(path[i - 1].groundRangeKm - 1e-9);
      }
    }
  });
});
