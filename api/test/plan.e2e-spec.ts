import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

/**
 * POST /api/compute/plan (SPEC §3). The MUF itself is the physics core's (tested in common/);
 * here: slot counts, OWF = 0.85 × the highest MUF (common practice, SPEC §9), usable ⊆ channels
 * ≤ MUF, best = highest usable ≤ OWF, the three profile sources, and 400s naming the field.
 */
const FROM = { latDeg: 47.2, lonDeg: 8.6 }; // invented demo stations (Harrow Sound scenario)
const TO = { latDeg: 40.4, lonDeg: -3.7 };
const CHANNELS = [3615, 5290, 7045, 9120, 11460, 13992, 18090, 24950];
const base = {
  from: FROM,
  to: TO,
  dateUtc: '2026-03-20',
  channelsKHz: CHANNELS,
  profileSource: 'model',
};

interface Slot {
  startUtc: string;
  mufMHz: Record<string, number | null>;
  owfMHz: number | null;
  usableChannelsKHz: number[];
  bestChannelKHz: number | null;
  modes: { label: string; groupDelayMs: number }[];
}

function checkSlot(s: Slot) {
  const mufs = Object.values(s.mufMHz).filter((m): m is number => m !== null);
  if (!mufs.length) {
    expect(s.owfMHz).toBeNull();
    expect(s.usableChannelsKHz).toEqual([]);
    return;
  }
  const max = Math.max(...mufs);
  expect(s.owfMHz).toBeCloseTo(0.85 * max, 9); // OWF ≈ 0.85 MUF (common practice)
  expect(s.usableChannelsKHz).toEqual(CHANNELS.filter((c) => c / 1000 <= max));
  const best = s.usableChannelsKHz.filter((c) => c / 1000 <= (s.owfMHz as number)).at(-1) ?? null;
  expect(s.bestChannelKHz).toBe(best);
  if (best !== null) {
    expect(s.modes.length).toBeGreaterThan(0);
    for (const m of s.modes) expect(m.groupDelayMs).toBeGreaterThan(0);
  }
}

describe('POST /api/compute/plan', () => {
  let t: TestApp;
  let op: string;
  let nc: string;
  beforeAll(async () => {
    t = await bootApp();
    op = await login(t.http, 'operator@hopwise.test');
    nc = await login(t.http, 'netcontrol@hopwise.test');
  });
  afterAll(async () => {
    await t.close();
  });

  const plan = (body: unknown, token = op) =>
    request(t.http)
      .post('/api/compute/plan')
      .set(bearer(token))
      .send(body as object);

  it('24 hourly slots from the diurnal model, 200 (not 201)', async () => {
    const res = await plan(base).expect(200);
    const slots = res.body.slots as Slot[];
    expect(slots).toHaveLength(24);
    expect(slots[0].startUtc).toBe('2026-03-20T00:00:00.000Z');
    expect(slots[23].startUtc).toBe('2026-03-20T23:00:00.000Z');
    slots.forEach(checkSlot);
    expect(slots.some((s) => s.bestChannelKHz !== null)).toBe(true);
  });

  it('15-minute slots → 96', async () => {
    const res = await plan({ ...base, slotMinutes: 15, channelsKHz: [7045] }).expect(200);
    expect(res.body.slots).toHaveLength(96);
    expect(res.body.slots[1].startUtc).toBe('2026-03-20T00:15:00.000Z');
  });

  it('a link of the user (linkId) gives the same plan as its stations’ coordinates', async () => {
    const links = await request(t.http).get('/api/links').set(bearer(op)).expect(200);
    const link = links.body.items[0];
    const byLink = await plan({
      linkId: link.id,
      dateUtc: '2026-03-20',
      channelsKHz: CHANNELS,
      profileSource: 'model',
    }).expect(200);
    const byPoints = await plan({
      ...base,
      from: { latDeg: link.fromStation.latDeg, lonDeg: link.fromStation.lonDeg },
      to: { latDeg: link.toStation.latDeg, lonDeg: link.toStation.lonDeg },
    }).expect(200);
    expect(byLink.body).toEqual(byPoints.body);
    // Another user's private link looks absent.
    const other = await plan(
      { linkId: link.id, dateUtc: '2026-03-20', channelsKHz: CHANNELS, profileSource: 'model' },
      nc,
    ).expect(400);
    expect(other.body.fields).toHaveProperty('linkId');
  });

  it('profileSource feed: the latest feed update of the nearest region (constant over the day)', async () => {
    await request(t.http).post('/api/conditions/poll').set(bearer(nc)).expect(200);
    const res = await plan({ ...base, profileSource: 'feed' }).expect(200);
    const slots = res.body.slots as Slot[];
    slots.forEach(checkSlot);
    for (const s of slots) expect(s.mufMHz).toEqual(slots[0].mufMHz);
  });

  it('profileSource { profileId }: a stored profile the user may see', async () => {
    const list = await request(t.http).get('/api/profiles?source=feed').set(bearer(op)).expect(200);
    const id = list.body.items[0].id as number;
    const res = await plan({ ...base, profileSource: { profileId: id } }).expect(200);
    (res.body.slots as Slot[]).forEach(checkSlot);
    const missing = await plan({ ...base, profileSource: { profileId: 999999 } }).expect(400);
    expect(missing.body.fields).toHaveProperty(['profileSource.profileId']);
  });

  it('400 naming the field', async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ ...base, channelsKHz: [2999] }, 'channelsKHz[0]'],
      [{ ...base, channelsKHz: [30001] }, 'channelsKHz[0]'],
      [{ ...base, channelsKHz: [7045.5] }, 'channelsKHz[0]'],
      [{ ...base, channelsKHz: [] }, 'channelsKHz'],
      [{ ...base, channelsKHz: Array.from({ length: 51 }, (_, i) => 3000 + i) }, 'channelsKHz'],
      [{ ...base, dateUtc: '20-03-2026' }, 'dateUtc'],
      [{ ...base, dateUtc: '2026-02-30' }, 'dateUtc'],
      [{ ...base, slotMinutes: 20 }, 'slotMinutes'],
      [{ ...base, profileSource: 'guess' }, 'profileSource'],
      [{ ...base, from: undefined }, 'from'],
      [{ ...base, to: { latDeg: 91, lonDeg: 0 } }, 'to.latDeg'],
      [{ ...base, to: FROM }, 'to'],
    ];
    for (const [body, field] of cases) {
      const res = await plan(body).expect(400);
      expect(res.body.statusCode).toBe(400);
      expect(res.body.fields, JSON.stringify(body)).toHaveProperty([field]);
    }
  });

  it('needs sign-in', async () => {
    await request(t.http).post('/api/compute/plan').send(base).expect(401);
  });
});
