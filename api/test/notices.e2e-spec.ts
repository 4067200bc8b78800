import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PushPayload } from '@hopwise/common';
import { eq } from 'drizzle-orm';
import { outbox, pushSubscriptions, users } from '../src/db/schema.js';
import { DeliveryWorker } from '../src/delivery/delivery-worker.js';
import { OutboxRepository } from '../src/delivery/outbox.repository.js';
import { NoticesRepository, type NewNotice } from '../src/notices/notices.repository.js';
import { StandInsService } from '../src/standins/standins.service.js';
import { bearer, bootApp, login, type TestApp } from './helpers.js';
import { makeSubscriber, type TestSubscriber } from './support/web-push-decrypt.js';

const DAY_MS = 86_400_000;

describe('notices: inbox, push subscriptions and delivery through the outbox', () => {
  let t: TestApp;
  let op: string;
  let analyst: string;
  let opId: number;
  let standIns: StandInsService;
  let worker: DeliveryWorker;
  let repo: NoticesRepository;
  let subscriber: TestSubscriber;
  let seq = 0;

  const notice = (userId: number, title: string): NewNotice => ({
    userId,
    kind: 'above-muf',
    subjectType: 'net',
    subjectId: 1,
    changeKey: `test:${++seq}`,
    title,
    body: `Body of ${title}`,
    data: {},
  });
  const pushes = () => standIns.push!.received;
  const mails = () => standIns.mail!.received;

  beforeAll(async () => {
    t = await bootApp({ HOPWISE_WATCH_INTERVAL_MS: '0', HOPWISE_DELIVERY_INTERVAL_MS: '0' });
    op = await login(t.http, 'operator@hopwise.test');
    analyst = await login(t.http, 'analyst@hopwise.test');
    opId = t.db.select().from(users).where(eq(users.email, 'operator@hopwise.test')).get()!.id;
    standIns = t.app.get(StandInsService);
    await standIns.ready();
    worker = t.app.get(DeliveryWorker);
    repo = t.app.get(NoticesRepository);
    subscriber = makeSubscriber();
  });
  afterAll(async () => t?.close());

  it('needs a signed-in user', async () => {
    await request(t.http).get('/api/notices').expect(401);
  });

  it('starts with an empty inbox and gives the VAPID public key (65-byte P-256 point)', async () => {
    const list = await request(t.http).get('/api/notices').set(bearer(op)).expect(200);
    expect(list.body).toEqual({ items: [], total: 0, unread: 0 });
    const key = await request(t.http)
      .get('/api/notices/push/public-key')
      .set(bearer(op))
      .expect(200);
    expect(Buffer.from(key.body.publicKey as string, 'base64url')).toHaveLength(65);
  });

  it('validates push subscriptions, naming the field', async () => {
    const bad1 = await request(t.http)
      .post('/api/notices/push/subscriptions')
      .set(bearer(op))
      .send({ endpoint: 'http://insecure.example/push/1', keys: subscriber.keys })
      .expect(400);
    expect(bad1.body.fields).toHaveProperty('endpoint');
    const bad2 = await request(t.http)
      .post('/api/notices/push/subscriptions')
      .set(bearer(op))
      .send({
        endpoint: 'https://push.example/1',
        keys: { p256dh: 'AAAA', auth: subscriber.keys.auth },
      })
      .expect(400);
    expect(bad2.body.fields).toHaveProperty(['keys.p256dh']);
    const bad3 = await request(t.http)
      .post('/api/notices/push/subscriptions')
      .set(bearer(op))
      .send({ endpoint: 'https://push.example/1' })
      .expect(400);
    expect(bad3.body.fields).toHaveProperty('keys');
    await request(t.http)
      .delete('/api/notices/push/subscriptions')
      .set(bearer(op))
      .query({ endpoint: 'https://push.example/never' })
      .expect(404);
  });

  it('delivers a notice by push (decryptable aes128gcm) and by e-mail, once', async () => {
    const created = await request(t.http)
      .post('/api/notices/push/subscriptions')
      .set(bearer(op))
      .send({ endpoint: standIns.push!.endpointFor('op-browser'), keys: subscriber.keys })
      .expect(201);
    expect(created.body).toMatchObject({ id: expect.any(Number) });

    const stored = repo.storeChanges([notice(opId, 'Net "Test": 7150 kHz is above the MUF')], [], {
      push: true,
      email: true,
    });
    expect(stored).toHaveLength(1);
    // The same change again is stored once (UNIQUE(user_id, change_key)).
    seq--;
    expect(repo.storeChanges([notice(opId, 'again')], [], { push: true, email: true })).toEqual([]);

    const drained = await worker.drainOnce();
    expect(drained).toEqual({ sent: 2, retrying: 0, failed: 0 });
    expect(pushes()).toHaveLength(1);
    expect(pushes()[0]!.headers['content-encoding']).toBe('aes128gcm');
    expect(pushes()[0]!.headers.authorization).toMatch(/^vapid t=.+, k=.+/);
    const payload = JSON.parse(
      subscriber.decrypt(Buffer.from(pushes()[0]!.bodyBase64, 'base64')),
    ) as PushPayload;
    expect(payload).toEqual({
      title: 'Net "Test": 7150 kHz is above the MUF',
      body: 'Body of Net "Test": 7150 kHz is above the MUF',
      url: expect.stringMatching(/\/nets\?net=1$/),
    });
    expect(mails()).toHaveLength(1);
    expect(mails()[0]!.to).toEqual(['operator@hopwise.test']);
    expect(mails()[0]!.subject).toBe('Hopwise: Net "Test": 7150 kHz is above the MUF');
    expect(mails()[0]!.raw).toContain('Predictions are estimates');

    // Nothing more is due: a second drain sends nothing.
    expect(await worker.drainOnce()).toEqual({ sent: 0, retrying: 0, failed: 0 });
  });

  it('shows the notice in the inbox of its user only; marks read', async () => {
    const mine = await request(t.http).get('/api/notices').set(bearer(op)).expect(200);
    expect(mine.body).toMatchObject({ total: 1, unread: 1 });
    const id = mine.body.items[0].id as number;
    expect(mine.body.items[0]).toMatchObject({
      kind: 'above-muf',
      url: '/nets?net=1',
      readAt: null,
    });

    const other = await request(t.http).get('/api/notices').set(bearer(analyst)).expect(200);
    expect(other.body).toEqual({ items: [], total: 0, unread: 0 });
    await request(t.http).post(`/api/notices/${id}/read`).set(bearer(analyst)).expect(404);
    await request(t.http).post('/api/notices/abc/read').set(bearer(op)).expect(400);

    const read = await request(t.http).post(`/api/notices/${id}/read`).set(bearer(op)).expect(200);
    expect(read.body.readAt).toEqual(expect.any(String));
    const count = await request(t.http)
      .get('/api/notices/unread-count')
      .set(bearer(op))
      .expect(200);
    expect(count.body).toEqual({ unread: 0 });
  });

  it('keeps deliveries pending while the stand-ins are down and sends each exactly once after', async () => {
    await standIns.push!.stop();
    await standIns.mail!.stop();
    repo.storeChanges([notice(opId, 'During the outage')], [], { push: true, email: true });

    const down = await worker.drainOnce();
    expect(down).toEqual({ sent: 0, retrying: 2, failed: 0 });
    // Backing off: not due yet, so nothing is attempted.
    expect(await worker.drainOnce()).toEqual({ sent: 0, retrying: 0, failed: 0 });

    await standIns.push!.start();
    await standIns.mail!.start();
    const later = new Date(Date.now() + DAY_MS);
    // Two drains at once: the atomic claim lets only one send each row.
    const [a, b] = await Promise.all([worker.drainOnce(later), worker.drainOnce(later)]);
    expect(a.sent + b.sent).toBe(2);
    expect(await worker.drainOnce(later)).toEqual({ sent: 0, retrying: 0, failed: 0 });

    expect(pushes().map((p) => p.subscriptionId)).toEqual(['op-browser', 'op-browser']);
    expect(
      JSON.parse(subscriber.decrypt(Buffer.from(pushes()[1]!.bodyBase64, 'base64'))).title,
    ).toBe('During the outage');
    expect(mails().map((m) => m.subject)).toEqual([
      'Hopwise: Net "Test": 7150 kHz is above the MUF',
      'Hopwise: During the outage',
    ]);
    const rows = t.db.select().from(outbox).all();
    expect(rows.every((r) => r.status === 'sent')).toBe(true);
    expect(rows.filter((r) => r.attempts === 2)).toHaveLength(2);
  });

  it('claims a row only once', () => {
    const outboxRepo = t.app.get(OutboxRepository);
    repo.storeChanges([notice(opId, 'Claim once')], [], { push: false, email: true });
    const id = outboxRepo.dueIds(new Date(), 10)[0]!;
    expect(outboxRepo.claim(id, new Date(), 60_000)).toBeDefined();
    expect(outboxRepo.claim(id, new Date(), 60_000)).toBeUndefined();
    outboxRepo.markRetry(id, new Date(0), 'test');
  });

  it('disables a subscription the push service says is gone (410) and stops sending to it', async () => {
    standIns.push!.markGone('op-browser');
    const before = pushes().length;
    repo.storeChanges([notice(opId, 'After unsubscribe')], [], { push: true, email: false });
    const result = await worker.drainOnce();
    expect(result.failed).toBe(1);
    expect(pushes()).toHaveLength(before);
    const sub = t.db.select().from(pushSubscriptions).get()!;
    expect(sub.disabledAt).toEqual(expect.any(String));
    const failed = t.db.select().from(outbox).where(eq(outbox.status, 'failed')).all();
    expect(failed.map((r) => r.lastError)).toEqual(['push service answered 410']);
  });

  it('marks all read and unsubscribes by endpoint', async () => {
    const all = await request(t.http).post('/api/notices/read-all').set(bearer(op)).expect(200);
    expect(all.body.unread).toBe(0);
    const count = await request(t.http)
      .get('/api/notices/unread-count')
      .set(bearer(op))
      .expect(200);
    expect(count.body).toEqual({ unread: 0 });
    const endpoint = standIns.push!.endpointFor('op-browser-2');
    await request(t.http)
      .post('/api/notices/push/subscriptions')
      .set(bearer(op))
      .send({ endpoint, keys: makeSubscriber().keys })
      .expect(201);
    await request(t.http)
      .delete('/api/notices/push/subscriptions')
      .set(bearer(op))
      .query({ endpoint })
      .expect(204);
  });
});
