import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { profilesQueryKey } from './get-profiles';
import type { ProfileBody, ProfileRow } from './types';

export interface CreateProfileInput {
  name: string;
  validAtUtc?: string;
  latDeg?: number;
  lonDeg?: number;
  profile: ProfileBody;
  published?: boolean;
}

export const createProfile = (input: CreateProfileInput) =>
  api.post<ProfileRow>('/api/profiles', input);

export function useCreateProfile({ onSuccess }: { onSuccess?: (row: ProfileRow) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProfile,
    onSuccess: async (row) => {
      await queryClient.invalidateQueries({ queryKey: profilesQueryKey });
      onSuccess?.(row);
    },
  });
}
