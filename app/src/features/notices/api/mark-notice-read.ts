import type { NoticeView } from '@hopwise/common';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { noticesQueryKey } from './get-notices';

export const markNoticeRead = (id: number) => api.post<NoticeView>(`/api/notices/${id}/read`);

export function useMarkNoticeRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markNoticeRead,
    onSettled: () => queryClient.invalidateQueries({ queryKey: noticesQueryKey }),
  });
}
