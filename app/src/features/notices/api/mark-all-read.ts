import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { noticesQueryKey } from './get-notices';

export const markAllNoticesRead = () =>
  api.post<{ updated: number; unread: number }>('/api/notices/read-all');

export function useMarkAllNoticesRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markAllNoticesRead,
    onSettled: () => queryClient.invalidateQueries({ queryKey: noticesQueryKey }),
  });
}
