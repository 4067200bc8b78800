import {
  Body1,
  Button,
  Caption1,
  Field,
  Select,
  Spinner,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
} from '@fluentui/react-components';
import { ArrowDownload16Regular } from '@fluentui/react-icons';
import type { ListResponse } from '@hopwise/common';
import { useState } from 'react';
import { DeleteConfirmDialog } from '@/components/confirm-dialog';
import { useTableStyles } from '@/components/data-table/table-styles';
import { TimeCell } from '@/components/data-table/time-cell';
import { EmptyState } from '@/components/empty-state';
import { QueryStateBoundary } from '@/components/query-state-boundary';
import { useNotify } from '@/hooks/use-notify';
import type { HfLink, Study } from '@/types/links';
import { formatUtcAndLocal } from '@/utils/format-time';
import { formatMHz } from '@/utils/study-summary';
import { useDeleteStudy } from '../api/delete-study';
import { exportStudyCsv } from '../api/export-study-csv';
import { useStudies } from '../api/get-studies';

const useStyles = makeStyles({
  table: { minWidth: '820px' },
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
  const table = useTableStyles();
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

  const list = ({ items }: ListResponse<Study>) => (
    <div className={table.wrapper}>
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
          {items.map((study) => {
            const muf = study.result?.perFrequency?.[0]?.mufMHz?.['1'];
            return (
              <TableRow key={study.id}>
                <TableCell>
                  <TimeCell iso={study.atUtc} />
                </TableCell>
                <TableCell>
                  <div className={table.stack}>
                    <Body1>{linkName(study.linkId)}</Body1>
                    {study.name && <Caption1 className={table.muted}>{study.name}</Caption1>}
                  </div>
                </TableCell>
                <TableCell>{describeFrequencies(study.frequenciesMHz)}</TableCell>
                <TableCell>{formatMHz(muf)}</TableCell>
                <TableCell>
                  <div className={table.actions}>
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

  return (
    <>
      <div className={table.toolbar}>
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
      <QueryStateBoundary
        query={studies}
        loadingLabel="Loading studies…"
        errorTitle="Could not load studies"
        empty={
          <EmptyState title="No saved studies">
            Run a study with “Run and save” and it will be listed here.
          </EmptyState>
        }
        isEmpty={(data) => data.items.length === 0}
      >
        {list}
      </QueryStateBoundary>
      <DeleteConfirmDialog
        item={deleting}
        mutation={remove}
        title="Delete this study?"
        confirmLabel="Delete study"
        onClose={() => setDeleting(undefined)}
      >
        The saved results of {deleting ? linkName(deleting.linkId) : 'this link'} at{' '}
        {deleting ? formatUtcAndLocal(deleting.atUtc).utc : ''} will be removed.
      </DeleteConfirmDialog>
    </>
  );
}
