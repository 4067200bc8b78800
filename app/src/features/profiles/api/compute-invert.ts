import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { InvertedSample, TracePoint } from './types';

/** True-height inversion of a trace: `POST /api/compute/invert` (SPEC §3). */
export const computeInvert = (trace: TracePoint[], signal?: AbortSignal) =>
  api.post<{ samples: InvertedSample[] }>('/api/compute/invert', { trace }, { signal });

export const getInvertQueryOptions = (trace: TracePoint[]) =>
  queryOptions({
    queryKey: ['compute', 'invert', trace],
    queryFn: ({ signal }) => computeInvert(trace, signal),
    staleTime: Infinity,
  });

export const useInvert = (trace: TracePoint[] | undefined) =>
  useQuery({ ...getInvertQueryOptions(trace ?? []), enabled: (trace?.length ?? 0) > 0 });
