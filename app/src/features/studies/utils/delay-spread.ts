/**
 * Multipath (delay) spread read against the HF test-channel conditions of ITU-R F.1487 (HF modem
 * testing with a Watterson-type channel simulator). The class values used here are FROM MEMORY —
 * quiet ≈ 0.5 ms, moderate 1–2 ms, disturbed 2–7 ms (SPEC §9) — and must be verified against the
 * Recommendation before being quoted.
 */
export type SpreadClass = 'none' | 'single' | 'quiet' | 'moderate' | 'disturbed' | 'beyond';

export interface SpreadReading {
  spreadClass: SpreadClass;
  label: string;
  description: string;
}

/** Upper edges of the classes [ms] (from memory, see above). */
export const QUIET_MAX_MS = 1;
export const MODERATE_MAX_MS = 2;
export const DISTURBED_MAX_MS = 7;

export function classifyDelaySpread(spreadMs: number | null | undefined): SpreadReading {
  if (spreadMs === null || spreadMs === undefined || !Number.isFinite(spreadMs)) {
    return {
      spreadClass: 'none',
      label: 'No modes',
      description: 'No sky-wave mode at this frequency.',
    };
  }
  if (spreadMs === 0) {
    return {
      spreadClass: 'single',
      label: 'Single mode',
      description: 'Only one mode arrives: no multipath spread.',
    };
  }
  if (spreadMs < QUIET_MAX_MS) {
    return {
      spreadClass: 'quiet',
      label: 'Like a quiet channel',
      description: 'Comparable to the quiet test channel (≈ 0.5 ms).',
    };
  }
  if (spreadMs <= MODERATE_MAX_MS) {
    return {
      spreadClass: 'moderate',
      label: 'Like a moderate channel',
      description: 'Within the moderate test channel’s 1–2 ms.',
    };
  }
  if (spreadMs <= DISTURBED_MAX_MS) {
    return {
      spreadClass: 'disturbed',
      label: 'Like a disturbed channel',
      description: 'Within the disturbed test channel’s 2–7 ms.',
    };
  }
  return {
    spreadClass: 'beyond',
    label: 'Beyond the test channels',
    description:
      'Longer than the disturbed test channel’s 7 ms: expect serial-tone modems to struggle.',
  };
}
