import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { NoticeView, PushPayload } from '@hopwise/common';
import { eq } from 'drizzle-orm';
import { ConditionsService } from '../src/conditions/conditions.service.js';
import { notices, outbox } from '../src/db/schema.js';
import { DeliveryWorker } from '../src/delivery/delivery-worker.js';
import { StandInsService } from '../src/standins/standins.service.js';
import { WatchService } from '../src/watch/watch.service.js';
import { bearer, bootApp, login, type TestApp } from './helpers.js';
import { makeSubscriber, type TestSubscriber } from './support/web-push-decrypt.js';

const DAY_MS = 86_400_000;
const NET_NAME = 'Harrow Sound evening net'; // the demo seed's net (api/src/nets/nets-demo-seed.ts)

/**
 * The watch end to end: conditions feed stand-in → poll → profile → watch → notice per member →
 * outbox → Web Push stand-in (payload decrypted here, RFC 8291) and mail stand-in.
 * Invented demo data: foF2 values are chosen to move every demo channel in or out of the MUF.
 */
describe('watch: a feed update that lowers foF2 tells the net members', () => {
  let t: TestApp;
  let ctl: string;
  let op: string;
  let netId: number;
  let feedUrl: string;
  let standIns: StandInsService;
  let watch: WatchService;
  let worker: DeliveryWorker;
  let subscriber: TestSubscriber;

  /** Posts the same foF2 to every feed region (whichever is nearest the path), then polls. */
  const postFeed = async (foF2MHz: number) => {
    const { regions } = (await (await fetch(`${feedUrl}/regions`)).json()) as {
      regions: { region: string }[];
    };
    for (const { region } of regions) {
      const res = await fetch(`${feedUrl}/updates`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ region, foF2MHz }),
      });
      expect(res.status).toBe(201);
    }
    await request(t.http).post('/api/conditions/poll').set(bearer(ctl)).expect(200);
  };
  const inbox = async (token: string) =>
    (await request(t.http).get('/api/notices?limit=100').set(bearer(token)).expect(200)).body as {
      items: NoticeView[];
      total: number;
      unread: number;
    };

  beforeAll(async () => {
    // Poll the feed on demand only; the watch and the outbox run when the test says.
    t = await bootApp({
      HOPWISE_FEED_POLL_MS: '0',
      HOPWISE_WATCH_INTERVAL_MS: '0',
      HOPWISE_DELIVERY_INTERVAL_MS: '0',
    });
    ctl = await login(t.http, 'netcontrol@hopwise.test');
    op = await login(t.http, 'operator@hopwise.test');
    standIns = t.app.get(StandInsService);
    await standIns.ready();
    watch = t.app.get(WatchService);
    worker = t.app.get(DeliveryWorker);
    feedUrl = t.app.get(ConditionsService).feedUrl!;
    subscriber = makeSubscriber();
  });
  afterAll(async () => {
    await t?.close();
  });

  it('publishes the demo net under good conditions: no notice yet', async () => {
    const nets = await request(t.http).get('/api/nets').set(bearer(ctl)).expect(200);
    const net = (nets.body.items as { id: number; name: string }[]).find(
      (n) => n.name === NET_NAME,
    );
    expect(net).toBeDefined();
    netId = net!.id;

    await request(t.http)
      .post('/api/notices/push/subscriptions')
      .set(bearer(op))
      .send({ endpoint: standIns.push!.endpointFor('operator-1'), keys: subscriber.keys })
      .expect(201);
    // A high foF2 keeps every demo channel (4.6–14 MHz) under the MUF of the demo net's path.
    await postFeed(14);
    const today = new Date().toISOString().slice(0, 10);
    await request(t.http)
      .post(`/api/nets/${netId}/publish`)
      .set(bearer(ctl))
      .send({ dateUtc: today, profileSource: 'feed' })
      .expect(201);
    const first = await watch.runOnce();
    expect(first.errors).toEqual([]);
    expect(first.evaluatedSlots).toBeGreaterThan(0);
    expect((await inbox(op)).total).toBe(0);
  });

  it('stores a notice for each member when foF2 drops, and delivers it by push and e-mail', async () => {
    // A disturbance: foF2 1.5 MHz puts every demo channel above the MUF.
    await postFeed(1.5);
    await watch.runOnce();
    const box = await inbox(op);
    const aboveMuf = box.items.filter((n) => n.kind === 'above-muf');
    expect(aboveMuf.length).toBeGreaterThan(0);
    expect(aboveMuf[0]!.title).toMatch(
      new RegExp(`^Net "${NET_NAME}": \\d+ kHz is above the MUF at \\d\\d:\\d\\d UTC$`),
    );
    expect(aboveMuf[0]).toMatchObject({
      subjectType: 'net',
      subjectId: netId,
      url: `/nets?net=${netId}`,
    });
    // The controller is told too (owner of the net).
    expect((await inbox(ctl)).items.some((n) => n.kind === 'above-muf')).toBe(true);

    await worker.drainOnce();
    const mine = standIns.push!.received.filter((p) => p.subscriptionId === 'operator-1');
    expect(mine).toHaveLength(box.total);
    const payloads = mine.map(
      (p) => JSON.parse(subscriber.decrypt(Buffer.from(p.bodyBase64, 'base64'))) as PushPayload,
    );
    expect(payloads.map((p) => p.title).sort()).toEqual(box.items.map((n) => n.title).sort());
    expect(payloads[0]!.url).toMatch(new RegExp(`/nets\\?net=${netId}$`));
    const opMail = standIns.mail!.received.filter((m) => m.to.includes('operator@hopwise.test'));
    expect(opMail.map((m) => m.subject).sort()).toEqual(
      box.items.map((n) => `Hopwise: ${n.title}`).sort(),
    );
  });

  it('stores a change once however often the watch runs', async () => {
    const before = t.db.select().from(notices).all().length;
    const again = await watch.runOnce();
    const twice = await watch.runOnce();
    expect([again.noticesStored, twice.noticesStored]).toEqual([0, 0]);
    expect(t.db.select().from(notices).all()).toHaveLength(before);
    const keys = t.db
      .select()
      .from(notices)
      .all()
      .map((n) => `${n.userId}|${n.changeKey}`);
    expect(new Set(keys).size).toBe(keys.length);
  });

  it('delivers exactly once what was noticed while the push and mail stand-ins were down', async () => {
    const pushBefore = standIns.push!.received.length;
    const mailBefore = standIns.mail!.received.length;
    await standIns.push!.stop();
    await standIns.mail!.stop();

    // Recovery: the best channel comes back → a new change for every member. (The poll's
    // feed-update event may already have run the watch and a drain; runOnce waits for it.)
    const noticesBefore = t.db.select().from(notices).all().length;
    const lastIdBefore = Math.max(
      0,
      ...t.db
        .select()
        .from(notices)
        .all()
        .map((n) => n.id),
    );
    await postFeed(14);
    await watch.runOnce();
    await worker.drainOnce();
    expect(t.db.select().from(notices).all().length).toBeGreaterThan(noticesBefore);
    const pending = t.db.select().from(outbox).where(eq(outbox.status, 'pending')).all();
    expect(pending.length).toBeGreaterThan(0);
    expect(pending.every((r) => r.attempts >= 1 && r.lastError !== null)).toBe(true);
    expect(standIns.push!.received.length).toBe(pushBefore);
    expect(standIns.mail!.received.length).toBe(mailBefore);

    await standIns.push!.start();
    await standIns.mail!.start();
    const later = new Date(Date.now() + DAY_MS); // past every backoff
    const up = await worker.drainOnce(later);
    expect(up.sent).toBe(pending.length);
    expect(await worker.drainOnce(later)).toEqual({ sent: 0, retrying: 0, failed: 0 });

    const newPush = standIns.push!.received.length - pushBefore;
    const newMail = standIns.mail!.received.length - mailBefore;
    expect(newPush + newMail).toBe(pending.length);
    const recovered = (await inbox(op)).items.filter((n) => n.id > lastIdBefore);
    expect(recovered.length).toBeGreaterThan(0);
    expect(recovered.every((n) => n.kind === 'best-channel-changed')).toBe(true);
    const opPush = standIns.push!.received.slice(pushBefore);
    expect(opPush).toHaveLength(recovered.length);
    expect(
      opPush
        .map(
          (p) =>
            (JSON.parse(subscriber.decrypt(Buffer.from(p.bodyBase64, 'base64'))) as PushPayload)
              .title,
        )
        .sort(),
    ).toEqual(recovered.map((n) => n.title).sort());
    const rows = t.db.select().from(outbox).all();
    expect(rows.every((r) => r.status === 'sent')).toBe(true);
  });

  it('follows a link: 404 for a link one cannot see, 400 naming the field, then notices', async () => {
    const links = await request(t.http).get('/api/links').set(bearer(op)).expect(200);
    const link = (links.body.items as { id: number; name: string }[]).find(
      (l) => l.name === 'Ridge to Vale',
    )!;
    await request(t.http).get(`/api/links/${link.id}/follow`).set(bearer(ctl)).expect(404);
    const bad = await request(t.http)
      .post(`/api/links/${link.id}/follow`)
      .set(bearer(op))
      .send({ channelsKHz: [2000] })
      .expect(400);
    expect(bad.body.fields).toHaveProperty('channelsKHz');
    const follow = await request(t.http)
      .post(`/api/links/${link.id}/follow`)
      .set(bearer(op))
      .send({ channelsKHz: [4625, 6998, 9145], watchChannelKHz: 9145 })
      .expect(200);
    expect(follow.body).toMatchObject({ following: true, channelsKHz: [4625, 6998, 9145] });

    await watch.runOnce(); // baseline under good conditions
    await postFeed(1.5);
    await watch.runOnce();
    const linkNotices = (await inbox(op)).items.filter((n) => n.subjectType === 'link');
    const linkAbove = linkNotices.find((n) => n.kind === 'above-muf');
    expect(linkAbove).toBeDefined();
    expect(linkAbove!.title).toMatch(/^Link "Ridge to Vale": 9145 kHz is above the MUF/);

    await request(t.http).delete(`/api/links/${link.id}/follow`).set(bearer(op)).expect(204);
    const after = await request(t.http)
      .get(`/api/links/${link.id}/follow`)
      .set(bearer(op))
      .expect(200);
    expect(after.body.following).toBe(false);
  });
});
