import { Caption1, makeStyles, tokens } from '@fluentui/react-components';
import { formatUtcAndLocal } from '@/utils/format-time';
import type { MapPalette } from './map-palette';

const useStyles = makeStyles({
  legend: {
    position: 'absolute',
    left: tokens.spacingHorizontalM,
    bottom: tokens.spacingVerticalM,
    zIndex: 500,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    margin: 0,
    listStyleType: 'none',
    backgroundColor: tokens.colorNeutralBackground1,
    color: tokens.colorNeutralForeground1,
    borderRadius: tokens.borderRadiusMedium,
    boxShadow: tokens.shadow8,
    opacity: 0.94,
    pointerEvents: 'none',
  },
  item: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  muted: { color: tokens.colorNeutralForeground3 },
});

function Swatch({ children }: { children: React.ReactNode }) {
  return (
    <svg width="22" height="14" viewBox="0 0 22 14" aria-hidden focusable="false">
      {children}
    </svg>
  );
}

/** What the map's symbols mean, and the time the day/night shading is drawn for. */
export function MapLegend({ palette, now }: { palette: MapPalette; now: Date }) {
  const styles = useStyles();
  const time = formatUtcAndLocal(now.toISOString());
  return (
    <ul className={styles.legend} aria-label="Map legend">
      <li className={styles.item}>
        <Swatch>
          <circle
            cx="11"
            cy="7"
            r="5"
            fill={palette.ownStation}
            stroke={palette.stationStroke}
            strokeWidth="2"
          />
        </Swatch>
        <Caption1>Your station (dashed rim: shared)</Caption1>
      </li>
      <li className={styles.item}>
        <Swatch>
          <circle
            cx="11"
            cy="7"
            r="5"
            fill={palette.sharedStation}
            stroke={palette.stationStroke}
            strokeWidth="2"
          />
        </Swatch>
        <Caption1>Shared by another user</Caption1>
      </li>
      <li className={styles.item}>
        <Swatch>
          <path d="M1 11 Q11 1 21 11" fill="none" stroke={palette.linkArc} strokeWidth="2.5" />
        </Swatch>
        <Caption1>Link, along the great circle</Caption1>
      </li>
      <li className={styles.item}>
        <Swatch>
          <circle
            cx="11"
            cy="7"
            r="3.5"
            fill={palette.stationStroke}
            stroke={palette.controlPoint}
            strokeWidth="2"
          />
        </Swatch>
        <Caption1>Control point (path midpoint)</Caption1>
      </li>
      <li className={styles.item}>
        <Swatch>
          <rect x="1" y="2" width="20" height="10" fill={palette.night} fillOpacity="0.3" />
        </Swatch>
        <Caption1>
          Night side at {time.utc}
          <span className={styles.muted}> ({time.localShort} local)</span>
        </Caption1>
      </li>
      <li className={styles.item}>
        <Swatch>
          <path
            d="M1 7 H21 M11 1 V13"
            stroke={palette.graticule}
            strokeWidth="1"
            strokeDasharray="2 2"
          />
        </Swatch>
        <Caption1>Graticule every 15°</Caption1>
      </li>
    </ul>
  );
}
