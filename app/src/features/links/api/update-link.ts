import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { HfLink, LinkInput } from '@/types/links';
import { linksQueryKey } from './get-links';

export interface UpdateLinkInput {
  id: number;
  change: Partial<LinkInput>;
}

export const updateLink = ({ id, change }: UpdateLinkInput) =>
  api.patch<HfLink>(`/api/links/${id}`, change);

export function useUpdateLink({ onSuccess }: { onSuccess?: (link: HfLink) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateLink,
    onSuccess: async (link) => {
      await queryClient.invalidateQueries({ queryKey: linksQueryKey });
      onSuccess?.(link);
    },
  });
}
