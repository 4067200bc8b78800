import {
  Button,
  Caption1,
  Dropdown,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Option,
  Spinner,
  Subtitle2,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { ArrowDownload20Regular } from '@fluentui/react-icons';
import { buildProfile } from '@hopwise/common';
import { useQueries } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useNotify } from '@/hooks/use-notify';
import {
  COMPARE_GROUND_RANGES_KM,
  exportCompareCsv,
  useCompareProfiles,
} from '../api/compare-profiles';
import { getVerticalQueryOptions } from '../api/compute-vertical';
import { getProfileQueryOptions } from '../api/get-profile';
import { useProfiles } from '../api/get-profiles';
import { useDebouncedValue } from '../hooks/use-debounced-value';
import { sampleDensityCurve } from '../utils/density-curve';
import { frequencyGridMHz, sweepTopMHz } from '../utils/frequency-grid';
import { ionogramCeilingKm, ionogramPoints } from '../utils/ionogram-points';
import { ChartFrame } from './chart-frame';
import { ChartLegend } from './chart-legend';
import { seriesColor } from './chart-colors';
import { DensityChart, type DensityQuantity } from './density-chart';
import { IonogramChart } from './ionogram-chart';
import { QuantitySwitch } from './quantity-switch';
import { CompareTable } from './compare-table';

const MAX_PICKED = 4;

const useStyles = makeStyles({
  stack: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  controls: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    gap: tokens.spacingHorizontalL,
  },
  picker: { minWidth: '360px', maxWidth: '100%' },
  frequency: { width: '160px' },
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(min(420px, 100%), 1fr))',
    gap: tokens.spacingHorizontalXL,
    alignItems: 'start',
  },
  section: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  head: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
  },
  muted: { color: tokens.colorNeutralForeground3 },
});

const parseIds = (text: string | null): number[] =>
  (text ?? '')
    .split(',')
    .map(Number)
    .filter((n) => Number.isInteger(n) && n > 0)
    .slice(0, MAX_PICKED);

function saveBlob(blob: Blob, fileName: string) {
  const url = URL.createObjectURL(blob);
  const anchor = document.createElement('a');
  anchor.href = url;
  anchor.download = fileName;
  document.body.append(anchor);
  anchor.click();
  anchor.remove();
  window.setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** 2–4 profiles: overlaid N(h) and synthetic ionograms, and the table of their differences. */
export function CompareView() {
  const styles = useStyles();
  const notify = useNotify();
  const [searchParams, setSearchParams] = useSearchParams();
  const ids = parseIds(searchParams.get('ids'));
  const [frequencyText, setFrequencyText] = useState('7');
  const [quantity, setQuantity] = useState<DensityQuantity>('density');
  const [exporting, setExporting] = useState(false);

  const library = useProfiles({ limit: 100 });
  const setIds = (next: number[]) =>
    setSearchParams(next.length > 0 ? { ids: next.join(',') } : {}, { replace: true });

  const frequencyMHz = Number(frequencyText);
  const frequencyValid =
    Number.isFinite(frequencyMHz) && frequencyMHz >= 0.1 && frequencyMHz <= 100;
  const debouncedFrequency = useDebouncedValue(frequencyValid ? frequencyMHz : 0, 400);

  const profiles = useQueries({ queries: ids.map((id) => getProfileQueryOptions(id)) });
  const rows = profiles.map((q) => q.data);
  const loaded = rows.every(Boolean) && rows.length === ids.length;

  const curves = useMemo(
    () =>
      rows.map((row) => {
        if (!row?.profile) return [];
        try {
          return sampleDensityCurve(buildProfile(row.profile));
        } catch {
          return [];
        }
      }),
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [rows.map((r) => r?.id ?? 0).join(','), loaded],
  );

  const maxFoF2 = Math.max(0, ...rows.map((r) => r?.foF2MHz ?? 0));
  const frequencies = useMemo(
    () => (maxFoF2 > 0 ? frequencyGridMHz(1, sweepTopMHz(maxFoF2)) : []),
    [maxFoF2],
  );
  const ionograms = useQueries({
    queries: ids.map((id) => ({
      ...getVerticalQueryOptions({ id }, frequencies),
      enabled: frequencies.length > 0,
    })),
  });
  const computing = ionograms.some((q) => q.isFetching);
  const allEchoes = ionograms.flatMap((q) => q.data?.echoes ?? []);
  const ceilingKm = ionogramCeilingKm(
    allEchoes.filter((e) => e.reflected).map((e) => e.virtualHeightKm ?? NaN),
  );

  const compare = useCompareProfiles({
    ids,
    frequencyMHz: debouncedFrequency,
    groundRangesKm: [...COMPARE_GROUND_RANGES_KM],
  });

  const nameOf = (id: number, index: number) =>
    rows[index]?.name ?? library.data?.items.find((p) => p.id === id)?.name ?? `Profile ${id}`;
  const legend = ids.map((id, index) => ({ label: nameOf(id, index), color: seriesColor(index) }));

  const onExport = async () => {
    setExporting(true);
    try {
      const blob = await exportCompareCsv({
        ids,
        frequencyMHz: debouncedFrequency,
        groundRangesKm: [...COMPARE_GROUND_RANGES_KM],
      });
      saveBlob(blob, `hopwise-profile-comparison-${ids.join('-')}.csv`);
    } catch (error) {
      notify('error', 'Could not export the comparison', (error as Error).message);
    } finally {
      setExporting(false);
    }
  };

  const options = library.data?.items ?? [];
  const selectedNames = ids.map((id, i) => nameOf(id, i));

  return (
    <div className={styles.stack}>
      <div className={styles.controls}>
        <Field
          label={`Profiles to compare (2–${MAX_PICKED}; the first is the reference)`}
          validationState={ids.length === MAX_PICKED ? 'warning' : 'none'}
          validationMessage={
            ids.length === MAX_PICKED
              ? `At most ${MAX_PICKED}: remove one to add another.`
              : undefined
          }
        >
          <Dropdown
            className={styles.picker}
            multiselect
            placeholder={library.isPending ? 'Loading the library…' : 'Pick profiles'}
            selectedOptions={ids.map(String)}
            value={selectedNames.join(', ')}
            onOptionSelect={(_, data) => {
              const next = data.selectedOptions.map(Number);
              // Keep the order of picking so the reference stays first.
              const ordered = [
                ...ids.filter((id) => next.includes(id)),
                ...next.filter((id) => !ids.includes(id)),
              ].slice(0, MAX_PICKED);
              setIds(ordered);
            }}
          >
            {ids
              .filter((id) => !options.some((o) => o.id === id))
              .map((id, i) => (
                <Option key={id} value={String(id)}>
                  {nameOf(id, i)}
                </Option>
              ))}
            {options.map((profile) => (
              <Option
                key={profile.id}
                value={String(profile.id)}
                disabled={ids.length >= MAX_PICKED && !ids.includes(profile.id)}
              >
                {profile.name}
              </Option>
            ))}
          </Dropdown>
        </Field>
        <Field
          label="Frequency for group delays (MHz)"
          validationState={frequencyValid ? 'none' : 'error'}
          validationMessage={frequencyValid ? undefined : 'A frequency from 0.1 to 100 MHz.'}
        >
          <Input
            className={styles.frequency}
            inputMode="decimal"
            value={frequencyText}
            onChange={(_, d) => setFrequencyText(d.value)}
          />
        </Field>
      </div>

      {ids.length < 2 ? (
        <Caption1>Pick at least two profiles to compare them.</Caption1>
      ) : (
        <>
          {profiles.some((q) => q.isError) && (
            <MessageBar intent="error" role="alert">
              <MessageBarBody>
                Could not load {profiles.filter((q) => q.isError).length} of the picked profiles.
              </MessageBarBody>
            </MessageBar>
          )}
          <div className={styles.grid}>
            <ChartFrame
              title="Profiles"
              legend={
                <>
                  <ChartLegend label="Profile key" entries={legend} />
                  <QuantitySwitch value={quantity} onChange={setQuantity} />
                </>
              }
            >
              {loaded ? (
                <DensityChart
                  title="Overlaid profiles"
                  quantity={quantity}
                  series={ids.map((id, index) => ({
                    label: nameOf(id, index),
                    color: seriesColor(index),
                    points: curves[index] ?? [],
                  }))}
                />
              ) : (
                <Spinner label="Loading profiles…" />
              )}
            </ChartFrame>
            <ChartFrame
              title="Synthetic ionograms"
              overlay={computing ? <Spinner size="small" label="Computing…" /> : undefined}
              legend={<ChartLegend label="Ionogram key" entries={legend} />}
              caption="Computed from each profile every 0.05 MHz from 1 MHz (ordinary ray, no geomagnetic field). Estimates, not measurements."
            >
              <IonogramChart
                title="Overlaid synthetic ionograms"
                ceilingKm={ceilingKm}
                series={ids.map((id, index) => ({
                  label: nameOf(id, index),
                  color: seriesColor(index),
                  points: ionogramPoints(ionograms[index]?.data?.echoes ?? [], ceilingKm),
                }))}
              />
            </ChartFrame>
          </div>

          <section className={styles.section} aria-label="Differences">
            <div className={styles.head}>
              <Subtitle2 as="h2">Differences to the reference</Subtitle2>
              <Button
                icon={exporting ? <Spinner size="tiny" /> : <ArrowDownload20Regular />}
                disabled={exporting || !compare.isSuccess}
                onClick={() => void onExport()}
              >
                Export CSV
              </Button>
            </div>
            {compare.isFetching && !compare.data && <Spinner label="Comparing…" />}
            {compare.isError && (
              <MessageBar intent="error" role="alert" layout="multiline">
                <MessageBarBody>
                  <MessageBarTitle>Could not compare the profiles</MessageBarTitle>
                  {compare.error.message}
                </MessageBarBody>
              </MessageBar>
            )}
            {compare.data && (
              <CompareTable
                items={compare.data.items}
                groundRangesKm={COMPARE_GROUND_RANGES_KM}
                frequencyMHz={debouncedFrequency}
              />
            )}
            <Caption1 className={styles.muted}>
              1-hop MUF and group delay on reference paths of 1000 and 3000 km over a spherical
              Earth (R₀ = 6371 km, ITU-R P.533). Predictions are estimates: keep an alternative for
              safety-of-life traffic, and transmit only on channels your licence or assignment
              allows.
            </Caption1>
          </section>
        </>
      )}
    </div>
  );
}
