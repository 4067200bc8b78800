import type { ProfileData } from '@hopwise/common';
import { useQuery } from '@tanstack/react-query';
import { computeOblique } from '../api/compute-oblique';

/** The modes at one frequency with their ray paths (height against ground range) for the diagram. */
export function useRayPaths(
  profile: ProfileData | undefined,
  groundRangeKm: number | undefined,
  frequencyMHz: number | undefined,
) {
  return useQuery({
    queryKey: ['compute', 'oblique-ray-paths', profile, groundRangeKm, frequencyMHz],
    queryFn: ({ signal }) =>
      computeOblique(
        {
          profile: profile as ProfileData,
          groundRangeKm: groundRangeKm as number,
          frequencyMHz: frequencyMHz as number,
          mufs: false,
          includeRayPath: true,
        },
        signal,
      ),
    enabled: profile !== undefined && !!groundRangeKm && !!frequencyMHz,
    staleTime: Infinity,
  });
}
