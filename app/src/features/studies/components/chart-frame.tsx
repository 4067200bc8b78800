import { Caption1, Subtitle2, makeStyles, tokens } from '@fluentui/react-components';
import type { ReactNode } from 'react';

const useStyles = makeStyles({
  figure: {
    margin: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    padding: tokens.spacingHorizontalL,
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
    minWidth: 0,
  },
  legend: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalM}`,
    listStyleType: 'none',
    margin: 0,
    padding: 0,
  },
  item: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalXS },
  note: { color: tokens.colorNeutralForeground3 },
});

interface ChartFrameProps {
  id: string;
  title: string;
  note?: ReactNode;
  legend?: { name: string; color: string; dashed?: boolean }[];
  children: ReactNode;
}

/** A chart with its heading, an HTML legend (read by screen readers) and a note. */
export function ChartFrame({ id, title, note, legend, children }: ChartFrameProps) {
  const styles = useStyles();
  return (
    <figure className={styles.figure} aria-labelledby={`${id}-title`} data-chart={id}>
      <Subtitle2 as="h3" id={`${id}-title`}>
        {title}
      </Subtitle2>
      {children}
      {legend && legend.length > 0 && (
        <ul className={styles.legend} aria-label={`${title}: curves`}>
          {legend.map((entry) => (
            <li key={entry.name} className={styles.item}>
              <svg width="22" height="6" aria-hidden focusable="false">
                <line
                  x1="1"
                  y1="3"
                  x2="21"
                  y2="3"
                  stroke={entry.color}
                  strokeWidth="3"
                  strokeDasharray={entry.dashed ? '5 3' : undefined}
                />
              </svg>
              <Caption1>{entry.name}</Caption1>
            </li>
          ))}
        </ul>
      )}
      {note && (
        <figcaption>
          <Caption1 className={styles.note}>{note}</Caption1>
        </figcaption>
      )}
    </figure>
  );
}
