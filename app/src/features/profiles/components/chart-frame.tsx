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
  chart: { width: '100%', maxWidth: '640px', position: 'relative' },
  overlay: {
    position: 'absolute',
    inset: 0,
    display: 'flex',
    alignItems: 'center',
    justifyContent: 'center',
    pointerEvents: 'none',
  },
  caption: { color: tokens.colorNeutralForeground3 },
});

interface ChartFrameProps {
  title: string;
  caption?: ReactNode;
  legend?: ReactNode;
  /** Shown over the chart (e.g. a spinner while a recomputation runs). */
  overlay?: ReactNode;
  children: ReactNode;
}

/** A chart card: heading, the chart, its legend and a caption. */
export function ChartFrame({ title, caption, legend, overlay, children }: ChartFrameProps) {
  const styles = useStyles();
  return (
    <figure className={styles.figure} aria-label={title}>
      <Subtitle2 as="h3">{title}</Subtitle2>
      <div className={styles.chart}>
        {children}
        {overlay && <div className={styles.overlay}>{overlay}</div>}
      </div>
      {legend}
      {caption && (
        <figcaption>
          <Caption1 className={styles.caption}>{caption}</Caption1>
        </figcaption>
      )}
    </figure>
  );
}
