import type { LoginResponse, UserView } from '@hopwise/common';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getToken } from '@/lib/auth-token';

/** The signed-in user: the full view from /auth/me, or the shorter one login returns. */
export type SessionUser = LoginResponse['user'] & Partial<Pick<UserView, 'disabled' | 'createdAt'>>;

export const userQueryKey = ['auth', 'me'] as const;

/** `null` when nobody is signed in (no token): not an error. */
export async function getUser(): Promise<SessionUser | null> {
  if (!getToken()) return null;
  return api.get<UserView>('/api/auth/me');
}

export const getUserQueryOptions = () =>
  queryOptions({ queryKey: userQueryKey, queryFn: getUser, staleTime: 5 * 60_000 });

export const useUser = () => useQuery(getUserQueryOptions());
