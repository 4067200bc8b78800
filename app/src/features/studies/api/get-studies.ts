import type { ListResponse } from '@hopwise/common';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Study } from '@/types/links';

export const studiesQueryKey = ['studies'] as const;

export interface StudiesQuery {
  linkId?: number;
  from?: string;
  to?: string;
  sort?: 'atUtc' | 'createdAt';
  order?: 'asc' | 'desc';
  limit?: number;
  offset?: number;
}

export const getStudies = (query: StudiesQuery = {}, signal?: AbortSignal) =>
  api.get<ListResponse<Study>>('/api/studies', { params: { ...query }, signal });

export const getStudiesQueryOptions = (query: StudiesQuery = {}) =>
  queryOptions({
    queryKey: [...studiesQueryKey, 'list', query],
    queryFn: ({ signal }) => getStudies(query, signal),
  });

export const useStudies = (query: StudiesQuery = {}) => useQuery(getStudiesQueryOptions(query));
