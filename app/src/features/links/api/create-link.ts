import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { HfLink, LinkInput } from '@/types/links';
import { linksQueryKey } from './get-links';

export const createLink = (input: LinkInput) => api.post<HfLink>('/api/links', input);

export function useCreateLink({ onSuccess }: { onSuccess?: (link: HfLink) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createLink,
    onSuccess: async (link) => {
      await queryClient.invalidateQueries({ queryKey: linksQueryKey });
      onSuccess?.(link);
    },
  });
}
