// Fault test: the notice outbox survives a SIGKILL in the middle of delivery.
//
// Set-up, and why it is realistic: the push service and the mail server are outside the product
// (the product's own loopback stand-ins would die with it and forget what they received). Here
// they run in the test process: a Web Push service on HTTPS with a self-signed certificate that
// the product trusts through NODE_EXTRA_CA_CERTS (HOPWISE_PUSH_STANDIN=0, so the product uses the
// plain https agent as with a real push service), and the product's mail stand-in as the SMTP
// server named by HOPWISE_SMTP_URL. The conditions feed stand-in runs as its own process
// (api/dist/standins/feed/main.js) and HOPWISE_FEED_URL points at it.
//
// Notices are made the way the product makes them: a feed update with a very low foF2 and the
// publication of the demo net make the watch store an above-the-MUF notice for each member and
// its outbox rows (every member has several push subscriptions and e-mail), then the worker
// drains them one by one. The push service acknowledges the first ACKS_BEFORE_HOLD messages,
// records the next one and never answers it; that is when the server is SIGKILLed. So at the kill
// some rows are sent, exactly one is 'sending' (its message already at the service, like a crash
// between the service's acknowledgement and the row update) and the rest are pending.
//
// Proven: the file is intact (integrity_check) both as the kill left it and after the restart;
// after the restart on the same file every row that existed at the kill is marked sent and its
// message (push payload decrypted, or e-mail subject) is at the service; rows sent before the kill
// are not sent again; the only duplicate is the row that was in flight (at-least-once), which is
// re-sent once its claim (HOPWISE_DELIVERY_LEASE_MS, shortened here to 2 s from 2 min) lapses;
// every member's inbox still lists the same notices.
import Database from 'better-sqlite3';
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { MailStandIn } from '../../api/src/standins/mail/mail-standin.js';
import { makeSubscriber, type TestSubscriber } from '../../api/test/support/web-push-decrypt.js';
import { HoldingPushService, type PushMessage } from '../support/holding-push-service.js';
import {
  exited,
  freePort,
  repoRoot,
  signIn,
  startProduct,
  type Product,
} from '../support/product-process.js';

const MEMBERS = ['operator@hopwise.test', 'netcontrol@hopwise.test']; // the demo net's people
const BROWSERS_PER_MEMBER = 3;
/** Pushes acknowledged before the hold: all of the first notice's and one of the next one's. */
const ACKS_BEFORE_HOLD = BROWSERS_PER_MEMBER + 1;
const LEASE_MS = 2000;
const NET_NAME = 'Harrow Sound evening net'; // api/src/nets/nets-demo-seed.ts

interface OutboxRow {
  id: number;
  channel: 'push' | 'email';
  target: string;
  status: string;
  attempts: number;
  lastError: string | null;
  noticeId: number;
  userEmail: string;
  title: string;
}

function readOutbox(dbFile: string): { rows: OutboxRow[]; integrity: unknown } {
  const db = new Database(dbFile);
  try {
    const integrity = db.pragma('integrity_check', { simple: true });
    const rows = db
      .prepare(
        `SELECT o.id, o.channel, o.target, o.status, o.attempts, o.last_error AS lastError,
                o.notice_id AS noticeId,
                u.email AS userEmail, n.title
           FROM outbox o JOIN notices n ON n.id = o.notice_id JOIN users u ON u.id = n.user_id
          ORDER BY o.id`,
      )
      .all() as OutboxRow[];
    return { rows, integrity };
  } finally {
    db.close();
  }
}

const rowKey = (r: OutboxRow) => `${r.channel}|${r.target}|${r.title}`;
const count = (rows: OutboxRow[], status: string) => rows.filter((r) => r.status === status).length;

describe('the notice outbox survives a restart mid-delivery', () => {
  const dir = mkdtempSync(path.join(tmpdir(), 'hopwise-outbox-fault-'));
  const dbFile = path.join(dir, 'hopwise.sqlite');
  const push = new HoldingPushService();
  const mail = new MailStandIn();
  const children: ChildProcess[] = [];
  afterAll(async () => {
    for (const child of children) if (child.exitCode === null) child.kill('SIGKILL');
    await Promise.all([push.stop(), mail.stop()]);
    rmSync(dir, { recursive: true, force: true });
  });

  async function api(p: Product, token: string, method: string, url: string, body?: unknown) {
    const res = await fetch(`${p.baseUrl}${url}`, {
      method,
      headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await res.text();
    return { status: res.status, body: text ? (JSON.parse(text) as unknown) : undefined };
  }

  it('delivers every row that existed at the kill; only the one in flight twice', async () => {
    await Promise.all([push.start(), mail.start()]);
    push.ackLimit = ACKS_BEFORE_HOLD;
    const caFile = path.join(dir, 'push-service-ca.pem');
    writeFileSync(caFile, push.caPem);

    const feedPort = await freePort();
    const feedUrl = `http://127.0.0.1:${feedPort}`;
    const feed = spawn(process.execPath, [path.join(repoRoot, 'api/dist/standins/feed/main.js')], {
      env: { ...process.env, FEED_PORT: String(feedPort) },
      stdio: 'ignore',
    });
    children.push(feed);
    for (let i = 0; ; i++) {
      const up = await fetch(`${feedUrl}/regions`).then(
        (r) => r.ok,
        () => false,
      );
      if (up) break;
      if (i > 100 || feed.exitCode !== null) throw new Error('feed stand-in did not start');
      await new Promise((r) => setTimeout(r, 100));
    }

    const env = {
      HOPWISE_PUSH_STANDIN: '0',
      NODE_EXTRA_CA_CERTS: caFile,
      HOPWISE_SMTP_URL: mail.url,
      HOPWISE_FEED_URL: feedUrl,
      HOPWISE_DELIVERY_INTERVAL_MS: '250',
      HOPWISE_DELIVERY_LEASE_MS: String(LEASE_MS),
    };
    const first = await startProduct(dbFile, env);
    children.push(first.child);

    // Every member subscribes several browsers (each a push target) and gets e-mail.
    const tokens = new Map<string, string>();
    const browsers = new Map<string, { label: string; subscriber: TestSubscriber }>(); // by sub id
    for (const email of MEMBERS) {
      const token = await signIn(first.baseUrl, email);
      tokens.set(email, token);
      for (let b = 0; b < BROWSERS_PER_MEMBER; b++) {
        const label = `${email.split('@')[0]}-${b}`;
        const subscriber = makeSubscriber();
        const res = await api(first, token, 'POST', '/api/notices/push/subscriptions', {
          endpoint: push.endpointFor(label),
          keys: subscriber.keys,
        });
        expect(res.status).toBe(201);
        browsers.set(String((res.body as { id: number }).id), { label, subscriber });
      }
    }

    // The net is published under good conditions (foF2 14 MHz: no notice); then foF2 1.5 MHz in
    // every region puts every demo channel above the MUF: the poll's feed update makes the watch
    // store a notice per member and slot with its outbox rows, and drain them.
    const ctl = tokens.get('netcontrol@hopwise.test')!;
    const { regions } = (await (await fetch(`${feedUrl}/regions`)).json()) as {
      regions: { region: string }[];
    };
    const feedUpdate = async (foF2MHz: number) => {
      for (const { region } of regions) {
        const res = await fetch(`${feedUrl}/updates`, {
          method: 'POST',
          headers: { 'Content-Type': 'application/json' },
          body: JSON.stringify({ region, foF2MHz }),
        });
        expect(res.status).toBe(201);
      }
      expect((await api(first, ctl, 'POST', '/api/conditions/poll')).status).toBe(200);
    };
    await feedUpdate(14);
    const nets = (await api(first, ctl, 'GET', '/api/nets')).body as {
      items: { id: number; name: string }[];
    };
    const net = nets.items.find((n) => n.name === NET_NAME);
    expect(net, 'demo net').toBeDefined();
    const published = await api(first, ctl, 'POST', `/api/nets/${net!.id}/publish`, {
      dateUtc: new Date().toISOString().slice(0, 10),
      profileSource: 'feed',
    });
    expect(published.status).toBe(201);
    await feedUpdate(1.5);

    // Kill while the push service holds a message unanswered.
    const held = await Promise.race([
      push.held().then(() => true),
      new Promise<false>((r) => setTimeout(() => r(false), 30_000)),
    ]);
    expect(held, `no push held: ${JSON.stringify(readOutbox(dbFile).rows)}\n${first.log()}`).toBe(
      true,
    );
    first.child.kill('SIGKILL');
    await exited(first.child);
    expect(first.child.signalCode).toBe('SIGKILL');

    // --- The file as the kill left it.
    const atKill = readOutbox(dbFile);
    expect(atKill.integrity).toBe('ok');
    const rows = atKill.rows;
    expect(new Set(rows.map(rowKey)).size, 'one row per channel, target and notice').toBe(
      rows.length,
    );
    expect(
      rows
        .filter((r) => r.channel === 'email')
        .map((r) => r.target)
        .sort(),
    ).toEqual(
      rows
        .filter((r) => r.channel === 'email')
        .map((r) => r.userEmail)
        .sort(),
    );
    const inFlight = rows.filter((r) => r.status === 'sending');
    const sentBefore = rows.filter((r) => r.status === 'sent');
    const pendingAtKill = count(rows, 'pending');
    expect(inFlight).toHaveLength(1);
    expect(inFlight[0]!.channel).toBe('push');
    expect(sentBefore.filter((r) => r.channel === 'push')).toHaveLength(ACKS_BEFORE_HOLD);
    expect(sentBefore.filter((r) => r.channel === 'email').length).toBeGreaterThan(0);
    expect(pendingAtKill).toBeGreaterThan(0);
    expect(count(rows, 'failed')).toBe(0);
    const noticesAtKill = new Map<string, number[]>();
    for (const r of rows) {
      const ids = noticesAtKill.get(r.userEmail) ?? [];
      if (!ids.includes(r.noticeId)) ids.push(r.noticeId);
      noticesAtKill.set(r.userEmail, ids);
    }

    // What the services received, keyed like the rows (push payloads decrypted).
    const pushKey = (m: PushMessage) => {
      const [subId, browser] = [...browsers].find(([, b]) => b.label === m.label)!;
      const payload = JSON.parse(browser.subscriber.decrypt(m.body)) as { title: string };
      return `push|${subId}|${payload.title}`;
    };
    const deliveredKeys = () => [
      ...push.received.map(pushKey),
      ...mail.received.map(
        (m) => `email|${m.to.join(',')}|${m.subject?.replace(/^Hopwise: /, '')}`,
      ),
    ];
    // The held message is the in-flight row's; what was acknowledged is what is marked sent.
    expect(push.received.filter((m) => !m.acknowledged).map(pushKey)).toEqual([
      rowKey(inFlight[0]!),
    ]);
    expect(new Set(deliveredKeys())).toEqual(new Set([...sentBefore, ...inFlight].map(rowKey)));

    // --- Restart on the same file; the push service now answers everything.
    push.ackLimit = Number.POSITIVE_INFINITY;
    const second = await startProduct(dbFile, env);
    children.push(second.child);
    let final = readOutbox(dbFile).rows;
    for (let i = 0; final.some((r) => r.status === 'pending' || r.status === 'sending'); i++) {
      if (i > 120) throw new Error(`outbox not drained after the restart\n${second.log()}`);
      await new Promise((r) => setTimeout(r, 250));
      final = readOutbox(dbFile).rows;
    }

    // Every row that existed at the kill is sent, and nothing new was queued.
    expect(final.map((r) => [r.id, r.status])).toEqual(rows.map((r) => [r.id, 'sent']));
    expect(final.find((r) => r.id === inFlight[0]!.id)!.attempts).toBe(2);

    // None lost; the rows sent before the kill are not sent again; the one in flight is the only
    // duplicate (at-least-once).
    const received = new Map<string, number>();
    for (const key of deliveredKeys()) received.set(key, (received.get(key) ?? 0) + 1);
    expect([...received.keys()].sort()).toEqual(rows.map(rowKey).sort());
    const duplicates = [...received].filter(([, n]) => n > 1);
    expect(duplicates).toEqual([[rowKey(inFlight[0]!), 2]]);
    console.log(
      `outbox at the kill: ${rows.length} rows (${sentBefore.length} sent, ${inFlight.length} ` +
        `sending, ${pendingAtKill} pending); after the restart all sent, ` +
        `${duplicates.length} duplicate delivery`,
    );

    // Every member's inbox still lists the notices it had at the kill.
    for (const email of MEMBERS) {
      const token = await signIn(second.baseUrl, email);
      const inbox = (await api(second, token, 'GET', '/api/notices?limit=100')).body as {
        items: { id: number }[];
      };
      expect(
        inbox.items.map((n) => n.id).sort((a, b) => a - b),
        email,
      ).toEqual((noticesAtKill.get(email) ?? []).sort((a, b) => a - b));
      expect(noticesAtKill.get(email)?.length, `${email} has notices`).toBeGreaterThan(0);
    }

    second.child.kill('SIGTERM');
    await exited(second.child);
    expect(readOutbox(dbFile).integrity).toBe('ok');
  });
});
