import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Study } from '@/types/links';
import { studiesQueryKey } from './get-studies';

export const getStudy = (id: number, signal?: AbortSignal) =>
  api.get<Study>(`/api/studies/${id}`, { signal });

export const getStudyQueryOptions = (id: number | undefined) =>
  queryOptions({
    queryKey: [...studiesQueryKey, 'one', id],
    queryFn: ({ signal }) => getStudy(id as number, signal),
    enabled: id !== undefined,
    // A saved study never changes.
    staleTime: Infinity,
  });

export const useStudy = (id: number | undefined) => useQuery(getStudyQueryOptions(id));
