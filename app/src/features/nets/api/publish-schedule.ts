import type { ScheduleVersionView } from '@hopwise/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { netsQueryKey } from './get-nets';

export interface PublishInput {
  netId: number;
  dateUtc: string;
  profileSource: 'model' | 'feed';
}

export const publishSchedule = ({ netId, ...body }: PublishInput) =>
  api.post<ScheduleVersionView>(`/api/nets/${netId}/publish`, body);

export function usePublishSchedule({
  onSuccess,
}: { onSuccess?: (v: ScheduleVersionView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: publishSchedule,
    onSuccess: async (version) => {
      await queryClient.invalidateQueries({ queryKey: netsQueryKey });
      onSuccess?.(version);
    },
  });
}
