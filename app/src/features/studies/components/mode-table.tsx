import {
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useTableStyles } from '@/components/data-table/table-styles';
import { EmptyState } from '@/components/empty-state';
import type { ObliqueModeResult } from '@/types/links';

const useStyles = makeStyles({
  table: { minWidth: '980px' },
  number: { textAlign: 'right', fontVariantNumeric: 'tabular-nums' },
  label: { fontWeight: tokens.fontWeightSemibold },
});

const fixed = (value: number, digits: number) =>
  Number.isFinite(value)
    ? value.toLocaleString('en-GB', {
        minimumFractionDigits: digits,
        maximumFractionDigits: digits,
      })
    : '—';

const COLUMNS: { key: string; label: string; numeric?: boolean }[] = [
  { key: 'label', label: 'Mode' },
  { key: 'hops', label: 'Hops', numeric: true },
  { key: 'layer', label: 'Layer' },
  { key: 'ray', label: 'Ray' },
  { key: 'elevationDeg', label: 'Elevation (°)', numeric: true },
  { key: 'apexHeightKm', label: 'Apex height (km)', numeric: true },
  { key: 'groupDelayMs', label: 'Group delay (ms)', numeric: true },
  { key: 'groupPathKm', label: 'Group path (km)', numeric: true },
  { key: 'phasePathKm', label: 'Phase path (km)', numeric: true },
  { key: 'phaseAdvanceKm', label: 'Phase advance (km)', numeric: true },
  { key: 'phaseAdvanceCycles', label: 'Phase advance (cycles)', numeric: true },
];

/** Every mode at one frequency, ordered by group delay (first arrival first). */
export function ModeTable({
  modes,
  frequencyMHz,
}: {
  modes: ObliqueModeResult[];
  frequencyMHz: number;
}) {
  const styles = useStyles();
  const table = useTableStyles();
  if (modes.length === 0) {
    return (
      <EmptyState title={`No sky-wave mode at ${frequencyMHz} MHz`}>
        The frequency is above every MUF of this path, or below the lowest elevation considered. Try
        a lower frequency.
      </EmptyState>
    );
  }
  const rows = [...modes].sort((a, b) => a.groupDelayMs - b.groupDelayMs);
  return (
    <div className={table.wrapper}>
      <Table className={styles.table} aria-label={`Modes at ${frequencyMHz} MHz`} size="small">
        <TableHeader>
          <TableRow>
            {COLUMNS.map((c) => (
              <TableHeaderCell key={c.key} className={c.numeric ? styles.number : undefined}>
                {c.label}
              </TableHeaderCell>
            ))}
          </TableRow>
        </TableHeader>
        <TableBody>
          {rows.map((mode, i) => (
            <TableRow key={`${mode.label}-${mode.ray}-${i}`}>
              <TableCell className={styles.label}>{mode.label}</TableCell>
              <TableCell className={styles.number}>{mode.hops}</TableCell>
              <TableCell>{mode.layer}</TableCell>
              <TableCell>{mode.ray === 'low' ? 'Low' : 'High'}</TableCell>
              <TableCell className={styles.number}>{fixed(mode.elevationDeg, 2)}</TableCell>
              <TableCell className={styles.number}>{fixed(mode.apexHeightKm, 1)}</TableCell>
              <TableCell className={styles.number}>{fixed(mode.groupDelayMs, 3)}</TableCell>
              <TableCell className={styles.number}>{fixed(mode.groupPathKm, 1)}</TableCell>
              <TableCell className={styles.number}>{fixed(mode.phasePathKm, 1)}</TableCell>
              <TableCell className={styles.number}>{fixed(mode.phaseAdvanceKm, 3)}</TableCell>
              <TableCell className={styles.number}>{fixed(mode.phaseAdvanceCycles, 0)}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </div>
  );
}
