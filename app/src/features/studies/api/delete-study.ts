import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { studiesQueryKey } from './get-studies';

export const deleteStudy = (id: number) => api.delete<void>(`/api/studies/${id}`);

export function useDeleteStudy({ onSuccess }: { onSuccess?: (id: number) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteStudy,
    onSuccess: async (_, id) => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: [...studiesQueryKey, 'list'] }),
        queryClient.invalidateQueries({ queryKey: ['links', 'latest-study'] }),
      ]);
      onSuccess?.(id);
    },
  });
}
