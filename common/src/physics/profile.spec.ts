import disturbedDay from '../../../profiles/disturbed-day.json' with { type: 'json' };
import quietDay from '../../../profiles/quiet-day.json' with { type: 'json' };
import quietNight from '../../../profiles/quiet-night.json' with { type: 'json' };
import sampledEvening from '../../../profiles/sampled-evening.json' with { type: 'json' };
import { describe, expect, it } from 'vitest';
import { InputError, ProfileInputError } from './errors.js';
import { electronDensityFromPlasmaFrequencyMHz } from './plasma.js';
import {
  buildProfile,
  CHAPMAN_CUTOFF_FRACTION,
  validateProfile,
  type ProfileData,
} from './profile.js';

const relErr = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const DEMO_PROFILES: Record<string, unknown> = {
  'quiet-day': quietDay.profile,
  'quiet-night': quietNight.profile,
  'disturbed-day': disturbedDay.profile,
  'sampled-evening': sampledEvening.profile,
};
/** The invented demo profiles of profiles/ (README there: demo data, not measurements). */
const loadDemo = (name: string): ProfileData => DEMO_PROFILES[name] as ProfileData;

/** The field path an invalid profile is rejected with. */
function rejectedField(data: unknown, options?: { earthRadiusKm?: number }): string {
  try {
    buildProfile(data as ProfileData, options);
  } catch (err) {
    expect(err).toBeInstanceOf(ProfileInputError);
    expect(err).toBeInstanceOf(InputError);
    const fields = (err as InputError).fields;
    expect((err as Error).message).toContain(Object.keys(fields)[0]);
    return Object.keys(fields)[0];
  }
  throw new Error('profile was accepted');
}

describe('layer shapes (SPEC §2.1)', () => {
  const nm = electronDensityFromPlasmaFrequencyMHz(9);

  it('α-Chapman: N = N_m·exp(½(1 − z − e^(−z))) (Davies 1990; Chapman 1931)', () => {
    const p = buildProfile({
      layers: [
        {
          name: 'F2',
          shape: 'chapman',
          criticalFrequencyMHz: 9,
          peakHeightKm: 300,
          scaleHeightKm: 50,
        },
      ],
    });
    expect(relErr(p.electronDensityPerM3(300), nm)).toBeLessThan(1e-15);
    for (const z of [-3, -1, -0.2, 0.5, 1, 4, 20]) {
      const expected = nm * Math.exp(0.5 * (1 - z - Math.exp(-z)));
      expect(relErr(p.electronDensityPerM3(300 + 50 * z), expected)).toBeLessThan(1e-14);
    }
    // Documented cut-off: 0 where N < 1e-12·N_m.
    expect(p.electronDensityPerM3(p.bottomKm - 1e-6)).toBe(0);
    expect(
      relErr(p.electronDensityPerM3(p.bottomKm + 1e-9), CHAPMAN_CUTOFF_FRACTION * nm),
    ).toBeLessThan(1e-5);
    expect(p.topKm).toBeGreaterThan(300 + 50 * 56);
    expect(p.peaks).toEqual([
      {
        name: 'F2',
        heightKm: 300,
        plasmaFrequencyMHz: expect.closeTo(9, 12),
        electronDensityPerM3: expect.closeTo(nm, 0),
      },
    ]);
    expect(p.maxPlasmaFrequencyMHz).toBeCloseTo(9, 12);
    expect(p.maxPlasmaFrequencyHeightKm).toBeCloseTo(300, 4);
  });

  it('parabolic: N = N_m(1 − ((h − h_m)/y_m)²) inside, 0 outside (Davies 1990)', () => {
    const p = buildProfile({
      layers: [
        {
          name: 'E',
          shape: 'parabolic',
          criticalFrequencyMHz: 9,
          peakHeightKm: 110,
          semiThicknessKm: 20,
        },
      ],
    });
    expect(p.electronDensityPerM3(100)).toBeCloseTo(nm * 0.75, 0);
    expect(p.electronDensityPerM3(89.9)).toBe(0);
    expect(p.electronDensityPerM3(130.1)).toBe(0);
    expect([p.bottomKm, p.topKm]).toEqual([90, 130]);
    expect(p.breakpointsKm).toEqual([90, 130]);
  });

  it('quasi-parabolic: N_m at r_m, 0 at r_b and at r_m·r_b/(r_b − y_m) (Croft & Hoogasian 1968)', () => {
    const R0 = 6371;
    const p = buildProfile({
      layers: [
        {
          name: 'F2',
          shape: 'quasiParabolic',
          criticalFrequencyMHz: 9,
          peakHeightKm: 300,
          semiThicknessKm: 100,
        },
      ],
    });
    const rm = R0 + 300;
    const rb = rm - 100;
    const topKm = (rm * rb) / (rb - 100) - R0;
    expect(relErr(p.electronDensityPerM3(300), nm)).toBeLessThan(1e-15);
    expect(p.bottomKm).toBe(200);
    expect(p.topKm).toBeCloseTo(topKm, 9);
    const h = 250;
    const r = R0 + h;
    expect(
      relErr(p.electronDensityPerM3(h), nm * (1 - ((r - rm) / 100) ** 2 * (rb / r) ** 2)),
    ).toBeLessThan(1e-14);
    expect(p.electronDensityPerM3(topKm + 0.01)).toBe(0);
    // R₀ comes from the options (SPEC §2.2)
    const q = buildProfile(
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
      { earthRadiusKm: 3000 },
    );
    expect(q.earthRadiusKm).toBe(3000);
    expect(q.topKm).toBeCloseTo((3300 * 3200) / 3100 - 3000, 9);
  });

  it('layers are summed; critical frequency of a layer is the summed plasma frequency at its peak (SPEC §3)', () => {
    const p = buildProfile(loadDemo('quiet-day'));
    const e = p.peaks.find((x) => x.name === 'E')!;
    expect(e.plasmaFrequencyMHz).toBeGreaterThan(3.3);
    expect(p.peaks.map((x) => x.name)).toEqual(['E', 'F1', 'F2']);
    expect(p.maxPlasmaFrequencyMHz).toBeCloseTo(9.2, 6);
  });

  it('density drop N(h) − N(h − d) agrees with the plain difference where that is well conditioned', () => {
    for (const name of ['quiet-day', 'disturbed-day', 'quiet-night']) {
      const p = buildProfile(loadDemo(name));
      for (let h = p.bottomKm + 1; h < p.bottomKm + 400; h += 7.3) {
        const plain = p.electronDensityPerM3(h) - p.electronDensityPerM3(h - 0.5);
        expect(Math.abs(p.densityDropPerM3(h, 0.5) - plain)).toBeLessThan(
          1e-9 * p.maxElectronDensityPerM3,
        );
      }
    }
    const qp = buildProfile({
      layers: [
        {
          name: 'F2',
          shape: 'quasiParabolic',
          criticalFrequencyMHz: 9,
          peakHeightKm: 300,
          semiThicknessKm: 100,
        },
      ],
    });
    expect(
      Math.abs(
        qp.densityDropPerM3(250, 0.5) -
          (qp.electronDensityPerM3(250) - qp.electronDensityPerM3(249.5)),
      ),
    ).toBeLessThan(1e-9 * qp.maxElectronDensityPerM3);
  });

  it('monotonic breaks bracket the maxima of the summed profile', () => {
    const p = buildProfile(loadDemo('quiet-day'));
    const b = p.monotonicBreaksKm;
    for (let i = 0; i + 1 < b.length; i++) {
      const n = 50;
      const values = Array.from({ length: n + 1 }, (_, k) =>
        p.electronDensityPerM3(b[i] + ((b[i + 1] - b[i]) * k) / n),
      );
      const rising = values.every((v, k) => k === 0 || v >= values[k - 1] - 1e-6 * values[k - 1]);
      const falling = values.every((v, k) => k === 0 || v <= values[k - 1] + 1e-6 * values[k - 1]);
      expect(rising || falling).toBe(true);
    }
  });
});

describe('samples profiles (SPEC §2.1)', () => {
  it('are linear in N between samples and 0 outside', () => {
    const p = buildProfile({
      samples: [
        { heightKm: 100, electronDensityPerM3: 0 },
        { heightKm: 200, electronDensityPerM3: 1e12 },
        { heightKm: 300, electronDensityPerM3: 5e11 },
      ],
    });
    expect(p.electronDensityPerM3(150)).toBeCloseTo(5e11, 0);
    expect(p.electronDensityPerM3(250)).toBeCloseTo(7.5e11, 0);
    expect(p.electronDensityPerM3(99)).toBe(0);
    expect(p.electronDensityPerM3(301)).toBe(0);
    expect(p.peaks.map((x) => [x.name, x.heightKm])).toEqual([['peak1', 200]]);
  });

  it('accept plasma-frequency samples and name every local maximum from the ground up', () => {
    const p = buildProfile(loadDemo('sampled-evening'));
    expect(p.kind).toBe('samples');
    expect(p.peaks.map((x) => [x.name, x.heightKm])).toEqual([
      ['peak1', 110],
      ['peak2', 320],
    ]);
    expect(p.peaks[1].plasmaFrequencyMHz).toBeCloseTo(6.8, 12);
    expect([p.bottomKm, p.topKm]).toEqual([90, 800]);
  });
});

describe('profile validation names the offending field', () => {
  const E = {
    name: 'E',
    shape: 'parabolic',
    criticalFrequencyMHz: 3,
    peakHeightKm: 110,
    semiThicknessKm: 20,
  };
  it.each([
    ['empty layer list', { layers: [] }, 'profile.layers'],
    ['empty samples list', { samples: [] }, 'profile.samples'],
    [
      'a single sample',
      { samples: [{ heightKm: 100, electronDensityPerM3: 1e11 }] },
      'profile.samples',
    ],
    ['both layers and samples', { layers: [E], samples: [] }, 'profile'],
    [
      'non-increasing heights',
      {
        samples: [
          { heightKm: 100, electronDensityPerM3: 1 },
          { heightKm: 200, electronDensityPerM3: 2 },
          { heightKm: 200, electronDensityPerM3: 3 },
        ],
      },
      'profile.samples[2].heightKm',
    ],
    [
      'negative density',
      {
        samples: [
          { heightKm: 100, electronDensityPerM3: 1 },
          { heightKm: 200, electronDensityPerM3: -2 },
        ],
      },
      'profile.samples[1].electronDensityPerM3',
    ],
    [
      'NaN height',
      {
        samples: [
          { heightKm: Number.NaN, electronDensityPerM3: 1 },
          { heightKm: 200, electronDensityPerM3: 2 },
        ],
      },
      'profile.samples[0].heightKm',
    ],
    [
      'Infinity frequency',
      { layers: [{ ...E, criticalFrequencyMHz: Infinity }] },
      'profile.layers[0].criticalFrequencyMHz',
    ],
    [
      'all-zero samples',
      {
        samples: [
          { heightKm: 100, plasmaFrequencyMHz: 0 },
          { heightKm: 200, plasmaFrequencyMHz: 0 },
        ],
      },
      'profile.samples',
    ],
    [
      'missing semi-thickness',
      {
        layers: [E, { name: 'F2', shape: 'parabolic', criticalFrequencyMHz: 8, peakHeightKm: 300 }],
      },
      'profile.layers[1].semiThicknessKm',
    ],
    [
      'missing scale height',
      { layers: [{ name: 'F2', shape: 'chapman', criticalFrequencyMHz: 8, peakHeightKm: 300 }] },
      'profile.layers[0].scaleHeightKm',
    ],
    [
      'duplicate layer names',
      { layers: [E, { ...E, peakHeightKm: 120 }] },
      'profile.layers[1].name',
    ],
    ['unknown shape', { layers: [{ ...E, shape: 'gaussian' }] }, 'profile.layers[0].shape'],
    [
      'base below ground',
      { layers: [{ ...E, semiThicknessKm: 120 }] },
      'profile.layers[0].semiThicknessKm',
    ],
    [
      'negative critical frequency',
      { layers: [{ ...E, criticalFrequencyMHz: -3 }] },
      'profile.layers[0].criticalFrequencyMHz',
    ],
  ])('%s', (_label, data, field) => {
    expect(rejectedField(data)).toBe(field);
  });

  it('a quasi-parabolic layer with y_m ≥ r_b (tiny R₀) is rejected', () => {
    const qp = {
      layers: [
        {
          name: 'F2',
          shape: 'quasiParabolic',
          criticalFrequencyMHz: 9,
          peakHeightKm: 300,
          semiThicknessKm: 200,
        },
      ],
    };
    expect(rejectedField(qp, { earthRadiusKm: 50 })).toBe('profile.layers[0].semiThicknessKm');
  });

  it('validateProfile returns the typed data for a valid profile', () => {
    expect(validateProfile({ layers: [E] })).toEqual({ layers: [E] });
  });
});
