import { Spinner, makeStyles, tokens } from '@fluentui/react-components';
import { useState } from 'react';
import { PageHeader } from '@/components/page-header';
import { QueryErrorBar } from '@/components/query-state-boundary';
import { useThemeModeContext } from '@/components/theme/theme-mode-context';
import { useUser } from '@/features/auth/api/get-user';
import { useLinks } from '@/features/links/api/get-links';
import { LinkFormDialog } from '@/features/links/components/link-form-dialog';
import { MapLegend } from '@/features/map/components/map-legend';
import { MAP_PALETTES } from '@/features/map/components/map-palette';
import { StationPanel } from '@/features/map/components/station-panel';
import { WorldMap } from '@/features/map/components/world-map';
import { useNow } from '@/features/map/hooks/use-now';
import { useStations } from '@/features/stations/api/get-stations';
import {
  StationFormDialog,
  type StationDraft,
} from '@/features/stations/components/station-form-dialog';
import type { Station } from '@/types/links';

const useStyles = makeStyles({
  error: { marginBottom: '12px' },
  layout: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr) 320px',
    gap: tokens.spacingHorizontalL,
    height: 'max(460px, calc(100vh - 210px))',
    '@media (max-width: 980px)': {
      gridTemplateColumns: 'minmax(0, 1fr)',
      gridTemplateRows: 'minmax(420px, 60vh) auto',
      height: 'auto',
    },
  },
  mapFrame: {
    position: 'relative',
    minHeight: '420px',
    borderRadius: tokens.borderRadiusLarge,
    overflow: 'hidden',
    boxShadow: tokens.shadow4,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
  },
  status: {
    position: 'absolute',
    top: tokens.spacingVerticalM,
    right: tokens.spacingHorizontalM,
    zIndex: 500,
  },
});

type StationDialog = { station?: Station; draft?: StationDraft } | undefined;

export default function MapRoute() {
  const styles = useStyles();
  const { mode } = useThemeModeContext();
  const palette = MAP_PALETTES[mode];
  const now = useNow(60_000);
  const { data: user } = useUser();
  const stations = useStations();
  const links = useLinks();
  const [selectedId, setSelectedId] = useState<number | undefined>();
  const [stationDialog, setStationDialog] = useState<StationDialog>();
  const [linkFrom, setLinkFrom] = useState<Station | undefined>();

  if (!user) return null;
  const stationItems = stations.data?.items ?? [];
  const linkItems = links.data?.items ?? [];
  const selected = stationItems.find((s) => s.id === selectedId);
  const failed = stations.error ?? links.error;

  return (
    <>
      <PageHeader
        title="Map"
        description="Your stations and the great-circle paths of your links, with each path's control point and today's night side. The basemap ships with Hopwise: no tile server is needed."
      />
      {failed && (
        <QueryErrorBar
          className={styles.error}
          title="Could not load your stations and links"
          error={failed}
          onRetry={() => {
            void stations.refetch();
            void links.refetch();
          }}
        />
      )}
      <div className={styles.layout}>
        <div className={styles.mapFrame} role="region" aria-label="World map of stations and links">
          <WorldMap
            stations={stationItems}
            links={linkItems}
            currentUserId={user.id}
            palette={palette}
            now={now}
            selectedStationId={selectedId}
            onSelectStation={setSelectedId}
            onMapClick={(latDeg, lonDeg) => setStationDialog({ draft: { latDeg, lonDeg } })}
          />
          <MapLegend palette={palette} now={now} />
          {(stations.isPending || links.isPending) && (
            <Spinner className={styles.status} size="small" label="Loading stations…" />
          )}
        </div>
        <StationPanel
          station={selected}
          stations={stationItems}
          links={linkItems}
          currentUserId={user.id}
          onSelectStation={setSelectedId}
          onAddStation={() => setStationDialog({})}
          onEditStation={(station) => setStationDialog({ station })}
          onAddLink={(station) => setLinkFrom(station)}
        />
      </div>
      <StationFormDialog
        open={stationDialog !== undefined}
        onOpenChange={(open) => !open && setStationDialog(undefined)}
        station={stationDialog?.station}
        draft={stationDialog?.draft}
        onSaved={(station) => setSelectedId(station.id)}
      />
      <LinkFormDialog
        open={linkFrom !== undefined}
        onOpenChange={(open) => !open && setLinkFrom(undefined)}
        stations={stationItems}
        fromStationId={linkFrom?.id}
      />
    </>
  );
}
