import {
  Badge,
  Body1,
  Button,
  Caption1,
  MessageBar,
  MessageBarBody,
  Subtitle2,
  makeStyles,
  mergeClasses,
  tokens,
} from '@fluentui/react-components';
import { Alert24Regular, CheckmarkCircle20Regular } from '@fluentui/react-icons';
import type { NoticeListResponse, NoticeView } from '@hopwise/common';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { Link } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { QueryStateBoundary } from '@/components/query-state-boundary';
import { formatUtcAndLocal } from '@/utils/format-time';
import { useNotices } from '../api/get-notices';
import { getUnreadCountQueryOptions } from '../api/get-unread-count';
import { useMarkAllNoticesRead } from '../api/mark-all-read';
import { useMarkNoticeRead } from '../api/mark-notice-read';
import { NOTICE_KIND_LABELS } from './notice-kind';

const PAGE = 20;

const useStyles = makeStyles({
  toolbar: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalM,
  },
  list: {
    listStyleType: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
  },
  item: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr) auto',
    gap: tokens.spacingHorizontalL,
    padding: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalL}`,
    borderRadius: tokens.borderRadiusLarge,
    backgroundColor: tokens.colorNeutralBackground1,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    borderLeft: `4px solid ${tokens.colorNeutralStroke2}`,
  },
  unread: {
    borderLeft: `4px solid ${tokens.colorBrandStroke1}`,
    backgroundColor: tokens.colorBrandBackground2,
  },
  text: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS, minWidth: 0 },
  heading: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
  },
  readTitle: { fontWeight: tokens.fontWeightRegular },
  meta: { color: tokens.colorNeutralForeground3 },
  actions: {
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'flex-end',
    gap: tokens.spacingVerticalS,
  },
  pager: {
    display: 'flex',
    gap: tokens.spacingHorizontalS,
    alignItems: 'center',
    marginTop: tokens.spacingVerticalM,
  },
});

function NoticeItem({ notice }: { notice: NoticeView }) {
  const styles = useStyles();
  const markRead = useMarkNoticeRead();
  const unread = notice.readAt === null;
  const at = formatUtcAndLocal(notice.createdAt);
  const titleId = `notice-${notice.id}-title`;
  return (
    <li className={mergeClasses(styles.item, unread && styles.unread)} aria-labelledby={titleId}>
      <div className={styles.text}>
        <div className={styles.heading}>
          {unread && (
            <Badge appearance="filled" color="brand" size="small">
              New
            </Badge>
          )}
          <Badge appearance="tint" color={notice.kind === 'above-muf' ? 'danger' : 'informative'}>
            {NOTICE_KIND_LABELS[notice.kind]}
          </Badge>
          <Subtitle2 as="h2" id={titleId} className={unread ? undefined : styles.readTitle}>
            {notice.title}
          </Subtitle2>
        </div>
        <Body1>{notice.body}</Body1>
        <Caption1 className={styles.meta}>
          <time dateTime={notice.createdAt}>{at.utc}</time> · {at.localShort} local
        </Caption1>
      </div>
      <div className={styles.actions}>
        <Link to={notice.url}>Open {notice.subjectType === 'net' ? 'net' : 'link'}</Link>
        {unread && (
          <Button
            size="small"
            icon={<CheckmarkCircle20Regular />}
            disabled={markRead.isPending}
            onClick={() => markRead.mutate(notice.id)}
            aria-label={`Mark read: ${notice.title}`}
          >
            Mark read
          </Button>
        )}
      </div>
    </li>
  );
}

/** The inbox: newest first, unread highlighted, mark one or all read. */
export function NoticesInbox() {
  const styles = useStyles();
  const [offset, setOffset] = useState(0);
  const notices = useNotices({ limit: PAGE, offset });
  const markAll = useMarkAllNoticesRead();
  const queryClient = useQueryClient();
  const unreadNow = notices.data?.unread;

  // The list knows the unread count too: keep the navigation badge in step without waiting a poll.
  useEffect(() => {
    if (unreadNow !== undefined) {
      queryClient.setQueryData(getUnreadCountQueryOptions().queryKey, { unread: unreadNow });
    }
  }, [queryClient, unreadNow]);

  const list = ({ items, total, unread }: NoticeListResponse) => (
    <section aria-label="Notices">
      <div className={styles.toolbar}>
        <Body1 aria-live="polite">
          {unread === 0 ? 'All read' : `${unread} unread`} · {total} in all
        </Body1>
        <Button
          appearance="secondary"
          disabled={unread === 0 || markAll.isPending}
          onClick={() => markAll.mutate()}
        >
          Mark all read
        </Button>
      </div>
      {markAll.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>{markAll.error.message}</MessageBarBody>
        </MessageBar>
      )}
      <ul className={styles.list}>
        {items.map((n) => (
          <NoticeItem key={n.id} notice={n} />
        ))}
      </ul>
      {total > PAGE && (
        <nav className={styles.pager} aria-label="Notice pages">
          <Button disabled={offset === 0} onClick={() => setOffset(Math.max(0, offset - PAGE))}>
            Newer
          </Button>
          <Caption1>
            {offset + 1}–{Math.min(offset + PAGE, total)} of {total}
          </Caption1>
          <Button disabled={offset + PAGE >= total} onClick={() => setOffset(offset + PAGE)}>
            Older
          </Button>
        </nav>
      )}
    </section>
  );

  return (
    <QueryStateBoundary
      query={notices}
      loadingLabel="Loading notices…"
      errorTitle="Could not load your notices"
      empty={
        <EmptyState icon={<Alert24Regular />} title="No notices yet">
          Hopwise tells you here when the channel in force on a published net schedule you belong
          to, or on a link you follow, rises above the MUF, when the best channel changes, or when a
          mode appears or disappears.
        </EmptyState>
      }
      isEmpty={(data) => data.total === 0}
    >
      {list}
    </QueryStateBoundary>
  );
}
