/**
 * The built-in diurnal model of SPEC §4: a layered profile at a point and UTC time.
 *
 * Solar zenith angle χ: `solarZenithAngleDeg` (geo/solar.ts, astronomy-engine).
 *
 * E layer (SPEC §4, from the CCIR/ITU-R daytime E-layer model):
 *   foE = 0.9·[(180 + 1.44·R12)·cos χ]^0.25 MHz   while cos χ > 0 and foE ≥ the night floor;
 *   night floor foE = 0.6 MHz (ILLUSTRATIVE: a residual night-time E; our choice, not a standard).
 *   Parabolic, peak 110 km, semi-thickness 20 km (ITU-R P.533 E layer, SPEC §4).
 *
 * F1 layer (ILLUSTRATIVE, by day only, χ < 80°): foF1 = 1.4·foE (our choice), parabolic, peak
 *   190 km, semi-thickness 40 km. Omitted at night.
 *
 * F2 layer (ILLUSTRATIVE model of our own, marked approximate; no standard behind it):
 *   a lagged solar elevation term c = max(0, cos χ_lag), χ_lag = the zenith angle one hour earlier
 *   (the F2 peak lags local noon), then
 *     foF2 = foF2_night + (foF2_noon − foF2_night)·c^0.6,
 *     foF2_night = 2.5 + 0.01·R12 MHz, foF2_noon = 6.0 + 0.04·R12 MHz,
 *     hmF2 = 350 − 70·c^0.6 km (higher at night),
 *   quasi-parabolic with semi-thickness 100 km (a QP layer keeps the plan's MUF searches fast).
 *   With R12 = 100 at noon under an overhead Sun this gives
 *   10 MHz at 280 km — the right order of magnitude for mid-latitudes, nothing more.
 */
import { solarZenithAngleDeg } from '../geo/solar.js';
import type { GeoPoint } from '../geo/great-circle.js';
import type { LayerInput, ProfileData } from '../physics/profile.js';

export interface DiurnalModelOptions {
  /** 12-month smoothed sunspot number R12 (default 50). */
  r12?: number;
}

export interface DiurnalModelResult {
  profile: ProfileData & { layers: LayerInput[] };
  solarZenithDeg: number;
  foEMHz: number;
  foF1MHz: number | null;
  foF2MHz: number;
  hmF2Km: number;
  /** Always true: the F1 and F2 parts are illustrative. */
  approximate: true;
}

export const DEFAULT_R12 = 50;
/** Residual night-time foE [MHz] (illustrative). */
export const NIGHT_FOE_MHZ = 0.6;
/** E layer of ITU-R P.533 (SPEC §4). */
export const E_PEAK_HEIGHT_KM = 110;
export const E_SEMI_THICKNESS_KM = 20;
const F1_PEAK_HEIGHT_KM = 190;
const F1_SEMI_THICKNESS_KM = 40;
const F1_MAX_ZENITH_DEG = 80;
const F1_TO_E_RATIO = 1.4;
const F2_SEMI_THICKNESS_KM = 100;
const F2_LAG_MS = 3_600_000;
const F2_SHAPE_EXPONENT = 0.6;
const DEG = Math.PI / 180;

/** foE [MHz] by day from the SPEC §4 formula (0 when the Sun is at or below the horizon). */
export function daytimeFoEMHz(solarZenithDeg: number, r12: number): number {
  const cosChi = Math.cos(solarZenithDeg * DEG);
  if (cosChi <= 0) return 0;
  return 0.9 * Math.pow((180 + 1.44 * r12) * cosChi, 0.25);
}

/** foE [MHz] with the (illustrative) night floor. */
export function modelFoEMHz(solarZenithDeg: number, r12: number): number {
  return Math.max(NIGHT_FOE_MHZ, daytimeFoEMHz(solarZenithDeg, r12));
}

/** The illustrative F2 peak from a lagged solar elevation term (see the header). */
export function modelF2(laggedZenithDeg: number, r12: number): { foF2MHz: number; hmF2Km: number } {
  const c = Math.pow(Math.max(0, Math.cos(laggedZenithDeg * DEG)), F2_SHAPE_EXPONENT);
  const nightMHz = 2.5 + 0.01 * r12;
  const noonMHz = 6.0 + 0.04 * r12;
  return { foF2MHz: nightMHz + (noonMHz - nightMHz) * c, hmF2Km: 350 - 70 * c };
}

/** The model profile at `point` and `at` (UTC). */
export function diurnalModel(
  point: GeoPoint,
  at: Date,
  options: DiurnalModelOptions = {},
): DiurnalModelResult {
  const r12 = options.r12 ?? DEFAULT_R12;
  if (!(Number.isFinite(r12) && r12 >= 0 && r12 <= 300)) {
    throw new RangeError('r12 must be a number from 0 to 300');
  }
  const solarZenithDeg = solarZenithAngleDeg(point, at);
  const foEMHz = modelFoEMHz(solarZenithDeg, r12);
  const lagged = solarZenithAngleDeg(point, new Date(at.getTime() - F2_LAG_MS));
  const { foF2MHz, hmF2Km } = modelF2(lagged, r12);
  const layers: LayerInput[] = [
    {
      name: 'E',
      shape: 'parabolic',
      criticalFrequencyMHz: foEMHz,
      peakHeightKm: E_PEAK_HEIGHT_KM,
      semiThicknessKm: E_SEMI_THICKNESS_KM,
    },
  ];
  let foF1MHz: number | null = null;
  if (solarZenithDeg < F1_MAX_ZENITH_DEG) {
    foF1MHz = F1_TO_E_RATIO * foEMHz;
    layers.push({
      name: 'F1',
      shape: 'parabolic',
      criticalFrequencyMHz: foF1MHz,
      peakHeightKm: F1_PEAK_HEIGHT_KM,
      semiThicknessKm: F1_SEMI_THICKNESS_KM,
    });
  }
  layers.push({
    name: 'F2',
    shape: 'quasiParabolic',
    criticalFrequencyMHz: foF2MHz,
    peakHeightKm: hmF2Km,
    semiThicknessKm: F2_SEMI_THICKNESS_KM,
  });
  return {
    profile: { layers },
    solarZenithDeg,
    foEMHz,
    foF1MHz,
    foF2MHz,
    hmF2Km,
    approximate: true,
  };
}
