import type { ListResponse } from '@hopwise/common';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ProfileRow } from './types';

export const profilesQueryKey = ['profiles'] as const;

export interface ProfilesQuery {
  source?: string;
  mine?: boolean;
  published?: boolean;
  from?: string;
  to?: string;
  limit?: number;
  offset?: number;
  full?: boolean;
}

export const getProfiles = (query: ProfilesQuery = {}, signal?: AbortSignal) =>
  api.get<ListResponse<ProfileRow>>('/api/profiles', { params: { ...query }, signal });

export const getProfilesQueryOptions = (query: ProfilesQuery = {}) =>
  queryOptions({
    queryKey: [...profilesQueryKey, 'list', query],
    queryFn: ({ signal }) => getProfiles(query, signal),
    placeholderData: keepPreviousData,
  });

export const useProfiles = (query: ProfilesQuery = {}) => useQuery(getProfilesQueryOptions(query));
