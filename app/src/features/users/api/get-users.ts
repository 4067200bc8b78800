import type { ListResponse, UserView } from '@hopwise/common';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const usersQueryKey = ['users'] as const;

export interface UsersQuery {
  limit?: number;
  offset?: number;
}

export const getUsers = (query: UsersQuery = {}, signal?: AbortSignal) =>
  api.get<ListResponse<UserView>>('/api/users', { params: { ...query }, signal });

export const getUsersQueryOptions = (query: UsersQuery = {}) =>
  queryOptions({
    queryKey: [...usersQueryKey, query],
    queryFn: ({ signal }) => getUsers(query, signal),
  });

export const useUsers = (query: UsersQuery = {}) => useQuery(getUsersQueryOptions(query));
