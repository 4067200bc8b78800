import type { NetView } from '@hopwise/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { NetInput } from './create-net';
import { netsQueryKey } from './get-nets';

export const updateNet = ({ id, change }: { id: number; change: Partial<NetInput> }) =>
  api.patch<NetView>(`/api/nets/${id}`, change);

export function useUpdateNet({ onSuccess }: { onSuccess?: (net: NetView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateNet,
    onSuccess: async (net) => {
      await queryClient.invalidateQueries({ queryKey: netsQueryKey });
      onSuccess?.(net);
    },
  });
}
