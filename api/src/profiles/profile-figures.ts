/**
 * Figures derived from a stored profile with the physics core (never re-implemented here):
 *
 * - foE, foF1, foF2 [MHz], hmF2 [km]: `buildProfile(...).peaks` — the plasma frequency of the
 *   summed profile at each layer's peak (SPEC §3 "criticalFrequenciesMHz").
 *   Layers profiles: the layers named E, F1, F2 (any case). Without an F2 layer (and for samples
 *   profiles) foF2/hmF2 are the profile's highest plasma frequency and its height. Samples
 *   profiles: foE is the largest local maximum between 90 and 150 km below hmF2 (the E region,
 *   common practice); foF1 is not identified (null).
 * - verticalTecu: `runCompute('slant', { elevationDeg: 90, frequencyMHz: 1000 })`, integrated
 *   over the whole profile (top height = the profile's top, at least the route's 2000 km).
 *   1 TECU = 1e16 electrons/m².
 * - semiThicknessKm of F2 (comparison view):
 *   parabolic or quasi-parabolic F2 layer → its y_m;
 *   Chapman F2 layer → 2H: near its peak ½(1 − z − e^(−z)) ≈ −z²/4, so N ≈ N_m(1 − (h − h_m)²/(2H)²),
 *   the parabola of semi-thickness 2H (Taylor expansion of the Chapman function; the usual
 *   parabolic approximation of a Chapman layer — from memory, e.g. Davies 1990 §2);
 *   otherwise (samples, or no F2 layer) estimated from the N(h) curve: the bottomside height h½
 *   where N first falls to N_m/2 below the peak gives y_m = √2·(h_m − h½), exact for a parabolic
 *   layer (N = N_m/2 at (h − h_m)/y_m = −1/√2); null if N does not fall to N_m/2 above the ground.
 */
import {
  brentRoot,
  buildProfile,
  runCompute,
  type ComputeResponses,
  type Profile,
  type ProfileData,
} from '@hopwise/common';

export interface ProfileFigures {
  foEMHz: number | null;
  foF1MHz: number | null;
  foF2MHz: number;
  hmF2Km: number;
  verticalTecu: number;
}

/** Frequency [MHz] far above any plasma frequency (< 100 MHz), for the TEC integral. */
const TEC_PROBE_FREQUENCY_MHZ = 1000;
const SLANT_DEFAULT_TOP_KM = 2000;
const SLANT_MAX_TOP_KM = 50_000;
/** E region heights [km] for a samples profile's foE (common practice). */
const E_REGION_KM = [90, 150] as const;
/** Step [km] of the downward search for the half-density height. */
const HALF_DENSITY_STEP_KM = 0.5;

function peakNamed(profile: Profile, name: string) {
  return profile.peaks.find((p) => p.name.toLowerCase() === name.toLowerCase());
}

export function verticalTecu(data: ProfileData, profile: Profile = buildProfile(data)): number {
  const topHeightKm = Math.min(
    SLANT_MAX_TOP_KM,
    Math.max(SLANT_DEFAULT_TOP_KM, Math.ceil(profile.topKm)),
  );
  const slant: ComputeResponses['slant'] = runCompute('slant', {
    profile: data,
    frequencyMHz: TEC_PROBE_FREQUENCY_MHZ,
    elevationDeg: 90,
    topHeightKm,
  });
  return slant.verticalTecu;
}

function f2Peak(data: ProfileData, profile: Profile): { frequencyMHz: number; heightKm: number } {
  const named = 'layers' in data ? peakNamed(profile, 'F2') : undefined;
  if (named) return { frequencyMHz: named.plasmaFrequencyMHz, heightKm: named.heightKm };
  return {
    frequencyMHz: profile.maxPlasmaFrequencyMHz,
    heightKm: profile.maxPlasmaFrequencyHeightKm,
  };
}

/** Derived figures stored with every profile; throws the physics core's InputError on bad data. */
export function profileFigures(data: ProfileData): ProfileFigures {
  const profile = buildProfile(data);
  const f2 = f2Peak(data, profile);
  let foEMHz: number | null = null;
  let foF1MHz: number | null = null;
  if ('layers' in data) {
    foEMHz = peakNamed(profile, 'E')?.plasmaFrequencyMHz ?? null;
    foF1MHz = peakNamed(profile, 'F1')?.plasmaFrequencyMHz ?? null;
  } else {
    const ePeaks = profile.peaks.filter(
      (p) =>
        p.heightKm >= E_REGION_KM[0] && p.heightKm <= E_REGION_KM[1] && p.heightKm < f2.heightKm,
    );
    if (ePeaks.length > 0) foEMHz = Math.max(...ePeaks.map((p) => p.plasmaFrequencyMHz));
  }
  return {
    foEMHz,
    foF1MHz,
    foF2MHz: f2.frequencyMHz,
    hmF2Km: f2.heightKm,
    verticalTecu: verticalTecu(data, profile),
  };
}

/** F2 semi-thickness [km] as documented at the top of this file. */
export function f2SemiThicknessKm(data: ProfileData): number | null {
  if ('layers' in data) {
    const layer = data.layers.find((l) => l.name.toLowerCase() === 'f2');
    if (layer?.shape === 'chapman') return 2 * (layer.scaleHeightKm as number);
    if (layer) return layer.semiThicknessKm as number;
  }
  const profile = buildProfile(data);
  const peakKm = profile.maxPlasmaFrequencyHeightKm;
  const halfPerM3 = profile.maxElectronDensityPerM3 / 2;
  const excess = (h: number) => profile.electronDensityPerM3(h) - halfPerM3;
  // Walk down from the peak to the first height where N ≤ N_m/2, then refine by Brent.
  let upperKm = peakKm;
  for (let h = peakKm - HALF_DENSITY_STEP_KM; h >= 0; h -= HALF_DENSITY_STEP_KM) {
    if (excess(h) <= 0) {
      const halfKm = brentRoot(excess, h, upperKm);
      return halfKm === null ? null : Math.SQRT2 * (peakKm - halfKm);
    }
    upperKm = h;
  }
  return null;
}
