import type { NetScheduleView } from '@hopwise/common';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { netsQueryKey } from './get-nets';

export type ScheduleSourceChoice = 'model' | 'feed';

export interface ScheduleQuery {
  dateUtc: string;
  profileSource: ScheduleSourceChoice;
}

export const getNetSchedule = (id: number, q: ScheduleQuery, signal?: AbortSignal) =>
  api.get<NetScheduleView>(`/api/nets/${id}/schedule`, { params: { ...q }, signal });

export const getNetScheduleQueryOptions = (id: number, q: ScheduleQuery) =>
  queryOptions({
    queryKey: [...netsQueryKey, id, 'schedule', q],
    queryFn: ({ signal }) => getNetSchedule(id, q, signal),
    placeholderData: keepPreviousData,
  });

export const useNetSchedule = (id: number, q: ScheduleQuery) =>
  useQuery(getNetScheduleQueryOptions(id, q));
