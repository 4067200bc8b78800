import { describe, expect, it } from 'vitest';
import {
  ELECTRON_MASS_KG,
  ELEMENTARY_CHARGE_C,
  SPEED_OF_LIGHT_MPS,
  VACUUM_PERMITTIVITY_FPM,
} from './constants.js';
import {
  electronDensityFromPlasmaFrequencyMHz,
  groupIndex,
  groupVelocityMps,
  phaseVelocityMps,
  plasmaFrequencyHz,
  plasmaFrequencyMHz,
  plasmaProperties,
  refractiveIndex,
} from './plasma.js';

const relErr = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('constants', () => {
  it('are the CODATA 2018 values (NIST, as listed in SPEC §2)', () => {
    expect(SPEED_OF_LIGHT_MPS).toBe(299792458);
    expect(ELEMENTARY_CHARGE_C).toBe(1.602176634e-19);
    expect(ELECTRON_MASS_KG).toBe(9.1093837015e-31);
    expect(VACUUM_PERMITTIVITY_FPM).toBe(8.8541878128e-12);
  });
});

describe('plasma frequency', () => {
  const densities = [1e6, 1e9, 1e10, 1e11, 3.3e11, 1e12, 2.5e12, 1e13];

  it('matches f_p ≈ 8.98·sqrt(N) Hz to the 3 significant figures of that constant (Davies 1990, Ionospheric Radio, §1)', () => {
    let worst = 0;
    for (const n of densities)
      worst = Math.max(worst, relErr(plasmaFrequencyHz(n), 8.98 * Math.sqrt(n)));
    // 8.98 is 8.9787… rounded: relative rounding error ≤ 0.005/8.98 = 5.6e-4.
    expect(worst).toBeLessThan(5.6e-4);
  });

  it('matches the exact formula f_p = (1/2π)·sqrt(N e²/(ε₀ mₑ)) with CODATA 2018 constants to 1e-8 (SPEC §2.3)', () => {
    // Constants typed in from NIST CODATA 2018, independently of constants.ts.
    const e = 1.602176634e-19;
    const eps0 = 8.8541878128e-12;
    const me = 9.1093837015e-31;
    let worst = 0;
    for (const n of densities) {
      const reference = Math.sqrt((n * e * e) / (eps0 * me)) / (2 * Math.PI);
      worst = Math.max(worst, relErr(plasmaFrequencyHz(n), reference));
    }
    console.info(
      `plasma frequency vs CODATA formula: largest relative error ${worst.toExponential(2)}`,
    );
    expect(worst).toBeLessThan(1e-8);
  });

  it('inverts exactly: N(f_p(N)) = N to 1e-12', () => {
    for (const n of densities)
      expect(relErr(electronDensityFromPlasmaFrequencyMHz(plasmaFrequencyMHz(n)), n)).toBeLessThan(
        1e-12,
      );
  });
});

describe('dispersion relation', () => {
  it('v_p·v_g = c² for the cold-plasma relation to 1e-8 (Budden 1985, The Propagation of Radio Waves, ch. 3)', () => {
    let worst = 0;
    for (let x = 0; x < 1; x += 0.001) {
      worst = Math.max(
        worst,
        relErr(phaseVelocityMps(x) * groupVelocityMps(x), SPEED_OF_LIGHT_MPS ** 2),
      );
    }
    console.info(`v_p·v_g vs c²: largest relative error ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-8);
  });

  it('μ = sqrt(1 − X) and μ′ = 1/μ (SPEC §2; Budden 1985)', () => {
    expect(refractiveIndex(0)).toBe(1);
    expect(refractiveIndex(0.75)).toBeCloseTo(0.5, 15);
    expect(groupIndex(0.75)).toBeCloseTo(2, 14);
    expect(refractiveIndex(1)).toBe(0);
    expect(Number.isNaN(refractiveIndex(1.5))).toBe(true);
  });
});

describe('plasmaProperties (plasma route)', () => {
  it('gives the indices and velocities above the plasma frequency', () => {
    const r = plasmaProperties({ plasmaFrequencyMHz: 6 }, 10);
    expect(r.propagates).toBe(true);
    expect(relErr(r.refractiveIndex as number, 0.8)).toBeLessThan(1e-14); // sqrt(1 − 0.36)
    expect(relErr(r.groupIndex as number, 1.25)).toBeLessThan(1e-14);
    expect(
      relErr(
        (r.phaseVelocityMps as number) * (r.groupVelocityMps as number),
        SPEED_OF_LIGHT_MPS ** 2,
      ),
    ).toBeLessThan(1e-12);
    expect(relErr(plasmaFrequencyMHz(r.electronDensityPerM3), 6)).toBeLessThan(1e-12);
  });

  it('gives nulls at and below the plasma frequency', () => {
    for (const f of [6, 5.9, 0.1]) {
      const r = plasmaProperties({ plasmaFrequencyMHz: 6 }, f);
      expect(r).toMatchObject({
        propagates: false,
        refractiveIndex: null,
        groupIndex: null,
        phaseVelocityMps: null,
        groupVelocityMps: null,
      });
    }
  });

  it('accepts a density instead of a plasma frequency', () => {
    const r = plasmaProperties({ electronDensityPerM3: 1e12 }, 30);
    expect(relErr(r.plasmaFrequencyMHz, plasmaFrequencyMHz(1e12))).toBeLessThan(1e-15);
    expect(r.propagates).toBe(true);
  });
});
