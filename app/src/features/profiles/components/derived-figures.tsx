import { Caption1, Body1Strong, makeStyles, tokens } from '@fluentui/react-components';
import { fixed } from '../utils/format';

const useStyles = makeStyles({
  list: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(120px, 1fr))',
    gap: tokens.spacingHorizontalM,
    margin: 0,
  },
  item: {
    display: 'flex',
    flexDirection: 'column',
    padding: tokens.spacingHorizontalM,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground2,
  },
  term: { color: tokens.colorNeutralForeground3 },
  value: { margin: 0, fontSize: tokens.fontSizeBase500 },
});

export interface Figure {
  term: string;
  value: number | null | undefined;
  unit: string;
  digits: number;
}

/** Key numbers of a profile (foE, foF2, hmF2, TEC…) as a description list. */
export function DerivedFigures({ figures, label }: { figures: Figure[]; label: string }) {
  const styles = useStyles();
  return (
    <dl className={styles.list} aria-label={label}>
      {figures.map((f) => (
        <div key={f.term} className={styles.item}>
          <dt>
            <Caption1 className={styles.term}>{f.term}</Caption1>
          </dt>
          <dd className={styles.value}>
            <Body1Strong>{fixed(f.value, f.digits)}</Body1Strong>{' '}
            {f.value !== null && f.value !== undefined && <Caption1>{f.unit}</Caption1>}
          </dd>
        </div>
      ))}
    </dl>
  );
}
