import disturbedDay from '../../../profiles/disturbed-day.json' with { type: 'json' };
import quietDay from '../../../profiles/quiet-day.json' with { type: 'json' };
import quietNight from '../../../profiles/quiet-night.json' with { type: 'json' };
import sampledEvening from '../../../profiles/sampled-evening.json' with { type: 'json' };
import { describe, expect, it } from 'vitest';
import {
  ELECTRON_MASS_KG,
  ELEMENTARY_CHARGE_C,
  SPEED_OF_LIGHT_MPS,
  VACUUM_PERMITTIVITY_FPM,
} from './constants.js';
import { NoSolutionError } from './errors.js';
import { electronDensityFromPlasmaFrequencyMHz } from './plasma.js';
import { buildProfile, type ProfileData } from './profile.js';
import { heightAlongSlantKm, slantPath, slantRangeKm } from './slant.js';

const relErr = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const DEMO_PROFILES: Record<string, unknown> = {
  'quiet-day': quietDay.profile,
  'quiet-night': quietNight.profile,
  'disturbed-day': disturbedDay.profile,
  'sampled-evening': sampledEvening.profile,
};
/** The invented demo profiles of profiles/ (README there: demo data, not measurements). */
const loadDemo = (name: string): ProfileData => DEMO_PROFILES[name] as ProfileData;
const GPS_L1_MHZ = 1575.42; // GPS L1 carrier (IS-GPS-200)

describe('slant path geometry', () => {
  it('h(s) and s(h) invert each other and satisfy r² = R₀² + s² + 2R₀ s sin β', () => {
    for (const deg of [0, 5, 30, 90]) {
      const beta = (deg * Math.PI) / 180;
      const s = slantRangeKm(350, beta, 6371);
      const r = Math.sqrt(6371 ** 2 + s * s + 2 * 6371 * s * Math.sin(beta));
      expect(r - 6371).toBeCloseTo(350, 9);
      expect(heightAlongSlantKm(s, beta, 6371)).toBeCloseTo(350, 9);
    }
    expect(slantRangeKm(350, Math.PI / 2, 6371)).toBeCloseTo(350, 12);
  });
});

describe('TEC', () => {
  it('α-Chapman vertical TEC = sqrt(2πe)·N_m·H to 1e-5 (integral of the Chapman function; SPEC §9)', () => {
    const nm = electronDensityFromPlasmaFrequencyMHz(9);
    const H = 50;
    const profile = buildProfile({
      layers: [
        {
          name: 'F2',
          shape: 'chapman',
          criticalFrequencyMHz: 9,
          peakHeightKm: 300,
          scaleHeightKm: H,
        },
      ],
    });
    const r = slantPath(profile, { frequencyMHz: 30, elevationDeg: 90, topHeightKm: 5000 });
    const expectedTecu = (Math.sqrt(2 * Math.PI * Math.E) * nm * H * 1000) / 1e16;
    const err = relErr(r.verticalTecu, expectedTecu);
    console.info(`Chapman vertical TEC: relative error ${err.toExponential(2)}`);
    expect(err).toBeLessThan(1e-5);
    // at vertical incidence the slant TEC is the vertical TEC
    expect(relErr(r.slantTecu, r.verticalTecu)).toBeLessThan(1e-9);
  });

  it('slant TEC exceeds vertical TEC at lower elevations (longer path)', () => {
    const profile = buildProfile(loadDemo('quiet-day'));
    const low = slantPath(profile, { frequencyMHz: GPS_L1_MHZ, elevationDeg: 10 });
    const high = slantPath(profile, { frequencyMHz: GPS_L1_MHZ, elevationDeg: 60 });
    expect(low.slantTecu).toBeGreaterThan(high.slantTecu);
    expect(high.slantTecu).toBeGreaterThan(high.verticalTecu);
    expect(relErr(low.verticalTecu, high.verticalTecu)).toBeLessThan(1e-12);
  });
});

describe('delays', () => {
  it('first-order delay 40.3·TEC/f²: 1 TECU at GPS L1 ≈ 0.162 m (ITU-R P.531; IS-GPS-200)', () => {
    // Build a thin samples layer holding exactly 1 TECU vertically (triangle: ½·N·Δh = 1e16 m⁻²).
    const peak = 1e16 / (0.5 * 100e3);
    const profile = buildProfile({
      samples: [
        { heightKm: 300, electronDensityPerM3: 0 },
        { heightKm: 350, electronDensityPerM3: peak },
        { heightKm: 400, electronDensityPerM3: 0 },
      ],
    });
    const r = slantPath(profile, { frequencyMHz: GPS_L1_MHZ, elevationDeg: 90 });
    expect(r.verticalTecu).toBeCloseTo(1, 12);
    const firstOrderM = r.firstOrderDelayNs * 1e-9 * SPEED_OF_LIGHT_MPS;
    expect(firstOrderM).toBeCloseTo(0.162, 3);
    expect(relErr(firstOrderM, (40.3 * 1e16) / (GPS_L1_MHZ * 1e6) ** 2)).toBeLessThan(1e-12);
  });

  it('exact delays and the first-order value differ at GPS L1 by the expected second-order size (Budden 1985 expansion μ′ − 1 = X/2 + 3X²/8 + …)', () => {
    const profile = buildProfile(loadDemo('quiet-day'));
    const r = slantPath(profile, { frequencyMHz: GPS_L1_MHZ, elevationDeg: 30 });
    // The first-order formula uses the rounded 40.3; the exact first-order coefficient is
    // e²/(8π²ε₀mₑ) = 40.308… (CODATA 2018), so exact/firstOrder = K/40.3·(1 + O(X)).
    const K =
      ELEMENTARY_CHARGE_C ** 2 / (8 * Math.PI ** 2 * VACUUM_PERMITTIVITY_FPM * ELECTRON_MASS_KG);
    const xMax =
      profile.maxElectronDensityPerM3 / electronDensityFromPlasmaFrequencyMHz(GPS_L1_MHZ);
    const ratio = r.groupDelayExcessNs / r.firstOrderDelayNs;
    const secondOrder = ratio / (K / 40.3) - 1;
    expect(secondOrder).toBeGreaterThan(0);
    expect(secondOrder).toBeLessThan(0.75 * xMax); // (3X²/8)/(X/2) ≤ ¾·X_max
    // phase advance: 1 − μ = X/2 + X²/8 + …, so it exceeds the first-order value by ≤ ¼·X_max
    const phaseSecond = r.phaseAdvanceNs / r.firstOrderDelayNs / (K / 40.3) - 1;
    expect(phaseSecond).toBeGreaterThan(0);
    expect(phaseSecond).toBeLessThan(0.25 * xMax);
    expect(secondOrder).toBeGreaterThan(phaseSecond); // group − phase = ∫X²/4 + … > 0
    console.info(
      `GPS L1, 30°: exact/first-order − 1 = ${secondOrder.toExponential(2)} (group), ${phaseSecond.toExponential(2)} (phase); X_max = ${xMax.toExponential(2)}`,
    );
    expect(r.groupDelayExcessM).toBeCloseTo(r.groupDelayExcessNs * 1e-9 * SPEED_OF_LIGHT_MPS, 12);
    expect(r.phaseAdvanceM).toBeCloseTo(r.phaseAdvanceNs * 1e-9 * SPEED_OF_LIGHT_MPS, 12);
  });

  it('excess group delay, phase advance and slant TEC match composite Simpson written here to 1e-5', () => {
    const profile = buildProfile(loadDemo('quiet-day'));
    let worst = 0;
    for (const [f, deg] of [
      [12, 30],
      [10, 60],
      [30, 5],
      [GPS_L1_MHZ, 0],
    ]) {
      const r = slantPath(profile, { frequencyMHz: f, elevationDeg: deg, topHeightKm: 2000 });
      // Plain composite Simpson in slant range s over [0, s_top], 200 000 intervals.
      const R0 = 6371;
      const b = R0 * Math.sin((deg * Math.PI) / 180);
      const sTop = -b + Math.sqrt(b * b + 2000 * (2 * R0 + 2000));
      const nf = electronDensityFromPlasmaFrequencyMHz(f);
      const n = 200000;
      const hStep = sTop / n;
      let tec = 0;
      let group = 0;
      let phase = 0;
      for (let i = 0; i <= n; i++) {
        const s = i * hStep;
        const h = Math.sqrt(R0 * R0 + s * s + 2 * R0 * s * Math.sin((deg * Math.PI) / 180)) - R0;
        const N = profile.electronDensityPerM3(h);
        const mu = Math.sqrt(1 - N / nf);
        const w = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
        tec += w * N;
        group += w * (1 / mu - 1);
        phase += w * (1 - mu);
      }
      const scale = (hStep / 3) * 1000; // km → m
      const refTecu = (tec * scale) / 1e16;
      const refGroupNs = ((group * scale) / SPEED_OF_LIGHT_MPS) * 1e9;
      const refPhaseNs = ((phase * scale) / SPEED_OF_LIGHT_MPS) * 1e9;
      worst = Math.max(
        worst,
        relErr(r.slantTecu, refTecu),
        relErr(r.groupDelayExcessNs, refGroupNs),
        relErr(r.phaseAdvanceNs, refPhaseNs),
      );
    }
    console.info(
      `slant TEC / excess group delay / phase advance vs Simpson: largest relative error ${worst.toExponential(2)}`,
    );
    expect(worst).toBeLessThan(1e-5);
  });

  it('group delay excess ≥ phase advance (group path ≥ phase path)', () => {
    const profile = buildProfile(loadDemo('quiet-day'));
    for (const f of [9.3, 12, 50, GPS_L1_MHZ]) {
      const r = slantPath(profile, { frequencyMHz: f, elevationDeg: 45 });
      expect(r.groupDelayExcessNs).toBeGreaterThan(r.phaseAdvanceNs);
    }
  });

  it('at or below the highest plasma frequency on the path: NoSolutionError (→ 422)', () => {
    const profile = buildProfile(loadDemo('quiet-day'));
    expect(() => slantPath(profile, { frequencyMHz: 9.2, elevationDeg: 45 })).toThrow(
      NoSolutionError,
    );
    expect(() => slantPath(profile, { frequencyMHz: 5, elevationDeg: 45 })).toThrow(
      NoSolutionError,
    );
    // below the F2 peak the path tops out in the F1 region: 9 MHz gets through to 200 km
    expect(
      slantPath(profile, { frequencyMHz: 9, elevationDeg: 45, topHeightKm: 200 }).slantTecu,
    ).toBeGreaterThan(0);
  });
});
