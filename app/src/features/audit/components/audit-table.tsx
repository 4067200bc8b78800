import {
  Body1,
  Button,
  Caption1,
  Field,
  Select,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import type { AuditEntryView, ListResponse } from '@hopwise/common';
import { useState } from 'react';
import { useTableStyles } from '@/components/data-table/table-styles';
import { TimeCell } from '@/components/data-table/time-cell';
import { EmptyState } from '@/components/empty-state';
import { QueryStateBoundary } from '@/components/query-state-boundary';
import { useAudit } from '../api/get-audit';

const PAGE_SIZE = 50;

/** Filter choices: an action prefix (the API matches `prefix` and `prefix.*`). */
const ACTION_FILTERS = [
  { value: '', label: 'All changes' },
  { value: 'user', label: 'Users and roles' },
  { value: 'profile', label: 'Profiles' },
  { value: 'sounding', label: 'Soundings' },
  { value: 'net', label: 'Nets and schedules' },
  { value: 'station', label: 'Stations' },
  { value: 'link', label: 'Links' },
  { value: 'study', label: 'Studies' },
] as const;

const useStyles = makeStyles({
  table: { minWidth: '820px' },
  timeColumn: { width: '230px' },
  actionColumn: { width: '180px' },
  targetColumn: { width: '140px' },
  code: { fontFamily: tokens.fontFamilyMonospace },
  pager: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    marginTop: tokens.spacingVerticalS,
  },
});

function actorOf(entry: AuditEntryView): { name: string; email: string | null } {
  if (entry.actorUserId === null) return { name: 'System', email: null };
  return { name: entry.actorName ?? `User ${entry.actorUserId}`, email: entry.actorEmail };
}

/** The audit log: who changed what and when (UTC with local time beside), newest first. */
export function AuditTable() {
  const styles = useStyles();
  const table = useTableStyles();
  const [action, setAction] = useState('');
  const [offset, setOffset] = useState(0);
  const audit = useAudit({ limit: PAGE_SIZE, offset, action: action || undefined });

  const toolbar = (
    <div className={table.toolbar}>
      <Field label="Show">
        <Select
          value={action}
          onChange={(_, data) => {
            setAction(data.value);
            setOffset(0);
          }}
        >
          {ACTION_FILTERS.map((f) => (
            <option key={f.value} value={f.value}>
              {f.label}
            </option>
          ))}
        </Select>
      </Field>
    </div>
  );

  const list = ({ items, total }: ListResponse<AuditEntryView>) => {
    const first = total === 0 ? 0 : offset + 1;
    const last = offset + items.length;

    return (
      <>
        {items.length === 0 ? (
          <EmptyState title="Nothing recorded">No changes match this filter yet.</EmptyState>
        ) : (
          <div className={table.wrapper}>
            <Table className={styles.table} aria-label="Audit log">
              <TableHeader>
                <TableRow>
                  <TableHeaderCell className={styles.timeColumn}>Time</TableHeaderCell>
                  <TableHeaderCell>Actor</TableHeaderCell>
                  <TableHeaderCell className={styles.actionColumn}>Action</TableHeaderCell>
                  <TableHeaderCell className={styles.targetColumn}>Target</TableHeaderCell>
                </TableRow>
              </TableHeader>
              <TableBody>
                {items.map((entry) => {
                  const actor = actorOf(entry);
                  return (
                    <TableRow key={entry.id}>
                      <TableCell>
                        <TimeCell iso={entry.at} />
                      </TableCell>
                      <TableCell>
                        <div className={table.stack}>
                          <Body1>{actor.name}</Body1>
                          {actor.email && (
                            <Caption1 className={table.muted}>{actor.email}</Caption1>
                          )}
                        </div>
                      </TableCell>
                      <TableCell>
                        <span className={styles.code}>{entry.action}</span>
                      </TableCell>
                      <TableCell>
                        <span className={styles.code}>{entry.target}</span>
                      </TableCell>
                    </TableRow>
                  );
                })}
              </TableBody>
            </Table>
          </div>
        )}
        <nav className={styles.pager} aria-label="Audit log pages">
          <Button
            disabled={offset === 0 || audit.isFetching}
            onClick={() => setOffset(Math.max(0, offset - PAGE_SIZE))}
          >
            Newer
          </Button>
          <Button
            disabled={last >= total || audit.isFetching}
            onClick={() => setOffset(offset + PAGE_SIZE)}
          >
            Older
          </Button>
          <Caption1 className={table.muted} aria-live="polite">
            {total === 0 ? 'No entries' : `Entries ${first}–${last} of ${total}`}
          </Caption1>
        </nav>
      </>
    );
  };

  return (
    <>
      {toolbar}
      <QueryStateBoundary
        query={audit}
        loadingLabel="Loading the audit log…"
        errorTitle="Could not load the audit log"
        padSpinner
      >
        {list}
      </QueryStateBoundary>
    </>
  );
}
