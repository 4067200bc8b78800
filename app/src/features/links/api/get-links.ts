import type { ListResponse } from '@hopwise/common';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { HfLink } from '@/types/links';

export const linksQueryKey = ['links'] as const;

export interface LinksQuery {
  limit?: number;
  offset?: number;
  q?: string;
}

export const LINKS_PAGE = 100;

export const getLinks = (query: LinksQuery = {}, signal?: AbortSignal) =>
  api.get<ListResponse<HfLink>>('/api/links', { params: { ...query }, signal });

export const getLinksQueryOptions = (query: LinksQuery = { limit: LINKS_PAGE }) =>
  queryOptions({
    queryKey: [...linksQueryKey, 'list', query],
    queryFn: ({ signal }) => getLinks(query, signal),
  });

export const useLinks = (query?: LinksQuery) => useQuery(getLinksQueryOptions(query));
