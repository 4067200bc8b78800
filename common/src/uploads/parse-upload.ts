/**
 * Parsers for uploaded profile-sample and sounding-trace files (SPEC §3.1, §4). Pure: text in,
 * typed rows or a list of every bad row out; no I/O, so the client can pre-check a file before
 * sending it and the API applies exactly the same rules.
 *
 * CSV: a header row of the JSON field names — `heightKm,electronDensityPerM3` or
 * `heightKm,plasmaFrequencyMHz` (samples), `frequencyMHz,virtualHeightKm` (traces) — then one
 * record per line. Lines starting with `#` and blank lines are skipped. The delimiter is taken
 * from the header (comma, semicolon or tab; papaparse's guess).
 * JSON: an array of such objects, or `{ samples: [...] }` / `{ trace: [...] }`.
 *
 * Limits follow the compute schemas (common/src/compute/schemas.ts): heights 0 ≤ h < 5000 km,
 * electron density 0 ≤ N < 1e16 m⁻³, plasma frequency 0 ≤ f_p < 100 MHz, sounding frequency
 * 0.1–100 MHz, virtual height 0 < h' < 5000 km; samples ≥ 2 rows, traces ≥ 5 rows, ≤ 20 000 rows.
 */
import Papa from 'papaparse';
import type { SampleInput } from '../physics/profile.js';
import type { TracePoint } from '../physics/inversion.js';

export const MAX_UPLOAD_ROWS = 20_000;
export const MIN_SAMPLE_ROWS = 2;
export const MIN_TRACE_ROWS = 5;
const MAX_HEIGHT_KM = 5000;
const MAX_DENSITY_PER_M3 = 1e16;
const MAX_PLASMA_FREQUENCY_MHZ = 100;
const MIN_SOUNDING_FREQUENCY_MHZ = 0.1;
const MAX_SOUNDING_FREQUENCY_MHZ = 100;

/** Machine-readable reasons; `detail` says more in plain words. */
export const UPLOAD_ROW_REASONS = [
  'not a number',
  'missing value',
  'heights not increasing',
  'height out of range',
  'negative density',
  'density out of range',
  'frequency out of range',
  'frequencies not ascending',
  'virtual height out of range',
  'conflicting values',
  'no ionization',
  'too few rows',
  'too many rows',
  'unknown header',
  'not valid JSON',
  'empty file',
] as const;
export type UploadRowReason = (typeof UPLOAD_ROW_REASONS)[number];

export interface UploadRowError {
  /** 1-based data row (the header and comment lines are not counted); 0 = the file or its header. */
  row: number;
  /** 1-based line of the file (CSV); null for JSON, whose records have no line of their own. */
  line: number | null;
  /** The column (field name) at fault; null when the whole row or file is at fault. */
  column: string | null;
  reason: UploadRowReason;
  detail: string;
}

export type UploadFormat = 'csv' | 'json';
export interface ParseUploadOptions {
  format: UploadFormat;
}

export type ParseSamplesResult =
  { ok: true; samples: SampleInput[] } | { ok: false; errors: UploadRowError[] };
export type ParseTraceResult =
  { ok: true; trace: TracePoint[] } | { ok: false; errors: UploadRowError[] };

/** One record before validation: raw cell values by column, with its position in the file. */
interface RawRecord {
  row: number;
  line: number | null;
  values: Record<string, unknown>;
  /** JSON records carry typed values: a string there is not a number, even if it reads as one. */
  typed: boolean;
}

type Kind = 'samples' | 'trace';

const HEADERS: Record<Kind, string> = {
  samples: '`heightKm,electronDensityPerM3` or `heightKm,plasmaFrequencyMHz`',
  trace: '`frequencyMHz,virtualHeightKm`',
};
const COLUMNS: Record<Kind, readonly string[]> = {
  samples: ['heightKm', 'electronDensityPerM3', 'plasmaFrequencyMHz'],
  trace: ['frequencyMHz', 'virtualHeightKm'],
};

const fileError = (
  reason: UploadRowReason,
  detail: string,
  line: number | null = null,
  column: string | null = null,
): UploadRowError => ({ row: 0, line, column, reason, detail });

// A decimal number as people write it in data files (no hex, no "Infinity", no thousands separators).
const NUMBER_TEXT = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** A cell as a finite number, or the reason it is not one. */
function readNumber(value: unknown, typed: boolean): number | 'missing value' | 'not a number' {
  if (value === undefined || value === null) return 'missing value';
  if (typeof value === 'number') return Number.isFinite(value) ? value : 'not a number';
  if (typeof value === 'string' && !typed) {
    const text = value.trim();
    if (text === '') return 'missing value';
    if (!NUMBER_TEXT.test(text)) return 'not a number';
    const n = Number(text);
    return Number.isFinite(n) ? n : 'not a number';
  }
  return 'not a number';
}

// ---------------------------------------------------------------------------------------------
// Reading the file into raw records

function readCsv(
  text: string,
  kind: Kind,
): { records: RawRecord[]; columns: string[] } | UploadRowError[] {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const kept: { line: number; text: string }[] = [];
  lines.forEach((t, i) => {
    const trimmed = t.trim();
    if (trimmed !== '' && !trimmed.startsWith('#')) kept.push({ line: i + 1, text: t });
  });
  if (kept.length === 0) {
    return [fileError('empty file', `no header row; expected ${HEADERS[kind]}`)];
  }
  const header = kept[0];
  const headerParse = Papa.parse<string[]>(header.text, { delimiter: '' });
  const delimiter = headerParse.meta.delimiter || ',';
  const columns = (headerParse.data[0] ?? []).map((c) => c.trim());
  const headerErrors = checkColumns(columns, kind, header.line);
  if (headerErrors.length > 0) return headerErrors;

  const dataLines = kept.slice(1);
  if (dataLines.length > MAX_UPLOAD_ROWS) {
    return [
      fileError(
        'too many rows',
        `${dataLines.length} data rows; at most ${MAX_UPLOAD_ROWS} are accepted`,
        header.line,
      ),
    ];
  }
  const records: RawRecord[] = [];
  const errors: UploadRowError[] = [];
  dataLines.forEach(({ line, text: lineText }, i) => {
    const cells = Papa.parse<string[]>(lineText, { delimiter }).data[0] ?? [];
    if (cells.length > columns.length) {
      errors.push({
        row: i + 1,
        line,
        column: null,
        reason: 'unknown header',
        detail: `${cells.length} values but the header names ${columns.length} columns`,
      });
    }
    const values: Record<string, unknown> = {};
    columns.forEach((c, k) => (values[c] = cells[k] ?? ''));
    records.push({ row: i + 1, line, values, typed: false });
  });
  if (errors.length > 0) return errors;
  return { records, columns };
}

function checkColumns(columns: string[], kind: Kind, line: number | null): UploadRowError[] {
  const errors: UploadRowError[] = [];
  const known = COLUMNS[kind];
  const seen = new Set<string>();
  for (const c of columns) {
    if (!known.includes(c)) {
      errors.push(
        fileError('unknown header', `unknown column '${c}'; expected ${HEADERS[kind]}`, line, c),
      );
    } else if (seen.has(c)) {
      errors.push(fileError('unknown header', `column '${c}' appears twice`, line, c));
    }
    seen.add(c);
  }
  if (errors.length > 0) return errors;
  const required =
    kind === 'trace'
      ? ['frequencyMHz', 'virtualHeightKm']
      : [
          'heightKm',
          seen.has('plasmaFrequencyMHz') ? 'plasmaFrequencyMHz' : 'electronDensityPerM3',
        ];
  for (const c of required) {
    if (!seen.has(c)) {
      errors.push(
        fileError('unknown header', `column '${c}' is missing; expected ${HEADERS[kind]}`, line, c),
      );
    }
  }
  if (seen.has('electronDensityPerM3') && seen.has('plasmaFrequencyMHz')) {
    errors.push(
      fileError(
        'unknown header',
        'give either electronDensityPerM3 or plasmaFrequencyMHz, not both',
        line,
        'plasmaFrequencyMHz',
      ),
    );
  }
  return errors;
}

function readJson(text: string, kind: Kind): RawRecord[] | UploadRowError[] {
  let data: unknown;
  try {
    data = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (err) {
    return [fileError('not valid JSON', (err as Error).message)];
  }
  const list = Array.isArray(data)
    ? data
    : typeof data === 'object' &&
        data !== null &&
        Array.isArray((data as Record<string, unknown>)[kind])
      ? ((data as Record<string, unknown>)[kind] as unknown[])
      : undefined;
  if (!list) {
    return [
      fileError(
        'unknown header',
        `expected an array of records or { "${kind}": [...] } with fields ${HEADERS[kind]}`,
      ),
    ];
  }
  if (list.length > MAX_UPLOAD_ROWS) {
    return [
      fileError('too many rows', `${list.length} rows; at most ${MAX_UPLOAD_ROWS} are accepted`),
    ];
  }
  return validateRecordList(list, kind);
}

/** Array items as raw records; unknown keys and non-objects are reported per row. */
function validateRecordList(list: unknown[], kind: Kind): RawRecord[] | UploadRowError[] {
  const errors: UploadRowError[] = [];
  const records: RawRecord[] = list.map((item, i) => {
    const row = i + 1;
    if (typeof item !== 'object' || item === null || Array.isArray(item)) {
      errors.push({
        row,
        line: null,
        column: null,
        reason: 'missing value',
        detail: `row ${row} is not an object with fields ${HEADERS[kind]}`,
      });
      return { row, line: null, values: {}, typed: true };
    }
    for (const key of Object.keys(item)) {
      if (!COLUMNS[kind].includes(key)) {
        errors.push({
          row,
          line: null,
          column: key,
          reason: 'unknown header',
          detail: `unknown field '${key}'; expected ${HEADERS[kind]}`,
        });
      }
    }
    return { row, line: null, values: item as Record<string, unknown>, typed: true };
  });
  return errors.length > 0 ? errors : records;
}

// ---------------------------------------------------------------------------------------------
// Validating records

function validateSampleRecords(records: RawRecord[]): ParseSamplesResult {
  const errors: UploadRowError[] = [];
  const samples: SampleInput[] = [];
  let previousHeightKm = -Infinity;
  let anyPositive = false;
  for (const { row, line, values, typed } of records) {
    const at = (column: string | null, reason: UploadRowReason, detail: string) =>
      errors.push({ row, line, column, reason, detail });
    const h = readNumber(values.heightKm, typed);
    let heightKm: number | undefined;
    if (typeof h === 'string') at('heightKm', h, `heightKm: ${describe(values.heightKm, h)}`);
    else if (h < 0 || h >= MAX_HEIGHT_KM) {
      at('heightKm', 'height out of range', `heightKm ${h} is outside 0 ≤ h < ${MAX_HEIGHT_KM}`);
    } else if (h <= previousHeightKm) {
      at(
        'heightKm',
        'heights not increasing',
        `heightKm ${h} is not above the previous row's ${previousHeightKm}`,
      );
    } else {
      heightKm = h;
      previousHeightKm = h;
    }

    const hasN = values.electronDensityPerM3 !== undefined;
    const hasF = values.plasmaFrequencyMHz !== undefined;
    if (hasN && hasF) {
      at(null, 'conflicting values', 'give either electronDensityPerM3 or plasmaFrequencyMHz');
      continue;
    }
    const column = hasF ? 'plasmaFrequencyMHz' : 'electronDensityPerM3';
    const v = readNumber(values[column], typed);
    if (typeof v === 'string') {
      at(column, v, `${column}: ${describe(values[column], v)}`);
      continue;
    }
    if (v < 0) {
      at(column, 'negative density', `${column} ${v} is negative`);
      continue;
    }
    if (hasF && v >= MAX_PLASMA_FREQUENCY_MHZ) {
      at(
        column,
        'frequency out of range',
        `plasmaFrequencyMHz ${v} is not below ${MAX_PLASMA_FREQUENCY_MHZ}`,
      );
      continue;
    }
    if (!hasF && v >= MAX_DENSITY_PER_M3) {
      at(
        column,
        'density out of range',
        `electronDensityPerM3 ${v} is not below ${MAX_DENSITY_PER_M3}`,
      );
      continue;
    }
    anyPositive ||= v > 0;
    if (heightKm === undefined) continue;
    samples.push(
      hasF ? { heightKm, plasmaFrequencyMHz: v } : { heightKm, electronDensityPerM3: v },
    );
  }
  if (errors.length > 0) return { ok: false, errors };
  if (records.length < MIN_SAMPLE_ROWS) {
    return {
      ok: false,
      errors: [
        fileError(
          'too few rows',
          `${records.length} data rows; a samples profile needs at least ${MIN_SAMPLE_ROWS}`,
        ),
      ],
    };
  }
  if (!anyPositive) {
    return {
      ok: false,
      errors: [fileError('no ionization', 'every sample is zero; at least one must be positive')],
    };
  }
  return { ok: true, samples };
}

function validateTraceRecords(records: RawRecord[]): ParseTraceResult {
  const errors: UploadRowError[] = [];
  const trace: TracePoint[] = [];
  let previousFrequencyMHz = -Infinity;
  for (const { row, line, values, typed } of records) {
    const at = (column: string, reason: UploadRowReason, detail: string) =>
      errors.push({ row, line, column, reason, detail });
    const f = readNumber(values.frequencyMHz, typed);
    let frequencyMHz: number | undefined;
    if (typeof f === 'string') {
      at('frequencyMHz', f, `frequencyMHz: ${describe(values.frequencyMHz, f)}`);
    } else if (f < MIN_SOUNDING_FREQUENCY_MHZ || f > MAX_SOUNDING_FREQUENCY_MHZ) {
      at(
        'frequencyMHz',
        'frequency out of range',
        `frequencyMHz ${f} is outside ${MIN_SOUNDING_FREQUENCY_MHZ}–${MAX_SOUNDING_FREQUENCY_MHZ} MHz`,
      );
    } else if (f <= previousFrequencyMHz) {
      at(
        'frequencyMHz',
        'frequencies not ascending',
        `frequencyMHz ${f} is not above the previous row's ${previousFrequencyMHz}`,
      );
    } else {
      frequencyMHz = f;
      previousFrequencyMHz = f;
    }

    const h = readNumber(values.virtualHeightKm, typed);
    let virtualHeightKm: number | undefined;
    if (typeof h === 'string') {
      at('virtualHeightKm', h, `virtualHeightKm: ${describe(values.virtualHeightKm, h)}`);
    } else if (h <= 0 || h >= MAX_HEIGHT_KM) {
      at(
        'virtualHeightKm',
        'virtual height out of range',
        `virtualHeightKm ${h} is outside 0 < h' < ${MAX_HEIGHT_KM} km`,
      );
    } else virtualHeightKm = h;
    if (frequencyMHz !== undefined && virtualHeightKm !== undefined) {
      trace.push({ frequencyMHz, virtualHeightKm });
    }
  }
  if (errors.length > 0) return { ok: false, errors };
  if (records.length < MIN_TRACE_ROWS) {
    return {
      ok: false,
      errors: [
        fileError(
          'too few rows',
          `${records.length} data rows; a trace needs at least ${MIN_TRACE_ROWS}`,
        ),
      ],
    };
  }
  return { ok: true, trace };
}

function describe(value: unknown, reason: 'missing value' | 'not a number'): string {
  if (reason === 'missing value') return 'no value';
  const shown = typeof value === 'string' ? `'${value.trim()}'` : JSON.stringify(value);
  return `${shown?.slice(0, 40) ?? String(value)} is not a number`;
}

// ---------------------------------------------------------------------------------------------
// Entry points

/** Parses a samples file (CSV or JSON); on failure lists every bad row. */
export function parseSamplesFile(text: string, options: ParseUploadOptions): ParseSamplesResult {
  const read = options.format === 'csv' ? readCsv(text, 'samples') : readJson(text, 'samples');
  if (Array.isArray(read)) {
    if (isErrorList(read)) return { ok: false, errors: read };
    return validateSampleRecords(read);
  }
  return validateSampleRecords(read.records);
}

/** Parses a sounding-trace file (CSV or JSON); on failure lists every bad row. */
export function parseTraceFile(text: string, options: ParseUploadOptions): ParseTraceResult {
  const read = options.format === 'csv' ? readCsv(text, 'trace') : readJson(text, 'trace');
  if (Array.isArray(read)) {
    if (isErrorList(read)) return { ok: false, errors: read };
    return validateTraceRecords(read);
  }
  return validateTraceRecords(read.records);
}

/** Validates samples given as objects (e.g. a JSON request body) with the same rules. */
export function validateSampleList(list: unknown[]): ParseSamplesResult {
  if (list.length > MAX_UPLOAD_ROWS) {
    return {
      ok: false,
      errors: [fileError('too many rows', `at most ${MAX_UPLOAD_ROWS} rows are accepted`)],
    };
  }
  const read = validateRecordList(list, 'samples');
  return isErrorList(read) ? { ok: false, errors: read } : validateSampleRecords(read);
}

/** Validates a trace given as objects (e.g. a JSON request body) with the same rules. */
export function validateTraceList(list: unknown[]): ParseTraceResult {
  if (list.length > MAX_UPLOAD_ROWS) {
    return {
      ok: false,
      errors: [fileError('too many rows', `at most ${MAX_UPLOAD_ROWS} rows are accepted`)],
    };
  }
  const read = validateRecordList(list, 'trace');
  return isErrorList(read) ? { ok: false, errors: read } : validateTraceRecords(read);
}

function isErrorList(list: RawRecord[] | UploadRowError[]): list is UploadRowError[] {
  return list.length > 0 && 'reason' in list[0];
}

/** `row 3 (line 5), virtualHeightKm: virtual height out of range` — for logs and messages. */
export function formatUploadRowError(e: UploadRowError): string {
  const where = e.row === 0 ? 'file' : `row ${e.row}`;
  const line = e.line !== null ? ` (line ${e.line})` : '';
  const column = e.column ? `, ${e.column}` : '';
  return `${where}${line}${column}: ${e.reason} — ${e.detail}`;
}
