import { describe, expect, it } from 'vitest';
import { InputError } from '../physics/errors.js';
import {
  invertRequestSchema,
  obliqueRequestSchema,
  parseRequest,
  plasmaRequestSchema,
  slantRequestSchema,
  verticalRequestSchema,
} from './schemas.js';

const E = {
  name: 'E',
  shape: 'parabolic',
  criticalFrequencyMHz: 3,
  peakHeightKm: 110,
  semiThicknessKm: 20,
};
const profile = { layers: [E] };

/** Parses and returns the InputError's fields (the test fails if the body is accepted). */
function fieldsOf(
  schema: Parameters<typeof parseRequest>[0],
  body: unknown,
): Record<string, string> {
  try {
    parseRequest(schema, body);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    const fields = (err as InputError).fields;
    expect((err as Error).message.startsWith(Object.keys(fields)[0])).toBe(true);
    return fields;
  }
  throw new Error('body was accepted');
}

describe('compute request schemas reject bad input naming the field (SPEC §3: 400 naming the field)', () => {
  it.each([
    [
      'NaN frequency',
      verticalRequestSchema,
      { profile, frequenciesMHz: [Number.NaN] },
      'frequenciesMHz[0]',
    ],
    [
      'Infinity frequency',
      verticalRequestSchema,
      { profile, frequenciesMHz: [5, Infinity] },
      'frequenciesMHz[1]',
    ],
    [
      'string frequency',
      verticalRequestSchema,
      { profile, frequenciesMHz: ['5'] },
      'frequenciesMHz[0]',
    ],
    [
      'frequency above 100 MHz',
      verticalRequestSchema,
      { profile, frequenciesMHz: [101] },
      'frequenciesMHz[0]',
    ],
    [
      'frequency below 0.1 MHz',
      verticalRequestSchema,
      { profile, frequenciesMHz: [0.05] },
      'frequenciesMHz[0]',
    ],
    ['no frequencies', verticalRequestSchema, { profile, frequenciesMHz: [] }, 'frequenciesMHz'],
    [
      '2001 frequencies',
      verticalRequestSchema,
      { profile, frequenciesMHz: Array(2001).fill(5) },
      'frequenciesMHz',
    ],
    [
      'negative critical frequency',
      verticalRequestSchema,
      {
        profile: { layers: [E, { ...E, name: 'F', criticalFrequencyMHz: -1 }] },
        frequenciesMHz: [5],
      },
      'profile.layers[1].criticalFrequencyMHz',
    ],
    [
      'missing semi-thickness',
      verticalRequestSchema,
      { profile: { layers: [{ ...E, semiThicknessKm: undefined }] }, frequenciesMHz: [5] },
      'profile.layers[0].semiThicknessKm',
    ],
    [
      'unknown layer key',
      verticalRequestSchema,
      { profile: { layers: [{ ...E, colour: 'red' }] }, frequenciesMHz: [5] },
      'profile.layers[0].colour',
    ],
    [
      'unknown body key',
      verticalRequestSchema,
      { profile, frequenciesMHz: [5], extra: 1 },
      'extra',
    ],
    [
      'negative sample height',
      verticalRequestSchema,
      {
        profile: {
          samples: [
            { heightKm: -1, electronDensityPerM3: 0 },
            { heightKm: 100, electronDensityPerM3: 1 },
          ],
        },
        frequenciesMHz: [5],
      },
      'profile.samples[0].heightKm',
    ],
    [
      'single sample',
      verticalRequestSchema,
      { profile: { samples: [{ heightKm: 100, electronDensityPerM3: 1 }] }, frequenciesMHz: [5] },
      'profile.samples',
    ],
    [
      'empty layers',
      verticalRequestSchema,
      { profile: { layers: [] }, frequenciesMHz: [5] },
      'profile.layers',
    ],
    [
      'layers and id',
      verticalRequestSchema,
      { profile: { id: 3, layers: [E] }, frequenciesMHz: [5] },
      'profile',
    ],
    ['body not an object', verticalRequestSchema, null, 'body'],
    [
      'both density and plasma frequency',
      plasmaRequestSchema,
      { electronDensityPerM3: 1, plasmaFrequencyMHz: 1, frequencyMHz: 5 },
      'body',
    ],
    [
      'negative density',
      plasmaRequestSchema,
      { electronDensityPerM3: -1, frequencyMHz: 5 },
      'electronDensityPerM3',
    ],
    [
      'ground range 0',
      obliqueRequestSchema,
      { profile, frequencyMHz: 7, groundRangeKm: 0 },
      'groundRangeKm',
    ],
    [
      'ground range beyond 20000 km',
      obliqueRequestSchema,
      { profile, frequencyMHz: 7, groundRangeKm: 20001 },
      'groundRangeKm',
    ],
    [
      '7 hops',
      obliqueRequestSchema,
      { profile, frequencyMHz: 7, groundRangeKm: 1000, maxHops: 7 },
      'maxHops',
    ],
    [
      'fractional hops',
      obliqueRequestSchema,
      { profile, frequencyMHz: 7, groundRangeKm: 1000, maxHops: 1.5 },
      'maxHops',
    ],
    [
      'unknown earth',
      obliqueRequestSchema,
      { profile, frequencyMHz: 7, groundRangeKm: 1000, earth: 'oblate' },
      'earth',
    ],
    [
      'elevation above 90°',
      slantRequestSchema,
      { profile, frequencyMHz: 1575.42, elevationDeg: 91 },
      'elevationDeg',
    ],
    [
      'negative elevation',
      slantRequestSchema,
      { profile, frequencyMHz: 1575.42, elevationDeg: -1 },
      'elevationDeg',
    ],
    [
      'trace of 4 points',
      invertRequestSchema,
      { trace: [1, 2, 3, 4].map((f) => ({ frequencyMHz: f, virtualHeightKm: 200 })) },
      'trace',
    ],
    [
      'trace not ascending',
      invertRequestSchema,
      { trace: [1, 2, 3, 3, 5].map((f) => ({ frequencyMHz: f, virtualHeightKm: 200 })) },
      'trace[3].frequencyMHz',
    ],
    [
      'trace with NaN height',
      invertRequestSchema,
      {
        trace: [1, 2, 3, 4, 5].map((f) => ({
          frequencyMHz: f,
          virtualHeightKm: f === 4 ? Number.NaN : 200,
        })),
      },
      'trace[3].virtualHeightKm',
    ],
  ])('%s', (_label, schema, body, field) => {
    expect(Object.keys(fieldsOf(schema, body))[0]).toBe(field);
  });

  it('applies the oblique defaults (maxHops 4, minElevationDeg 3, spherical, mufs, no ray path)', () => {
    expect(
      parseRequest(obliqueRequestSchema, { profile, frequencyMHz: 7, groundRangeKm: 1000 }),
    ).toEqual({
      profile,
      frequencyMHz: 7,
      groundRangeKm: 1000,
      maxHops: 4,
      minElevationDeg: 3,
      earth: 'spherical',
      mufs: true,
      includeRayPath: false,
    });
  });

  it('applies the slant default top height (2000 km)', () => {
    expect(
      parseRequest(slantRequestSchema, { profile, frequencyMHz: 1575.42, elevationDeg: 30 })
        .topHeightKm,
    ).toBe(2000);
  });
});
