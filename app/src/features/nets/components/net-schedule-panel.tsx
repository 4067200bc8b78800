import type { NetView, ScheduleSlot } from '@hopwise/common';
import {
  Badge,
  Button,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Select,
  Spinner,
  Subtitle1,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { DateTime } from 'luxon';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { useNotify } from '@/hooks/use-notify';
import { formatUtcAndLocal } from '@/utils/format-time';
import { exportSchedule } from '../api/export-schedule';
import { useNetSchedule, type ScheduleSourceChoice } from '../api/get-net-schedule';
import { usePublishSchedule } from '../api/publish-schedule';
import { useSaveOverrides } from '../api/save-overrides';
import { ScheduleGrid } from './schedule-grid';

const useStyles = makeStyles({
  panel: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  bar: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalM,
    alignItems: 'flex-end',
  },
  legend: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL },
});

const SAFETY =
  'Predictions are estimates: keep an alternative path for safety-of-life traffic. Transmit only on channels your licence or assignment allows; RF-exposure limits of local regulations apply.';

const todayUtc = () => DateTime.utc().toISODate() as string;

/** A net's schedule: the draft grid with overrides and Publish (controllers), or the published one. */
export function NetSchedulePanel({ net }: { net: NetView }) {
  const styles = useStyles();
  const notify = useNotify();
  const [dateUtc, setDateUtc] = useState(todayUtc);
  const [profileSource, setProfileSource] = useState<ScheduleSourceChoice>('model');
  const [confirming, setConfirming] = useState(false);
  const schedule = useNetSchedule(net.id, { dateUtc, profileSource });
  const overrides = useSaveOverrides();
  const publish = usePublishSchedule({
    onSuccess: (v) => {
      setConfirming(false);
      notify('success', `Schedule published as version ${v.version}`, net.name);
    },
  });

  const onOverride = (slot: ScheduleSlot, channelKHz: number | null) =>
    overrides.mutate(
      { netId: net.id, slots: [{ startUtc: slot.startUtc, channelKHz }] },
      { onError: (e) => notify('error', 'Override not saved', e.message) },
    );
  const download = (format: 'csv' | 'ics') =>
    exportSchedule(net.id, format).catch((e: Error) => notify('error', 'Export failed', e.message));

  const data = schedule.data;
  const published = data?.published;
  return (
    <section className={styles.panel} aria-labelledby="net-schedule-heading">
      <Subtitle1 as="h2" id="net-schedule-heading">
        {net.name}: 24-hour schedule
      </Subtitle1>
      <MessageBar intent="warning">
        <MessageBarBody>
          <MessageBarTitle>Before you transmit</MessageBarTitle>
          {SAFETY}
        </MessageBarBody>
      </MessageBar>
      <div className={styles.bar}>
        {net.canManage && (
          <Field label="Day (UTC)">
            <Input
              type="date"
              value={dateUtc}
              onChange={(_, d) => d.value && setDateUtc(d.value)}
            />
          </Field>
        )}
        {net.canManage && (
          <Field label="Conditions from">
            <Select
              value={profileSource}
              onChange={(_, d) => setProfileSource(d.value as ScheduleSourceChoice)}
            >
              <option value="model">Built-in diurnal model (approximate model)</option>
              <option value="feed">Latest conditions feed update</option>
            </Select>
          </Field>
        )}
        {published ? (
          <Badge appearance="filled" shape="rounded" size="large">
            {`Published v${published.version} for ${published.dateUtc} · ${formatUtcAndLocal(published.publishedAt).text}`}
          </Badge>
        ) : (
          <Badge appearance="outline" shape="rounded" size="large">
            Not published yet
          </Badge>
        )}
        <Button disabled={!published} onClick={() => void download('csv')}>
          Export CSV
        </Button>
        <Button disabled={!published} onClick={() => void download('ics')}>
          Export iCalendar
        </Button>
        {net.canManage && (
          <Button appearance="primary" disabled={!data?.draft} onClick={() => setConfirming(true)}>
            Publish…
          </Button>
        )}
      </div>
      <div className={styles.legend} aria-label="Legend">
        <span>◆ in force (best or override)</span>
        <span>◇ computed best (when overridden)</span>
        <span>○ usable on every member path</span>
        <span>╳ above the MUF on some path</span>
      </div>
      {schedule.isPending && <Spinner label="Computing the schedule…" />}
      {schedule.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>{schedule.error.message}</MessageBarBody>
        </MessageBar>
      )}
      {data?.draft && (
        <>
          {data.approximate && (
            <MessageBar intent="info">
              <MessageBarBody>
                Approximate model: the E layer follows the solar zenith angle; the F layers come
                from an illustrative diurnal model, not from measurements.
              </MessageBarBody>
            </MessageBar>
          )}
          <ScheduleGrid
            slots={data.draft.slots}
            channelsKHz={data.channelsKHz}
            caption={`Draft for ${data.dateUtc} (UTC). Best channel per slot: the highest channel usable on all member paths at or below the lowest OWF (0.85 × MUF). Activate a cell to put that channel in force.`}
            onOverride={onOverride}
            busy={overrides.isPending || schedule.isFetching}
          />
        </>
      )}
      {data && !data.draft && published && (
        <ScheduleGrid
          slots={published.slots}
          channelsKHz={published.channelsKHz}
          caption={`Published version ${published.version} for ${published.dateUtc} (UTC), read-only.`}
        />
      )}
      {data && !data.draft && !published && (
        <MessageBar intent="info">
          <MessageBarBody>The net controller has not published a schedule yet.</MessageBarBody>
        </MessageBar>
      )}
      <ConfirmDialog
        modalType="modal"
        open={confirming}
        title={`Publish the schedule for ${dateUtc}?`}
        confirmLabel="Publish"
        busy={publish.isPending}
        error={publish.error?.message}
        onConfirm={() => publish.mutate({ netId: net.id, dateUtc, profileSource })}
        onCancel={() => setConfirming(false)}
      >
        Members will see this as a new version and be told when the band moves under it. {SAFETY}
      </ConfirmDialog>
    </section>
  );
}
