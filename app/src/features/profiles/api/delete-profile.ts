import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { profilesQueryKey } from './get-profiles';

export const deleteProfile = (id: number) => api.delete<void>(`/api/profiles/${id}`);

export function useDeleteProfile({
  onSuccess,
  onError,
}: { onSuccess?: (id: number) => void; onError?: (error: Error, id: number) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteProfile,
    onSuccess: (_data, id) => onSuccess?.(id),
    onError: (error, id) => onError?.(error, id),
    onSettled: () => queryClient.invalidateQueries({ queryKey: profilesQueryKey }),
  });
}
