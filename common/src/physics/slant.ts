/**
 * Straight-line (unrefracted) trans-ionospheric path from a ground station (SPEC §3 "slant").
 *
 * Geometry on a sphere of radius R₀, elevation β from the horizontal, slant range s:
 *   r(s)² = R₀² + s² + 2R₀·s·sin β,   h(s) = r − R₀ = (s² + 2R₀ s sin β)/(r + R₀)  (cancellation-free)
 *   s_top = T(2R₀ + T)/(sqrt(R₀² sin²β + T(2R₀ + T)) + R₀ sin β)  for the top height T.
 * Integrals along s (bending neglected; Budden 1985; ITU-R P.531):
 *   TEC_slant = ∫ N ds,  TEC_vertical = ∫₀^T N dh            [electrons/m²; 1 TECU = 1e16]
 *   excess group delay = ∫ (μ' − 1) ds / c,  with μ' − 1 = X/(μ(1 + μ))
 *   phase advance      = ∫ (1 − μ) ds / c,   with 1 − μ  = X/(1 + μ)
 *   first-order value  = 40.3·TEC/(c f²)  (ITU-R P.531; IS-GPS-200: 1 TECU at L1 ≈ 0.162 m)
 * (the X/(…) forms avoid the cancellation of 1 − μ at GNSS frequencies, where X ~ 1e-7).
 * The integrand is smooth in s between the images of the profile's breakpoints, also at β = 0.
 */
import {
  ELECTRONS_PER_M2_PER_TECU,
  FIRST_ORDER_DELAY_COEFFICIENT,
  HZ_PER_MHZ,
  M_PER_KM,
  NS_PER_S,
  RAD_PER_DEG,
  SPEED_OF_LIGHT_MPS,
} from './constants.js';
import { InputError, NoSolutionError } from './errors.js';
import { electronDensityFromPlasmaFrequencyMHz, plasmaFrequencyMHz } from './plasma.js';
import type { Profile } from './profile.js';
import { integrate } from './quadrature.js';

export interface SlantParams {
  frequencyMHz: number;
  elevationDeg: number;
  /** Default 2000 km. */
  topHeightKm?: number;
}

export interface SlantResult {
  slantTecu: number;
  verticalTecu: number;
  groupDelayExcessNs: number;
  phaseAdvanceNs: number;
  firstOrderDelayNs: number;
  groupDelayExcessM: number;
  phaseAdvanceM: number;
}

export const DEFAULT_SLANT_TOP_HEIGHT_KM = 2000;
const REL_TOLERANCE = 1e-11;

/** Slant range [km] from the ground to height h at elevation β (radians) on a sphere of radius R₀. */
export function slantRangeKm(
  heightKm: number,
  elevationRad: number,
  earthRadiusKm: number,
): number {
  const b = earthRadiusKm * Math.sin(elevationRad);
  const c = heightKm * (2 * earthRadiusKm + heightKm);
  return c / (Math.sqrt(b * b + c) + b);
}

/** Height [km] at slant range s along the line of elevation β. */
export function heightAlongSlantKm(
  slantKm: number,
  elevationRad: number,
  earthRadiusKm: number,
): number {
  const a = slantKm * slantKm + 2 * earthRadiusKm * slantKm * Math.sin(elevationRad);
  return a / (Math.sqrt(earthRadiusKm * earthRadiusKm + a) + earthRadiusKm);
}

/** Highest plasma frequency [MHz] between the ground and topHeightKm (N is monotonic between breaks). */
export function maxPlasmaFrequencyBelowMHz(profile: Profile, topHeightKm: number): number {
  let maxN = profile.electronDensityPerM3(Math.min(topHeightKm, profile.topKm));
  for (const h of profile.monotonicBreaksKm) {
    if (h > topHeightKm) break;
    maxN = Math.max(maxN, profile.electronDensityPerM3(h));
  }
  for (const peak of profile.peaks) {
    if (peak.heightKm <= topHeightKm) maxN = Math.max(maxN, peak.electronDensityPerM3);
  }
  return plasmaFrequencyMHz(maxN);
}

export function slantPath(profile: Profile, params: SlantParams): SlantResult {
  const { frequencyMHz, elevationDeg } = params;
  const topHeightKm = params.topHeightKm ?? DEFAULT_SLANT_TOP_HEIGHT_KM;
  if (!(Number.isFinite(elevationDeg) && elevationDeg >= 0 && elevationDeg <= 90)) {
    throw new InputError('elevationDeg must be between 0 and 90', {
      elevationDeg: 'must be between 0 and 90',
    });
  }
  if (!(Number.isFinite(topHeightKm) && topHeightKm > 0)) {
    throw new InputError('topHeightKm must be positive', { topHeightKm: 'must be positive' });
  }
  if (!(Number.isFinite(frequencyMHz) && frequencyMHz > 0)) {
    throw new InputError('frequencyMHz must be positive', { frequencyMHz: 'must be positive' });
  }
  const fpMaxMHz = maxPlasmaFrequencyBelowMHz(profile, topHeightKm);
  if (frequencyMHz <= fpMaxMHz) {
    throw new NoSolutionError(
      `frequencyMHz ${frequencyMHz} is at or below the highest plasma frequency on the path (${fpMaxMHz.toFixed(4)} MHz): the wave does not get through`,
      'belowPlasmaFrequency',
    );
  }
  const R0 = profile.earthRadiusKm;
  const beta = elevationDeg * RAD_PER_DEG;
  const nf = electronDensityFromPlasmaFrequencyMHz(frequencyMHz);

  // Height segments with smooth N, mapped to slant range.
  const topKm = Math.min(topHeightKm, profile.topKm);
  const heights = [profile.bottomKm, ...profile.monotonicBreaksKm, topKm].filter(
    (h) => h >= profile.bottomKm && h <= topKm,
  );
  const edges = [...new Set(heights)].sort((a, b) => a - b);

  let tec = 0; // ∫ N ds  [km·m⁻³]
  let groupExcess = 0; // ∫ (μ' − 1) ds [km]
  let phaseAdvance = 0; // ∫ (1 − μ) ds [km]
  let verticalTec = 0; // ∫ N dh [km·m⁻³]
  const nAt = (s: number) => profile.electronDensityPerM3(heightAlongSlantKm(s, beta, R0));
  for (let i = 0; i + 1 < edges.length; i++) {
    const s0 = slantRangeKm(edges[i], beta, R0);
    const s1 = slantRangeKm(edges[i + 1], beta, R0);
    tec += integrate(nAt, s0, s1, { relTolerance: REL_TOLERANCE });
    groupExcess += integrate(
      (s) => {
        const x = nAt(s) / nf;
        const mu = Math.sqrt(1 - x);
        return x / (mu * (1 + mu));
      },
      s0,
      s1,
      { relTolerance: REL_TOLERANCE },
    );
    phaseAdvance += integrate(
      (s) => {
        const x = nAt(s) / nf;
        return x / (1 + Math.sqrt(1 - x));
      },
      s0,
      s1,
      { relTolerance: REL_TOLERANCE },
    );
    verticalTec += integrate((h) => profile.electronDensityPerM3(h), edges[i], edges[i + 1], {
      relTolerance: REL_TOLERANCE,
    });
  }
  const slantTecu = (tec * M_PER_KM) / ELECTRONS_PER_M2_PER_TECU;
  const fHz = frequencyMHz * HZ_PER_MHZ;
  const firstOrderM = (FIRST_ORDER_DELAY_COEFFICIENT * tec * M_PER_KM) / (fHz * fHz);
  return {
    slantTecu,
    verticalTecu: (verticalTec * M_PER_KM) / ELECTRONS_PER_M2_PER_TECU,
    groupDelayExcessNs: ((groupExcess * M_PER_KM) / SPEED_OF_LIGHT_MPS) * NS_PER_S,
    phaseAdvanceNs: ((phaseAdvance * M_PER_KM) / SPEED_OF_LIGHT_MPS) * NS_PER_S,
    firstOrderDelayNs: (firstOrderM / SPEED_OF_LIGHT_MPS) * NS_PER_S,
    groupDelayExcessM: groupExcess * M_PER_KM,
    phaseAdvanceM: phaseAdvance * M_PER_KM,
  };
}
