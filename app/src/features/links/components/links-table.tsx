import {
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
import { LinkButton } from '@/components/link-button';
import { paths } from '@/config/paths';
import { useNotify } from '@/hooks/use-notify';
import type { HfLink, Station } from '@/types/links';
import { formatBearing, formatKm, formatLatLon } from '@/utils/format-geo';
import { filterRows, nextSort, sortRows, type SortState } from '@/utils/sort-rows';
import { useDeleteLink } from '../api/delete-link';
import { useLinks } from '../api/get-links';
import { LinkFormDialog } from './link-form-dialog';

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
  table: { minWidth: '900px' },
  muted: { color: tokens.colorNeutralForeground3 },
  filter: { width: '300px', maxWidth: '100%' },
  actionsColumn: { width: '260px' },
  stack: { display: 'flex', flexDirection: 'column' },
  actions: {
    display: 'flex',
    flexWrap: 'nowrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
  },
  total: { marginTop: tokens.spacingVerticalS, color: tokens.colorNeutralForeground3 },
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
  const notify = useNotify();
  const links = useLinks();
  const [filter, setFilter] = useState('');
  const [sort, setSort] = useState<SortState<Column>>({ column: 'name', direction: 'ascending' });
  const [editing, setEditing] = useState<HfLink | undefined>();
  const [formOpen, setFormOpen] = useState(false);
  const [deleting, setDeleting] = useState<HfLink | undefined>();
  const remove = useDeleteLink({
    onSuccess: () => {
      notify('success', 'Link deleted', deleting?.name);
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
        aria-label="Filter links by name"
        placeholder="Filter by link or station name"
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
        Add link
      </Button>
    </div>
  );

  const dialogs = (
    <>
      <LinkFormDialog
        open={formOpen}
        onOpenChange={setFormOpen}
        stations={stations}
        link={editing}
      />
      <ConfirmDialog
        open={deleting !== undefined}
        title={`Delete ${deleting?.name ?? 'link'}?`}
        confirmLabel="Delete link"
        busy={remove.isPending}
        error={remove.error?.message}
        onConfirm={() => deleting && remove.mutate(deleting.id)}
        onCancel={() => {
          setDeleting(undefined);
          remove.reset();
        }}
      >
        The link and its place on the map go away. Its saved studies stay in the studies list until
        you delete them.
      </ConfirmDialog>
    </>
  );

  if (links.isPending) return <Spinner label="Loading links…" />;
  if (links.isError) {
    return (
      <MessageBar intent="error" layout="multiline" role="alert">
        <MessageBarBody>
          <MessageBarTitle>Could not load links</MessageBarTitle>
          {links.error.message}
        </MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void links.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  }

  const { items, total } = links.data;
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
          A link joins two stations. Add one with “Add link” to see its distance, bearings and path
          midpoint, and to run a link study.
        </EmptyState>
      ) : (
        <>
          <div className={styles.wrapper}>
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
                            <Caption1 className={styles.muted}>
                              {link.fromStation?.name} → {link.toStation?.name}
                            </Caption1>
                          }
                        >
                          <Body1>{link.name}</Body1>
                        </TableCellLayout>
                      </TableCell>
                      <TableCell>
                        <div className={styles.stack}>
                          <Body1>{formatKm(link.distanceKm)}</Body1>
                          <Caption1 className={styles.muted}>
                            WGS-84: {formatKm(link.geodesicDistanceKm)}
                          </Caption1>
                        </div>
                      </TableCell>
                      <TableCell>
                        <div className={styles.stack}>
                          <Body1>{formatBearing(link.bearingDeg)} outbound</Body1>
                          <Caption1 className={styles.muted}>
                            {formatBearing(link.reverseBearingDeg)} back
                          </Caption1>
                        </div>
                      </TableCell>
                      <TableCell>
                        {formatLatLon(link.midpoint?.latDeg, link.midpoint?.lonDeg)}
                      </TableCell>
                      <TableCell>
                        <div className={styles.actions}>
                          <LinkButton to={paths.linkStudy.getHref(link.id)} appearance="primary">
                            Study
                          </LinkButton>
                          <Button
                            size="small"
                            disabled={!(canEdit || isAdmin)}
                            aria-label={`Edit ${link.name}`}
                            onClick={() => {
                              setEditing(link);
                              setFormOpen(true);
                            }}
                          >
                            Edit
                          </Button>
                          <Button
                            size="small"
                            disabled={!(canEdit || isAdmin)}
                            aria-label={`Delete ${link.name}`}
                            onClick={() => setDeleting(link)}
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
              ? `${total} ${total === 1 ? 'link' : 'links'}`
              : `${rows.length} of ${items.length} links match “${filter.trim()}”`}
          </Caption1>
        </>
      )}
    </>
  );
}
