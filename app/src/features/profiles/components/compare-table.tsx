import {
  Caption1,
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
import type { CompareItem } from '../api/types';
import { fixed, signedDifference } from '../utils/format';
import { seriesColor } from './chart-colors';

const useStyles = makeStyles({
  numeric: { fontVariantNumeric: 'tabular-nums' },
  cell: { display: 'flex', flexDirection: 'column', paddingBlock: tokens.spacingVerticalXS },
  delta: { color: tokens.colorNeutralForeground3 },
  swatch: {
    display: 'inline-block',
    width: '10px',
    height: '10px',
    borderRadius: '2px',
    marginRight: tokens.spacingHorizontalS,
  },
});

interface Quantity {
  label: string;
  digits: number;
  value: (item: CompareItem) => number | null;
}

function quantities(groundRangesKm: readonly number[], frequencyMHz: number): Quantity[] {
  const atRange = (km: number) => (item: CompareItem) =>
    item.perRange.find((r) => r.groundRangeKm === km) ?? null;
  return [
    { label: 'foE (MHz)', digits: 2, value: (i) => i.foEMHz },
    { label: 'foF2 (MHz)', digits: 2, value: (i) => i.foF2MHz },
    { label: 'hmF2 (km)', digits: 1, value: (i) => i.hmF2Km },
    { label: 'F2 semi-thickness (km)', digits: 1, value: (i) => i.semiThicknessKm },
    { label: 'Vertical TEC (TECU)', digits: 2, value: (i) => i.verticalTecu },
    ...groundRangesKm.flatMap((km): Quantity[] => [
      {
        label: `1-hop MUF at ${km} km (MHz)`,
        digits: 2,
        value: (i) => atRange(km)(i)?.muf1MHz ?? null,
      },
      {
        label: `Group delay at ${km} km, ${frequencyMHz} MHz (ms)`,
        digits: 3,
        value: (i) => atRange(km)(i)?.groupDelayMs ?? null,
      },
    ]),
  ];
}

/** Figures of 2–4 profiles side by side; every profile after the first shows its difference to it. */
export function CompareTable({
  items,
  groundRangesKm,
  frequencyMHz,
}: {
  items: CompareItem[];
  groundRangesKm: readonly number[];
  frequencyMHz: number;
}) {
  const styles = useStyles();
  const table = useTableStyles();
  const [reference] = items;
  return (
    <div className={table.wrapper}>
      <Table aria-label="Differences between the profiles" size="small">
        <TableHeader>
          <TableRow>
            <TableHeaderCell>Quantity</TableHeaderCell>
            {items.map((item, index) => (
              <TableHeaderCell key={item.id}>
                <span
                  className={styles.swatch}
                  style={{ backgroundColor: seriesColor(index) }}
                  aria-hidden
                />
                {item.name}
                {index === 0 ? ' (reference)' : ''}
              </TableHeaderCell>
            ))}
          </TableRow>
        </TableHeader>
        <TableBody>
          {quantities(groundRangesKm, frequencyMHz).map((q) => (
            <TableRow key={q.label}>
              <TableCell>{q.label}</TableCell>
              {items.map((item, index) => (
                <TableCell key={item.id} className={styles.numeric}>
                  <span className={styles.cell}>
                    <span>{fixed(q.value(item), q.digits)}</span>
                    {index > 0 && (
                      <Caption1 className={styles.delta}>
                        Δ {signedDifference(q.value(item), q.value(reference), q.digits)}
                      </Caption1>
                    )}
                  </span>
                </TableCell>
              ))}
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </div>
  );
}
