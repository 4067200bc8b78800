import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';
import type { Study } from '@/types/links';
import { linksQueryKey } from './get-links';

/** The link's most recent saved study, or `null` when it has none (the API answers 404). */
export async function getLatestStudy(linkId: number, signal?: AbortSignal): Promise<Study | null> {
  try {
    return await api.get<Study>(`/api/links/${linkId}/latest-study`, { signal });
  } catch (error) {
    if (isApiError(error) && error.status === 404) return null;
    throw error;
  }
}

export const getLatestStudyQueryOptions = (linkId: number) =>
  queryOptions({
    queryKey: [...linksQueryKey, 'latest-study', linkId],
    queryFn: ({ signal }) => getLatestStudy(linkId, signal),
  });

export const useLatestStudy = (linkId: number) => useQuery(getLatestStudyQueryOptions(linkId));
