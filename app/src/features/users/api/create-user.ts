import type { Role, UserView } from '@hopwise/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { usersQueryKey } from './get-users';

export interface CreateUserInput {
  email: string;
  displayName: string;
  password: string;
  role: Role;
}

/** Minimum password length for new accounts (the API checks the same). */
export const MIN_PASSWORD_LENGTH = 10;

export const createUser = (input: CreateUserInput) => api.post<UserView>('/api/users', input);

export function useCreateUser({ onSuccess }: { onSuccess?: (user: UserView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: async (user) => {
      await queryClient.invalidateQueries({ queryKey: usersQueryKey });
      onSuccess?.(user);
    },
  });
}
