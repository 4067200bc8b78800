import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CompareResult } from './types';

/** Reference ranges of the difference table: a short and a long one-hop path. */
export const COMPARE_GROUND_RANGES_KM = [1000, 3000] as const;

export interface CompareInput {
  ids: number[];
  frequencyMHz: number;
  groundRangesKm?: number[];
}

export const compareProfiles = (input: CompareInput, signal?: AbortSignal) =>
  api.post<CompareResult>('/api/profiles/compare', input, { signal });

export const getCompareQueryOptions = (input: CompareInput) =>
  queryOptions({
    queryKey: ['profiles', 'compare', input],
    queryFn: ({ signal }) => compareProfiles(input, signal),
    placeholderData: keepPreviousData,
  });

export const useCompareProfiles = (input: CompareInput) =>
  useQuery({
    ...getCompareQueryOptions(input),
    enabled: input.ids.length >= 2 && input.ids.length <= 4 && input.frequencyMHz > 0,
  });

/** `GET /api/profiles/compare.csv`, fetched with the session's token and returned as a Blob. */
export const exportCompareCsv = ({ ids, frequencyMHz, groundRangesKm }: CompareInput) =>
  api.get<Blob>('/api/profiles/compare.csv', {
    params: { ids: ids.join(','), frequencyMHz, groundRangesKm: groundRangesKm?.join(',') },
    responseType: 'blob',
  });
