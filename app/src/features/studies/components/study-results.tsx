import {
  Badge,
  Body1,
  Caption1,
  Field,
  MessageBar,
  MessageBarBody,
  ProgressBar,
  Select,
  Spinner,
  Subtitle1,
  Subtitle2,
  Tooltip,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { Info16Regular } from '@fluentui/react-icons';
import type { ProfileData } from '@hopwise/common';
import { Suspense, lazy, useState } from 'react';
import type { StudyFrequencyResult } from '@/types/links';
import { bestMode, formatMHz, highestMufMHz } from '@/utils/study-summary';
import { useGroupDelaySweep } from '../hooks/use-group-delay-sweep';
import { useRayPaths } from '../hooks/use-ray-paths';
import { classifyDelaySpread } from '../utils/delay-spread';
import { ModeTable } from './mode-table';
import { StudyCautions } from './study-cautions';

// Victory is large: the charts load on their own, after the tables (STACK gotcha 12).
const GroupDelayChart = lazy(() => import('./group-delay-chart'));
const RayDiagramChart = lazy(() => import('./ray-diagram-chart'));
const ProfileChart = lazy(() => import('./profile-chart'));

/** OWF ≈ 0.85 × MUF — common practice (SPEC §9). */
const OWF_FACTOR = 0.85;

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL, minWidth: 0 },
  head: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalL,
    alignItems: 'end',
    justifyContent: 'space-between',
  },
  cards: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(220px, 1fr))',
    gap: tokens.spacingHorizontalL,
  },
  card: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
    padding: tokens.spacingHorizontalL,
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
  },
  mufList: { margin: 0, padding: 0, listStyleType: 'none', fontVariantNumeric: 'tabular-nums' },
  big: {
    fontSize: tokens.fontSizeHero700,
    lineHeight: tokens.lineHeightHero700,
    fontWeight: tokens.fontWeightSemibold,
  },
  muted: { color: tokens.colorNeutralForeground3 },
  headText: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  inline: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalXS },
  charts: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(min(460px, 100%), 1fr))',
    gap: tokens.spacingHorizontalL,
  },
  progress: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
});

/** A study's results, saved or previewed. */
export interface StudyView {
  title: string;
  kind: 'saved' | 'preview';
  profile: ProfileData;
  groundRangeKm: number;
  perFrequency: StudyFrequencyResult[];
}

export function StudyResults({ view }: { view: StudyView }) {
  const styles = useStyles();
  const [selectedMHz, setSelectedMHz] = useState<number | undefined>();
  const entries = view.perFrequency;
  const selected =
    entries.find((entry) => entry.frequencyMHz === selectedMHz) ??
    entries.find((entry) => entry.modes.length > 0) ??
    entries[0];
  const mufs = entries.find(
    (entry) => entry.mufMHz && Object.keys(entry.mufMHz).length > 0,
  )?.mufMHz;
  const topMufMHz = highestMufMHz(mufs);
  const sweep = useGroupDelaySweep(view.profile, view.groundRangeKm, topMufMHz);
  const rays = useRayPaths(view.profile, view.groundRangeKm, selected?.frequencyMHz);
  const spread = classifyDelaySpread(selected?.multipathSpreadMs);
  const best = selected ? bestMode(selected.modes) : undefined;

  if (!selected) return null;

  return (
    <section className={styles.root} aria-labelledby="results-title">
      <div className={styles.head}>
        <div className={styles.headText}>
          <Subtitle1 as="h2" id="results-title">
            {view.kind === 'preview' ? 'Preview (not saved)' : 'Results'}
          </Subtitle1>
          <Body1 as="p" className={styles.muted}>
            {view.title} · ground range {view.groundRangeKm.toFixed(1)} km
          </Body1>
        </div>
        {entries.length > 1 && (
          <Field label="Frequency shown">
            <Select
              value={String(selected.frequencyMHz)}
              onChange={(_, data) => setSelectedMHz(Number(data.value))}
            >
              {entries.map((entry) => (
                <option key={entry.frequencyMHz} value={String(entry.frequencyMHz)}>
                  {entry.frequencyMHz} MHz ({entry.modes.length}{' '}
                  {entry.modes.length === 1 ? 'mode' : 'modes'})
                </option>
              ))}
            </Select>
          </Field>
        )}
      </div>

      <StudyCautions />

      <div className={styles.cards}>
        <div className={styles.card}>
          <Subtitle2 as="h3">MUF by number of hops</Subtitle2>
          {mufs ? (
            <ul className={styles.mufList}>
              {Object.entries(mufs).map(([hops, muf]) => (
                <li key={hops}>
                  <Body1>
                    {hops} {hops === '1' ? 'hop' : 'hops'}: <strong>{formatMHz(muf)}</strong>
                    {muf !== null && (
                      <span className={styles.muted}> · OWF {formatMHz(muf * OWF_FACTOR, 1)}</span>
                    )}
                  </Body1>
                </li>
              ))}
            </ul>
          ) : (
            <Caption1 className={styles.muted}>Not computed for this result.</Caption1>
          )}
          <Caption1 className={styles.muted}>OWF = 0.85 × MUF (common practice).</Caption1>
        </div>
        <div className={styles.card}>
          <Subtitle2 as="h3">Multipath spread at {selected.frequencyMHz} MHz</Subtitle2>
          <span className={styles.big}>
            {selected.multipathSpreadMs === null
              ? '—'
              : `${selected.multipathSpreadMs.toFixed(2)} ms`}
          </span>
          <span className={styles.inline}>
            <Badge
              appearance="tint"
              color={
                spread.spreadClass === 'disturbed' || spread.spreadClass === 'beyond'
                  ? 'danger'
                  : spread.spreadClass === 'moderate'
                    ? 'warning'
                    : 'success'
              }
            >
              {spread.label}
            </Badge>
            <Tooltip
              relationship="description"
              content="HF test-channel delay spreads of ITU-R F.1487: quiet ≈ 0.5 ms, moderate 1–2 ms, disturbed 2–7 ms. Values from memory — verify before quoting."
            >
              <Info16Regular aria-label="About the channel classes" tabIndex={0} />
            </Tooltip>
          </span>
          <Caption1 className={styles.muted}>
            {spread.description} Classes after the ITU-R F.1487 test channels (values from memory;
            verify before quoting).
          </Caption1>
        </div>
        <div className={styles.card}>
          <Subtitle2 as="h3">Mode to plan on</Subtitle2>
          <span className={styles.big}>{best ? best.label : '—'}</span>
          <Caption1 className={styles.muted}>
            {best
              ? `${best.ray} ray, ${best.elevationDeg.toFixed(1)}° elevation, ${best.groupDelayMs.toFixed(3)} ms`
              : 'No mode at this frequency.'}{' '}
            Fewest hops, low ray first (common practice).
          </Caption1>
        </div>
      </div>

      <section aria-labelledby="modes-title">
        <Subtitle2 as="h3" id="modes-title" style={{ display: 'block', marginBottom: 8 }}>
          Modes at {selected.frequencyMHz} MHz
        </Subtitle2>
        <ModeTable modes={selected.modes} frequencyMHz={selected.frequencyMHz} />
      </section>

      <div className={styles.charts}>
        <div className={styles.progress}>
          {topMufMHz === null ? (
            <MessageBar intent="info">
              <MessageBarBody>
                No MUF on this path, so there is no group-delay curve to draw.
              </MessageBarBody>
            </MessageBar>
          ) : (
            <>
              {sweep.done < sweep.total && (
                <ProgressBar
                  value={sweep.total ? sweep.done / sweep.total : 0}
                  aria-label="Group-delay sweep progress"
                />
              )}
              <Caption1 className={styles.muted} aria-live="polite">
                {sweep.done < sweep.total
                  ? `Computing group delay: ${sweep.done} of ${sweep.total} frequencies…`
                  : `Group delay at ${sweep.total} frequencies from 2 MHz to ${formatMHz(topMufMHz)}.`}
              </Caption1>
              {sweep.error && (
                <MessageBar intent="error" role="alert">
                  <MessageBarBody>The sweep stopped: {sweep.error}</MessageBarBody>
                </MessageBar>
              )}
              <Suspense fallback={<Spinner size="small" label="Loading chart…" />}>
                {sweep.points.length > 0 && <GroupDelayChart points={sweep.points} />}
              </Suspense>
            </>
          )}
        </div>
        <div className={styles.progress}>
          {rays.isPending ? (
            <Spinner size="small" label="Tracing ray paths…" />
          ) : rays.isError ? (
            <MessageBar intent="error" role="alert">
              <MessageBarBody>Could not trace the ray paths: {rays.error.message}</MessageBarBody>
            </MessageBar>
          ) : (
            <Suspense fallback={<Spinner size="small" label="Loading chart…" />}>
              <RayDiagramChart modes={rays.data.modes} frequencyMHz={selected.frequencyMHz} />
            </Suspense>
          )}
        </div>
        <Suspense fallback={<Spinner size="small" label="Loading chart…" />}>
          <ProfileChart profile={view.profile} frequencyMHz={selected.frequencyMHz} />
        </Suspense>
      </div>
    </section>
  );
}
