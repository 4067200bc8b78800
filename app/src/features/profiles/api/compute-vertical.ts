import type { ProfileInput } from '@hopwise/common';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { VerticalResult } from './types';

/** The synthetic ionogram: `POST /api/compute/vertical` (SPEC §3). */
export const computeVertical = (
  body: { profile: ProfileInput; frequenciesMHz: number[] },
  signal?: AbortSignal,
) => api.post<VerticalResult>('/api/compute/vertical', body, { signal });

export const getVerticalQueryOptions = (profile: ProfileInput, frequenciesMHz: number[]) =>
  queryOptions({
    queryKey: ['compute', 'vertical', profile, frequenciesMHz],
    queryFn: ({ signal }) => computeVertical({ profile, frequenciesMHz }, signal),
    staleTime: Infinity,
    placeholderData: keepPreviousData,
  });

/** Pass `null` to skip (e.g. while the input is invalid). */
export const useVertical = (profile: ProfileInput | null, frequenciesMHz: number[]) =>
  useQuery({
    ...getVerticalQueryOptions(profile ?? {}, frequenciesMHz),
    enabled: profile !== null && frequenciesMHz.length > 0,
  });
