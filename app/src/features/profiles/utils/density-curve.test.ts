import { buildProfile } from '@hopwise/common';
import { describe, expect, it } from 'vitest';
import { sampleDensityCurve } from './density-curve';

describe('sampleDensityCurve', () => {
  // Parabolic layer N = N_m(1 − ((h − h_m)/y_m)²) (Davies, Ionospheric Radio, 1990) with
  // f_p = 8.98·sqrt(N) Hz (Davies 1990), so f_c = 5 MHz gives N_m ≈ (5e6/8.98)² ≈ 3.10e11 m⁻³.
  const profile = buildProfile({
    layers: [
      {
        name: 'F',
        shape: 'parabolic',
        criticalFrequencyMHz: 5,
        peakHeightKm: 250,
        semiThicknessKm: 50,
      },
    ],
  });
  const curve = sampleDensityCurve(profile, { points: 201, trimFraction: 0 });

  it('covers the layer from its base to its top in increasing height', () => {
    expect(curve.length).toBeGreaterThan(100);
    expect(curve[0].heightKm).toBeCloseTo(200, 6);
    expect(curve.at(-1)?.heightKm).toBeCloseTo(300, 6);
    for (let i = 1; i < curve.length; i++) {
      expect(curve[i].heightKm).toBeGreaterThan(curve[i - 1].heightKm);
    }
  });

  it('includes the peak, where N = N_m and f_p = f_c', () => {
    const peak = curve.find((p) => p.heightKm === 250);
    expect(peak?.plasmaFrequencyMHz).toBeCloseTo(5, 9);
    expect(peak?.electronDensityPerM3).toBeCloseTo((5e6 / 8.98) ** 2, -9); // 8.98 is rounded: ~0.02 %
  });

  it('follows the parabola: N(h_m + y_m/2) = 0.75·N_m', () => {
    const nm = profile.maxElectronDensityPerM3;
    const half = curve.find((p) => Math.abs(p.heightKm - 275) < 1e-9);
    expect(half?.electronDensityPerM3).toBeCloseTo(0.75 * nm, -3);
  });

  it('trims a Chapman topside to where the density matters', () => {
    const chapman = buildProfile({
      layers: [
        {
          name: 'F2',
          shape: 'chapman',
          criticalFrequencyMHz: 8,
          peakHeightKm: 300,
          scaleHeightKm: 55,
        },
      ],
    });
    const trimmed = sampleDensityCurve(chapman);
    expect(trimmed.at(-1)!.heightKm).toBeLessThanOrEqual(1000);
    expect(trimmed.at(-1)!.heightKm).toBeGreaterThan(500);
  });
});
