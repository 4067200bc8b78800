import type { ProfileData } from '@hopwise/common';
import { useEffect, useState } from 'react';
import type { ObliqueModeResult } from '@/types/links';
import { computeOblique } from '../api/compute-oblique';
import { groupDelaySweep } from '../utils/frequencies';

export interface SweepPoint {
  frequencyMHz: number;
  modes: ObliqueModeResult[];
}

export interface GroupDelaySweep {
  points: SweepPoint[];
  done: number;
  total: number;
  error?: string;
}

/** Requests in flight at once: the machine serving the API may be small. */
const CONCURRENCY = 2;

/**
 * Group delay of every mode from 2 MHz to the highest MUF, one /api/compute/oblique call per
 * frequency with `mufs: false` (only the modes are needed), reporting progress as they complete.
 */
export function useGroupDelaySweep(
  profile: ProfileData | undefined,
  groundRangeKm: number | undefined,
  highestMufMHz: number | null,
): GroupDelaySweep {
  const key = JSON.stringify([profile, groundRangeKm, highestMufMHz]);
  const [state, setState] = useState<GroupDelaySweep & { key: string }>({
    key: '',
    points: [],
    done: 0,
    total: 0,
  });

  useEffect(() => {
    if (!profile || !groundRangeKm || highestMufMHz === null) return;
    const frequencies = groupDelaySweep(highestMufMHz);
    const controller = new AbortController();
    const results: SweepPoint[] = [];
    let next = 0;
    setState({ key, points: [], done: 0, total: frequencies.length });

    const worker = async () => {
      while (next < frequencies.length && !controller.signal.aborted) {
        const frequencyMHz = frequencies[next];
        next += 1;
        const result = await computeOblique(
          { profile, frequencyMHz, groundRangeKm, mufs: false },
          controller.signal,
        );
        results.push({ frequencyMHz, modes: result.modes });
        if (!controller.signal.aborted) {
          const sorted = [...results].sort((a, b) => a.frequencyMHz - b.frequencyMHz);
          setState({ key, points: sorted, done: results.length, total: frequencies.length });
        }
      }
    };

    Promise.all(Array.from({ length: CONCURRENCY }, worker)).catch((error: unknown) => {
      if (controller.signal.aborted) return;
      const message = error instanceof Error ? error.message : String(error);
      setState((current) => ({ ...current, error: message }));
    });
    return () => controller.abort();
    // `key` stands for the three inputs (the profile is an object compared by value).
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);

  if (state.key !== key) return { points: [], done: 0, total: 0 };
  return state;
}
