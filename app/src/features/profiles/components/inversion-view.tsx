import {
  Button,
  Caption1,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Select,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { buildProfile, type ProfileInput } from '@hopwise/common';
import { useEffect, useMemo, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { paths } from '@/config/paths';
import { useNotify } from '@/hooks/use-notify';
import { formatUtcAndLocal } from '@/utils/format-time';
import { useInvert } from '../api/compute-invert';
import { useVertical } from '../api/compute-vertical';
import { useSounding, useSoundings } from '../api/get-soundings';
import { useSaveInversion } from '../api/save-inversion';
import { sampleDensityCurve } from '../utils/density-curve';
import { frequencyGridMHz, MAX_FREQUENCIES } from '../utils/frequency-grid';
import { ionogramCeilingKm, ionogramPoints } from '../utils/ionogram-points';
import { ChartFrame } from './chart-frame';
import { ChartLegend } from './chart-legend';
import { MEASURED_COLOR, seriesColor } from './chart-colors';
import { DensityChart } from './density-chart';
import { IonogramChart } from './ionogram-chart';
import { QuantitySwitch } from './quantity-switch';
import type { DensityQuantity } from './density-chart';

const useStyles = makeStyles({
  stack: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  picker: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    gap: tokens.spacingHorizontalL,
  },
  select: { minWidth: '320px' },
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(min(420px, 100%), 1fr))',
    gap: tokens.spacingHorizontalXL,
    alignItems: 'start',
  },
  save: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    gap: tokens.spacingHorizontalM,
    padding: tokens.spacingHorizontalL,
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
  },
  name: { minWidth: '320px' },
  muted: { color: tokens.colorNeutralForeground3 },
});

/**
 * Pick a sounding, see its trace, the true-height profile the inversion gives, and the synthetic
 * ionogram of that profile laid over the trace (they should coincide: SPEC §3, invert); then save
 * the result to the library.
 */
export function InversionView({ initialSoundingId }: { initialSoundingId?: number }) {
  const styles = useStyles();
  const notify = useNotify();
  const navigate = useNavigate();
  const soundings = useSoundings();
  const [soundingId, setSoundingId] = useState<number | undefined>(initialSoundingId);
  const [quantity, setQuantity] = useState<DensityQuantity>('density');
  const [name, setName] = useState('');

  // With nothing chosen, take the newest sounding.
  useEffect(() => {
    if (soundingId === undefined && soundings.data?.items.length) {
      setSoundingId(soundings.data.items[0].id);
    }
  }, [soundingId, soundings.data]);

  const sounding = useSounding(soundingId);
  const trace = sounding.data?.trace;
  useEffect(() => {
    if (sounding.data) setName(`${sounding.data.name} (inverted)`);
  }, [sounding.data]);

  const inversion = useInvert(trace);
  const samplesBody = useMemo(
    () =>
      inversion.data
        ? {
            samples: inversion.data.samples.map((s) => ({
              heightKm: s.heightKm,
              electronDensityPerM3: s.electronDensityPerM3,
            })),
          }
        : null,
    [inversion.data],
  );
  const built = useMemo(() => {
    if (!samplesBody) return null;
    try {
      return buildProfile(samplesBody);
    } catch {
      return null;
    }
  }, [samplesBody]);
  const curve = useMemo(() => (built ? sampleDensityCurve(built) : []), [built]);

  const frequencies = useMemo(() => {
    if (!trace || trace.length === 0) return [];
    const lowMHz = trace[0].frequencyMHz;
    const highMHz = trace[trace.length - 1].frequencyMHz;
    const step = Math.max(0.05, (highMHz - lowMHz) / (MAX_FREQUENCIES - 1));
    return frequencyGridMHz(Math.max(0.1, lowMHz), highMHz, step);
  }, [trace]);
  const synthetic = useVertical(samplesBody as ProfileInput | null, frequencies);

  const save = useSaveInversion({
    onSuccess: (row) => {
      notify('success', 'Profile saved', `“${row.name}” is in the library.`);
      navigate(paths.profileDetail.getHref(row.id));
    },
  });

  if (soundings.isPending) return <Spinner label="Loading soundings…" />;
  if (soundings.isError) {
    return (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>
          <MessageBarTitle>Could not load soundings</MessageBarTitle>
          {soundings.error.message}
        </MessageBarBody>
      </MessageBar>
    );
  }
  const list = soundings.data.items;
  if (list.length === 0 && soundingId === undefined) {
    return (
      <EmptyState
        title="No sounding traces yet"
        action={
          <Button appearance="primary" onClick={() => navigate(paths.profileUpload.getHref())}>
            Upload a trace
          </Button>
        }
      >
        Upload a trace of virtual height by frequency, then invert it here.
      </EmptyState>
    );
  }

  const echoes = synthetic.data?.echoes ?? [];
  const traceHeights = trace?.map((p) => p.virtualHeightKm) ?? [];
  const ceilingKm = ionogramCeilingKm(traceHeights);
  const observed = formatUtcAndLocal(sounding.data?.observedAtUtc);

  return (
    <div className={styles.stack}>
      <div className={styles.picker}>
        <Field label="Sounding">
          <Select
            className={styles.select}
            value={soundingId === undefined ? '' : String(soundingId)}
            onChange={(_, data) => setSoundingId(Number(data.value))}
          >
            {soundingId !== undefined && !list.some((s) => s.id === soundingId) && (
              <option value={soundingId}>Sounding #{soundingId}</option>
            )}
            {list.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name} · {formatUtcAndLocal(s.observedAtUtc).utc} · {s.pointCount} points
              </option>
            ))}
          </Select>
        </Field>
        {sounding.data && (
          <Caption1 className={styles.muted}>
            Observed {observed.text}
            {trace ? ` · ${trace.length} trace points` : ''}
          </Caption1>
        )}
      </div>

      {sounding.isPending && soundingId !== undefined && <Spinner label="Loading the trace…" />}
      {sounding.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>Could not load the sounding: {sounding.error.message}</MessageBarBody>
        </MessageBar>
      )}
      {inversion.isError && (
        <MessageBar intent="error" role="alert" layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>This trace cannot be inverted</MessageBarTitle>
            {inversion.error.message}
          </MessageBarBody>
        </MessageBar>
      )}

      {trace && (
        <div className={styles.grid}>
          <ChartFrame
            title="Trace and synthetic ionogram"
            overlay={
              inversion.isFetching || synthetic.isFetching ? (
                <Spinner size="small" label="Computing…" />
              ) : undefined
            }
            legend={
              <ChartLegend
                label="Ionogram key"
                entries={[
                  { label: 'Measured trace', color: MEASURED_COLOR, mark: 'dots' },
                  { label: 'Synthetic ionogram of the inverted profile', color: seriesColor(0) },
                ]}
              />
            }
            caption="The inversion assumes a monotonic profile with no valley and no ionization below the lowest sounded frequency; where the line leaves the dots the profile does not reproduce the trace."
          >
            <IonogramChart
              title="Measured trace with the synthetic ionogram of its inversion"
              ceilingKm={ceilingKm}
              series={[
                {
                  label: 'Measured trace',
                  color: MEASURED_COLOR,
                  mark: 'dots',
                  points: trace.map((p) => ({ x: p.frequencyMHz, y: p.virtualHeightKm })),
                },
                {
                  label: 'Synthetic',
                  color: seriesColor(0),
                  points: ionogramPoints(echoes, ceilingKm),
                },
              ]}
            />
          </ChartFrame>
          <ChartFrame
            title="True-height profile"
            legend={<QuantitySwitch value={quantity} onChange={setQuantity} />}
            caption="Electron density by lamination, linear in height within each lamina (SPEC §3)."
          >
            {inversion.isPending ? (
              <Spinner label="Inverting…" />
            ) : (
              <DensityChart
                title="Inverted true-height profile"
                quantity={quantity}
                series={[{ label: 'Inverted', color: seriesColor(0), points: curve }]}
              />
            )}
          </ChartFrame>
        </div>
      )}

      {trace && inversion.isSuccess && soundingId !== undefined && (
        <form
          className={styles.save}
          aria-label="Save as profile"
          onSubmit={(event) => {
            event.preventDefault();
            save.mutate({ soundingId, name: name.trim() || undefined });
          }}
        >
          <Field
            label="Profile name"
            validationState={save.isError ? 'error' : 'none'}
            validationMessage={save.isError ? save.error.message : undefined}
          >
            <Input className={styles.name} value={name} onChange={(_, d) => setName(d.value)} />
          </Field>
          <Button type="submit" appearance="primary" disabled={save.isPending}>
            {save.isPending ? 'Saving…' : 'Save as profile'}
          </Button>
        </form>
      )}
    </div>
  );
}
