import disturbedDay from '../../../profiles/disturbed-day.json' with { type: 'json' };
import quietDay from '../../../profiles/quiet-day.json' with { type: 'json' };
import quietNight from '../../../profiles/quiet-night.json' with { type: 'json' };
import sampledEvening from '../../../profiles/sampled-evening.json' with { type: 'json' };
import { describe, expect, it } from 'vitest';
import { SPEED_OF_LIGHT_MPS } from './constants.js';
import { electronDensityFromPlasmaFrequencyMHz } from './plasma.js';
import { buildProfile, type LayerInput, type ProfileData } from './profile.js';
import { createVerticalSounder, verticalIonogram, type VerticalEcho } from './vertical.js';

const relErr = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const DEMO_PROFILES: Record<string, unknown> = {
  'quiet-day': quietDay.profile,
  'quiet-night': quietNight.profile,
  'disturbed-day': disturbedDay.profile,
  'sampled-evening': sampledEvening.profile,
};
/** The invented demo profiles of profiles/ (README there: demo data, not measurements). */
const loadDemo = (name: string): ProfileData => DEMO_PROFILES[name] as ProfileData;
const reflected = (e: VerticalEcho) => {
  expect(e.reflected).toBe(true);
  return e as { [K in keyof VerticalEcho]: NonNullable<VerticalEcho[K]> };
};

/**
 * Independent reference written for this test (not the production path): reflection height by
 * bisection, then h' = ∫ dh/μ and h = ∫ μ dh with h = h_r − t², by composite 5-point
 * Gauss–Legendre (nodes from Abramowitz & Stegun Table 25.4) on many equal panels in t.
 */
function referenceEcho(
  density: (h: number) => number,
  bottomKm: number,
  topKm: number,
  fMHz: number,
) {
  const nf = electronDensityFromPlasmaFrequencyMHz(fMHz);
  let hi = bottomKm;
  const step = 0.01;
  while (density(hi) < nf) {
    hi += step;
    if (hi > topKm) return null;
  }
  let lo = hi - step;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lo + hi);
    if (density(mid) < nf) lo = mid;
    else hi = mid;
  }
  const hr = lo;
  const x = [-0.906179845938664, -0.5384693101056831, 0, 0.5384693101056831, 0.906179845938664];
  const w = [
    0.2369268850561891, 0.4786286704993665, 0.5688888888888889, 0.4786286704993665,
    0.2369268850561891,
  ];
  const tMax = Math.sqrt(hr - bottomKm);
  const panels = 40000;
  let v = 0;
  let p = 0;
  for (let k = 0; k < panels; k++) {
    const a = (tMax * k) / panels;
    const half = tMax / panels / 2;
    for (let m = 0; m < 5; m++) {
      const t = a + half * (1 + x[m]);
      const mu = Math.sqrt(Math.max(1e-300, 1 - density(hr - t * t) / nf));
      v += w[m] * half * ((2 * t) / mu);
      p += w[m] * half * (2 * t * mu);
    }
  }
  return { trueKm: hr, virtualKm: bottomKm + v, phaseKm: bottomKm + p };
}

describe('vertical incidence on a parabolic layer (closed forms)', () => {
  const fc = 8;
  const hm = 300;
  const ym = 80;
  const hb = hm - ym;
  const profile = buildProfile({
    layers: [
      {
        name: 'F2',
        shape: 'parabolic',
        criticalFrequencyMHz: fc,
        peakHeightKm: hm,
        semiThicknessKm: ym,
      },
    ],
  });
  const sound = createVerticalSounder(profile);
  const ratios = Array.from({ length: 941 }, (_, i) => 0.05 + i * 0.001);

  it("virtual height h'(f) = h_b + (y_m/2)(f/f_c)·ln((f_c + f)/(f_c − f)) to 1e-6 over 0.05–0.99 f_c (Davies 1990; Budden 1985)", () => {
    let worst = 0;
    for (const a of ratios) {
      const e = reflected(sound(a * fc));
      const expected = hb + (ym / 2) * a * Math.log((1 + a) / (1 - a));
      worst = Math.max(worst, relErr(e.virtualHeightKm, expected));
      // group delay = 2h'/c (SPEC §3)
      expect(
        relErr(e.groupDelayMs, ((2 * expected * 1000) / SPEED_OF_LIGHT_MPS) * 1000),
      ).toBeLessThan(1e-6);
    }
    console.info(
      `parabolic virtual height: ${ratios.length} frequencies, largest relative error ${worst.toExponential(2)}`,
    );
    expect(ratios.length).toBe(941);
    expect(worst).toBeLessThan(1e-6);
  });

  it('true height h_r = h_m − y_m·sqrt(1 − (f/f_c)²) (parabola solved for f_p = f)', () => {
    let worst = 0;
    for (const a of ratios)
      worst = Math.max(
        worst,
        relErr(reflected(sound(a * fc)).trueHeightKm, hm - ym * Math.sqrt(1 - a * a)),
      );
    console.info(`parabolic true height: largest relative error ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-9);
  });

  it('phase height closed form (derived here) to 1e-6', () => {
    // Derived for this project: with a = f/f_c, v = |h − h_m|/y_m, u_r² = 1 − a²,
    // ∫_{h_b}^{h_r} μ dh = (y_m/a)∫_{u_r}^{1} sqrt(v² − u_r²) dv
    //   = (y_m/a)[v·sqrt(v² − u_r²)/2 − (u_r²/2)·ln(v + sqrt(v² − u_r²))]_{u_r}^{1}
    // ⇒ phase height = h_b + (y_m/2)·[1 − ((1 − a²)/(2a))·ln((1 + a)/(1 − a))].
    // (Same substitution gives the textbook h' above, which checks the derivation.)
    let worst = 0;
    for (const a of ratios) {
      const expected = hb + (ym / 2) * (1 - ((1 - a * a) / (2 * a)) * Math.log((1 + a) / (1 - a)));
      worst = Math.max(worst, relErr(reflected(sound(a * fc)).phaseHeightKm, expected));
    }
    console.info(`parabolic phase height: largest relative error ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-6);
  });

  it('at or above f_c there is no echo (nulls)', () => {
    for (const f of [fc, fc * 1.0001, 12]) {
      expect(sound(f)).toEqual({
        frequencyMHz: f,
        reflected: false,
        trueHeightKm: null,
        virtualHeightKm: null,
        phaseHeightKm: null,
        groupDelayMs: null,
      });
    }
  });
});

describe('vertical incidence against an independent high-precision quadrature', () => {
  const cases: [string, ProfileData, number[]][] = [
    [
      'Chapman layer',
      {
        layers: [
          {
            name: 'F2',
            shape: 'chapman',
            criticalFrequencyMHz: 9,
            peakHeightKm: 300,
            scaleHeightKm: 50,
          },
        ],
      },
      [1, 3, 6, 8, 8.9],
    ],
    [
      'quasi-parabolic layer',
      {
        layers: [
          {
            name: 'F2',
            shape: 'quasiParabolic',
            criticalFrequencyMHz: 9,
            peakHeightKm: 300,
            semiThicknessKm: 100,
          },
        ],
      },
      [2, 5, 8, 8.9],
    ],
    [
      '3-layer quiet-day profile (E + F1 + F2)',
      loadDemo('quiet-day'),
      [1, 3, 3.4, 4, 5, 6, 8, 9.1],
    ],
  ];
  for (const [label, data, freqs] of cases) {
    it(`${label}: true, virtual and phase height to 1e-6`, () => {
      const profile = buildProfile(data);
      const sound = createVerticalSounder(profile);
      let worst = 0;
      for (const f of freqs) {
        const ref = referenceEcho(
          (h) => profile.electronDensityPerM3(h),
          profile.bottomKm,
          profile.topKm,
          f,
        )!;
        const e = reflected(sound(f));
        worst = Math.max(
          worst,
          relErr(e.trueHeightKm, ref.trueKm),
          relErr(e.virtualHeightKm, ref.virtualKm),
          relErr(e.phaseHeightKm, ref.phaseKm),
        );
      }
      console.info(
        `${label}: ${freqs.length} frequencies, largest relative error vs reference quadrature ${worst.toExponential(2)}`,
      );
      expect(worst).toBeLessThan(1e-6);
    });
  }
});

describe('vertical ionogram invariants', () => {
  it('virtual height ≥ true height ≥ phase height (group path ≥ phase path) and nulls above the highest peak', () => {
    for (const name of ['quiet-day', 'quiet-night', 'disturbed-day', 'sampled-evening']) {
      const profile = buildProfile(loadDemo(name));
      const freqs = Array.from({ length: 300 }, (_, i) => 0.5 + i * 0.04);
      const { echoes } = verticalIonogram(profile, freqs);
      let count = 0;
      for (const e of echoes) {
        if (!e.reflected) {
          expect(e.frequencyMHz).toBeGreaterThanOrEqual(profile.maxPlasmaFrequencyMHz * (1 - 1e-9));
          continue;
        }
        count++;
        expect(e.virtualHeightKm!).toBeGreaterThanOrEqual(e.trueHeightKm! - 1e-9);
        expect(e.trueHeightKm!).toBeGreaterThanOrEqual(e.phaseHeightKm! - 1e-9);
      }
      expect(count).toBeGreaterThan(50);
    }
  });

  it('critical frequencies are listed per layer name / peak', () => {
    expect(
      Object.keys(
        verticalIonogram(buildProfile(loadDemo('quiet-day')), [5]).criticalFrequenciesMHz,
      ),
    ).toEqual(['E', 'F1', 'F2']);
    const s = verticalIonogram(
      buildProfile(loadDemo('sampled-evening')),
      [5],
    ).criticalFrequenciesMHz;
    expect(s).toEqual({ peak1: expect.closeTo(2, 12), peak2: expect.closeTo(6.8, 12) });
  });

  it('a frequency between foE and the E-region maximum passes the E layer and reflects higher', () => {
    const profile = buildProfile(loadDemo('quiet-day'));
    const sound = createVerticalSounder(profile);
    expect(reflected(sound(3.2)).trueHeightKm).toBeLessThan(115);
    expect(reflected(sound(3.45)).trueHeightKm).toBeGreaterThan(130);
  });

  it('samples profiles: per-lamina closed forms agree with quadrature of the linear-N profile', () => {
    const data = loadDemo('sampled-evening');
    const profile = buildProfile(data);
    const sound = createVerticalSounder(profile);
    let worst = 0;
    for (const f of [1, 1.9, 2.5, 4, 6.5]) {
      const ref = referenceEcho(
        (h) => profile.electronDensityPerM3(h),
        profile.bottomKm,
        profile.topKm,
        f,
      )!;
      const e = reflected(sound(f));
      worst = Math.max(
        worst,
        relErr(e.virtualHeightKm, ref.virtualKm),
        relErr(e.phaseHeightKm, ref.phaseKm),
        relErr(e.trueHeightKm, ref.trueKm),
      );
    }
    console.info(
      `samples profile vs reference quadrature: largest relative error ${worst.toExponential(2)}`,
    );
    expect(worst).toBeLessThan(1e-6);
  });

  it('a step at the first sample reflects the low frequencies there', () => {
    const profile = buildProfile({
      samples: [
        { heightKm: 200, plasmaFrequencyMHz: 3 },
        { heightKm: 300, plasmaFrequencyMHz: 6 },
      ],
    });
    expect(createVerticalSounder(profile)(2)).toMatchObject({
      reflected: true,
      trueHeightKm: 200,
      virtualHeightKm: 200,
      phaseHeightKm: 200,
    });
  });

  it('layers given in any order give the same ionogram', () => {
    const layers = (loadDemo('quiet-day') as { layers: LayerInput[] }).layers;
    const a = verticalIonogram(buildProfile({ layers }), [2, 4, 7]);
    const b = verticalIonogram(buildProfile({ layers: [...layers].reverse() }), [2, 4, 7]);
    expect(b.echoes).toEqual(a.echoes);
  });
});
