import {
  Badge,
  Body1,
  Button,
  Caption1,
  Checkbox,
  Field,
  Link,
  Select,
  Switch,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { DataArea24Regular } from '@fluentui/react-icons';
import type { ListResponse } from '@hopwise/common';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useTableStyles } from '@/components/data-table/table-styles';
import { TimeCell } from '@/components/data-table/time-cell';
import { EmptyState } from '@/components/empty-state';
import { QueryStateBoundary } from '@/components/query-state-boundary';
import { paths } from '@/config/paths';
import { useNotify } from '@/hooks/use-notify';
import { useDeleteProfile } from '../api/delete-profile';
import { useProfiles, type ProfilesQuery } from '../api/get-profiles';
import { useSetPublished } from '../api/publish-profile';
import type { ProfileRow } from '../api/types';
import { fixed } from '../utils/format';
import { SOURCE_FILTERS, sourceLabel } from '../utils/source-labels';
import { ProfileRowActions } from './profile-row-actions';

const PAGE_SIZE = 20;
const MAX_COMPARE = 4;

const useStyles = makeStyles({
  filters: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    gap: tokens.spacingHorizontalL,
    marginBottom: tokens.spacingVerticalL,
  },
  select: { minWidth: '190px' },
  // Fluent's table lays out with fixed column widths (plus cell padding): every column but the
  // name gets one, and the name takes what is left.
  table: { minWidth: '1040px' },
  pickColumn: { width: '32px' },
  sourceColumn: { width: '96px' },
  numberColumn: { width: '54px' },
  numeric: { textAlign: 'right', fontVariantNumeric: 'tabular-nums' },
  timeColumn: { width: '158px' },
  publishedColumn: { width: '80px' },
  ownerColumn: { width: '80px' },
  actionsColumn: { width: '150px' },
  footer: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
    marginTop: tokens.spacingVerticalM,
  },
  pager: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
});

type PublishedFilter = 'any' | 'yes' | 'no';

export interface ProfileLibraryProps {
  currentUserId: number;
  canPublish: boolean;
  canWrite: boolean;
  isAdmin: boolean;
}

/** The profile library: filters, the table with row actions, paging and picking rows to compare. */
export function ProfileLibrary({
  currentUserId,
  canPublish,
  canWrite,
  isAdmin,
}: ProfileLibraryProps) {
  const styles = useStyles();
  const table = useTableStyles();
  const notify = useNotify();
  const navigate = useNavigate();
  const [source, setSource] = useState('');
  const [mine, setMine] = useState(false);
  const [published, setPublished] = useState<PublishedFilter>('any');
  const [page, setPage] = useState(0);
  const [picked, setPicked] = useState<number[]>([]);

  const query: ProfilesQuery = {
    source: source || undefined,
    mine: mine || undefined,
    published: published === 'any' ? undefined : published === 'yes',
    limit: PAGE_SIZE,
    offset: page * PAGE_SIZE,
  };
  const profiles = useProfiles(query);
  const nameOf = (id: number) =>
    profiles.data?.items.find((p) => p.id === id)?.name ?? `Profile ${id}`;

  const publish = useSetPublished({
    onSuccess: (_row, input) =>
      notify(
        'success',
        input.published ? 'Profile published' : 'Profile unpublished',
        input.published
          ? `${nameOf(input.id)} is now in the shared library.`
          : `${nameOf(input.id)} is visible to you only.`,
      ),
    onError: (error, input) =>
      notify('error', `Could not change ${nameOf(input.id)}`, error.message),
  });
  const remove = useDeleteProfile({
    onSuccess: (id) => {
      setPicked((list) => list.filter((p) => p !== id));
      notify('success', 'Profile deleted');
    },
    onError: (error) => notify('error', 'Could not delete the profile', error.message),
  });

  const resetPage = () => setPage(0);
  const togglePick = (id: number, on: boolean) =>
    setPicked((list) =>
      on
        ? list.includes(id)
          ? list
          : [...list, id].slice(-MAX_COMPARE)
        : list.filter((p) => p !== id),
    );

  const filters = (
    <div className={styles.filters} role="search" aria-label="Filter profiles">
      <Field label="Source">
        <Select
          className={styles.select}
          value={source}
          onChange={(_, data) => {
            setSource(data.value);
            resetPage();
          }}
        >
          {SOURCE_FILTERS.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Published">
        <Select
          className={styles.select}
          value={published}
          onChange={(_, data) => {
            setPublished(data.value as PublishedFilter);
            resetPage();
          }}
        >
          <option value="any">Published or not</option>
          <option value="yes">Published only</option>
          <option value="no">Not published</option>
        </Select>
      </Field>
      <Switch
        label="Only mine"
        checked={mine}
        onChange={(_, data) => {
          setMine(data.checked);
          resetPage();
        }}
      />
    </div>
  );

  const busyId = publish.isPending
    ? publish.variables?.id
    : remove.isPending
      ? remove.variables
      : undefined;

  const list = ({ items, total }: ListResponse<ProfileRow>) => {
    const first = page * PAGE_SIZE + 1;
    const last = page * PAGE_SIZE + items.length;

    return (
      <>
        <div className={table.wrapper}>
          <Table className={styles.table} aria-label="Profile library">
            <TableHeader>
              <TableRow>
                <TableHeaderCell className={styles.pickColumn} aria-label="Pick to compare" />
                <TableHeaderCell>Name</TableHeaderCell>
                <TableHeaderCell className={styles.sourceColumn}>Source</TableHeaderCell>
                <TableHeaderCell className={styles.timeColumn}>Valid at</TableHeaderCell>
                <TableHeaderCell className={styles.numberColumn}>foE (MHz)</TableHeaderCell>
                <TableHeaderCell className={styles.numberColumn}>foF2 (MHz)</TableHeaderCell>
                <TableHeaderCell className={styles.numberColumn}>hmF2 (km)</TableHeaderCell>
                <TableHeaderCell className={styles.numberColumn}>TEC (TECU)</TableHeaderCell>
                <TableHeaderCell className={styles.publishedColumn}>Published</TableHeaderCell>
                <TableHeaderCell className={styles.ownerColumn}>Owner</TableHeaderCell>
                <TableHeaderCell className={styles.actionsColumn}>Actions</TableHeaderCell>
              </TableRow>
            </TableHeader>
            <TableBody>
              {items.map((profile: ProfileRow) => {
                const own = profile.ownerId === currentUserId;
                return (
                  <TableRow key={profile.id}>
                    <TableCell>
                      <Checkbox
                        aria-label={`Pick ${profile.name} for comparison`}
                        checked={picked.includes(profile.id)}
                        onChange={(_, data) => togglePick(profile.id, data.checked === true)}
                      />
                    </TableCell>
                    <TableCell>
                      <Link
                        as="a"
                        href={paths.profileDetail.getHref(profile.id)}
                        onClick={(e) => {
                          e.preventDefault();
                          navigate(paths.profileDetail.getHref(profile.id));
                        }}
                      >
                        {profile.name}
                      </Link>
                    </TableCell>
                    <TableCell>{sourceLabel(profile.source)}</TableCell>
                    <TableCell>
                      <TimeCell iso={profile.validAtUtc} />
                    </TableCell>
                    <TableCell className={styles.numeric}>{fixed(profile.foEMHz, 2)}</TableCell>
                    <TableCell className={styles.numeric}>{fixed(profile.foF2MHz, 2)}</TableCell>
                    <TableCell className={styles.numeric}>{fixed(profile.hmF2Km, 0)}</TableCell>
                    <TableCell className={styles.numeric}>
                      {fixed(profile.verticalTecu, 1)}
                    </TableCell>
                    <TableCell>
                      {profile.published ? (
                        <Badge appearance="tint" color="brand">
                          Published
                        </Badge>
                      ) : (
                        <Badge appearance="outline" color="subtle">
                          Private
                        </Badge>
                      )}
                    </TableCell>
                    <TableCell>
                      <Body1>
                        {own ? 'You' : (profile.ownerName ?? `User ${profile.ownerId}`)}
                      </Body1>
                    </TableCell>
                    <TableCell>
                      <ProfileRowActions
                        profile={profile}
                        canPublish={canPublish && (own || isAdmin)}
                        canDelete={own || isAdmin}
                        busy={busyId === profile.id}
                        onPublish={(value) => publish.mutate({ id: profile.id, published: value })}
                        onDelete={() => remove.mutate(profile.id)}
                      />
                    </TableCell>
                  </TableRow>
                );
              })}
            </TableBody>
          </Table>
        </div>
        <div className={styles.footer}>
          <div className={styles.pager}>
            <Button size="small" disabled={page === 0} onClick={() => setPage((p) => p - 1)}>
              Previous page
            </Button>
            <Caption1 aria-live="polite">
              {first}–{last} of {total}
            </Caption1>
            <Button size="small" disabled={last >= total} onClick={() => setPage((p) => p + 1)}>
              Next page
            </Button>
          </div>
          <div className={styles.pager}>
            <Caption1 className={table.muted}>
              {picked.length === 0
                ? 'Tick 2–4 profiles to compare them.'
                : `${picked.length} picked for comparison`}
            </Caption1>
            <Button
              as="a"
              appearance="primary"
              size="small"
              disabled={picked.length < 2}
              href={paths.profileCompare.getHref(picked)}
              onClick={(event) => {
                event.preventDefault();
                if (picked.length >= 2) navigate(paths.profileCompare.getHref(picked));
              }}
            >
              Compare picked
            </Button>
          </div>
        </div>
      </>
    );
  };

  return (
    <>
      {filters}
      <QueryStateBoundary
        query={profiles}
        loadingLabel="Loading profiles…"
        errorTitle="Could not load profiles"
        padSpinner
        empty={
          <EmptyState icon={<DataArea24Regular />} title="No profiles match">
            {source || mine || published !== 'any'
              ? 'Change the filters to see more of the library.'
              : canWrite
                ? 'Build one from layer parameters, upload samples, or invert a sounding trace.'
                : 'Published profiles will be listed here.'}
          </EmptyState>
        }
        isEmpty={(data) => data.items.length === 0}
      >
        {list}
      </QueryStateBoundary>
    </>
  );
}
