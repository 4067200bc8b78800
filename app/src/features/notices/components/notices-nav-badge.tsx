import { CounterBadge } from '@fluentui/react-components';
import { useUnreadCount } from '../api/get-unread-count';

/** Unread notices beside the Notices navigation item (polled every 30 s). */
export function NoticesNavBadge() {
  const count = useUnreadCount();
  const unread = count.data?.unread ?? 0;
  if (unread === 0) return null;
  return (
    <CounterBadge
      count={unread}
      overflowCount={99}
      size="small"
      color="danger"
      aria-label={`${unread} unread`}
    />
  );
}
