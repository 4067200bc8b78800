import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  UPLOAD_ROW_REASONS,
  parseSamplesFile,
  parseTraceFile,
  type ParseSamplesResult,
  type ParseTraceResult,
  type UploadFormat,
} from './parse-upload.js';

/**
 * Property-based fuzzing of the upload parsers with hostile files: they never throw, and every
 * failure names a row (0 = the file) and a known reason; every success holds only finite numbers.
 */

const RUNS = Number(process.env.HOPWISE_FUZZ_RUNS ?? 300);
const SEED = Number(process.env.HOPWISE_FUZZ_SEED ?? 20260318);

const hostileCell = fc.oneof(
  fc.constantFrom(
    'NaN',
    'Infinity',
    '-Infinity',
    '1e309',
    '-1e309',
    '0x1F',
    '1_000',
    '',
    ' ',
    '"',
    '""',
    '1,5',
    '١٢٣',
    '=cmd|"/c calc"!A1',
    "'; DROP TABLE profiles; --",
    '<script>alert(1)</script>',
    '__proto__',
    'constructor',
    '\u0000',
    '\uFEFF',
    '\u202E12',
  ),
  fc.double().map(String),
  fc.integer().map(String),
  fc.string({ maxLength: 12, unit: 'grapheme' }),
);

const HEADERS = [
  'heightKm,electronDensityPerM3',
  'heightKm,plasmaFrequencyMHz',
  'frequencyMHz,virtualHeightKm',
  'heightKm,electronDensityPerM3,plasmaFrequencyMHz',
  '__proto__,constructor',
  '',
  '#',
];

/** CSV text: a header (maybe hostile), up to 40 rows of hostile cells, odd separators, cut short. */
const csvText = fc
  .record({
    header: fc.oneof(fc.constantFrom(...HEADERS), fc.string({ maxLength: 30 })),
    rows: fc.array(fc.array(hostileCell, { minLength: 0, maxLength: 4 }), { maxLength: 40 }),
    eol: fc.constantFrom('\n', '\r\n', '\r', ';'),
    cut: fc.option(fc.nat(), { nil: undefined }),
  })
  .map(({ header, rows, eol, cut }) => {
    const text = [header, ...rows.map((r) => r.join(','))].join(eol);
    return cut === undefined ? text : text.slice(0, cut % (text.length + 1));
  });

/** JSON text: arbitrary JSON (deep, wide, unicode), arrays of half-right records, or truncated. */
const record = fc.dictionary(
  fc.constantFrom(
    'heightKm',
    'electronDensityPerM3',
    'plasmaFrequencyMHz',
    'frequencyMHz',
    'virtualHeightKm',
    '__proto__',
    'constructor',
  ),
  fc.oneof(fc.double(), hostileCell, fc.constant(null), fc.array(fc.integer(), { maxLength: 3 })),
  { maxKeys: 4 },
);
const jsonText = fc.oneof(
  fc.jsonValue({ maxDepth: 6 }).map((v) => JSON.stringify(v)),
  fc.array(record, { maxLength: 40 }).map((v) => JSON.stringify(v)),
  fc.record({ samples: fc.array(record, { maxLength: 10 }) }).map((v) => JSON.stringify(v)),
  fc.tuple(fc.array(record, { minLength: 1, maxLength: 10 }), fc.nat()).map(([v, cut]) => {
    const s = JSON.stringify(v);
    return s.slice(0, cut % s.length);
  }),
  fc.nat({ max: 5000 }).map((depth) => '['.repeat(depth) + ']'.repeat(depth)),
  fc.string({ maxLength: 200, unit: 'binary' }),
);

function checkResult(result: ParseSamplesResult | ParseTraceResult): void {
  if (result.ok) {
    const rows = 'samples' in result ? result.samples : result.trace;
    for (const row of rows) {
      for (const value of Object.values(row)) expect(Number.isFinite(value)).toBe(true);
    }
    return;
  }
  expect(result.errors.length).toBeGreaterThan(0);
  for (const e of result.errors) {
    expect(Number.isInteger(e.row) && e.row >= 0).toBe(true);
    expect(UPLOAD_ROW_REASONS).toContain(e.reason);
    expect(typeof e.detail).toBe('string');
    expect(e.detail.length).toBeGreaterThan(0);
  }
}

describe('upload parsers under hostile files (fast-check)', () => {
  const cases: [string, UploadFormat, fc.Arbitrary<string>][] = [
    ['CSV', 'csv', csvText],
    ['JSON', 'json', jsonText],
  ];
  for (const [label, format, text] of cases) {
    it(`parseSamplesFile never throws on ${label} and names the row of every error`, () => {
      fc.assert(
        fc.property(text, (t) => checkResult(parseSamplesFile(t, { format }))),
        { numRuns: RUNS, seed: SEED },
      );
    });
    it(`parseTraceFile never throws on ${label} and names the row of every error`, () => {
      fc.assert(
        fc.property(text, (t) => checkResult(parseTraceFile(t, { format }))),
        { numRuns: RUNS, seed: SEED },
      );
    });
  }

  it('refuses a file over the row limit without building it row by row', () => {
    const big = [
      'heightKm,electronDensityPerM3',
      ...Array.from({ length: 20_001 }, (_, i) => `${100 + i},1e10`),
    ];
    const result = parseSamplesFile(big.join('\n'), { format: 'csv' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.map((e) => e.reason)).toContain('too many rows');
  });
});
