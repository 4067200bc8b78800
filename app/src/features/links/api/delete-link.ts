import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { linksQueryKey } from './get-links';

export const deleteLink = (id: number) => api.delete<void>(`/api/links/${id}`);

export function useDeleteLink({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteLink,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: linksQueryKey });
      onSuccess?.();
    },
  });
}
