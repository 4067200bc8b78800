import type { NetView } from '@hopwise/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { netsQueryKey } from './get-nets';

export interface NetInput {
  name: string;
  controlStationId: number;
  memberStationIds: number[];
  channelsKHz: number[];
}

export const createNet = (input: NetInput) => api.post<NetView>('/api/nets', input);

export function useCreateNet({ onSuccess }: { onSuccess?: (net: NetView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createNet,
    onSuccess: async (net) => {
      await queryClient.invalidateQueries({ queryKey: netsQueryKey });
      onSuccess?.(net);
    },
  });
}
