import type { ListResponse, NetView } from '@hopwise/common';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const netsQueryKey = ['nets'] as const;
export const NETS_PAGE = 100;

export const getNets = (signal?: AbortSignal) =>
  api.get<ListResponse<NetView>>('/api/nets', { params: { limit: NETS_PAGE }, signal });

export const getNetsQueryOptions = () =>
  queryOptions({ queryKey: [...netsQueryKey, 'list'], queryFn: ({ signal }) => getNets(signal) });

export const useNets = () => useQuery(getNetsQueryOptions());
