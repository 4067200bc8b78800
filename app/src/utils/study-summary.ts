/** Small read-outs of a study's result shared by the study page and the dashboard cards. */

export interface ModeSummaryInput {
  label: string;
  hops: number;
  ray: 'low' | 'high';
  elevationDeg: number;
  groupDelayMs: number;
}

/**
 * The mode an operator would plan on: the fewest hops (each ground reflection and each pass
 * through the D region costs signal — common practice), then the low ray (the high, Pedersen ray
 * is strongly defocused — common practice), then the shortest group delay.
 */
export function bestMode<M extends ModeSummaryInput>(modes: readonly M[]): M | undefined {
  return [...modes].sort(
    (a, b) =>
      a.hops - b.hops ||
      (a.ray === b.ray ? 0 : a.ray === 'low' ? -1 : 1) ||
      a.groupDelayMs - b.groupDelayMs,
  )[0];
}

/** The highest MUF over all hop counts, or null when no hop count has one. */
export function highestMufMHz(mufMHz: Record<string, number | null> | undefined): number | null {
  const values = Object.values(mufMHz ?? {}).filter(
    (v): v is number => typeof v === 'number' && Number.isFinite(v),
  );
  return values.length ? Math.max(...values) : null;
}

/** "12.86 MHz", or a dash. */
export const formatMHz = (value: number | null | undefined, digits = 2): string =>
  typeof value === 'number' && Number.isFinite(value) ? `${value.toFixed(digits)} MHz` : '—';
