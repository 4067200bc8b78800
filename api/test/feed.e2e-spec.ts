import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ConditionsService } from '../src/conditions/conditions.service.js';
import { ConditionsEvents, type ConditionsEvent } from '../src/events/conditions-events.js';
import type { FeedStandin } from '../src/standins/feed/feed-standin.js';
import { bearer, bootApp, login, type TestApp } from './helpers.js';

/**
 * The conditions feed: the in-process stand-in (invented demo data) is polled, each update is
 * stored exactly once as a feed profile, and an update made while the feed is down is picked up
 * by the next poll after it is back.
 */
describe('conditions feed', () => {
  let t: TestApp;
  let nc: string;
  let op: string;
  let standin: FeedStandin;
  const events: ConditionsEvent[] = [];

  const feedProfiles = async () => {
    const res = await request(t.http)
      .get('/api/profiles?source=feed&limit=500')
      .set(bearer(op))
      .expect(200);
    return res.body.items as {
      id: number;
      provenance: { feedSeq: number; region: string };
      foF2MHz: number;
    }[];
  };
  const poll = () => request(t.http).post('/api/conditions/poll').set(bearer(nc));

  beforeAll(async () => {
    t = await bootApp();
    nc = await login(t.http, 'netcontrol@hopwise.test');
    op = await login(t.http, 'operator@hopwise.test');
    standin = t.app.get(ConditionsService).standin as FeedStandin;
    t.app.get(ConditionsEvents).subscribe((e) => {
      events.push(e);
    });
  });
  afterAll(async () => {
    await t.close();
  });

  it('the stand-in runs on loopback and serves the demo regions', async () => {
    expect(standin.running).toBe(true);
    expect(standin.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
    const res = await fetch(`${standin.url}/updates?since=0`);
    const body = (await res.json()) as { updates: { region: string }[] };
    expect(body.updates.map((u) => u.region)).toEqual(
      expect.arrayContaining(['harrow-sound', 'north-atlantic', 'iberia']),
    );
  });

  it('an update posted to the feed is stored once however often the server polls', async () => {
    await poll().expect(200);
    const before = await feedProfiles();
    const posted = await fetch(`${standin.url}/updates`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ region: 'harrow-sound', foF2MHz: 3.1 }),
    });
    expect(posted.status).toBe(201);
    const { seq } = (await posted.json()) as { seq: number };
    const first = await poll().expect(200);
    expect(first.body.stored).toBe(1);
    const second = await poll().expect(200);
    expect(second.body.stored).toBe(0);
    const after = await feedProfiles();
    expect(after).toHaveLength(before.length + 1);
    const mine = after.filter((p) => p.provenance.feedSeq === seq);
    expect(mine).toHaveLength(1);
    expect(mine[0].provenance.region).toBe('harrow-sound');
    await new Promise((r) => setTimeout(r, 20));
    expect(events).toContainEqual(
      expect.objectContaining({ type: 'feed-update', profileId: mine[0].id }),
    );
    // The latest near the region centre is this (disturbed) update.
    const latest = await request(t.http)
      .get('/api/conditions/latest?latDeg=47&lonDeg=8')
      .set(bearer(op))
      .expect(200);
    expect(latest.body.profileId).toBeGreaterThanOrEqual(mine[0].id);
    expect(latest.body.region).toBe('harrow-sound');
  });

  it('the stand-in answers 400 naming the field for a bad update', async () => {
    const res = await fetch(`${standin.url}/updates`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ region: 'atlantis' }),
    });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { fields: object }).fields).toHaveProperty('region');
  });

  it('feed down during a poll: 503, nothing lost; the next poll after it is back stores it once', async () => {
    const before = await feedProfiles();
    await standin.stop();
    const { seq } = standin.addUpdate({ region: 'iberia', foF2MHz: 4.2 });
    const down = await poll().expect(503);
    expect(down.body.message).toMatch(/unreachable/);
    expect(await feedProfiles()).toHaveLength(before.length);
    await standin.start();
    const up = await poll().expect(200);
    expect(up.body.stored).toBeGreaterThanOrEqual(1);
    await poll().expect(200);
    const after = await feedProfiles();
    expect(after.filter((p) => p.provenance.feedSeq === seq)).toHaveLength(1);
  });

  it('polling needs nets:manage; the latest needs sign-in and a valid point', async () => {
    await request(t.http).post('/api/conditions/poll').set(bearer(op)).expect(403);
    await request(t.http).get('/api/conditions/latest?latDeg=47&lonDeg=8').expect(401);
    const bad = await request(t.http)
      .get('/api/conditions/latest?latDeg=95&lonDeg=8')
      .set(bearer(op))
      .expect(400);
    expect(bad.body.fields).toHaveProperty('latDeg');
  });

  it('the diurnal model route is marked approximate', async () => {
    const res = await request(t.http)
      .get('/api/conditions/model?latDeg=47.2&lonDeg=8.6&atUtc=2026-06-21T11:00:00Z')
      .set(bearer(op))
      .expect(200);
    expect(res.body.approximate).toBe(true);
    expect(res.body.profile.layers[0]).toMatchObject({ name: 'E', peakHeightKm: 110 });
  });
});
