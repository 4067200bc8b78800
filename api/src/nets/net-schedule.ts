import type { PlanResponse } from '@hopwise/common';
import type { ScheduleSlot } from '../db/schema/nets.js';

/**
 * A net's draft schedule from the plans of its paths (control station → each member), slot by slot:
 *   usableChannelsKHz  channels usable (≤ MUF) on ALL member paths
 *   owfMHz             the lowest OWF over the paths; mufMHz the lowest highest-MUF over the paths
 *   bestChannelKHz     the highest channel usable on all paths at or below that lowest OWF
 *                      (so it is at or below the OWF of every path; null if none)
 *   channelKHz         the controller's override for the slot if saved, else the best channel
 * A path with no MUF in a slot (closed) leaves no usable channel and null MUF/OWF in that slot.
 */
export function combinePlans(
  plans: readonly PlanResponse[],
  overrides: ReadonlyMap<string, number>,
): ScheduleSlot[] {
  if (!plans.length) return [];
  return plans[0].slots.map((first, i) => {
    const slots = plans.map((p) => p.slots[i]);
    const maxMufs = slots.map((s) => {
      const ms = Object.values(s.mufMHz).filter((m): m is number => m !== null);
      return ms.length ? Math.max(...ms) : null;
    });
    const closed = maxMufs.some((m) => m === null);
    const mufMHz = closed ? null : Math.min(...(maxMufs as number[]));
    const owfs = slots.map((s) => s.owfMHz);
    const owfMHz = owfs.some((o) => o === null) ? null : Math.min(...(owfs as number[]));
    const usableChannelsKHz = first.usableChannelsKHz.filter((c) =>
      slots.every((s) => s.usableChannelsKHz.includes(c)),
    );
    const atOrBelow = owfMHz === null ? [] : usableChannelsKHz.filter((c) => c / 1000 <= owfMHz);
    const bestChannelKHz = atOrBelow.length ? atOrBelow[atOrBelow.length - 1] : null;
    const override = overrides.get(first.startUtc);
    return {
      startUtc: first.startUtc,
      channelKHz: override ?? bestChannelKHz,
      bestChannelKHz,
      usableChannelsKHz,
      mufMHz,
      owfMHz,
      overridden: override !== undefined,
    };
  });
}
