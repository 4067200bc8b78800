import type { NoticeListResponse } from '@hopwise/common';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Every notices query starts with this key; mutations invalidate it. */
export const noticesQueryKey = ['notices'] as const;

export interface NoticesQuery {
  limit?: number;
  offset?: number;
  unread?: boolean;
}

export const getNotices = (query: NoticesQuery = {}, signal?: AbortSignal) =>
  api.get<NoticeListResponse>('/api/notices', { params: { ...query }, signal });

export const getNoticesQueryOptions = (query: NoticesQuery = {}) =>
  queryOptions({
    queryKey: [...noticesQueryKey, 'list', query],
    queryFn: ({ signal }) => getNotices(query, signal),
    placeholderData: keepPreviousData,
  });

export const useNotices = (query: NoticesQuery = {}) =>
  useQuery({ ...getNoticesQueryOptions(query), refetchInterval: 30_000 });
