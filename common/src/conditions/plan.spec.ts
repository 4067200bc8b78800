import { describe, expect, it } from 'vitest';
import { InputError } from '../physics/errors.js';
import { mufPerHops } from '../physics/muf.js';
import { buildProfile, type ProfileData } from '../physics/profile.js';
import { diurnalModel } from './diurnal-model.js';
import { computePlan, OWF_FACTOR, parsePlanRequest, slotStarts } from './plan.js';

// Invented demo profile (E + F2), used only to exercise the plan logic.
const QUIET: ProfileData = {
  layers: [
    {
      name: 'E',
      shape: 'parabolic',
      criticalFrequencyMHz: 3,
      peakHeightKm: 110,
      semiThicknessKm: 20,
    },
    { name: 'F2', shape: 'chapman', criticalFrequencyMHz: 8, peakHeightKm: 300, scaleHeightKm: 50 },
  ],
};
const FROM = { latDeg: 47.2, lonDeg: 8.6 };
const TO = { latDeg: 40.4, lonDeg: -3.7 };
const CHANNELS = [3500, 5100, 7050, 9800, 12300, 14200, 18100, 21000, 27500];

describe('plan', () => {
  it('slots: 24 hourly, 96 of 15 min, from 00:00 UTC', () => {
    expect(slotStarts('2026-03-20', 60)).toHaveLength(24);
    const q = slotStarts('2026-03-20', 15);
    expect(q).toHaveLength(96);
    expect(q[0].toISOString()).toBe('2026-03-20T00:00:00.000Z');
    expect(q[95].toISOString()).toBe('2026-03-20T23:45:00.000Z');
  });

  it('OWF = 0.85 × highest MUF (common practice); usable = channels ≤ MUF; best = highest usable ≤ OWF', () => {
    const plan = computePlan({
      from: FROM,
      to: TO,
      dateUtc: '2026-03-20',
      channelsKHz: CHANNELS,
      slotMinutes: 60,
      profileAt: () => QUIET,
    });
    expect(plan.slots).toHaveLength(24);
    const s = plan.slots[0];
    // The MUF per hop count is the physics core's, at the great-circle range.
    const mufs = Object.values(s.mufMHz).filter((m): m is number => m !== null);
    const maxMuf = Math.max(...mufs);
    expect(s.owfMHz).toBeCloseTo(OWF_FACTOR * maxMuf, 10);
    expect(s.usableChannelsKHz).toEqual(CHANNELS.filter((c) => c / 1000 <= maxMuf));
    const best = CHANNELS.filter((c) => c / 1000 <= (s.owfMHz as number)).at(-1);
    expect(s.bestChannelKHz).toBe(best);
    expect(s.modes.length).toBeGreaterThan(0);
    for (const m of s.modes) expect(m.groupDelayMs).toBeGreaterThan(0);
    // A profile that does not change gives the same answer in every slot.
    for (const slot of plan.slots) expect(slot.mufMHz).toEqual(s.mufMHz);
    // Secant-law order of magnitude (Davies 1990): the 1-hop MUF at ~1000 km lies between foF2
    // and foF2·sec(φ) with φ ≤ 90°; here simply foF2 < MUF(1) < 4·foF2.
    expect(s.mufMHz['1'] as number).toBeGreaterThan(8);
    expect(s.mufMHz['1'] as number).toBeLessThan(32);
    expect(mufPerHops(buildProfile(QUIET), 1000, 1, 3, 'spherical')['1']).not.toBeNull();
  });

  it('with the diurnal model, the midday MUF exceeds the midnight MUF at the control point', () => {
    const plan = computePlan({
      from: FROM,
      to: TO,
      dateUtc: '2026-06-21',
      channelsKHz: CHANNELS,
      slotMinutes: 60,
      profileAt: (at, p) => diurnalModel(p, at).profile,
    });
    const muf1 = (i: number) => plan.slots[i].mufMHz['1'] as number;
    expect(muf1(12)).toBeGreaterThan(muf1(0));
  });

  it('validation names the field', () => {
    const bad = (body: unknown) => {
      try {
        parsePlanRequest(body);
      } catch (err) {
        return (err as InputError).fields;
      }
      return undefined;
    };
    const ok = {
      from: FROM,
      to: TO,
      dateUtc: '2026-03-20',
      channelsKHz: [7050],
      profileSource: 'model',
    };
    expect(parsePlanRequest(ok).slotMinutes).toBe(60);
    expect(bad({ ...ok, channelsKHz: [2999] })).toHaveProperty(['channelsKHz[0]']);
    expect(bad({ ...ok, channelsKHz: [] })).toHaveProperty('channelsKHz');
    expect(bad({ ...ok, dateUtc: '2026-02-30' })).toHaveProperty('dateUtc');
    expect(bad({ ...ok, slotMinutes: 20 })).toHaveProperty('slotMinutes');
    expect(bad({ ...ok, from: undefined })).toHaveProperty('from');
    expect(bad({ ...ok, profileSource: 'guess' })).toHaveProperty('profileSource');
    expect(() => computePlan({ ...ok, to: FROM, slotMinutes: 60, profileAt: () => QUIET })).toThrow(
      InputError,
    );
  });
});
