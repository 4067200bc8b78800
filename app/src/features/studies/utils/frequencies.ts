/** Frequency lists for a study sweep and for the group-delay chart. */

/** Largest number of frequencies one study may ask for (keeps a saved study quick to compute). */
export const MAX_STUDY_FREQUENCIES = 60;

/**
 * start, start + step, …, up to stop inclusive. Each value is rounded to 1 kHz so that 0.1-MHz
 * steps do not accumulate binary floating-point error (3.3000000000000003).
 */
export function sweepFrequencies(startMHz: number, stopMHz: number, stepMHz: number): number[] {
  if (!(stepMHz > 0) || !(stopMHz >= startMHz)) return [];
  const count = Math.floor((stopMHz - startMHz) / stepMHz + 1e-9) + 1;
  return Array.from(
    { length: count },
    (_, i) => Math.round((startMHz + i * stepMHz) * 1000) / 1000,
  );
}

/** The group-delay chart sweeps from this frequency [MHz] (the bottom of the HF planning range). */
export const CHART_START_MHZ = 2;

/**
 * Frequencies for the group-delay chart: from 2 MHz to the highest MUF, at most `maxPoints`, in a
 * step of 0.1, 0.2, 0.25 or 0.5 MHz (the finest that fits), ending exactly on the MUF.
 */
export function groupDelaySweep(highestMufMHz: number, maxPoints = 64): number[] {
  if (!(highestMufMHz > CHART_START_MHZ)) return [];
  const spanMHz = highestMufMHz - CHART_START_MHZ;
  const stepMHz = [0.1, 0.2, 0.25, 0.5, 1, 2].find((step) => spanMHz / step + 2 <= maxPoints) ?? 2;
  const list = sweepFrequencies(CHART_START_MHZ, highestMufMHz, stepMHz);
  // The MUF itself, a little inside so the top mode still has a solution.
  const topMHz = Math.floor(highestMufMHz * 1000 - 1) / 1000;
  if (list[list.length - 1] < topMHz) list.push(topMHz);
  return list;
}
