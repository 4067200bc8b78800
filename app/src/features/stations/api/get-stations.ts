import type { ListResponse } from '@hopwise/common';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Station } from '@/types/links';

export const stationsQueryKey = ['stations'] as const;

export interface StationsQuery {
  limit?: number;
  offset?: number;
  q?: string;
}

/** The page size the tables and the map ask for (the API's largest page). */
export const STATIONS_PAGE = 100;

export const getStations = (query: StationsQuery = {}, signal?: AbortSignal) =>
  api.get<ListResponse<Station>>('/api/stations', { params: { ...query }, signal });

export const getStationsQueryOptions = (query: StationsQuery = { limit: STATIONS_PAGE }) =>
  queryOptions({
    queryKey: [...stationsQueryKey, query],
    queryFn: ({ signal }) => getStations(query, signal),
  });

export const useStations = (query?: StationsQuery) => useQuery(getStationsQueryOptions(query));
