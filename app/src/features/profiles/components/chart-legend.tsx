import { Caption1, makeStyles, tokens } from '@fluentui/react-components';

const useStyles = makeStyles({
  list: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalL}`,
    listStyle: 'none',
    margin: 0,
    padding: 0,
  },
  item: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  line: { width: '22px', height: '3px', borderRadius: '2px' },
  dot: { width: '8px', height: '8px', borderRadius: '50%', margin: '0 7px' },
});

export interface LegendEntry {
  label: string;
  color: string;
  /** 'line' for computed curves, 'dots' for measured points. */
  mark?: 'line' | 'dots';
}

/** The key of a chart, as an HTML list so screen readers read it. */
export function ChartLegend({ entries, label }: { entries: LegendEntry[]; label: string }) {
  const styles = useStyles();
  return (
    <ul className={styles.list} aria-label={label}>
      {entries.map((entry) => (
        <li key={entry.label} className={styles.item}>
          <span
            aria-hidden
            className={entry.mark === 'dots' ? styles.dot : styles.line}
            style={{ backgroundColor: entry.color }}
          />
          <Caption1>{entry.label}</Caption1>
        </li>
      ))}
    </ul>
  );
}
