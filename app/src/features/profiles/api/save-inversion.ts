import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { profilesQueryKey } from './get-profiles';
import type { ProfileRow } from './types';

export interface SaveInversionInput {
  soundingId: number;
  name?: string;
}

/** `POST /api/soundings/:id/invert` → the stored profile (source 'inversion'). */
export const saveInversion = ({ soundingId, name }: SaveInversionInput) =>
  api.post<ProfileRow>(`/api/soundings/${soundingId}/invert`, name ? { name } : {});

export function useSaveInversion({ onSuccess }: { onSuccess?: (row: ProfileRow) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveInversion,
    onSuccess: async (row) => {
      await queryClient.invalidateQueries({ queryKey: profilesQueryKey });
      onSuccess?.(row);
    },
  });
}
