/**
 * Plasma frequency against height for the N(h) chart, sampled from the profile with the physics
 * core's own `buildProfile` (pure; the same model the server computes with).
 * f_p [MHz] = 8.98·sqrt(N) Hz · 1e-6 (Davies 1990) comes from `Profile.plasmaFrequencyMHz`.
 */
import { buildProfile, type ProfileData } from '@hopwise/common';

export interface ProfilePoint {
  heightKm: number;
  plasmaFrequencyMHz: number;
  electronDensityPerM3: number;
}

/** Samples from 60 km (below any E layer) to 600 km or the profile's top, whichever is lower. */
export function profileCurve(profile: ProfileData, stepKm = 2): ProfilePoint[] {
  const built = buildProfile(profile);
  const bottomKm = Math.max(0, Math.min(60, built.bottomKm));
  const topKm = Math.max(bottomKm + stepKm, Math.min(600, built.topKm));
  const points: ProfilePoint[] = [];
  for (let heightKm = bottomKm; heightKm <= topKm + 1e-9; heightKm += stepKm) {
    points.push({
      heightKm,
      plasmaFrequencyMHz: built.plasmaFrequencyMHz(heightKm),
      electronDensityPerM3: built.electronDensityPerM3(heightKm),
    });
  }
  // Include each layer peak exactly so the curve's nose shows the true critical frequency.
  for (const peak of built.peaks) {
    if (peak.heightKm >= bottomKm && peak.heightKm <= topKm) {
      points.push({
        heightKm: peak.heightKm,
        plasmaFrequencyMHz: peak.plasmaFrequencyMHz,
        electronDensityPerM3: peak.electronDensityPerM3,
      });
    }
  }
  return points.sort((a, b) => a.heightKm - b.heightKm);
}
