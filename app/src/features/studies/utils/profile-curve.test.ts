import { describe, expect, it } from 'vitest';
import { profileCurve } from './profile-curve';

describe('profileCurve', () => {
  it('reaches the critical frequency at the peak of a parabolic layer', () => {
    // A single parabolic layer: f_p = f_c at h_m and 0 at h_m ± y_m (Davies 1990).
    const points = profileCurve({
      layers: [
        {
          name: 'F2',
          shape: 'parabolic',
          criticalFrequencyMHz: 8,
          peakHeightKm: 300,
          semiThicknessKm: 100,
        },
      ],
    });
    const peak = points.reduce((a, b) => (b.plasmaFrequencyMHz > a.plasmaFrequencyMHz ? b : a));
    expect(peak.heightKm).toBeCloseTo(300, 6);
    expect(peak.plasmaFrequencyMHz).toBeCloseTo(8, 6);
    expect(points.find((p) => p.heightKm === 150)?.plasmaFrequencyMHz).toBe(0);
    for (let i = 1; i < points.length; i += 1) {
      expect(points[i].heightKm).toBeGreaterThanOrEqual(points[i - 1].heightKm);
    }
  });
});
