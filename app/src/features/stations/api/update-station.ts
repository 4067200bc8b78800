import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Station, StationInput } from '@/types/links';
import { stationsQueryKey } from './get-stations';

export interface UpdateStationInput {
  id: number;
  change: Partial<StationInput>;
}

export const updateStation = ({ id, change }: UpdateStationInput) =>
  api.patch<Station>(`/api/stations/${id}`, change);

export function useUpdateStation({ onSuccess }: { onSuccess?: (station: Station) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStation,
    onSuccess: async (station) => {
      // A station's position changes its links' distances and bearings too.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: stationsQueryKey }),
        queryClient.invalidateQueries({ queryKey: ['links'] }),
      ]);
      onSuccess?.(station);
    },
  });
}
