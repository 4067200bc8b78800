import { describe, expect, it } from 'vitest';
import { QUIET_DAY, referenceFp2, referenceKinks } from '../../test/reference-profiles.js';
import { traceReferenceRay } from '../../test/reference-ray.js';
import { SPEED_OF_LIGHT_KM_PER_MS } from './constants.js';
import { InputError } from './errors.js';
import { computeOblique, type ObliqueParams } from './homing.js';
import { buildProfile } from './profile.js';

// The layers of profiles/quiet-day.json (invented demo data), as in test/reference-profiles.ts.
const quietDay = buildProfile({
  layers: QUIET_DAY.map((l, i) => ({ name: ['E', 'F1', 'F2'][i], ...l })),
});
const base: ObliqueParams = {
  frequencyMHz: 10,
  groundRangeKm: 1500,
  maxHops: 4,
  minElevationDeg: 3,
  earth: 'spherical',
  mufs: false,
  includeRayPath: false,
};
const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('computeOblique: response shape (SPEC §3)', () => {
  it('labels, ordering, delays, phase advance and multipath spread', () => {
    const r = computeOblique(quietDay, base);
    expect(r.modes.length).toBeGreaterThan(2);
    expect(r.mufMHz).toBeUndefined();
    for (const m of r.modes) {
      expect(m.label).toBe(`${m.hops}${m.layer}`);
      expect(['E', 'F1', 'F2']).toContain(m.layer);
      expect(m.elevationDeg).toBeGreaterThanOrEqual(3);
      expect(m.groupDelayMs).toBeCloseTo(m.groupPathKm / SPEED_OF_LIGHT_KM_PER_MS, 12);
      // Phase advance = P′ − P ≥ 0 (SPEC §2); cycles = (P′ − P)·f/c.
      expect(m.phaseAdvanceKm).toBeGreaterThan(0);
      expect(m.phaseAdvanceKm).toBeCloseTo(m.groupPathKm - m.phasePathKm, 9);
      expect(m.phaseAdvanceCycles).toBeCloseTo((m.phaseAdvanceKm * 1e3 * 10e6) / 299_792_458, 6);
      // A path of n equal hops is longer than the ground range.
      expect(m.groupPathKm).toBeGreaterThan(base.groundRangeKm);
    }
    // Ordered by hops, then reflecting-layer height, then low before high.
    const layerHeight: Record<string, number> = { E: 110, F1: 195, F2: 310 };
    for (let i = 1; i < r.modes.length; i++) {
      const p = r.modes[i - 1];
      const q = r.modes[i];
      const key = (m: typeof p) => [m.hops, layerHeight[m.layer], m.ray === 'low' ? 0 : 1];
      const [a, b] = [key(p), key(q)];
      expect(
        a[0] < b[0] || (a[0] === b[0] && (a[1] < b[1] || (a[1] === b[1] && a[2] <= b[2]))),
      ).toBe(true);
    }
    const delays = r.modes.map((m) => m.groupDelayMs);
    expect(r.multipathSpreadMs).toBeCloseTo(Math.max(...delays) - Math.min(...delays), 12);
  });

  it('a low and a high ray of one layer: the high ray has the higher elevation and apex', () => {
    const r = computeOblique(quietDay, { ...base, groundRangeKm: 1500, frequencyMHz: 10 });
    const f2 = r.modes.filter((m) => m.hops === 3 && m.layer === 'F2');
    expect(f2.map((m) => m.ray)).toEqual(['low', 'high']);
    expect(f2[1].elevationDeg).toBeGreaterThan(f2[0].elevationDeg);
    expect(f2[1].apexHeightKm).toBeGreaterThan(f2[0].apexHeightKm);
  });

  it('above every MUF: no modes, spread null, MUFs still given', () => {
    const r = computeOblique(quietDay, { ...base, frequencyMHz: 45, mufs: true });
    expect(r.modes).toEqual([]);
    expect(r.multipathSpreadMs).toBeNull();
    expect(Object.keys(r.mufMHz!)).toEqual(['1', '2', '3', '4']);
  });

  it('a range beyond one hop has multi-hop modes only', () => {
    const r = computeOblique(quietDay, { ...base, groundRangeKm: 6000, frequencyMHz: 14 });
    expect(r.modes.length).toBeGreaterThan(0);
    expect(r.modes.every((m) => m.hops >= 2)).toBe(true);
  });

  it('grazing rays: minElevationDeg 0 adds low-elevation modes', () => {
    const r0 = computeOblique(quietDay, {
      ...base,
      groundRangeKm: 3500,
      frequencyMHz: 7,
      minElevationDeg: 0,
    });
    const r3 = computeOblique(quietDay, {
      ...base,
      groundRangeKm: 3500,
      frequencyMHz: 7,
      minElevationDeg: 3,
    });
    expect(r0.modes.length).toBeGreaterThanOrEqual(r3.modes.length);
    expect(Math.min(...r0.modes.map((m) => m.elevationDeg))).toBeLessThan(3);
  });

  it('flat Earth works and gives shorter paths than the spherical Earth (no curvature)', () => {
    const flat = computeOblique(quietDay, { ...base, earth: 'flat', groundRangeKm: 800 });
    const sph = computeOblique(quietDay, { ...base, groundRangeKm: 800 });
    expect(flat.modes.length).toBeGreaterThan(0);
    const f = flat.modes.find((m) => m.label === '1F2' && m.ray === 'low')!;
    const s = sph.modes.find((m) => m.label === '1F2' && m.ray === 'low')!;
    expect(f.elevationDeg).toBeGreaterThan(s.elevationDeg - 10);
    // Breit–Tuve on a flat Earth (Davies 1990): P′ = D/cos β₀.
    for (const m of flat.modes) {
      expect(rel(m.groupPathKm, 800 / Math.cos((m.elevationDeg * Math.PI) / 180))).toBeLessThan(
        1e-7,
      );
    }
  });

  it('bad parameters → InputError naming the field', () => {
    expect(() => computeOblique(quietDay, { ...base, maxHops: 7 })).toThrow(InputError);
    try {
      computeOblique(quietDay, { ...base, groundRangeKm: -1, frequencyMHz: Number.NaN });
    } catch (e) {
      expect((e as InputError).fields).toHaveProperty('groundRangeKm');
      expect((e as InputError).fields).toHaveProperty('frequencyMHz');
    }
  });
});

describe('modes against the independent Runge–Kutta ray tracer', () => {
  it('range, group path and phase path ≤ 1e-5 relative; elevation ≤ 0.01° (SPEC §2.3)', () => {
    const fp2 = referenceFp2(QUIET_DAY);
    const kinksKm = referenceKinks(QUIET_DAY);
    let worstPath = 0;
    let worstElevationDeg = 0;
    let count = 0;
    for (const [f, G] of [
      [10, 1500],
      [14, 3000],
      [7, 800],
    ]) {
      const r = computeOblique(quietDay, { ...base, frequencyMHz: f, groundRangeKm: G });
      for (const m of r.modes) {
        const ref = traceReferenceRay(fp2, f, m.elevationDeg, { earth: 'spherical', kinksKm })!;
        const n = m.hops;
        const e = Math.max(
          rel(n * ref.groundRangeKm, G),
          rel(n * ref.groupPathKm, m.groupPathKm),
          rel(n * ref.phasePathKm, m.phasePathKm),
        );
        worstPath = Math.max(worstPath, e);
        expect(e).toBeLessThan(1e-5);
        // Elevation error implied by the reference range error: δβ ≈ δD / |dD/dβ|.
        const h = 1e-4;
        const up = traceReferenceRay(fp2, f, m.elevationDeg + h, { earth: 'spherical', kinksKm })!;
        const slope = (up.groundRangeKm - ref.groundRangeKm) / h; // km per degree
        const dBeta = Math.abs((ref.groundRangeKm - G / n) / slope);
        worstElevationDeg = Math.max(worstElevationDeg, dBeta);
        expect(dBeta).toBeLessThan(0.01);
        count++;
      }
    }
    expect(count).toBeGreaterThan(10);
    console.log(
      `${count} modes: largest path error ${worstPath.toExponential(2)}, elevation ${worstElevationDeg.toExponential(2)}°`,
    );
  });
});
