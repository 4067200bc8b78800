import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runCompute } from '../../src/compute/run.js';
import {
  MAX_UPLOAD_ROWS,
  formatUploadRowError,
  parseSamplesFile,
  parseTraceFile,
  validateTraceList,
  type UploadRowError,
} from '../../src/uploads/parse-upload.js';

const examples = new URL('../../../profiles/examples/', import.meta.url);
const example = (name: string) => readFileSync(new URL(name, examples), 'utf8');
const csv = { format: 'csv' } as const;
const json = { format: 'json' } as const;

function errorsOf(result: { ok: true } | { ok: false; errors: UploadRowError[] }) {
  expect(result.ok).toBe(false);
  return (result as { errors: UploadRowError[] }).errors;
}

describe('parseSamplesFile — good files', () => {
  it('reads the evening example (plasma frequency, comment lines skipped)', () => {
    const result = parseSamplesFile(example('samples-evening.csv'), csv);
    expect(result.ok).toBe(true);
    const reference = JSON.parse(
      readFileSync(new URL('../sampled-evening.json', examples), 'utf8'),
    );
    // The CSV is the same invented demo profile as profiles/sampled-evening.json.
    expect(result.ok && result.samples).toEqual(reference.profile.samples);
  });

  it('reads electron densities with exponents, CRLF line ends, a BOM and semicolons', () => {
    const text = '\uFEFFheightKm;electronDensityPerM3\r\n100;1e10\r\n# note\r\n\r\n200;2.5E11\r\n';
    expect(parseSamplesFile(text, csv)).toEqual({
      ok: true,
      samples: [
        { heightKm: 100, electronDensityPerM3: 1e10 },
        { heightKm: 200, electronDensityPerM3: 2.5e11 },
      ],
    });
  });

  it('reads JSON as an array and as { samples }', () => {
    const samples = [
      { heightKm: 100, plasmaFrequencyMHz: 0 },
      { heightKm: 200, plasmaFrequencyMHz: 5 },
    ];
    expect(parseSamplesFile(JSON.stringify(samples), json)).toEqual({ ok: true, samples });
    expect(parseSamplesFile(JSON.stringify({ samples }), json)).toEqual({ ok: true, samples });
  });
});

describe('parseSamplesFile — every bad row is reported', () => {
  it('lists all four faults of the bad example with row and line numbers', () => {
    const errors = errorsOf(parseSamplesFile(example('bad-samples.csv'), csv));
    expect(errors.map(({ row, line, column, reason }) => ({ row, line, column, reason }))).toEqual([
      { row: 2, line: 4, column: 'electronDensityPerM3', reason: 'not a number' },
      { row: 3, line: 5, column: 'heightKm', reason: 'heights not increasing' },
      { row: 4, line: 6, column: 'electronDensityPerM3', reason: 'missing value' },
      { row: 5, line: 7, column: 'electronDensityPerM3', reason: 'negative density' },
    ]);
    expect(formatUploadRowError(errors[0])).toContain('row 2 (line 4), electronDensityPerM3');
  });

  it('reports an unknown header with its column', () => {
    const errors = errorsOf(parseSamplesFile(example('bad-header.csv'), csv));
    expect(errors[0]).toMatchObject({
      row: 0,
      line: 2,
      column: 'density',
      reason: 'unknown header',
    });
  });

  it('reports too few rows, out-of-range values, an empty file and too many rows', () => {
    expect(errorsOf(parseSamplesFile('heightKm,electronDensityPerM3\n100,1e11\n', csv))).toEqual([
      expect.objectContaining({ row: 0, reason: 'too few rows' }),
    ]);
    expect(
      errorsOf(parseSamplesFile('heightKm,plasmaFrequencyMHz\n-1,1\n100,120\n6000,2\n', csv)).map(
        (e) => [e.row, e.reason],
      ),
    ).toEqual([
      [1, 'height out of range'],
      [2, 'frequency out of range'],
      [3, 'height out of range'],
    ]);
    expect(errorsOf(parseSamplesFile('# only a comment\n', csv))[0].reason).toBe('empty file');
    const big = ['heightKm,electronDensityPerM3'];
    for (let i = 0; i <= MAX_UPLOAD_ROWS; i++) big.push(`${i * 0.1},1e10`);
    expect(errorsOf(parseSamplesFile(big.join('\n'), csv))).toEqual([
      expect.objectContaining({ row: 0, reason: 'too many rows' }),
    ]);
  });

  it('reports bad JSON records and invalid JSON', () => {
    const errors = errorsOf(
      parseSamplesFile(
        JSON.stringify([
          { heightKm: 100, electronDensityPerM3: 1e10 },
          { heightKm: '110', electronDensityPerM3: 2e10 },
          { heightKm: 120, electronDensityPerM3: 1e10, colour: 'red' },
        ]),
        json,
      ),
    );
    expect(errors).toEqual([
      expect.objectContaining({ row: 3, line: null, column: 'colour', reason: 'unknown header' }),
    ]);
    expect(
      errorsOf(parseSamplesFile('[{"heightKm":"110","electronDensityPerM3":2e10}]', json))[0],
    ).toMatchObject({ row: 1, column: 'heightKm', reason: 'not a number' });
    expect(errorsOf(parseSamplesFile('[{', json))[0].reason).toBe('not valid JSON');
  });

  it('refuses a profile that is zero everywhere', () => {
    expect(
      errorsOf(parseSamplesFile('heightKm,plasmaFrequencyMHz\n1,0\n2,0\n', csv))[0].reason,
    ).toBe('no ionization');
  });
});

describe('parseTraceFile', () => {
  it('reads the quiet-day example trace', () => {
    const result = parseTraceFile(example('sounding-trace-quiet-day.csv'), csv);
    expect(result.ok).toBe(true);
    expect(result.ok && result.trace.length).toBe(83);
  });

  it('the example trace is the vertical ionogram of the quiet-day F2 layer, rounded to 0.1 km', () => {
    // Provenance check of the invented demo file (synthesised with the physics core, whose
    // vertical routine is itself checked against the parabolic closed form of Davies 1990).
    const result = parseTraceFile(example('sounding-trace-quiet-day.csv'), csv);
    if (!result.ok) throw new Error('example trace does not parse');
    const quietDay = JSON.parse(readFileSync(new URL('../quiet-day.json', examples), 'utf8'));
    const f2 = quietDay.profile.layers.filter((l: { name: string }) => l.name === 'F2');
    const echoes = runCompute('vertical', {
      profile: { layers: f2 },
      frequenciesMHz: result.trace.map((p) => p.frequencyMHz),
    }).echoes;
    result.trace.forEach((p, i) => {
      expect(
        Math.abs(p.virtualHeightKm - (echoes[i].virtualHeightKm as number)),
      ).toBeLessThanOrEqual(0.05 + 1e-9);
    });
  });

  it('lists every fault of the bad example', () => {
    const errors = errorsOf(parseTraceFile(example('bad-trace.csv'), csv));
    expect(errors.map(({ row, line, column, reason }) => ({ row, line, column, reason }))).toEqual([
      { row: 2, line: 4, column: 'frequencyMHz', reason: 'frequency out of range' },
      { row: 3, line: 5, column: 'frequencyMHz', reason: 'frequencies not ascending' },
      { row: 4, line: 6, column: 'virtualHeightKm', reason: 'virtual height out of range' },
    ]);
  });

  it('needs at least 5 rows and the trace header', () => {
    const few = 'frequencyMHz,virtualHeightKm\n2,200\n3,210\n4,230\n5,260\n';
    expect(errorsOf(parseTraceFile(few, csv))[0]).toMatchObject({ reason: 'too few rows' });
    expect(errorsOf(parseTraceFile('heightKm,plasmaFrequencyMHz\n1,2\n', csv))[0]).toMatchObject({
      reason: 'unknown header',
      column: 'heightKm',
    });
    expect(errorsOf(parseTraceFile('frequencyMHz\n1\n', csv))[0]).toMatchObject({
      reason: 'unknown header',
      column: 'virtualHeightKm',
    });
  });

  it('reads { trace } JSON and validates lists from request bodies the same way', () => {
    const trace = [2, 3, 4, 5, 6].map((f, i) => ({
      frequencyMHz: f,
      virtualHeightKm: 200 + i * 10,
    }));
    expect(parseTraceFile(JSON.stringify({ trace }), json)).toEqual({ ok: true, trace });
    const bad = validateTraceList([
      ...trace.slice(0, 4),
      { frequencyMHz: 0.05, virtualHeightKm: 0 },
    ]);
    expect(errorsOf(bad).map((e) => [e.row, e.column, e.reason])).toEqual([
      [5, 'frequencyMHz', 'frequency out of range'],
      [5, 'virtualHeightKm', 'virtual height out of range'],
    ]);
  });
});
