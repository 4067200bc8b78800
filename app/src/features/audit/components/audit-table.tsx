import {
  Body1,
  Button,
  Caption1,
  Field,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
  Select,
  Spinner,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import type { AuditEntryView } from '@hopwise/common';
import { useState } from 'react';
import { EmptyState } from '@/components/empty-state';
import { formatUtcAndLocal } from '@/utils/format-time';
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
  toolbar: {
    display: 'flex',
    alignItems: 'end',
    gap: tokens.spacingHorizontalL,
    marginBottom: tokens.spacingVerticalM,
  },
  wrapper: {
    overflowX: 'auto',
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
  },
  table: { minWidth: '820px' },
  timeColumn: { width: '230px' },
  actionColumn: { width: '180px' },
  targetColumn: { width: '140px' },
  muted: { color: tokens.colorNeutralForeground3 },
  stack: { display: 'flex', flexDirection: 'column' },
  code: { fontFamily: tokens.fontFamilyMonospace },
  loading: { padding: tokens.spacingVerticalXXL },
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
  const [action, setAction] = useState('');
  const [offset, setOffset] = useState(0);
  const audit = useAudit({ limit: PAGE_SIZE, offset, action: action || undefined });

  const toolbar = (
    <div className={styles.toolbar}>
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

  if (audit.isPending) {
    return (
      <>
        {toolbar}
        <Spinner className={styles.loading} label="Loading the audit log…" />
      </>
    );
  }
  if (audit.isError) {
    return (
      <>
        {toolbar}
        <MessageBar intent="error" layout="multiline" role="alert">
          <MessageBarBody>
            <MessageBarTitle>Could not load the audit log</MessageBarTitle>
            {audit.error.message}
          </MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void audit.refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      </>
    );
  }

  const { items, total } = audit.data;
  const first = total === 0 ? 0 : offset + 1;
  const last = offset + items.length;

  return (
    <>
      {toolbar}
      {items.length === 0 ? (
        <EmptyState title="Nothing recorded">No changes match this filter yet.</EmptyState>
      ) : (
        <div className={styles.wrapper}>
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
                const at = formatUtcAndLocal(entry.at);
                const actor = actorOf(entry);
                return (
                  <TableRow key={entry.id}>
                    <TableCell>
                      <div className={styles.stack}>
                        <Body1>{at.utc}</Body1>
                        <Caption1 className={styles.muted}>{at.localShort} local</Caption1>
                      </div>
                    </TableCell>
                    <TableCell>
                      <div className={styles.stack}>
                        <Body1>{actor.name}</Body1>
                        {actor.email && <Caption1 className={styles.muted}>{actor.email}</Caption1>}
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
        <Caption1 className={styles.muted} aria-live="polite">
          {total === 0 ? 'No entries' : `Entries ${first}–${last} of ${total}`}
        </Caption1>
      </nav>
    </>
  );
}
