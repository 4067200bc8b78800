import {
  Badge,
  Body1,
  Caption1,
  Table,
  TableBody,
  TableCell,
  TableCellLayout,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
} from '@fluentui/react-components';
import type { ListResponse } from '@hopwise/common';
import { useState } from 'react';
import { DeleteConfirmDialog } from '@/components/confirm-dialog';
import { EditDeleteButtons } from '@/components/data-table/edit-delete-buttons';
import { FilterToolbar } from '@/components/data-table/filter-toolbar';
import { FilteredTotal } from '@/components/data-table/filtered-total';
import { useTableStyles } from '@/components/data-table/table-styles';
import { useSortableHeader } from '@/components/data-table/use-sortable-header';
import { EmptyState } from '@/components/empty-state';
import { QueryStateBoundary } from '@/components/query-state-boundary';
import { useEditDialog } from '@/hooks/use-edit-dialog';
import { useNotify } from '@/hooks/use-notify';
import type { Station } from '@/types/links';
import { formatLatLon } from '@/utils/format-geo';
import { filterRows, sortRows } from '@/utils/sort-rows';
import { useDeleteStation } from '../api/delete-station';
import { useStations } from '../api/get-stations';
import { StationFormDialog } from './station-form-dialog';

const useStyles = makeStyles({
  table: { minWidth: '760px' },
  actionsColumn: { width: '260px' },
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
  const table = useTableStyles();
  const notify = useNotify();
  const stations = useStations();
  const [filter, setFilter] = useState('');
  const { sort, header } = useSortableHeader<Column>('name');
  const form = useEditDialog<Station>();
  const [deleting, setDeleting] = useState<Station | undefined>();
  const remove = useDeleteStation({
    onSuccess: () => {
      notify('success', 'Station deleted', deleting?.name);
      setDeleting(undefined);
    },
  });

  const toolbar = (
    <FilterToolbar
      filterLabel="Filter stations by name"
      placeholder="Filter by name or call sign"
      filter={filter}
      onFilterChange={setFilter}
      addLabel="Add station"
      onAdd={form.openNew}
    />
  );

  const dialogs = (
    <>
      <StationFormDialog open={form.open} onOpenChange={form.setOpen} station={form.item} />
      <DeleteConfirmDialog
        item={deleting}
        mutation={remove}
        title={`Delete ${deleting?.name ?? 'station'}?`}
        confirmLabel="Delete station"
        onClose={() => setDeleting(undefined)}
      >
        The station disappears from your lists and the map. Links that use it must be deleted first.
      </DeleteConfirmDialog>
    </>
  );

  const list = ({ items, total }: ListResponse<Station>) => {
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
            <div className={table.wrapper}>
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
                    const [lat, lon] = formatLatLon(station.latDeg, station.lonDeg).split(', ');
                    return (
                      <TableRow key={station.id}>
                        <TableCell>
                          <TableCellLayout
                            description={
                              station.callSign ? (
                                <Caption1 className={table.muted}>{station.callSign}</Caption1>
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
                          {!mine && <Caption1 className={table.muted}> · another user’s</Caption1>}
                        </TableCell>
                        <TableCell>
                          <div className={table.actions}>
                            <EditDeleteButtons
                              name={station.name}
                              disabled={!(mine || isAdmin)}
                              onEdit={() => form.openEdit(station)}
                              onDelete={() => setDeleting(station)}
                            />
                          </div>
                        </TableCell>
                      </TableRow>
                    );
                  })}
                </TableBody>
              </Table>
            </div>
            <FilteredTotal
              shown={rows.length}
              loaded={items.length}
              total={total}
              filter={filter}
              noun={['station', 'stations']}
            />
          </>
        )}
      </>
    );
  };

  return (
    <QueryStateBoundary
      query={stations}
      loadingLabel="Loading stations…"
      errorTitle="Could not load stations"
    >
      {list}
    </QueryStateBoundary>
  );
}
