/**
 * Cold, collisionless, unmagnetised plasma (SPEC §2).
 *
 *   f_p = (1/2π)·sqrt(N e² / (ε₀ mₑ))          plasma frequency ≈ 8.98·sqrt(N) Hz (Davies 1990, §1)
 *   X   = f_p² / f²
 *   μ   = sqrt(1 − X)                           refractive (phase) index (Budden 1985, ch. 3)
 *   μ'  = ∂(fμ)/∂f = 1/μ                        group index
 *   v_p = c/μ,  v_g = c·μ,  v_p·v_g = c²
 */
import {
  ELECTRON_MASS_KG,
  ELEMENTARY_CHARGE_C,
  HZ_PER_MHZ,
  SPEED_OF_LIGHT_MPS,
  VACUUM_PERMITTIVITY_FPM,
} from './constants.js';

/** f_p² / N  [Hz² · m³] = e² / (4π² ε₀ mₑ). */
export const PLASMA_FREQUENCY_SQUARED_PER_DENSITY =
  (ELEMENTARY_CHARGE_C * ELEMENTARY_CHARGE_C) /
  (4 * Math.PI * Math.PI * VACUUM_PERMITTIVITY_FPM * ELECTRON_MASS_KG);

export function plasmaFrequencyHz(electronDensityPerM3: number): number {
  return Math.sqrt(PLASMA_FREQUENCY_SQUARED_PER_DENSITY * Math.max(0, electronDensityPerM3));
}

export function plasmaFrequencyMHz(electronDensityPerM3: number): number {
  return plasmaFrequencyHz(electronDensityPerM3) / HZ_PER_MHZ;
}

export function electronDensityFromPlasmaFrequencyHz(plasmaFrequencyHz: number): number {
  return (plasmaFrequencyHz * plasmaFrequencyHz) / PLASMA_FREQUENCY_SQUARED_PER_DENSITY;
}

export function electronDensityFromPlasmaFrequencyMHz(plasmaFrequencyMHz: number): number {
  return electronDensityFromPlasmaFrequencyHz(plasmaFrequencyMHz * HZ_PER_MHZ);
}

/** X = f_p²/f² = N / N_f, where N_f is the density whose plasma frequency is f. */
export function plasmaX(electronDensityPerM3: number, frequencyMHz: number): number {
  return electronDensityPerM3 / electronDensityFromPlasmaFrequencyMHz(frequencyMHz);
}

/** μ = sqrt(1 − X); NaN when X > 1 (evanescent). */
export function refractiveIndex(x: number): number {
  return x <= 1 ? Math.sqrt(1 - x) : Number.NaN;
}

/** μ' = 1/μ; Infinity at X = 1, NaN when X > 1. */
export function groupIndex(x: number): number {
  return x <= 1 ? 1 / Math.sqrt(1 - x) : Number.NaN;
}

export function phaseVelocityMps(x: number): number {
  return SPEED_OF_LIGHT_MPS / refractiveIndex(x);
}

export function groupVelocityMps(x: number): number {
  return SPEED_OF_LIGHT_MPS * refractiveIndex(x);
}

export interface PlasmaResult {
  plasmaFrequencyMHz: number;
  electronDensityPerM3: number;
  propagates: boolean;
  refractiveIndex: number | null;
  groupIndex: number | null;
  phaseVelocityMps: number | null;
  groupVelocityMps: number | null;
}

/**
 * The plasma route (SPEC §3): the wave propagates only where f > f_p; at or below f_p the
 * indices and velocities are null.
 */
export function plasmaProperties(
  input: { electronDensityPerM3: number } | { plasmaFrequencyMHz: number },
  frequencyMHz: number,
): PlasmaResult {
  const electronDensityPerM3 =
    'electronDensityPerM3' in input
      ? input.electronDensityPerM3
      : electronDensityFromPlasmaFrequencyMHz(input.plasmaFrequencyMHz);
  const fpMHz =
    'plasmaFrequencyMHz' in input
      ? input.plasmaFrequencyMHz
      : plasmaFrequencyMHz(electronDensityPerM3);
  const fpHz = fpMHz * HZ_PER_MHZ;
  const fHz = frequencyMHz * HZ_PER_MHZ;
  const propagates = frequencyMHz > fpMHz;
  if (!propagates) {
    return {
      plasmaFrequencyMHz: fpMHz,
      electronDensityPerM3,
      propagates,
      refractiveIndex: null,
      groupIndex: null,
      phaseVelocityMps: null,
      groupVelocityMps: null,
    };
  }
  // 1 − X = (f − f_p)(f + f_p)/f²: factored to avoid cancellation when f is close to f_p.
  const mu = Math.sqrt(((fHz - fpHz) * (fHz + fpHz)) / (fHz * fHz));
  return {
    plasmaFrequencyMHz: fpMHz,
    electronDensityPerM3,
    propagates,
    refractiveIndex: mu,
    groupIndex: 1 / mu,
    phaseVelocityMps: SPEED_OF_LIGHT_MPS / mu,
    groupVelocityMps: SPEED_OF_LIGHT_MPS * mu,
  };
}
