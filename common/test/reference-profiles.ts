/**
 * Test-only plasma-frequency profiles written independently of common/src/physics/profile.ts
 * (SPEC §2.1 formulas), for the reference ray tracer. f_p² [MHz²] is summed over layers.
 */
export interface ReferenceLayer {
  shape: 'parabolic' | 'chapman' | 'quasiParabolic';
  criticalFrequencyMHz: number;
  peakHeightKm: number;
  semiThicknessKm?: number;
  scaleHeightKm?: number;
}

export function referenceFp2(layers: ReferenceLayer[], earthRadiusKm = 6371) {
  return (h: number): number => {
    let sum = 0;
    for (const l of layers) {
      const fc2 = l.criticalFrequencyMHz ** 2;
      if (l.shape === 'parabolic') {
        const u = (h - l.peakHeightKm) / (l.semiThicknessKm as number);
        if (u > -1 && u < 1) sum += fc2 * (1 - u * u);
      } else if (l.shape === 'chapman') {
        const z = (h - l.peakHeightKm) / (l.scaleHeightKm as number);
        sum += fc2 * Math.exp(0.5 * (1 - z - Math.exp(-z)));
      } else {
        const ym = l.semiThicknessKm as number;
        const r = earthRadiusKm + h;
        const rm = earthRadiusKm + l.peakHeightKm;
        const rb = rm - ym;
        if (r > rb && r < (rm * rb) / (rb - ym)) {
          const w = ((r - rm) / ym) * (rb / r);
          sum += fc2 * (1 - w * w);
        }
      }
    }
    return sum;
  };
}

/** Heights where a layer's f_p² or its slope jumps (parabolic / quasi-parabolic limits). */
export function referenceKinks(layers: ReferenceLayer[], earthRadiusKm = 6371): number[] {
  const out: number[] = [];
  for (const l of layers) {
    const ym = l.semiThicknessKm ?? 0;
    if (l.shape === 'parabolic') out.push(l.peakHeightKm - ym, l.peakHeightKm + ym);
    if (l.shape === 'quasiParabolic') {
      const rm = earthRadiusKm + l.peakHeightKm;
      const rb = rm - ym;
      out.push(rb - earthRadiusKm, (rm * rb) / (rb - ym) - earthRadiusKm);
    }
  }
  return out.sort((a, b) => a - b);
}

/** The layers of profiles/quiet-day.json (invented demo data). */
export const QUIET_DAY: ReferenceLayer[] = [
  { shape: 'parabolic', criticalFrequencyMHz: 3.3, peakHeightKm: 110, semiThicknessKm: 20 },
  { shape: 'parabolic', criticalFrequencyMHz: 4.6, peakHeightKm: 195, semiThicknessKm: 40 },
  { shape: 'chapman', criticalFrequencyMHz: 9.2, peakHeightKm: 310, scaleHeightKm: 55 },
];
