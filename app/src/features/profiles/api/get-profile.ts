import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { profilesQueryKey } from './get-profiles';
import type { ProfileRow } from './types';

export const getProfile = (id: number, signal?: AbortSignal) =>
  api.get<ProfileRow>(`/api/profiles/${id}`, { signal });

export const getProfileQueryOptions = (id: number) =>
  queryOptions({
    queryKey: [...profilesQueryKey, 'one', id],
    queryFn: ({ signal }) => getProfile(id, signal),
  });

export const useProfile = (id: number | undefined) =>
  useQuery({ ...getProfileQueryOptions(id ?? 0), enabled: id !== undefined && id > 0 });
