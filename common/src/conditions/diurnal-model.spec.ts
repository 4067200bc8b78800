import { describe, expect, it } from 'vitest';
import { subsolarPoint } from '../geo/solar.js';
import { buildProfile } from '../physics/profile.js';
import {
  daytimeFoEMHz,
  diurnalModel,
  E_PEAK_HEIGHT_KM,
  E_SEMI_THICKNESS_KM,
  modelFoEMHz,
  NIGHT_FOE_MHZ,
} from './diurnal-model.js';

describe('diurnal model: foE = 0.9·[(180 + 1.44·R12)·cos χ]^0.25 MHz (SPEC §4, CCIR/ITU-R E-layer model)', () => {
  it('χ = 0, R12 = 0: 0.9·180^0.25 = 3.29656 MHz (hand-computed: 180^0.25 = √13.41641 = 3.66284)', () => {
    expect(daytimeFoEMHz(0, 0)).toBeCloseTo(3.29656, 4);
  });

  it('χ = 0, R12 = 100: 0.9·324^0.25 = 0.9·√18 = 3.81838 MHz (hand-computed)', () => {
    expect(daytimeFoEMHz(0, 100)).toBeCloseTo(3.81838, 4);
  });

  it('χ = 60°: cos χ = ½ scales foE by 0.5^0.25 = 0.840896 (hand-computed)', () => {
    expect(daytimeFoEMHz(60, 0)).toBeCloseTo(3.29656 * 0.840896, 4);
    expect(daytimeFoEMHz(60, 100) / daytimeFoEMHz(0, 100)).toBeCloseTo(0.840896, 6);
  });

  it('at night (χ ≥ 90°) the formula gives 0 and the model keeps its illustrative floor', () => {
    expect(daytimeFoEMHz(95, 50)).toBe(0);
    expect(modelFoEMHz(95, 50)).toBe(NIGHT_FOE_MHZ);
  });
});

describe('diurnal model at a point', () => {
  it('at local noon on an equinox χ ≈ |latitude| (spherical astronomy: δ = 0, H = 0; from memory, within 0.5°)', () => {
    // March 2025 equinox, 2025-03-20 09:01 UTC (almanac value, from memory; solar.spec.ts checks δ ≈ 0).
    const at = new Date('2025-03-20T09:01:00Z');
    const noonLonDeg = subsolarPoint(at).lonDeg;
    for (const latDeg of [47.2, -33.9, 0]) {
      const m = diurnalModel({ latDeg, lonDeg: noonLonDeg }, at, { r12: 80 });
      expect(Math.abs(m.solarZenithDeg - Math.abs(latDeg))).toBeLessThan(0.5);
      expect(m.foEMHz).toBeCloseTo(daytimeFoEMHz(m.solarZenithDeg, 80), 10);
    }
  });

  it('builds a valid layered profile: E parabolic at 110 km / 20 km (ITU-R P.533), F1 by day only, F2 marked approximate', () => {
    const point = { latDeg: 47.2, lonDeg: 8.6 };
    const day = diurnalModel(point, new Date('2026-06-21T11:30:00Z'));
    const night = diurnalModel(point, new Date('2026-06-21T23:30:00Z'));
    expect(day.approximate).toBe(true);
    const e = day.profile.layers.find((l) => l.name === 'E');
    expect(e).toMatchObject({
      shape: 'parabolic',
      peakHeightKm: E_PEAK_HEIGHT_KM,
      semiThicknessKm: E_SEMI_THICKNESS_KM,
    });
    expect(day.profile.layers.map((l) => l.name)).toEqual(['E', 'F1', 'F2']);
    expect(night.profile.layers.map((l) => l.name)).toEqual(['E', 'F2']);
    expect(day.foF2MHz).toBeGreaterThan(night.foF2MHz);
    expect(night.hmF2Km).toBeGreaterThan(day.hmF2Km);
    for (const m of [day, night]) {
      const built = buildProfile(m.profile);
      expect(built.maxPlasmaFrequencyMHz).toBeGreaterThanOrEqual(m.foF2MHz);
    }
  });

  it('rejects an out-of-range sunspot number', () => {
    expect(() => diurnalModel({ latDeg: 0, lonDeg: 0 }, new Date(), { r12: -1 })).toThrow(/r12/);
  });
});
