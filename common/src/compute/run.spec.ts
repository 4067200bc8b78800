import quietDayFile from '../../../profiles/quiet-day.json' with { type: 'json' };
import { describe, expect, it } from 'vitest';
import { ConvergenceError, InputError, NoSolutionError } from '../physics/errors.js';
import type { ProfileData } from '../physics/profile.js';
import { computeErrorStatus, runCompute } from './run.js';

// Invented demo profile (profiles/README.md).
const quietDay = quietDayFile.profile as unknown as ProfileData;

/** Status and fields of what runCompute throws (200 when it returns). */
function outcome(
  route: Parameters<typeof runCompute>[0],
  body: unknown,
  options?: Parameters<typeof runCompute>[2],
) {
  try {
    return { status: 200, body: runCompute(route, body, options) as unknown };
  } catch (err) {
    return computeErrorStatus(err);
  }
}

describe('runCompute', () => {
  it('plasma: response fields per SPEC §3', () => {
    const r = outcome('plasma', { plasmaFrequencyMHz: 6, frequencyMHz: 10 });
    expect(r.status).toBe(200);
    expect(Object.keys((r as { body: object }).body).sort()).toEqual(
      [
        'electronDensityPerM3',
        'groupIndex',
        'groupVelocityMps',
        'phaseVelocityMps',
        'plasmaFrequencyMHz',
        'propagates',
        'refractiveIndex',
      ].sort(),
    );
  });

  it('vertical: echoes and critical frequencies', () => {
    const r = runCompute('vertical', { profile: quietDay, frequenciesMHz: [2, 5, 12] });
    expect(Object.keys(r.criticalFrequenciesMHz)).toEqual(['E', 'F1', 'F2']);
    expect(r.echoes.map((e) => e.reflected)).toEqual([true, true, false]);
    expect(Object.keys(r.echoes[0]).sort()).toEqual([
      'frequencyMHz',
      'groupDelayMs',
      'phaseHeightKm',
      'reflected',
      'trueHeightKm',
      'virtualHeightKm',
    ]);
  });

  it('oblique: modes and spread from computeOblique (physics/homing.ts); 400 for a bad field', () => {
    const profile = {
      layers: [
        {
          name: 'F2',
          shape: 'parabolic',
          criticalFrequencyMHz: 8,
          peakHeightKm: 300,
          semiThicknessKm: 80,
        },
      ],
    };
    const r = runCompute('oblique', {
      profile,
      frequencyMHz: 7,
      groundRangeKm: 1000,
      maxHops: 2,
      mufs: false,
    });
    expect(r.modes.length).toBeGreaterThan(0);
    expect(r.modes[0].label).toBe('1F2');
    expect(r.mufMHz).toBeUndefined();
    expect(
      outcome('oblique', { profile, frequencyMHz: 7, groundRangeKm: 1000, maxHops: 7 }),
    ).toMatchObject({ status: 400, fields: { maxHops: expect.any(String) } });
  });

  it('slant: 200, and 422 below the plasma frequency', () => {
    expect(
      outcome('slant', { profile: quietDay, frequencyMHz: 1575.42, elevationDeg: 30 }).status,
    ).toBe(200);
    const below = outcome('slant', { profile: quietDay, frequencyMHz: 5, elevationDeg: 30 });
    expect(below.status).toBe(422);
    expect((below as { message: string }).message).toMatch(/plasma frequency/);
  });

  it('invert: 200, and 422 naming the point for a trace that is too low', () => {
    const ok = outcome('invert', {
      trace: [1, 2, 3, 4, 5].map((f, i) => ({ frequencyMHz: f, virtualHeightKm: 200 + 15 * i })),
    });
    expect(ok.status).toBe(200);
    const bad = outcome('invert', {
      trace: [1, 2, 3, 4, 5].map((f, i) => ({
        frequencyMHz: f,
        virtualHeightKm: i === 2 ? 150 : 200 + 15 * i,
      })),
    });
    expect(bad).toMatchObject({ status: 422, message: expect.stringContaining('trace[2]') });
  });

  it('400 naming the field for malformed input', () => {
    const r = outcome('vertical', {
      profile: {
        layers: [{ name: 'E', shape: 'parabolic', criticalFrequencyMHz: 3, peakHeightKm: 110 }],
      },
      frequenciesMHz: [5],
    });
    expect(r).toMatchObject({
      status: 400,
      fields: { 'profile.layers[0].semiThicknessKm': expect.any(String) },
    });
    const dup = outcome('vertical', {
      profile: {
        samples: [
          { heightKm: 100, electronDensityPerM3: 1 },
          { heightKm: 90, electronDensityPerM3: 2 },
        ],
      },
      frequenciesMHz: [5],
    });
    expect(dup).toMatchObject({
      status: 400,
      fields: { 'profile.samples[1].heightKm': expect.any(String) },
    });
    expect(outcome('nope' as never, {})).toMatchObject({
      status: 400,
      fields: { route: expect.any(String) },
    });
  });

  it('a stored profile { id } needs a resolver; unknown ids are 400 on profile.id', () => {
    const body = { profile: { id: 7 }, frequenciesMHz: [5] };
    expect(outcome('vertical', body)).toMatchObject({
      status: 400,
      fields: { 'profile.id': expect.stringContaining('server') },
    });
    expect(outcome('vertical', body, { resolveProfile: () => undefined })).toMatchObject({
      status: 400,
      fields: { 'profile.id': 'no profile with id 7' },
    });
    const resolved = outcome('vertical', body, {
      resolveProfile: (id) => (id === 7 ? quietDay : undefined),
    });
    expect(resolved.status).toBe(200);
  });

  it('computeErrorStatus maps the error types', () => {
    expect(computeErrorStatus(new InputError('x: bad', { x: 'bad' }))).toEqual({
      status: 400,
      message: 'x: bad',
      fields: { x: 'bad' },
    });
    expect(computeErrorStatus(new NoSolutionError('none', 'r')).status).toBe(422);
    expect(computeErrorStatus(new ConvergenceError('stuck', {})).status).toBe(422);
    expect(computeErrorStatus(new Error('boom'))).toEqual({
      status: 500,
      message: 'internal error',
    });
  });
});
