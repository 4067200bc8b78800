/**
 * Retry delays of the outbox: exponential backoff, delay(n) = min(base · 2^(n−1), cap) after the
 * n-th failed attempt (common practice for queue workers; cf. "truncated exponential backoff"),
 * optionally with "equal jitter" (half fixed, half random) so many rows do not retry in lock-step.
 */
export interface BackoffOptions {
  baseMs: number;
  capMs: number;
  /** After this many attempts the row is given up ('failed'). */
  maxAttempts: number;
}

export const DEFAULT_BACKOFF: BackoffOptions = {
  baseMs: 30_000,
  capMs: 3_600_000,
  maxAttempts: 20,
};

/** Delay before the next attempt after `attempts` failed attempts (attempts ≥ 1). */
export function backoffDelayMs(
  attempts: number,
  options: BackoffOptions = DEFAULT_BACKOFF,
  random: (() => number) | undefined = undefined,
): number {
  const n = Math.max(1, Math.floor(attempts));
  // 2^(n−1) overflows to Infinity for large n; min() then gives the cap.
  const full = Math.min(options.baseMs * 2 ** (n - 1), options.capMs);
  if (!random) return full;
  return Math.round(full / 2 + (random() * full) / 2);
}

/** The next attempt time, or undefined when the row should be given up. */
export function nextAttemptAt(
  attempts: number,
  now: Date,
  options: BackoffOptions = DEFAULT_BACKOFF,
  random?: () => number,
): Date | undefined {
  if (attempts >= options.maxAttempts) return undefined;
  return new Date(now.getTime() + backoffDelayMs(attempts, options, random));
}
