import { describe, expect, it } from 'vitest';
import { nightPolygon, solarZenithAngleDeg, subsolarPoint } from './solar.js';

describe('solar position (astronomy-engine)', () => {
  it('declination at the June 2024 solstice (2024-06-20 20:51 UTC) is +23.44° (USNO / almanac value, from memory)', () => {
    const p = subsolarPoint(new Date('2024-06-20T20:51:00Z'));
    expect(p.latDeg).toBeCloseTo(23.44, 1);
  });

  it('declination at the March 2025 equinox (2025-03-20 09:01 UTC) is 0° (almanac value, from memory)', () => {
    const p = subsolarPoint(new Date('2025-03-20T09:01:00Z'));
    expect(Math.abs(p.latDeg)).toBeLessThan(0.02);
  });

  it('subsolar longitude follows the equation of time: about +16.4 min in early November (almanac; from memory)', () => {
    // With the equation of time E > 0 the Sun crosses Greenwich E minutes before 12:00 UTC, so at
    // 12:00 UTC the subsolar point lies E·(15°/h) west of Greenwich.
    const p = subsolarPoint(new Date('2026-11-03T12:00:00Z'));
    expect(p.lonDeg).toBeCloseTo(-(16.4 / 60) * 15, 0);
  });

  it('the Sun is overhead at the subsolar point and 90° away on the terminator', () => {
    const at = new Date('2026-12-02T10:00:00Z');
    const sub = subsolarPoint(at);
    expect(solarZenithAngleDeg(sub, at)).toBeLessThan(1e-6);
    const ring = nightPolygon(at, 10);
    for (const p of ring.slice(0, -2)) expect(solarZenithAngleDeg(p, at)).toBeCloseTo(90, 6);
  });
});
