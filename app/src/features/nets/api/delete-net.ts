import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { netsQueryKey } from './get-nets';

export const deleteNet = (id: number) => api.delete<void>(`/api/nets/${id}`);

export function useDeleteNet({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteNet,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: netsQueryKey });
      onSuccess?.();
    },
  });
}
