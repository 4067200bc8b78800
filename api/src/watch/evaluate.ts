import type { PlanSlot } from '@hopwise/common';
import type { NoticeKind } from '../db/schema.js';

/**
 * The watch's judgement for one slot of one subject (a net's published schedule or a followed
 * link), given the plan with the current conditions and what was seen last time:
 *  - above-muf: the channel in force is above the highest MUF of the slot (no hop count
 *    supports it), judged on the transition from "supported" to "above";
 *  - best-channel-changed: the best channel (highest usable at or below the OWF, SPEC §3) differs
 *    from the last one seen — for a net slot seen for the first time, from the channel in force
 *    unless the controller overrode that slot;
 *  - mode-appeared / mode-disappeared: with the same best channel, a propagation mode (e.g. 2F2)
 *    is in the plan that was not last time, or the other way round.
 * A change key is deterministic: the same change seen twice gives the same key, so it is stored
 * once per subscriber (UNIQUE(user_id, change_key)); the conditions reference (feed profile id or
 * `model`) is part of it, so a later, separate episode is a new change.
 */
export interface SlotState {
  bestChannelKHz: number | null;
  modes: string[];
  aboveMuf: boolean;
}

export interface SlotChange {
  kind: NoticeKind;
  key: string;
  title: string;
  body: string;
  data: Record<string, unknown>;
}

export interface SlotSubject {
  /** e.g. `net:5:v3` or `link:7:u:2` — the prefix of change keys. */
  keyPrefix: string;
  /** Shown in titles, e.g. `Net "Harrow evening"`. */
  name: string;
  /** Slot start as used in keys and texts (ISO 8601 UTC). */
  slotStartUtc: string;
  channelInForceKHz: number | null;
  /** A slot the controller overrode: the channel in force is a choice, not the plan's best. */
  overridden: boolean;
  /** `feed-<profileId>` or `model`. */
  conditionsRef: string;
  conditionsLabel: string;
}

/** Highest MUF over hop counts [MHz], or null when no hop count has one. */
export function highestMufMHz(slot: Pick<PlanSlot, 'mufMHz'>): number | null {
  const values = Object.values(slot.mufMHz).filter((v): v is number => typeof v === 'number');
  return values.length > 0 ? Math.max(...values) : null;
}

/**
 * One slot as every member path of a net sees it (the same rule as the nets' schedule,
 * nets/net-schedule.ts): the MUFs and modes of the worst path (the lowest highest MUF; a path
 * with none is worst), the lowest OWF, the channels usable on every path, and as best channel
 * the highest of those at or below that OWF.
 */
export function worstPathSlot(slots: readonly PlanSlot[]): PlanSlot {
  const rank = (slot: PlanSlot) => highestMufMHz(slot) ?? -Infinity;
  const worst = slots.reduce((w, slot) => (rank(slot) < rank(w) ? slot : w));
  const owfs = slots.map((slot) => slot.owfMHz);
  const owfMHz = owfs.some((o) => o === null) ? null : Math.min(...(owfs as number[]));
  const usableChannelsKHz = slots[0].usableChannelsKHz.filter((c) =>
    slots.every((slot) => slot.usableChannelsKHz.includes(c)),
  );
  const atOrBelow = owfMHz === null ? [] : usableChannelsKHz.filter((c) => c / 1000 <= owfMHz);
  return {
    startUtc: slots[0].startUtc,
    mufMHz: worst.mufMHz,
    owfMHz,
    usableChannelsKHz,
    bestChannelKHz: atOrBelow.length ? atOrBelow[atOrBelow.length - 1] : null,
    modes: worst.modes,
  };
}

const hhmm = (iso: string) => `${iso.slice(11, 16)} UTC`;
const keyTime = (iso: string) => `${iso.slice(0, 16)}Z`;
const mhz = (v: number | null) => (v === null ? 'none' : `${v.toFixed(2)} MHz`);
const khz = (v: number | null) => (v === null ? 'none' : `${v} kHz`);

export function evaluateSlot(
  subject: SlotSubject,
  plan: PlanSlot,
  previous: SlotState | undefined,
): { changes: SlotChange[]; state: SlotState } {
  const changes: SlotChange[] = [];
  const mufMHz = highestMufMHz(plan);
  const modes = [...new Set(plan.modes.map((m) => m.label))].sort();
  const inForce = subject.channelInForceKHz;
  const aboveMuf = inForce !== null && (mufMHz === null || inForce / 1000 > mufMHz);
  const at = hhmm(subject.slotStartUtc);
  const base = `${subject.keyPrefix}:slot:${keyTime(subject.slotStartUtc)}`;
  const ref = `p:${subject.conditionsRef}`;
  const common = {
    slotStartUtc: subject.slotStartUtc,
    channelInForceKHz: inForce,
    mufMHz,
    owfMHz: plan.owfMHz,
    bestChannelKHz: plan.bestChannelKHz,
    usableChannelsKHz: plan.usableChannelsKHz,
    modes,
    conditions: subject.conditionsRef,
  };

  if (aboveMuf && previous?.aboveMuf !== true) {
    changes.push({
      kind: 'above-muf',
      key: `${base}:above-muf:${inForce}:${ref}`,
      title: `${subject.name}: ${inForce} kHz is above the MUF at ${at}`,
      body:
        `With ${subject.conditionsLabel}, the highest MUF at ${at} is ${mhz(mufMHz)}, below the ` +
        `channel in force (${inForce} kHz). Best usable channel: ${khz(plan.bestChannelKHz)}.`,
      data: common,
    });
  }

  const previousBest =
    previous !== undefined
      ? previous.bestChannelKHz
      : subject.overridden || inForce === null
        ? undefined
        : inForce;
  if (previousBest !== undefined && previousBest !== plan.bestChannelKHz) {
    changes.push({
      kind: 'best-channel-changed',
      key: `${base}:best:${previousBest ?? 'none'}→${plan.bestChannelKHz ?? 'none'}:${ref}`,
      title: `${subject.name}: best channel at ${at} is now ${khz(plan.bestChannelKHz)}`,
      body:
        `With ${subject.conditionsLabel}, the best channel at ${at} changed from ` +
        `${khz(previousBest)} to ${khz(plan.bestChannelKHz)} (OWF ${mhz(plan.owfMHz)}, ` +
        `MUF ${mhz(mufMHz)}).`,
      data: { ...common, previousBestChannelKHz: previousBest },
    });
  }

  if (previous !== undefined && previous.bestChannelKHz === plan.bestChannelKHz) {
    const before = new Set(previous.modes);
    const now = new Set(modes);
    const ch = plan.bestChannelKHz;
    for (const label of modes.filter((m) => !before.has(m))) {
      changes.push({
        kind: 'mode-appeared',
        key: `${base}:ch:${ch}:mode+:${label}:${ref}`,
        title: `${subject.name}: mode ${label} appeared on ${khz(ch)} at ${at}`,
        body: `With ${subject.conditionsLabel}, ${khz(ch)} now also propagates by ${label} at ${at} (modes: ${modes.join(', ') || 'none'}).`,
        data: { ...common, mode: label },
      });
    }
    for (const label of previous.modes.filter((m) => !now.has(m))) {
      changes.push({
        kind: 'mode-disappeared',
        key: `${base}:ch:${ch}:mode-:${label}:${ref}`,
        title: `${subject.name}: mode ${label} gone on ${khz(ch)} at ${at}`,
        body: `With ${subject.conditionsLabel}, ${khz(ch)} no longer propagates by ${label} at ${at} (modes: ${modes.join(', ') || 'none'}).`,
        data: { ...common, mode: label },
      });
    }
  }

  return { changes, state: { bestChannelKHz: plan.bestChannelKHz, modes, aboveMuf } };
}

/**
 * The slots the watch looks at: the one in force now and the next one. Schedules are matched by
 * time of day (a 24-hour schedule repeats daily), so `slotStartsUtc` may belong to any date.
 */
export function currentAndNextSlotIndexes(slotStartsUtc: string[], now: Date): number[] {
  if (slotStartsUtc.length === 0) return [];
  const minuteOfDay = (d: Date) => d.getUTCHours() * 60 + d.getUTCMinutes();
  const order = slotStartsUtc
    .map((s, i) => ({ i, m: minuteOfDay(new Date(s)) }))
    .sort((a, b) => a.m - b.m);
  const nowM = minuteOfDay(now);
  let cur = order.length - 1; // before the first slot of the day: the last one still runs
  for (let k = 0; k < order.length; k++) if (order[k]!.m <= nowM) cur = k;
  const next = (cur + 1) % order.length;
  return next === cur ? [order[cur]!.i] : [order[cur]!.i, order[next]!.i];
}
