import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { netsQueryKey } from './get-nets';

export interface OverrideInput {
  netId: number;
  /** channelKHz null clears the override (back to the computed best channel). */
  slots: { startUtc: string; channelKHz: number | null }[];
}

export const saveOverrides = ({ netId, slots }: OverrideInput) =>
  api.put<{ overrides: OverrideInput['slots'] }>(`/api/nets/${netId}/schedule/overrides`, {
    slots,
  });

export function useSaveOverrides() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveOverrides,
    onSuccess: (_data, input) =>
      queryClient.invalidateQueries({ queryKey: [...netsQueryKey, input.netId, 'schedule'] }),
  });
}
