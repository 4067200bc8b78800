import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

/** Nets: CRUD, validation, ownership, the draft schedule, overrides, publish versions, exports. */
describe('nets', () => {
  let t: TestApp;
  let nc: string;
  let op: string;
  let an: string;
  let admin: string;
  let shared: { id: number; name: string }[];
  let netId: number;
  const DATE = '2026-03-20';
  const CHANNELS = [4625, 6998, 9145, 11460, 13992];

  beforeAll(async () => {
    t = await bootApp();
    nc = await login(t.http, 'netcontrol@hopwise.test');
    op = await login(t.http, 'operator@hopwise.test');
    an = await login(t.http, 'analyst@hopwise.test');
    admin = await login(t.http, 'admin@hopwise.test');
    const res = await request(t.http).get('/api/stations?limit=100').set(bearer(nc)).expect(200);
    shared = res.body.items;
    expect(shared.length).toBeGreaterThanOrEqual(2);
  });
  afterAll(async () => {
    await t.close();
  });

  it('the demo net is seeded for netcontrol@ with the operator’s shared stations', async () => {
    const res = await request(t.http).get('/api/nets').set(bearer(nc)).expect(200);
    expect(res.body.total).toBe(1);
    const net = res.body.items[0];
    expect(net.channelsKHz.length).toBeGreaterThanOrEqual(4);
    expect(net.channelsKHz.length).toBeLessThanOrEqual(6);
    expect(net.canManage).toBe(true);
    // The operator owns its stations, so sees the net (read-only).
    const opList = await request(t.http).get('/api/nets').set(bearer(op)).expect(200);
    expect(opList.body.items.map((n: { id: number }) => n.id)).toContain(net.id);
    expect(opList.body.items[0].canManage).toBe(false);
  });

  it('creates a net (channels deduplicated and sorted) → 201', async () => {
    const res = await request(t.http)
      .post('/api/nets')
      .set(bearer(nc))
      .send({
        name: 'Test net',
        controlStationId: shared[0].id,
        memberStationIds: [shared[1].id],
        channelsKHz: [9145, 4625, 13992, 6998, 11460, 4625],
      })
      .expect(201);
    netId = res.body.id;
    expect(res.body.channelsKHz).toEqual(CHANNELS);
    expect(res.body.memberStationIds).toEqual([shared[1].id]);
    expect(res.body.latestVersion).toBeNull();
  });

  it('validation: 400 naming the field', async () => {
    const ok = {
      name: 'X',
      controlStationId: shared[0].id,
      memberStationIds: [shared[1].id],
      channelsKHz: [7000],
    };
    const cases: [Record<string, unknown>, string][] = [
      [{ ...ok, channelsKHz: [2999] }, 'channelsKHz'],
      [{ ...ok, channelsKHz: [30001] }, 'channelsKHz'],
      [{ ...ok, channelsKHz: [7000.5] }, 'channelsKHz'],
      [{ ...ok, channelsKHz: [] }, 'channelsKHz'],
      [{ ...ok, memberStationIds: [] }, 'memberStationIds'],
      [{ ...ok, controlStationId: 99999 }, 'controlStationId'],
      [{ ...ok, memberStationIds: [99999] }, 'memberStationIds[0]'],
      [{ ...ok, memberStationIds: [shared[0].id] }, 'memberStationIds[0]'],
      [{ ...ok, name: '' }, 'name'],
    ];
    for (const [body, field] of cases) {
      const res = await request(t.http).post('/api/nets').set(bearer(nc)).send(body).expect(400);
      expect(res.body.fields, JSON.stringify(body)).toHaveProperty([field]);
    }
    await request(t.http)
      .post('/api/nets')
      .set(bearer(nc))
      .send({ ...ok, name: 'Test net' })
      .expect(409);
  });

  it('ownership and permissions: operators cannot create or change; strangers get 404', async () => {
    await request(t.http)
      .post('/api/nets')
      .set(bearer(op))
      .send({
        name: 'N',
        controlStationId: shared[0].id,
        memberStationIds: [shared[1].id],
        channelsKHz: [7000],
      })
      .expect(403);
    await request(t.http)
      .patch(`/api/nets/${netId}`)
      .set(bearer(op))
      .send({ name: 'Y' })
      .expect(403);
    // The analyst owns none of the net's stations: the net looks absent.
    await request(t.http).get(`/api/nets/${netId}`).set(bearer(an)).expect(404);
    await request(t.http)
      .get(`/api/nets/${netId}/schedule?dateUtc=${DATE}`)
      .set(bearer(an))
      .expect(404);
    await request(t.http).get(`/api/nets/${netId}`).set(bearer(admin)).expect(200);
    await request(t.http).get('/api/nets/abc').set(bearer(nc)).expect(400);
  });

  it('PATCH updates name and channels', async () => {
    const res = await request(t.http)
      .patch(`/api/nets/${netId}`)
      .set(bearer(nc))
      .send({ name: 'Test net 2', channelsKHz: [...CHANNELS, 18090] })
      .expect(200);
    expect(res.body.name).toBe('Test net 2');
    expect(res.body.channelsKHz).toEqual([...CHANNELS, 18090]);
  });

  it('draft schedule: 24 slots; best = highest channel usable on all paths at or below the lowest OWF', async () => {
    const res = await request(t.http)
      .get(`/api/nets/${netId}/schedule?dateUtc=${DATE}`)
      .set(bearer(nc))
      .expect(200);
    expect(res.body.approximate).toBe(true);
    const slots = res.body.draft.slots as {
      startUtc: string;
      channelKHz: number | null;
      bestChannelKHz: number | null;
      usableChannelsKHz: number[];
      mufMHz: number | null;
      owfMHz: number | null;
      overridden: boolean;
    }[];
    expect(slots).toHaveLength(24);
    for (const s of slots) {
      if (s.mufMHz !== null) {
        for (const c of s.usableChannelsKHz) expect(c / 1000).toBeLessThanOrEqual(s.mufMHz);
      }
      const best =
        s.usableChannelsKHz.filter((c) => s.owfMHz !== null && c / 1000 <= s.owfMHz).at(-1) ?? null;
      expect(s.bestChannelKHz).toBe(best);
      expect(s.channelKHz).toBe(s.bestChannelKHz);
      expect(s.overridden).toBe(false);
    }
    expect(res.body.published).toBeNull();
    // Members do not see drafts.
    const member = await request(t.http)
      .get(`/api/nets/${netId}/schedule?dateUtc=${DATE}`)
      .set(bearer(op))
      .expect(200);
    expect(member.body.draft).toBeNull();
    const bad = await request(t.http)
      .get(`/api/nets/${netId}/schedule?dateUtc=2026-13-01`)
      .set(bearer(nc))
      .expect(400);
    expect(bad.body.fields).toHaveProperty('dateUtc');
  });

  it('overrides: set, validate, merged into the draft', async () => {
    const bad = await request(t.http)
      .put(`/api/nets/${netId}/schedule/overrides`)
      .set(bearer(nc))
      .send({ slots: [{ startUtc: `${DATE}T06:00:00Z`, channelKHz: 7001 }] })
      .expect(400);
    expect(bad.body.fields).toHaveProperty(['slots[0].channelKHz']);
    await request(t.http)
      .put(`/api/nets/${netId}/schedule/overrides`)
      .set(bearer(nc))
      .send({ slots: [{ startUtc: `${DATE}T06:00:00Z`, channelKHz: 4625 }] })
      .expect(200);
    await request(t.http)
      .put(`/api/nets/${netId}/schedule/overrides`)
      .set(bearer(op))
      .send({ slots: [{ startUtc: `${DATE}T06:00:00Z`, channelKHz: 4625 }] })
      .expect(403);
    const res = await request(t.http)
      .get(`/api/nets/${netId}/schedule?dateUtc=${DATE}`)
      .set(bearer(nc))
      .expect(200);
    const six = res.body.draft.slots[6];
    expect(six).toMatchObject({
      startUtc: `${DATE}T06:00:00.000Z`,
      channelKHz: 4625,
      overridden: true,
    });
  });

  it('publish: 201, versions 1 then 2 (immutable), audit row, members see it', async () => {
    const v1 = await request(t.http)
      .post(`/api/nets/${netId}/publish`)
      .set(bearer(nc))
      .send({ dateUtc: DATE })
      .expect(201);
    expect(v1.body.version).toBe(1);
    expect(v1.body.slots).toHaveLength(24);
    expect(v1.body.slots[6]).toMatchObject({ channelKHz: 4625, overridden: true });
    // Clear the override and publish again: a new version; version 1 is unchanged.
    await request(t.http)
      .put(`/api/nets/${netId}/schedule/overrides`)
      .set(bearer(nc))
      .send({ slots: [{ startUtc: `${DATE}T06:00:00Z`, channelKHz: null }] })
      .expect(200);
    const v2 = await request(t.http)
      .post(`/api/nets/${netId}/publish`)
      .set(bearer(nc))
      .send({ dateUtc: DATE })
      .expect(201);
    expect(v2.body.version).toBe(2);
    expect(v2.body.slots[6].overridden).toBe(false);
    const csv1 = await request(t.http)
      .get(`/api/nets/${netId}/schedule.csv?version=1`)
      .set(bearer(op))
      .expect(200);
    expect(csv1.text.split('\r\n')[7]).toContain('4625');
    const member = await request(t.http)
      .get(`/api/nets/${netId}/schedule?dateUtc=${DATE}`)
      .set(bearer(op))
      .expect(200);
    expect(member.body.published.version).toBe(2);
    const audit = t.db.$client
      .prepare("select count(*) as n from audit_log where action = 'net.publish' and target = ?")
      .get(`net:${netId}`) as { n: number };
    expect(audit.n).toBe(2);
    const bad = await request(t.http)
      .post(`/api/nets/${netId}/publish`)
      .set(bearer(nc))
      .send({ dateUtc: 'today' })
      .expect(400);
    expect(bad.body.fields).toHaveProperty('dateUtc');
    await request(t.http)
      .post(`/api/nets/${netId}/publish`)
      .set(bearer(op))
      .send({ dateUtc: DATE })
      .expect(403);
  });

  it('CSV: a header and one row per slot, in UTC', async () => {
    const res = await request(t.http)
      .get(`/api/nets/${netId}/schedule.csv`)
      .set(bearer(nc))
      .expect(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const lines = res.text.trim().split('\r\n');
    expect(lines[0]).toBe(
      'net,version,startUtc,endUtc,channelKHz,bestChannelKHz,overridden,usableChannelsKHz,lowestMufMHz',
    );
    expect(lines).toHaveLength(25);
    expect(lines[1]).toContain(`Test net 2,2,${DATE}T00:00:00.000Z,${DATE}T01:00:00.000Z`);
  });

  it('iCalendar (RFC 5545): a VCALENDAR with one VEVENT per channel change covering the day', async () => {
    const res = await request(t.http)
      .get(`/api/nets/${netId}/schedule.ics`)
      .set(bearer(op))
      .expect(200);
    expect(res.headers['content-type']).toMatch(/text\/calendar/);
    const text = res.text.replace(/\r\n[ \t]/g, ''); // unfold lines (RFC 5545 §3.1)
    expect(text.startsWith('BEGIN:VCALENDAR')).toBe(true);
    expect(text).toContain('VERSION:2.0');
    const events = text.split('BEGIN:VEVENT').slice(1);
    expect(events.length).toBeGreaterThanOrEqual(1);
    const publishedSlots = (
      await request(t.http).get(`/api/nets/${netId}/schedule?dateUtc=${DATE}`).set(bearer(nc))
    ).body.published.slots as { channelKHz: number | null }[];
    let changes = 1;
    for (let i = 1; i < publishedSlots.length; i++) {
      if (publishedSlots[i].channelKHz !== publishedSlots[i - 1].channelKHz) changes++;
    }
    expect(events).toHaveLength(changes);
    expect(events[0]).toContain('DTSTART:20260320T000000Z');
    expect(events.at(-1)).toContain('DTEND:20260321T000000Z');
  });

  it('exports before any publish answer 404', async () => {
    const created = await request(t.http)
      .post('/api/nets')
      .set(bearer(nc))
      .send({
        name: 'Empty net',
        controlStationId: shared[1].id,
        memberStationIds: [shared[0].id],
        channelsKHz: [7000],
      })
      .expect(201);
    await request(t.http)
      .get(`/api/nets/${created.body.id}/schedule.csv`)
      .set(bearer(nc))
      .expect(404);
    await request(t.http).delete(`/api/nets/${created.body.id}`).set(bearer(nc)).expect(204);
    await request(t.http).get(`/api/nets/${created.body.id}`).set(bearer(nc)).expect(404);
  });
});
