import type { NetView } from '@hopwise/common';
import {
  Button,
  MessageBar,
  MessageBarBody,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { CalendarLtr24Regular } from '@fluentui/react-icons';
import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { useUser } from '@/features/auth/api/get-user';
import { useDeleteNet } from '@/features/nets/api/delete-net';
import { useNets } from '@/features/nets/api/get-nets';
import { NetFormDialog } from '@/features/nets/components/net-form-dialog';
import { NetSchedulePanel } from '@/features/nets/components/net-schedule-panel';
import { NetsTable } from '@/features/nets/components/nets-table';
import { useStations } from '@/features/stations/api/get-stations';

const useStyles = makeStyles({
  section: { display: 'flex', flexDirection: 'column', marginBottom: tokens.spacingVerticalXXL },
});

export default function NetsRoute() {
  const styles = useStyles();
  const { data: user } = useUser();
  const nets = useNets();
  const canManage = user?.role === 'netcontrol' || user?.role === 'admin';
  const stations = useStations();
  const [params, setParams] = useSearchParams();
  const selectedId = Number(params.get('net')) || undefined;
  const [editing, setEditing] = useState<NetView | 'new' | undefined>();
  const [deleting, setDeleting] = useState<NetView | undefined>();
  const remove = useDeleteNet({ onSuccess: () => setDeleting(undefined) });
  const items = nets.data?.items ?? [];
  const selected = items.find((n) => n.id === selectedId);

  return (
    <>
      <PageHeader
        title="Nets"
        description="Nets of stations with assigned channels, and their 24-hour frequency schedules (times in UTC with your local time beside)."
        actions={
          canManage ? (
            <Button appearance="primary" onClick={() => setEditing('new')}>
              Create a net
            </Button>
          ) : undefined
        }
      />
      <section className={styles.section} aria-label="Nets">
        {nets.isPending && <Spinner label="Loading nets…" />}
        {nets.isError && (
          <MessageBar intent="error" role="alert">
            <MessageBarBody>{nets.error.message}</MessageBarBody>
          </MessageBar>
        )}
        {nets.isSuccess && items.length === 0 && (
          <EmptyState icon={<CalendarLtr24Regular />} title="No nets to show yet">
            {canManage
              ? 'Create a net: choose a control station, member stations and the channels assigned to you.'
              : 'Nets with one of your stations, and their published schedules, will appear here.'}
          </EmptyState>
        )}
        {items.length > 0 && (
          <NetsTable
            nets={items}
            selectedId={selectedId}
            onOpen={(net) => setParams({ net: String(net.id) })}
            onEdit={(net) => setEditing(net)}
            onDelete={(net) => setDeleting(net)}
          />
        )}
      </section>
      {selected && <NetSchedulePanel key={selected.id} net={selected} />}
      <NetFormDialog
        open={editing !== undefined}
        onOpenChange={(open) => !open && setEditing(undefined)}
        stations={stations.data?.items ?? []}
        net={editing === 'new' ? undefined : editing}
      />
      <ConfirmDialog
        open={deleting !== undefined}
        title={`Delete ${deleting?.name ?? 'this net'}?`}
        confirmLabel="Delete"
        busy={remove.isPending}
        error={remove.error?.message}
        onConfirm={() => deleting && remove.mutate(deleting.id)}
        onCancel={() => setDeleting(undefined)}
      >
        The net and its draft go away; published versions stay in the record.
      </ConfirmDialog>
    </>
  );
}
