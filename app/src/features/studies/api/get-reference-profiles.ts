import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ReferenceProfile } from '@/types/links';

export const getReferenceProfiles = (signal?: AbortSignal) =>
  api.get<{ items: ReferenceProfile[] }>('/api/reference-profiles', { signal });

export const getReferenceProfilesQueryOptions = () =>
  queryOptions({
    queryKey: ['reference-profiles'],
    queryFn: ({ signal }) => getReferenceProfiles(signal),
    // The reference set ships with the server and does not change while it runs.
    staleTime: Infinity,
  });

export const useReferenceProfiles = () => useQuery(getReferenceProfilesQueryOptions());
