import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { stationsQueryKey } from './get-stations';

export const deleteStation = (id: number) => api.delete<void>(`/api/stations/${id}`);

export function useDeleteStation({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteStation,
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: stationsQueryKey }),
        queryClient.invalidateQueries({ queryKey: ['links'] }),
      ]);
      onSuccess?.();
    },
  });
}
