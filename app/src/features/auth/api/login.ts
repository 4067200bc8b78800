import type { LoginResponse } from '@hopwise/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { setToken } from '@/lib/auth-token';
import { userQueryKey } from './get-user';

export interface LoginInput {
  email: string;
  password: string;
}

export const login = (input: LoginInput): Promise<LoginResponse> =>
  api.post<LoginResponse>('/api/auth/login', input);

export function useLogin({ onSuccess }: { onSuccess?: (data: LoginResponse) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (data) => {
      setToken(data.accessToken);
      // Start from a clean cache so nothing from a previous user survives.
      queryClient.clear();
      queryClient.setQueryData(userQueryKey, data.user);
      onSuccess?.(data);
    },
  });
}
