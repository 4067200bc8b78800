import type { StudyView } from '@hopwise/common';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { studyCsv } from './study-csv.js';

const mode = {
  label: '1F2',
  hops: 1,
  layer: 'F2',
  ray: 'low' as const,
  elevationDeg: 21.5,
  apexHeightKm: 280,
  groupPathKm: 960,
  phasePathKm: 930,
  groupDelayMs: 3.2,
  phaseAdvanceKm: 30,
  phaseAdvanceCycles: 1000,
};

const study = (perFrequency: StudyView['result']['perFrequency']): StudyView => ({
  id: 9,
  ownerId: 1,
  linkId: 2,
  name: null,
  atUtc: '2026-03-18T13:00:00.000Z',
  profileSource: { kind: 'reference', key: 'quiet-day' },
  profile: { layers: [] },
  frequenciesMHz: perFrequency.map((f) => f.frequencyMHz),
  result: { groundRangeKm: 855, perFrequency },
  createdAt: '2026-03-18T13:05:00.000Z',
  updatedAt: '2026-03-18T13:05:00.000Z',
});

describe('studyCsv', () => {
  it('writes one row per mode and one empty-mode row for a frequency without modes', () => {
    const mufMHz = { '1': 12.7, '2': 10, '3': null, '4': null };
    const csv = studyCsv(
      study([
        {
          frequencyMHz: 10,
          modes: [mode, { ...mode, ray: 'high' }],
          mufMHz,
          multipathSpreadMs: 0.1,
        },
        { frequencyMHz: 16, modes: [], mufMHz, multipathSpreadMs: null },
      ]),
      'Ridge to Vale',
    );
    expect(csv.endsWith('\r\n')).toBe(true);
    const rows = Papa.parse<Record<string, string>>(csv.trim(), { header: true }).data;
    expect(rows.map((r) => [r.frequency_mhz, r.label, r.ray, r.muf_1_mhz, r.muf_3_mhz])).toEqual([
      ['10', '1F2', 'low', '12.7', ''],
      ['10', '1F2', 'high', '12.7', ''],
      ['16', '', '', '12.7', ''],
    ]);
    expect(rows[2].multipath_spread_ms).toBe('');
  });

  it('defuses a link name that a spreadsheet would run as a formula', () => {
    const csv = studyCsv(
      study([{ frequencyMHz: 10, modes: [mode], multipathSpreadMs: 0 }]),
      '=HYPERLINK("x")',
    );
    const row = Papa.parse<Record<string, string>>(csv.trim(), { header: true }).data[0];
    expect(row.link).toBe('\'=HYPERLINK("x")');
  });
});
