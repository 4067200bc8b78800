import { Body1, Field, Select, Subtitle1, makeStyles, tokens } from '@fluentui/react-components';
import { ArrowLeft20Regular } from '@fluentui/react-icons';
import { useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { LinkButton } from '@/components/link-button';
import { PageHeader } from '@/components/page-header';
import { QueryStateBoundary } from '@/components/query-state-boundary';
import { paths } from '@/config/paths';
import { useLink } from '@/features/links/api/get-link';
import { useLinks } from '@/features/links/api/get-links';
import { StudiesTable } from '@/features/studies/components/studies-table';
import { StudyWorkspace } from '@/features/studies/components/study-workspace';
import { isApiError } from '@/lib/api-client';
import type { HfLink } from '@/types/links';
import { formatBearing, formatKm, formatLatLon } from '@/utils/format-geo';

const useStyles = makeStyles({
  bar: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalL,
    alignItems: 'end',
    marginBottom: tokens.spacingVerticalL,
  },
  facts: { color: tokens.colorNeutralForeground2 },
  section: { marginTop: tokens.spacingVerticalXXXL },
  heading: { display: 'block', marginBottom: tokens.spacingVerticalM },
});

const positiveInt = (value: string | null | undefined) => {
  const n = Number(value);
  return Number.isInteger(n) && n > 0 ? n : undefined;
};

export default function LinkStudyRoute() {
  const styles = useStyles();
  const navigate = useNavigate();
  const params = useParams();
  const [search] = useSearchParams();
  const linkId = positiveInt(params.linkId) ?? 0;
  const studyId = positiveInt(search.get('study'));
  const link = useLink(linkId);
  const links = useLinks();

  const header = (
    <PageHeader
      title="Link study"
      description="Propagation modes, MUFs, group delay and multipath spread of a link for a chosen time, profile and frequency."
      actions={
        <LinkButton to={paths.links.getHref()} icon={<ArrowLeft20Regular />}>
          All links
        </LinkButton>
      }
    />
  );

  const study = (current: HfLink) => {
    const linkItems = links.data?.items ?? [current];

    return (
      <>
        <div className={styles.bar}>
          <Field label="Link">
            <Select
              value={String(current.id)}
              onChange={(_, data) => navigate(paths.linkStudy.getHref(data.value))}
            >
              {linkItems.map((l) => (
                <option key={l.id} value={String(l.id)}>
                  {l.name}
                </option>
              ))}
            </Select>
          </Field>
          <Body1 className={styles.facts}>
            {current.fromStation.name} → {current.toStation.name} · {formatKm(current.distanceKm)} ·
            bearing {formatBearing(current.bearingDeg)} · control point{' '}
            {formatLatLon(current.midpoint.latDeg, current.midpoint.lonDeg)}
          </Body1>
        </div>
        <StudyWorkspace
          key={current.id}
          link={current}
          studyId={studyId}
          onSaved={(id) => navigate(paths.linkStudy.getHref(current.id, id), { replace: true })}
        />
        <section className={styles.section} aria-labelledby="studies-heading">
          <Subtitle1 as="h2" id="studies-heading" className={styles.heading}>
            Saved studies
          </Subtitle1>
          <StudiesTable
            links={linkItems}
            initialLinkId={current.id}
            onOpen={(study) => navigate(paths.linkStudy.getHref(study.linkId, study.id))}
            onDeleted={(id) => {
              if (id === studyId) navigate(paths.linkStudy.getHref(current.id), { replace: true });
            }}
          />
        </section>
      </>
    );
  };

  return (
    <>
      {header}
      <QueryStateBoundary
        query={link}
        loadingLabel="Loading the link…"
        errorTitle={
          isApiError(link.error) && link.error.status === 404
            ? 'There is no link with this number that you can see'
            : 'Could not load the link'
        }
      >
        {study}
      </QueryStateBoundary>
    </>
  );
}
