import {
  Body1,
  Button,
  Caption1,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Spinner,
  Subtitle2,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  mergeClasses,
  tokens,
} from '@fluentui/react-components';
import type { ReactNode } from 'react';
import { useNavigate } from 'react-router-dom';
import { useTableStyles } from '@/components/data-table/table-styles';
import { LinkButton } from '@/components/link-button';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useNotify } from '@/hooks/use-notify';
import { formatUtcAndLocal } from '@/utils/format-time';
import { useDeleteProfile } from '../api/delete-profile';
import { useProfile } from '../api/get-profile';
import { useSetPublished } from '../api/publish-profile';
import { fixed } from '../utils/format';
import { SHAPE_LABELS } from '../utils/layer-form';
import { sourceLabel } from '../utils/source-labels';
import { DerivedFigures } from './derived-figures';
import { ProfileCharts } from './profile-charts';
import { ProfileRowActions } from './profile-row-actions';

const useStyles = makeStyles({
  stack: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL },
  actions: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
  section: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  tableWrap: { maxWidth: '760px' },
  muted: { color: tokens.colorNeutralForeground3 },
});

export interface ProfileDetailProps {
  id: number;
  currentUserId: number;
  canPublish: boolean;
  isAdmin: boolean;
  /** The area's section tabs, shown under the page heading. */
  nav?: ReactNode;
}

function describeLocation(latDeg: number | null, lonDeg: number | null): string | null {
  if (latDeg === null || lonDeg === null) return null;
  const lat = `${Math.abs(latDeg).toFixed(2)}° ${latDeg >= 0 ? 'N' : 'S'}`;
  const lon = `${Math.abs(lonDeg).toFixed(2)}° ${lonDeg >= 0 ? 'E' : 'W'}`;
  return `${lat}, ${lon}`;
}

/** One profile: its figures, N(h) and synthetic ionogram, its layers, and what can be done with it. */
export function ProfileDetail({ id, currentUserId, canPublish, isAdmin, nav }: ProfileDetailProps) {
  const styles = useStyles();
  const table = useTableStyles();
  const notify = useNotify();
  const navigate = useNavigate();
  const query = useProfile(id);
  const publish = useSetPublished({
    onSuccess: (_row, input) =>
      notify('success', input.published ? 'Profile published' : 'Profile unpublished'),
    onError: (error) => notify('error', 'Could not change the profile', error.message),
  });
  const remove = useDeleteProfile({
    onSuccess: () => {
      notify('success', 'Profile deleted');
      navigate(paths.profiles.getHref());
    },
    onError: (error) => notify('error', 'Could not delete the profile', error.message),
  });

  if (query.isPending) return <Spinner label="Loading the profile…" />;
  if (query.isError) {
    return (
      <>
        <PageHeader title="Profile" />
        {nav}
        <MessageBar intent="error" layout="multiline" role="alert">
          <MessageBarBody>
            <MessageBarTitle>
              {query.error.message.includes('not found') || query.error.message === 'Not Found'
                ? 'This profile does not exist or is not shared with you'
                : 'Could not load the profile'}
            </MessageBarTitle>
            {query.error.message}
          </MessageBarBody>
        </MessageBar>
      </>
    );
  }

  const profile = query.data;
  const own = profile.ownerId === currentUserId;
  const valid = formatUtcAndLocal(profile.validAtUtc);
  const location = describeLocation(profile.latDeg, profile.lonDeg);
  const soundingId = profile.provenance?.soundingId;
  const layers = profile.profile && 'layers' in profile.profile ? profile.profile.layers : null;

  return (
    <div className={styles.stack}>
      <PageHeader
        title={profile.name}
        description={
          <>
            {sourceLabel(profile.source)}
            {profile.validAtUtc ? ` · valid ${valid.text}` : ''}
            {location ? ` · ${location}` : ''}
            {profile.published ? ' · published' : ' · private'}
          </>
        }
        actions={
          <div className={styles.actions}>
            <LinkButton to={paths.profileCompare.getHref([profile.id])}>Compare with…</LinkButton>
            <ProfileRowActions
              size="medium"
              profile={profile}
              canPublish={canPublish && (own || isAdmin)}
              canDelete={own || isAdmin}
              busy={publish.isPending || remove.isPending}
              onPublish={(value) => publish.mutate({ id: profile.id, published: value })}
              onDelete={() => remove.mutate(profile.id)}
            />
          </div>
        }
      />
      {nav}

      <DerivedFigures
        label="Derived figures"
        figures={[
          { term: 'foE', value: profile.foEMHz, unit: 'MHz', digits: 2 },
          { term: 'foF1', value: profile.foF1MHz, unit: 'MHz', digits: 2 },
          { term: 'foF2', value: profile.foF2MHz, unit: 'MHz', digits: 2 },
          { term: 'hmF2', value: profile.hmF2Km, unit: 'km', digits: 0 },
          { term: 'Vertical TEC', value: profile.verticalTecu, unit: 'TECU', digits: 1 },
        ]}
      />

      {profile.profile ? (
        <ProfileCharts body={profile.profile} request={{ id: profile.id }} label={profile.name} />
      ) : (
        <MessageBar intent="warning">
          <MessageBarBody>The server did not send this profile's layers or samples.</MessageBarBody>
        </MessageBar>
      )}

      {layers && (
        <section className={styles.section} aria-label="Layers">
          <Subtitle2 as="h2">Layers</Subtitle2>
          <div className={mergeClasses(table.wrapper, styles.tableWrap)}>
            <Table aria-label="Layers of this profile" size="small">
              <TableHeader>
                <TableRow>
                  <TableHeaderCell>Layer</TableHeaderCell>
                  <TableHeaderCell>Shape</TableHeaderCell>
                  <TableHeaderCell>Critical frequency (MHz)</TableHeaderCell>
                  <TableHeaderCell>Peak height (km)</TableHeaderCell>
                  <TableHeaderCell>Thickness (km)</TableHeaderCell>
                </TableRow>
              </TableHeader>
              <TableBody>
                {layers.map((layer) => (
                  <TableRow key={layer.name}>
                    <TableCell>{layer.name}</TableCell>
                    <TableCell>{SHAPE_LABELS[layer.shape] ?? layer.shape}</TableCell>
                    <TableCell>{fixed(layer.criticalFrequencyMHz, 2)}</TableCell>
                    <TableCell>{fixed(layer.peakHeightKm, 0)}</TableCell>
                    <TableCell>
                      {layer.shape === 'chapman'
                        ? `H = ${fixed(layer.scaleHeightKm, 0)}`
                        : `yₘ = ${fixed(layer.semiThicknessKm, 0)}`}
                    </TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          </div>
        </section>
      )}

      {typeof soundingId === 'number' && (
        <Body1>
          Inverted from sounding #{soundingId}.{' '}
          <Button
            appearance="transparent"
            size="small"
            onClick={() => navigate(paths.profileInvert.getHref(soundingId))}
          >
            Open the trace
          </Button>
        </Body1>
      )}
      <Caption1 className={styles.muted}>
        Added {formatUtcAndLocal(profile.createdAt).text}. Figures and charts are computed from the
        profile: estimates for planning, not measurements.
      </Caption1>
    </div>
  );
}
