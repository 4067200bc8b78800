import type { Role, UserView } from '@hopwise/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { usersQueryKey } from './get-users';

export type UpdateUserChange = { role: Role } | { disabled: boolean };

export interface UpdateUserInput {
  id: number;
  change: UpdateUserChange;
}

export const updateUser = ({ id, change }: UpdateUserInput) =>
  api.patch<UserView>(`/api/users/${id}`, change);

export function useUpdateUser({
  onSuccess,
  onError,
}: {
  onSuccess?: (user: UserView, input: UpdateUserInput) => void;
  onError?: (error: Error, input: UpdateUserInput) => void;
} = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: (user, input) => onSuccess?.(user, input),
    onError: (error, input) => onError?.(error, input),
    // Refetch after success and failure alike, so the table shows what the server holds.
    onSettled: () => queryClient.invalidateQueries({ queryKey: usersQueryKey }),
  });
}
