import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { HfLink } from '@/types/links';
import { linksQueryKey } from './get-links';

export const getLink = (id: number, signal?: AbortSignal) =>
  api.get<HfLink>(`/api/links/${id}`, { signal });

export const getLinkQueryOptions = (id: number) =>
  queryOptions({
    queryKey: [...linksQueryKey, 'one', id],
    queryFn: ({ signal }) => getLink(id, signal),
    enabled: Number.isInteger(id) && id > 0,
  });

export const useLink = (id: number) => useQuery(getLinkQueryOptions(id));
