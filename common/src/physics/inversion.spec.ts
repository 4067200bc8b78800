import { describe, expect, it } from 'vitest';
import { NoSolutionError } from './errors.js';
import { invertTrace, type TracePoint } from './inversion.js';
import { buildProfile, type ProfileData } from './profile.js';
import { createVerticalSounder } from './vertical.js';

const relErr = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** Synthetic trace from our forward model (vertical.ts), which is itself checked against closed forms. */
function forwardTrace(
  data: ProfileData,
  freqs: number[],
): { trace: TracePoint[]; trueKm: number[] } {
  const sound = createVerticalSounder(buildProfile(data));
  const echoes = freqs.map(sound);
  return {
    trace: echoes.map((e) => ({
      frequencyMHz: e.frequencyMHz,
      virtualHeightKm: e.virtualHeightKm as number,
    })),
    trueKm: echoes.map((e) => e.trueHeightKm as number),
  };
}

describe('lamination inversion (SPEC §3 invert)', () => {
  const fc = 9;
  // Trace from 0.02 f_c: the SPEC's start (no ionization below the lowest sounded frequency) puts
  // the first true height at its virtual height, which for a Chapman bottomside tail is ~7 km too
  // high at 0.02 f_c (~9 km at 0.05 f_c); that offset decays upward but still gives ~1.9 km at
  // 0.2 f_c for a trace starting at 0.05 f_c. The lamination itself is exact for linear laminae.
  const ratios = Array.from({ length: 98 }, (_, i) => 0.02 + i * 0.01); // 0.02 … 0.99 f_c
  const layers: [string, ProfileData][] = [
    [
      'parabolic',
      {
        layers: [
          {
            name: 'F2',
            shape: 'parabolic',
            criticalFrequencyMHz: fc,
            peakHeightKm: 300,
            semiThicknessKm: 100,
          },
        ],
      },
    ],
    [
      'Chapman',
      {
        layers: [
          {
            name: 'F2',
            shape: 'chapman',
            criticalFrequencyMHz: fc,
            peakHeightKm: 300,
            scaleHeightKm: 50,
          },
        ],
      },
    ],
  ];
  for (const [label, data] of layers) {
    it(`recovers a ${label} layer's true heights within 1 km between 0.2 and 0.95 f_c (acceptance check)`, () => {
      const { trace, trueKm } = forwardTrace(
        data,
        ratios.map((r) => r * fc),
      );
      const { samples } = invertTrace(trace);
      expect(samples).toHaveLength(ratios.length);
      let worst = 0;
      let checked = 0;
      ratios.forEach((r, k) => {
        if (r < 0.2 - 1e-9 || r > 0.95 + 1e-9) return;
        checked++;
        worst = Math.max(worst, Math.abs(samples[k].heightKm - trueKm[k]));
      });
      console.info(
        `${label} inversion: ${checked} points, largest true-height error ${worst.toFixed(4)} km`,
      );
      expect(checked).toBe(76);
      expect(worst).toBeLessThan(1);
    });
  }

  it('the first point’s true height is its virtual height (no ionization below the lowest sounded frequency)', () => {
    const trace = [1, 2, 3, 4, 5].map((f, i) => ({
      frequencyMHz: f,
      virtualHeightKm: 200 + 10 * i,
    }));
    expect(invertTrace(trace).samples[0]).toEqual({
      heightKm: 200,
      plasmaFrequencyMHz: 1,
      electronDensityPerM3: expect.any(Number),
    });
  });

  it('exact round trip: trace → invert → vertical reproduces the trace to 1e-6', () => {
    const { trace } = forwardTrace(
      layers[1][1],
      ratios.map((r) => r * fc),
    );
    const { samples } = invertTrace(trace);
    for (const key of ['electronDensityPerM3', 'plasmaFrequencyMHz'] as const) {
      const sound = createVerticalSounder(
        buildProfile({
          samples: samples.map((s) => ({ heightKm: s.heightKm, [key]: s[key] }) as never),
        }),
      );
      let worst = 0;
      for (const p of trace)
        worst = Math.max(
          worst,
          relErr(sound(p.frequencyMHz).virtualHeightKm as number, p.virtualHeightKm),
        );
      console.info(
        `round trip trace → samples (${key}) → vertical: largest relative error ${worst.toExponential(2)}`,
      );
      expect(worst).toBeLessThan(1e-6);
    }
  });

  it('exact round trip: samples → vertical → invert recovers the sample heights to 1e-6', () => {
    const samples = [
      { heightKm: 150, plasmaFrequencyMHz: 1.5 },
      { heightKm: 170, plasmaFrequencyMHz: 2.6 },
      { heightKm: 190, plasmaFrequencyMHz: 3.4 },
      { heightKm: 215, plasmaFrequencyMHz: 4.8 },
      { heightKm: 240, plasmaFrequencyMHz: 5.5 },
      { heightKm: 270, plasmaFrequencyMHz: 6.9 },
      { heightKm: 300, plasmaFrequencyMHz: 7.2 },
    ];
    const { trace } = forwardTrace(
      { samples },
      samples.map((s) => s.plasmaFrequencyMHz),
    );
    const back = invertTrace(trace).samples;
    let worst = 0;
    back.forEach((s, k) => (worst = Math.max(worst, relErr(s.heightKm, samples[k].heightKm))));
    console.info(
      `round trip samples → vertical → invert: largest relative height error ${worst.toExponential(2)}`,
    );
    expect(worst).toBeLessThan(1e-6);
  });

  it('a virtual height too low for the profile below is a NoSolutionError naming the point', () => {
    const trace = [
      { frequencyMHz: 2, virtualHeightKm: 200 },
      { frequencyMHz: 3, virtualHeightKm: 220 },
      { frequencyMHz: 4, virtualHeightKm: 240 },
      { frequencyMHz: 5, virtualHeightKm: 205 },
      { frequencyMHz: 6, virtualHeightKm: 300 },
    ];
    expect(() => invertTrace(trace)).toThrow(NoSolutionError);
    expect(() => invertTrace(trace)).toThrow(/trace\[3\]/);
  });
});
