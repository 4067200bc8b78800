import type { ListResponse } from '@hopwise/common';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { SoundingRow } from './types';

export const soundingsQueryKey = ['soundings'] as const;

export const getSoundings = (signal?: AbortSignal) =>
  api.get<ListResponse<SoundingRow>>('/api/soundings', { params: { limit: 100 }, signal });

export const getSoundingsQueryOptions = () =>
  queryOptions({
    queryKey: [...soundingsQueryKey, 'list'],
    queryFn: ({ signal }) => getSoundings(signal),
  });

export const useSoundings = () => useQuery(getSoundingsQueryOptions());

export const getSounding = (id: number, signal?: AbortSignal) =>
  api.get<SoundingRow>(`/api/soundings/${id}`, { signal });

export const useSounding = (id: number | undefined) =>
  useQuery({
    queryKey: [...soundingsQueryKey, 'one', id],
    queryFn: ({ signal }) => getSounding(id ?? 0, signal),
    enabled: id !== undefined && id > 0,
  });
