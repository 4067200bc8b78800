import type { Profile } from '@hopwise/common';

export interface DensityPoint {
  heightKm: number;
  electronDensityPerM3: number;
  plasmaFrequencyMHz: number;
}

interface CurveOptions {
  /** Number of evenly spaced heights (breakpoints are added). Default 400. */
  points?: number;
  /**
   * The curve is trimmed to where N ≥ this fraction of the peak density (plus one point either
   * side), so a Chapman topside does not stretch the chart to thousands of km. Default 0.02.
   */
  trimFraction?: number;
  /** Highest height shown [km]. Default 1000. */
  ceilingKm?: number;
}

/**
 * N(h) and f_p(h) of a built profile on a height grid, for charts. The density comes from the
 * physics core (`Profile.electronDensityPerM3`); nothing is recomputed here.
 */
export function sampleDensityCurve(profile: Profile, options: CurveOptions = {}): DensityPoint[] {
  const { points = 400, trimFraction = 0.02, ceilingKm = 1000 } = options;
  const lowKm = Math.max(0, profile.bottomKm);
  const highKm = Math.min(profile.topKm, ceilingKm);
  if (!(highKm > lowKm)) return [];
  const stepKm = (highKm - lowKm) / (points - 1);
  const heights = new Set<number>();
  for (let i = 0; i < points; i++) heights.add(lowKm + i * stepKm);
  for (const h of profile.breakpointsKm) if (h >= lowKm && h <= highKm) heights.add(h);
  for (const peak of profile.peaks) if (peak.heightKm <= highKm) heights.add(peak.heightKm);
  const curve = [...heights]
    .sort((a, b) => a - b)
    .map((heightKm) => ({
      heightKm,
      electronDensityPerM3: profile.electronDensityPerM3(heightKm),
      plasmaFrequencyMHz: profile.plasmaFrequencyMHz(heightKm),
    }));

  const threshold = trimFraction * profile.maxElectronDensityPerM3;
  const first = curve.findIndex((p) => p.electronDensityPerM3 >= threshold);
  let last = curve.length - 1;
  while (last > 0 && curve[last].electronDensityPerM3 < threshold) last--;
  if (first < 0) return curve;
  return curve.slice(Math.max(0, first - 1), Math.min(curve.length, last + 2));
}
