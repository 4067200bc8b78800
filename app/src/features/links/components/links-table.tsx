import {
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
import { LinkButton } from '@/components/link-button';
import { QueryStateBoundary } from '@/components/query-state-boundary';
import { paths } from '@/config/paths';
import { useEditDialog } from '@/hooks/use-edit-dialog';
import { useNotify } from '@/hooks/use-notify';
import type { HfLink, Station } from '@/types/links';
import { formatBearing, formatKm, formatLatLon } from '@/utils/format-geo';
import { filterRows, sortRows } from '@/utils/sort-rows';
import { useDeleteLink } from '../api/delete-link';
import { useLinks } from '../api/get-links';
import { LinkFormDialog } from './link-form-dialog';

const useStyles = makeStyles({
  table: { minWidth: '900px' },
  actionsColumn: { width: '260px' },
});

type Column = 'name' | 'distanceKm' | 'bearingDeg';

interface LinksTableProps {
  stations: Station[];
  currentUserId: number;
  isAdmin: boolean;
}

/** Links between stations with their great-circle geometry, and a way into each link's study. */
export function LinksTable({ stations, currentUserId, isAdmin }: LinksTableProps) {
  const styles = useStyles();
  const table = useTableStyles();
  const notify = useNotify();
  const links = useLinks();
  const [filter, setFilter] = useState('');
  const { sort, header } = useSortableHeader<Column>('name');
  const form = useEditDialog<HfLink>();
  const [deleting, setDeleting] = useState<HfLink | undefined>();
  const remove = useDeleteLink({
    onSuccess: () => {
      notify('success', 'Link deleted', deleting?.name);
      setDeleting(undefined);
    },
  });

  const toolbar = (
    <FilterToolbar
      filterLabel="Filter links by name"
      placeholder="Filter by link or station name"
      filter={filter}
      onFilterChange={setFilter}
      addLabel="Add link"
      onAdd={form.openNew}
    />
  );

  const dialogs = (
    <>
      <LinkFormDialog
        open={form.open}
        onOpenChange={form.setOpen}
        stations={stations}
        link={form.item}
      />
      <DeleteConfirmDialog
        item={deleting}
        mutation={remove}
        title={`Delete ${deleting?.name ?? 'link'}?`}
        confirmLabel="Delete link"
        onClose={() => setDeleting(undefined)}
      >
        The link and its place on the map go away. Its saved studies stay in the studies list until
        you delete them.
      </DeleteConfirmDialog>
    </>
  );

  const list = ({ items, total }: ListResponse<HfLink>) => {
    const rows = sortRows(
      filterRows(items, filter, (l) => `${l.name} ${l.fromStation?.name} ${l.toStation?.name}`),
      sort,
      (link, column) => link[column],
    );
    return (
      <>
        {toolbar}
        {dialogs}
        {items.length === 0 ? (
          <EmptyState title="No links yet">
            A link joins two stations. Add one with “Add link” to see its distance, bearings and
            path midpoint, and to run a link study.
          </EmptyState>
        ) : (
          <>
            <div className={table.wrapper}>
              <Table className={styles.table} aria-label="Links" sortable>
                <TableHeader>
                  <TableRow>
                    {header('name', 'Link')}
                    {header('distanceKm', 'Distance')}
                    {header('bearingDeg', 'Bearings')}
                    <TableHeaderCell>Midpoint (control point)</TableHeaderCell>
                    <TableHeaderCell className={styles.actionsColumn}>Actions</TableHeaderCell>
                  </TableRow>
                </TableHeader>
                <TableBody>
                  {rows.map((link) => {
                    const canEdit = link.ownerId === undefined || link.ownerId === currentUserId;
                    return (
                      <TableRow key={link.id}>
                        <TableCell>
                          <TableCellLayout
                            description={
                              <Caption1 className={table.muted}>
                                {link.fromStation?.name} → {link.toStation?.name}
                              </Caption1>
                            }
                          >
                            <Body1>{link.name}</Body1>
                          </TableCellLayout>
                        </TableCell>
                        <TableCell>
                          <div className={table.stack}>
                            <Body1>{formatKm(link.distanceKm)}</Body1>
                            <Caption1 className={table.muted}>
                              WGS-84: {formatKm(link.geodesicDistanceKm)}
                            </Caption1>
                          </div>
                        </TableCell>
                        <TableCell>
                          <div className={table.stack}>
                            <Body1>{formatBearing(link.bearingDeg)} outbound</Body1>
                            <Caption1 className={table.muted}>
                              {formatBearing(link.reverseBearingDeg)} back
                            </Caption1>
                          </div>
                        </TableCell>
                        <TableCell>
                          {formatLatLon(link.midpoint?.latDeg, link.midpoint?.lonDeg)}
                        </TableCell>
                        <TableCell>
                          <div className={table.actions}>
                            <LinkButton to={paths.linkStudy.getHref(link.id)} appearance="primary">
                              Study
                            </LinkButton>
                            <EditDeleteButtons
                              name={link.name}
                              disabled={!(canEdit || isAdmin)}
                              onEdit={() => form.openEdit(link)}
                              onDelete={() => setDeleting(link)}
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
              noun={['link', 'links']}
            />
          </>
        )}
      </>
    );
  };

  return (
    <QueryStateBoundary
      query={links}
      loadingLabel="Loading links…"
      errorTitle="Could not load links"
    >
      {list}
    </QueryStateBoundary>
  );
}
