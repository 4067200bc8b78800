import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { profilesQueryKey } from './get-profiles';
import type { ProfileRow } from './types';

export interface PublishInput {
  id: number;
  published: boolean;
}

/** `POST /api/profiles/:id/publish` or `/unpublish` (needs the `profiles:publish` permission). */
export const setPublished = ({ id, published }: PublishInput) =>
  api.post<ProfileRow>(`/api/profiles/${id}/${published ? 'publish' : 'unpublish'}`);

export function useSetPublished({
  onSuccess,
  onError,
}: {
  onSuccess?: (row: ProfileRow, input: PublishInput) => void;
  onError?: (error: Error, input: PublishInput) => void;
} = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setPublished,
    onSuccess: (row, input) => onSuccess?.(row, input),
    onError: (error, input) => onError?.(error, input),
    onSettled: () => queryClient.invalidateQueries({ queryKey: profilesQueryKey }),
  });
}
