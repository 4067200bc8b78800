import {
  Badge,
  Body1,
  Button,
  Caption1,
  Subtitle2,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { Dismiss20Regular } from '@fluentui/react-icons';
import { LinkButton } from '@/components/link-button';
import { paths } from '@/config/paths';
import type { HfLink, Station } from '@/types/links';
import { formatBearing, formatKm, formatLatLon } from '@/utils/format-geo';

const useStyles = makeStyles({
  panel: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    padding: tokens.spacingHorizontalL,
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
    overflowY: 'auto',
  },
  head: { display: 'flex', alignItems: 'start', justifyContent: 'space-between' },
  muted: { color: tokens.colorNeutralForeground3 },
  list: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
  },
  linkItem: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
    padding: tokens.spacingVerticalS,
    borderRadius: tokens.borderRadiusMedium,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
  },
  actions: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
  stationButton: { justifyContent: 'flex-start' },
});

interface StationPanelProps {
  station?: Station;
  stations: Station[];
  links: HfLink[];
  currentUserId: number;
  onSelectStation: (id: number | undefined) => void;
  onAddStation: () => void;
  onEditStation: (station: Station) => void;
  onAddLink: (fromStation: Station) => void;
}

/**
 * Beside the map: the chosen station with its links (distance, bearing from this end) and
 * actions; with none chosen, a list of stations that keyboard users can pick from.
 */
export function StationPanel({
  station,
  stations,
  links,
  currentUserId,
  onSelectStation,
  onAddStation,
  onEditStation,
  onAddLink,
}: StationPanelProps) {
  const styles = useStyles();

  if (!station) {
    const sorted = [...stations].sort((a, b) => a.name.localeCompare(b.name));
    return (
      <aside className={styles.panel} aria-label="Stations on the map">
        <Subtitle2 as="h2">Stations</Subtitle2>
        <Body1 className={styles.muted}>
          Click a station on the map, or choose one here. Click an empty spot on the map to add a
          station there.
        </Body1>
        <Button appearance="primary" onClick={onAddStation}>
          Add station
        </Button>
        {sorted.length === 0 ? (
          <Caption1 className={styles.muted}>No stations yet.</Caption1>
        ) : (
          <ul className={styles.list}>
            {sorted.map((s) => (
              <li key={s.id}>
                <Button
                  appearance="subtle"
                  className={styles.stationButton}
                  onClick={() => onSelectStation(s.id)}
                >
                  {s.name}
                  {s.callSign ? ` (${s.callSign})` : ''}
                </Button>
              </li>
            ))}
          </ul>
        )}
      </aside>
    );
  }

  const mine = station.ownerId === currentUserId;
  const own = links.filter(
    (link) => link.fromStationId === station.id || link.toStationId === station.id,
  );

  return (
    <aside className={styles.panel} aria-label={`Station ${station.name}`}>
      <div className={styles.head}>
        <div>
          <Subtitle2 as="h2">{station.name}</Subtitle2>
          {station.callSign && <Caption1 as="p">{station.callSign}</Caption1>}
        </div>
        <Button
          appearance="subtle"
          icon={<Dismiss20Regular />}
          aria-label="Close station details"
          onClick={() => onSelectStation(undefined)}
        />
      </div>
      <Body1>{formatLatLon(station.latDeg, station.lonDeg)}</Body1>
      <div className={styles.actions}>
        <Badge appearance="tint" color={mine ? 'brand' : 'warning'}>
          {mine ? 'Yours' : 'Another user’s'}
        </Badge>
        <Badge appearance="outline">{station.shared ? 'Shared' : 'Private'}</Badge>
      </div>
      {station.notes && <Caption1 className={styles.muted}>{station.notes}</Caption1>}
      <div className={styles.actions}>
        {mine && <Button onClick={() => onEditStation(station)}>Edit station</Button>}
        <Button onClick={() => onAddLink(station)}>Add a link from here</Button>
      </div>
      <Subtitle2 as="h3">Links ({own.length})</Subtitle2>
      {own.length === 0 ? (
        <Caption1 className={styles.muted}>No links from or to this station yet.</Caption1>
      ) : (
        <ul className={styles.list}>
          {own.map((link) => {
            const outbound = link.fromStationId === station.id;
            const other = outbound ? link.toStation : link.fromStation;
            return (
              <li key={link.id} className={styles.linkItem}>
                <Body1>
                  <strong>{link.name}</strong>
                </Body1>
                <Caption1>
                  to {other?.name ?? 'the other station'} · {formatKm(link.distanceKm)} · bearing{' '}
                  {formatBearing(outbound ? link.bearingDeg : link.reverseBearingDeg)}
                </Caption1>
                <div className={styles.actions}>
                  <LinkButton to={paths.linkStudy.getHref(link.id)} appearance="secondary">
                    Study this link
                  </LinkButton>
                </div>
              </li>
            );
          })}
        </ul>
      )}
    </aside>
  );
}
