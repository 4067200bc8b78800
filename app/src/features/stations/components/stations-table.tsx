import {
  Badge,
  Body1,
  Button,
  Caption1,
  Input,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
  Spinner,
  Table,
  TableBody,
  TableCell,
  TableCellLayout,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { Add20Regular, Search20Regular } from '@fluentui/react-icons';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { EmptyState } from '@/components/empty-state';
import { useNotify } from '@/hooks/use-notify';
import type { Station } from '@/types/links';
import { formatLatLon } from '@/utils/format-geo';
import { filterRows, nextSort, sortRows, type SortState } from '@/utils/sort-rows';
import { useDeleteStation } from '../api/delete-station';
import { useStations } from '../api/get-stations';
import { StationFormDialog } from './station-form-dialog';

const useStyles = makeStyles({
  toolbar: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalM,
    alignItems: 'end',
    justifyContent: 'space-between',
    marginBottom: tokens.spacingVerticalM,
  },
  wrapper: {
    overflowX: 'auto',
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
  },
  table: { minWidth: '760px' },
  muted: { color: tokens.colorNeutralForeground3 },
  filter: { width: '300px', maxWidth: '100%' },
  actionsColumn: { width: '260px' },
  actions: {
    display: 'flex',
    flexWrap: 'nowrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
  },
  total: { marginTop: tokens.spacingVerticalS, color: tokens.colorNeutralForeground3 },
});

type Column = 'name' | 'latDeg' | 'lonDeg' | 'elevationM' | 'shared';

const valueOf = (station: Station, column: Column) =>
  column === 'shared' ? (station.shared ? 1 : 0) : station[column];

interface StationsTableProps {
  currentUserId: number;
  isAdmin: boolean;
}

/** The stations you own and those shared with everyone, with add, edit and delete. */
export function StationsTable({ currentUserId, isAdmin }: StationsTableProps) {
  const styles = useStyles();
  const notify = useNotify();
  const stations = useStations();
  const [filter, setFilter] = useState('');
  const [sort, setSort] = useState<SortState<Column>>({ column: 'name', direction: 'ascending' });
  const [editing, setEditing] = useState<Station | undefined>();
  const [formOpen, setFormOpen] = useState(false);
  const [deleting, setDeleting] = useState<Station | undefined>();
  const remove = useDeleteStation({
    onSuccess: () => {
      notify('success', 'Station deleted', deleting?.name);
      setDeleting(undefined);
    },
  });

  const header = (column: Column, label: string) => (
    <TableHeaderCell
      sortDirection={sort.column === column ? sort.direction : undefined}
      onClick={() => setSort((current) => nextSort(current, column))}
    >
      {label}
    </TableHeaderCell>
  );

  const toolbar = (
    <div className={styles.toolbar}>
      <Input
        className={styles.filter}
        aria-label="Filter stations by name"
        placeholder="Filter by name or call sign"
        contentBefore={<Search20Regular aria-hidden />}
        value={filter}
        onChange={(_, data) => setFilter(data.value)}
      />
      <Button
        appearance="primary"
        icon={<Add20Regular />}
        onClick={() => {
          setEditing(undefined);
          setFormOpen(true);
        }}
      >
        Add station
      </Button>
    </div>
  );

  const dialogs = (
    <>
      <StationFormDialog open={formOpen} onOpenChange={setFormOpen} station={editing} />
      <ConfirmDialog
        open={deleting !== undefined}
        title={`Delete ${deleting?.name ?? 'station'}?`}
        confirmLabel="Delete station"
        busy={remove.isPending}
        error={remove.error?.message}
        onConfirm={() => deleting && remove.mutate(deleting.id)}
        onCancel={() => {
          setDeleting(undefined);
          remove.reset();
        }}
      >
        The station disappears from your lists and the map. Links that use it must be deleted first.
      </ConfirmDialog>
    </>
  );

  if (stations.isPending) return <Spinner label="Loading stations…" />;
  if (stations.isError) {
    return (
      <MessageBar intent="error" layout="multiline" role="alert">
        <MessageBarBody>
          <MessageBarTitle>Could not load stations</MessageBarTitle>
          {stations.error.message}
        </MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void stations.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  }

  const { items, total } = stations.data;
  const rows = sortRows(
    filterRows(items, filter, (s) => `${s.name} ${s.callSign ?? ''}`),
    sort,
    valueOf,
  );

  return (
    <>
      {toolbar}
      {dialogs}
      {items.length === 0 ? (
        <EmptyState title="No stations yet">
          Add your first station with “Add station”, or click the map to place one.
        </EmptyState>
      ) : (
        <>
          <div className={styles.wrapper}>
            <Table className={styles.table} aria-label="Stations" sortable>
              <TableHeader>
                <TableRow>
                  {header('name', 'Station')}
                  {header('latDeg', 'Latitude')}
                  {header('lonDeg', 'Longitude')}
                  {header('elevationM', 'Elevation')}
                  {header('shared', 'Visibility')}
                  <TableHeaderCell className={styles.actionsColumn}>Actions</TableHeaderCell>
                </TableRow>
              </TableHeader>
              <TableBody>
                {rows.map((station) => {
                  const mine = station.ownerId === currentUserId;
                  const canEdit = mine || isAdmin;
                  const [lat, lon] = formatLatLon(station.latDeg, station.lonDeg).split(', ');
                  return (
                    <TableRow key={station.id}>
                      <TableCell>
                        <TableCellLayout
                          description={
                            station.callSign ? (
                              <Caption1 className={styles.muted}>{station.callSign}</Caption1>
                            ) : undefined
                          }
                        >
                          <Body1>{station.name}</Body1>
                        </TableCellLayout>
                      </TableCell>
                      <TableCell>{lat}</TableCell>
                      <TableCell>{lon}</TableCell>
                      <TableCell>
                        {station.elevationM === null || station.elevationM === undefined
                          ? '—'
                          : `${station.elevationM} m`}
                      </TableCell>
                      <TableCell>
                        {station.shared ? (
                          <Badge appearance="tint" color="important">
                            Shared
                          </Badge>
                        ) : (
                          <Badge appearance="tint" color="brand">
                            Private
                          </Badge>
                        )}
                        {!mine && <Caption1 className={styles.muted}> · another user’s</Caption1>}
                      </TableCell>
                      <TableCell>
                        <div className={styles.actions}>
                          <Button
                            size="small"
                            disabled={!canEdit}
                            aria-label={`Edit ${station.name}`}
                            onClick={() => {
                              setEditing(station);
                              setFormOpen(true);
                            }}
                          >
                            Edit
                          </Button>
                          <Button
                            size="small"
                            disabled={!canEdit}
                            aria-label={`Delete ${station.name}`}
                            onClick={() => setDeleting(station)}
                          >
                            Delete
                          </Button>
                        </div>
                      </TableCell>
                    </TableRow>
                  );
                })}
              </TableBody>
            </Table>
          </div>
          <Caption1 as="p" className={styles.total}>
            {rows.length === items.length
              ? `${total} ${total === 1 ? 'station' : 'stations'}`
              : `${rows.length} of ${items.length} stations match “${filter.trim()}”`}
          </Caption1>
        </>
      )}
    </>
  );
}
