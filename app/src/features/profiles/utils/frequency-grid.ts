/** The compute route takes at most 2000 frequencies, each 0.1–100 MHz (SPEC §3). */
export const MAX_FREQUENCIES = 2000;

/**
 * Frequencies from startMHz to endMHz (inclusive when it falls on the grid) in steps of stepMHz,
 * rounded to 1 kHz so that keys and labels stay exact; at most MAX_FREQUENCIES values.
 */
export function frequencyGridMHz(startMHz: number, endMHz: number, stepMHz = 0.05): number[] {
  if (!(stepMHz > 0) || !(endMHz >= startMHz)) return [];
  const count = Math.min(MAX_FREQUENCIES, Math.floor((endMHz - startMHz) / stepMHz + 1e-9) + 1);
  return Array.from(
    { length: count },
    (_, i) => Math.round((startMHz + i * stepMHz) * 1000) / 1000,
  );
}

/** The top of an ionogram sweep: a little above the highest critical frequency, whole MHz. */
export function sweepTopMHz(maxCriticalFrequencyMHz: number): number {
  return Math.min(100, Math.max(2, Math.ceil(maxCriticalFrequencyMHz * 1.05 + 0.5)));
}
