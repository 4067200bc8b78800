import type { ObliqueRequestInput, ProfileData } from '@hopwise/common';
import { api } from '@/lib/api-client';
import type { ObliqueResult, VerticalResult } from '@/types/links';

/** POST /api/compute/oblique (SPEC §3): modes, MUFs and spread without saving anything. */
export const computeOblique = (body: ObliqueRequestInput, signal?: AbortSignal) =>
  api.post<ObliqueResult>('/api/compute/oblique', body, { signal });

/** POST /api/compute/vertical (SPEC §3): the synthetic ionogram of a profile. */
export const computeVertical = (
  body: { profile: ProfileData; frequenciesMHz: number[] },
  signal?: AbortSignal,
) => api.post<VerticalResult>('/api/compute/vertical', body, { signal });
