import type { PlanSlot } from '@hopwise/common';
import { describe, expect, it } from 'vitest';
import {
  currentAndNextSlotIndexes,
  evaluateSlot,
  highestMufMHz,
  worstPathSlot,
  type SlotSubject,
} from './evaluate.js';

const subject: SlotSubject = {
  keyPrefix: 'net:5:v3',
  name: 'Net "Evening"',
  slotStartUtc: '2026-12-02T14:00:00.000Z',
  channelInForceKHz: 7150,
  overridden: false,
  conditionsRef: 'feed-42',
  conditionsLabel: 'the feed',
};

const slot = (over: Partial<PlanSlot>): PlanSlot => ({
  startUtc: '2026-12-02T14:00:00.000Z',
  mufMHz: { '1': 9.1, '2': 7.4 },
  owfMHz: 7.7,
  usableChannelsKHz: [5350, 7150],
  bestChannelKHz: 7150,
  modes: [
    {
      label: '1F2',
      hops: 1,
      layer: 'F2',
      ray: 'low',
      elevationDeg: 20,
      groupDelayMs: 3.1,
      groupPathKm: 930,
    },
  ],
  ...over,
});

describe('watch: judging one slot', () => {
  it('takes the highest MUF over hop counts, ignoring nulls', () => {
    expect(highestMufMHz({ mufMHz: { '1': 9.1, '2': null, '3': 7 } })).toBe(9.1);
    expect(highestMufMHz({ mufMHz: { '1': null } })).toBeNull();
  });

  it('is quiet when the plan agrees with the channel in force', () => {
    expect(evaluateSlot(subject, slot({}), undefined).changes).toEqual([]);
  });

  it('reports the channel in force above the MUF, and the new best channel, with stable keys', () => {
    const lowered = slot({
      mufMHz: { '1': 6.2, '2': 5.6 },
      owfMHz: 5.27,
      usableChannelsKHz: [5350],
      bestChannelKHz: 5350,
    });
    const { changes, state } = evaluateSlot(subject, lowered, undefined);
    expect(changes.map((c) => c.kind)).toEqual(['above-muf', 'best-channel-changed']);
    expect(changes.map((c) => c.key)).toEqual([
      'net:5:v3:slot:2026-12-02T14:00Z:above-muf:7150:p:feed-42',
      'net:5:v3:slot:2026-12-02T14:00Z:best:7150→5350:p:feed-42',
    ]);
    expect(state).toEqual({ bestChannelKHz: 5350, modes: ['1F2'], aboveMuf: true });
    // Same conditions again, judged against the stored state: nothing new.
    expect(evaluateSlot(subject, lowered, state).changes).toEqual([]);
  });

  it('does not compare an overridden slot with the plan on first sight', () => {
    const other = slot({ bestChannelKHz: 5350 });
    expect(evaluateSlot({ ...subject, overridden: true }, other, undefined).changes).toEqual([]);
  });

  it('reports modes appearing and disappearing on the same best channel', () => {
    const before = { bestChannelKHz: 7150, modes: ['1F2'], aboveMuf: false };
    const now = slot({
      modes: [
        {
          label: '2F2',
          hops: 2,
          layer: 'F2',
          ray: 'low',
          elevationDeg: 35,
          groupDelayMs: 3.4,
          groupPathKm: 1020,
        },
      ],
    });
    const kinds = evaluateSlot(subject, now, before).changes.map((c) => [c.kind, c.key]);
    expect(kinds).toEqual([
      ['mode-appeared', 'net:5:v3:slot:2026-12-02T14:00Z:ch:7150:mode+:2F2:p:feed-42'],
      ['mode-disappeared', 'net:5:v3:slot:2026-12-02T14:00Z:ch:7150:mode-:1F2:p:feed-42'],
    ]);
  });

  it('picks the slot in force now and the next one, by time of day, wrapping at midnight', () => {
    const starts = Array.from(
      { length: 24 },
      (_, h) => `2026-11-30T${String(h).padStart(2, '0')}:00:00.000Z`,
    );
    expect(currentAndNextSlotIndexes(starts, new Date('2026-12-02T14:20:00Z'))).toEqual([14, 15]);
    expect(currentAndNextSlotIndexes(starts, new Date('2026-12-02T23:59:00Z'))).toEqual([23, 0]);
    expect(currentAndNextSlotIndexes([starts[6]!], new Date('2026-12-02T01:00:00Z'))).toEqual([0]);
  });
});

describe('watch: a net slot over every member path', () => {
  it('takes the worst path’s MUFs and modes, the lowest OWF and the channels usable on all', () => {
    const near = slot({});
    const far = slot({
      mufMHz: { '1': 8.0, '2': 8.6 },
      owfMHz: 7.3,
      usableChannelsKHz: [5350, 7150, 7300],
      bestChannelKHz: 7300,
      modes: [{ ...near.modes[0], label: '2F2', hops: 2 }],
    });
    const both = worstPathSlot([near, far]);
    expect(highestMufMHz(both)).toBe(8.6); // min over paths of each path's highest MUF
    expect(both.modes.map((m) => m.label)).toEqual(['2F2']);
    expect(both.owfMHz).toBe(7.3);
    expect(both.usableChannelsKHz).toEqual([5350, 7150]);
    expect(both.bestChannelKHz).toBe(7150);
    expect(worstPathSlot([near])).toEqual(near);
  });

  it('a path with no MUF or no OWF closes the slot for the net', () => {
    const closed = slot({ mufMHz: { '1': null }, owfMHz: null, usableChannelsKHz: [] });
    const both = worstPathSlot([slot({}), closed]);
    expect(highestMufMHz(both)).toBeNull();
    expect(both.owfMHz).toBeNull();
    expect(both.bestChannelKHz).toBeNull();
    expect(evaluateSlot(subject, both, undefined).changes.map((c) => c.kind)).toContain(
      'above-muf',
    );
  });
});
