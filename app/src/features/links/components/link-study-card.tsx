import {
  Body1,
  Caption1,
  Card,
  CardHeader,
  Spinner,
  Subtitle2,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { LinkButton } from '@/components/link-button';
import { paths } from '@/config/paths';
import type { HfLink } from '@/types/links';
import { formatKm } from '@/utils/format-geo';
import { formatUtcAndLocal } from '@/utils/format-time';
import { bestMode, formatMHz } from '@/utils/study-summary';
import { useLatestStudy } from '../api/get-latest-study';

const useStyles = makeStyles({
  card: { padding: tokens.spacingHorizontalL, gap: tokens.spacingVerticalS },
  facts: {
    display: 'grid',
    gridTemplateColumns: 'auto 1fr',
    gap: `${tokens.spacingVerticalXXS} ${tokens.spacingHorizontalM}`,
    margin: 0,
  },
  term: { color: tokens.colorNeutralForeground3 },
  value: { margin: 0, fontVariantNumeric: 'tabular-nums' },
  muted: { color: tokens.colorNeutralForeground3 },
});

/** A dashboard card: the link's latest saved study at a glance, or a way to run the first one. */
export function LinkStudyCard({ link }: { link: HfLink }) {
  const styles = useStyles();
  const latest = useLatestStudy(link.id);
  const titleId = `link-card-${link.id}`;

  let body;
  if (latest.isPending) body = <Spinner size="tiny" label="Loading the latest study…" />;
  else if (latest.isError)
    body = <Caption1>Could not load the latest study: {latest.error.message}</Caption1>;
  else if (!latest.data) {
    body = (
      <>
        <Body1 className={styles.muted}>No study yet.</Body1>
        <LinkButton to={paths.linkStudy.getHref(link.id)} appearance="primary">
          Run a study
        </LinkButton>
      </>
    );
  } else {
    const study = latest.data;
    const first = study.result.perFrequency[0];
    const withModes = study.result.perFrequency.find((entry) => entry.modes.length > 0);
    const best = withModes ? bestMode(withModes.modes) : undefined;
    const when = formatUtcAndLocal(study.atUtc);
    body = (
      <>
        <dl className={styles.facts}>
          <dt className={styles.term}>MUF, 1 hop</dt>
          <dd className={styles.value}>{formatMHz(first?.mufMHz?.['1'])}</dd>
          <dt className={styles.term}>Best mode</dt>
          <dd className={styles.value}>
            {best && withModes
              ? `${best.label} at ${withModes.frequencyMHz} MHz, ${best.groupDelayMs.toFixed(2)} ms`
              : 'none'}
          </dd>
          <dt className={styles.term}>Study time</dt>
          <dd className={styles.value}>
            {when.utc} <span className={styles.muted}>({when.localShort} local)</span>
          </dd>
        </dl>
        <LinkButton to={paths.linkStudy.getHref(link.id, study.id)} appearance="secondary">
          Open the study
        </LinkButton>
      </>
    );
  }

  return (
    <Card className={styles.card} aria-labelledby={titleId}>
      <CardHeader
        header={
          <Subtitle2 as="h3" id={titleId}>
            {link.name}
          </Subtitle2>
        }
        description={
          <Caption1 className={styles.muted}>
            {link.fromStation.name} → {link.toStation.name} · {formatKm(link.distanceKm)}
          </Caption1>
        }
      />
      {body}
    </Card>
  );
}
