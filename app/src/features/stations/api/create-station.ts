import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Station, StationInput } from '@/types/links';
import { stationsQueryKey } from './get-stations';

export const createStation = (input: StationInput) => api.post<Station>('/api/stations', input);

export function useCreateStation({ onSuccess }: { onSuccess?: (station: Station) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createStation,
    onSuccess: async (station) => {
      await queryClient.invalidateQueries({ queryKey: stationsQueryKey });
      onSuccess?.(station);
    },
  });
}
