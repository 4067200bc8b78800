import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { noticesQueryKey } from './get-notices';

/** How often the shell asks for the unread count. [ms] */
export const UNREAD_POLL_MS = 30_000;

export const getUnreadCount = (signal?: AbortSignal) =>
  api.get<{ unread: number }>('/api/notices/unread-count', { signal });

export const getUnreadCountQueryOptions = () =>
  queryOptions({
    queryKey: [...noticesQueryKey, 'unread-count'],
    queryFn: ({ signal }) => getUnreadCount(signal),
  });

export const useUnreadCount = (enabled = true) =>
  useQuery({
    ...getUnreadCountQueryOptions(),
    enabled,
    refetchInterval: UNREAD_POLL_MS,
    refetchIntervalInBackground: false,
  });
