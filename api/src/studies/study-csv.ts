import { STUDY_CSV_COLUMNS, type StudyView } from '@hopwise/common';
import Papa from 'papaparse';

type CsvRow = Record<(typeof STUDY_CSV_COLUMNS)[number], string | number>;

/**
 * One row per (frequency, mode); a frequency without any mode still gets one row with the mode
 * columns empty, so "no sky wave at f" is visible. RFC 4180 quoting and CRLF by papaparse;
 * cells starting with = + - @ are escaped against spreadsheet formula injection.
 */
export function studyCsv(study: StudyView, linkName: string): string {
  const rows: CsvRow[] = [];
  for (const f of study.result.perFrequency) {
    const muf = (n: number) => f.mufMHz?.[String(n)] ?? '';
    const common = {
      study_id: study.id,
      link: linkName,
      at_utc: study.atUtc,
      frequency_mhz: f.frequencyMHz,
      muf_1_mhz: muf(1),
      muf_2_mhz: muf(2),
      muf_3_mhz: muf(3),
      muf_4_mhz: muf(4),
      multipath_spread_ms: f.multipathSpreadMs ?? '',
    };
    const none = {
      label: '',
      hops: '',
      layer: '',
      ray: '',
      elevation_deg: '',
      apex_height_km: '',
      group_path_km: '',
      phase_path_km: '',
      group_delay_ms: '',
      phase_advance_km: '',
      phase_advance_cycles: '',
    };
    if (f.modes.length === 0) rows.push({ ...common, ...none });
    for (const m of f.modes) {
      rows.push({
        ...common,
        label: m.label,
        hops: m.hops,
        layer: m.layer,
        ray: m.ray,
        elevation_deg: m.elevationDeg,
        apex_height_km: m.apexHeightKm,
        group_path_km: m.groupPathKm,
        phase_path_km: m.phasePathKm,
        group_delay_ms: m.groupDelayMs,
        phase_advance_km: m.phaseAdvanceKm,
        phase_advance_cycles: m.phaseAdvanceCycles,
      });
    }
  }
  const csv = Papa.unparse(
    { fields: [...STUDY_CSV_COLUMNS], data: rows.map((r) => STUDY_CSV_COLUMNS.map((c) => r[c])) },
    { newline: '\r\n', escapeFormulae: true },
  );
  return `${csv}\r\n`;
}
