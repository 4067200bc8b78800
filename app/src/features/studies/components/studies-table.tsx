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
import { ArrowDownload16Regular } from '@fluentui/react-icons';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { EmptyState } from '@/components/empty-state';
import { useNotify } from '@/hooks/use-notify';
import type { HfLink, Study } from '@/types/links';
import { formatUtcAndLocal } from '@/utils/format-time';
import { formatMHz } from '@/utils/study-summary';
import { useDeleteStudy } from '../api/delete-study';
import { exportStudyCsv } from '../api/export-study-csv';
import { useStudies } from '../api/get-studies';

const useStyles = makeStyles({
  toolbar: {
    display: 'flex',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalM,
  },
  wrapper: {
    overflowX: 'auto',
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
  },
  table: { minWidth: '820px' },
  stack: { display: 'flex', flexDirection: 'column' },
  muted: { color: tokens.colorNeutralForeground3 },
  actions: { display: 'flex', flexWrap: 'nowrap', gap: tokens.spacingHorizontalS },
});

const describeFrequencies = (list: number[]) =>
  list.length === 1
    ? `${list[0]} MHz`
    : `${list.length} frequencies, ${list[0]}–${list[list.length - 1]} MHz`;

interface StudiesTableProps {
  links: HfLink[];
  /** The link filter to start with (the study page passes its own link). */
  initialLinkId?: number;
  onOpen: (study: Study) => void;
  onDeleted?: (id: number) => void;
}

/** Saved studies, newest first by study time, with open, CSV export and delete. */
export function StudiesTable({ links, initialLinkId, onOpen, onDeleted }: StudiesTableProps) {
  const styles = useStyles();
  const notify = useNotify();
  const [linkId, setLinkId] = useState<number | undefined>(initialLinkId);
  const [order, setOrder] = useState<'asc' | 'desc'>('desc');
  const studies = useStudies({ linkId, sort: 'atUtc', order, limit: 100 });
  const [deleting, setDeleting] = useState<Study | undefined>();
  const [exportingId, setExportingId] = useState<number | undefined>();
  const remove = useDeleteStudy({
    onSuccess: (id) => {
      notify('success', 'Study deleted');
      setDeleting(undefined);
      onDeleted?.(id);
    },
  });
  const linkName = (id: number) => links.find((l) => l.id === id)?.name ?? `Link ${id}`;

  const onExport = async (study: Study) => {
    setExportingId(study.id);
    try {
      await exportStudyCsv(study.id);
    } catch (error) {
      notify('error', 'Could not export the study', (error as Error).message);
    } finally {
      setExportingId(undefined);
    }
  };

  let body;
  if (studies.isPending) body = <Spinner label="Loading studies…" />;
  else if (studies.isError) {
    body = (
      <MessageBar intent="error" layout="multiline" role="alert">
        <MessageBarBody>
          <MessageBarTitle>Could not load studies</MessageBarTitle>
          {studies.error.message}
        </MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void studies.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  } else if (studies.data.items.length === 0) {
    body = (
      <EmptyState title="No saved studies">
        Run a study with “Run and save” and it will be listed here.
      </EmptyState>
    );
  } else {
    body = (
      <div className={styles.wrapper}>
        <Table className={styles.table} aria-label="Saved studies" sortable size="small">
          <TableHeader>
            <TableRow>
              <TableHeaderCell
                sortDirection={order === 'asc' ? 'ascending' : 'descending'}
                onClick={() => setOrder((o) => (o === 'asc' ? 'desc' : 'asc'))}
              >
                Study time
              </TableHeaderCell>
              <TableHeaderCell>Link</TableHeaderCell>
              <TableHeaderCell>Frequencies</TableHeaderCell>
              <TableHeaderCell>MUF (1 hop)</TableHeaderCell>
              <TableHeaderCell>Actions</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {studies.data.items.map((study) => {
              const when = formatUtcAndLocal(study.atUtc);
              const muf = study.result?.perFrequency?.[0]?.mufMHz?.['1'];
              return (
                <TableRow key={study.id}>
                  <TableCell>
                    <div className={styles.stack}>
                      <Body1>{when.utc}</Body1>
                      <Caption1 className={styles.muted}>{when.localShort} local</Caption1>
                    </div>
                  </TableCell>
                  <TableCell>
                    <div className={styles.stack}>
                      <Body1>{linkName(study.linkId)}</Body1>
                      {study.name && <Caption1 className={styles.muted}>{study.name}</Caption1>}
                    </div>
                  </TableCell>
                  <TableCell>{describeFrequencies(study.frequenciesMHz)}</TableCell>
                  <TableCell>{formatMHz(muf)}</TableCell>
                  <TableCell>
                    <div className={styles.actions}>
                      <Button size="small" onClick={() => onOpen(study)}>
                        Open
                      </Button>
                      <Button
                        size="small"
                        icon={
                          exportingId === study.id ? (
                            <Spinner size="extra-tiny" aria-hidden />
                          ) : (
                            <ArrowDownload16Regular />
                          )
                        }
                        disabled={exportingId === study.id}
                        onClick={() => void onExport(study)}
                      >
                        Export CSV
                      </Button>
                      <Button size="small" onClick={() => setDeleting(study)}>
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
    );
  }

  return (
    <>
      <div className={styles.toolbar}>
        <Field label="Link">
          <Select
            value={linkId === undefined ? '' : String(linkId)}
            onChange={(_, data) => setLinkId(data.value ? Number(data.value) : undefined)}
          >
            <option value="">All links</option>
            {links.map((link) => (
              <option key={link.id} value={String(link.id)}>
                {link.name}
              </option>
            ))}
          </Select>
        </Field>
      </div>
      {body}
      <ConfirmDialog
        open={deleting !== undefined}
        title="Delete this study?"
        confirmLabel="Delete study"
        busy={remove.isPending}
        error={remove.error?.message}
        onConfirm={() => deleting && remove.mutate(deleting.id)}
        onCancel={() => {
          setDeleting(undefined);
          remove.reset();
        }}
      >
        The saved results of {deleting ? linkName(deleting.linkId) : 'this link'} at{' '}
        {deleting ? formatUtcAndLocal(deleting.atUtc).utc : ''} will be removed.
      </ConfirmDialog>
    </>
  );
}
