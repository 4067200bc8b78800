// The band moves under a published net: the demo net controller publishes the seeded net's
// schedule through the client, a disturbance lowering foF2 is posted to the conditions-feed
// stand-in, the server polls it, and the demo operator finds the notice in the inbox.
// Invented demo data throughout (foF2 values chosen to move every demo channel in or out of the MUF).
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DEMO_PASSWORD, launchBrowser, screenshotDir } from '../support/browser.js';

const NET_NAME = 'Harrow Sound evening net'; // api/src/nets/nets-demo-seed.ts

/**
 * The product runs its conditions-feed stand-in in-process on a free loopback port. Without a
 * harness-provided URL, find it among the loopback listeners (/proc/net/tcp, Linux) by its
 * `GET /regions` answer.
 */
async function findFeedStandIn(exceptPort: number): Promise<string> {
  const ports = new Set<number>();
  for (const file of ['/proc/net/tcp', '/proc/net/tcp6']) {
    let text: string;
    try {
      text = readFileSync(file, 'utf8');
    } catch {
      continue;
    }
    for (const line of text.split('\n').slice(1)) {
      const cols = line.trim().split(/\s+/);
      // local_address "0100007F:1F90" (127.0.0.1:8080), state 0A = LISTEN
      if (cols[3] !== '0A' || !cols[1]) continue;
      const [host, portHex] = cols[1].split(':');
      if (host === '0100007F' || host === '0000000000000000FFFF00000100007F') {
        ports.add(parseInt(portHex!, 16));
      }
    }
  }
  ports.delete(exceptPort);
  for (const port of ports) {
    try {
      const res = await fetch(`http://127.0.0.1:${port}/regions`, {
        signal: AbortSignal.timeout(1500),
      });
      const body = (await res.json()) as { regions?: { region: string }[] };
      if (body.regions?.some((r) => r.region === 'harrow-sound')) return `http://127.0.0.1:${port}`;
    } catch {
      // not the feed
    }
  }
  throw new Error('conditions-feed stand-in of the product not found on loopback');
}

/** Sign-in through the form (its e-mail label reads "E-mail"). */
async function signIn(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel(/e-?mail/i).fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

describe('notices in the browser', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  let feedUrl: string;
  let controllerToken: string;

  const api = async (method: string, url: string, body?: unknown) => {
    const res = await fetch(`${baseUrl}${url}`, {
      method,
      headers: { 'content-type': 'application/json', authorization: `Bearer ${controllerToken}` },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    return { status: res.status, body: (await res.json().catch(() => undefined)) as unknown };
  };
  /** Same foF2 for every feed region (whichever is nearest the net's path), then a poll. */
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
    expect((await api('POST', '/api/conditions/poll')).status).toBe(200);
  };

  beforeAll(async () => {
    browser = await launchBrowser();
    feedUrl = await findFeedStandIn(Number(new URL(baseUrl).port));
    const login = await fetch(`${baseUrl}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'netcontrol@hopwise.test', password: DEMO_PASSWORD }),
    });
    controllerToken = ((await login.json()) as { accessToken: string }).accessToken;
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('the controller publishes, a disturbance lowers foF2, and the operator sees the notice', async () => {
    // Good conditions first, so the published schedule has a channel in force in every slot.
    await postFeed(14);

    const ctlContext = await browser.newContext();
    const ctl = await ctlContext.newPage();
    await signIn(ctl, baseUrl, 'netcontrol@hopwise.test');
    await ctl.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Nets' }).click();
    await ctl
      .getByRole('row', { name: new RegExp(NET_NAME) })
      .getByRole('button', { name: 'Schedule' })
      .click();
    await ctl.getByLabel('Conditions from').selectOption('feed');
    const publishButton = ctl.getByRole('button', { name: 'Publish…' });
    await expect.poll(() => publishButton.isEnabled(), { timeout: 30_000 }).toBe(true);
    await publishButton.click();
    await ctl.getByRole('dialog').getByRole('button', { name: 'Publish', exact: true }).click();
    await ctl.getByText(/Published v1 for/).waitFor();
    await ctl.screenshot({
      path: path.join(screenshotDir, 'notices-net-published.png'),
      fullPage: true,
    });
    await ctlContext.close();

    // The disturbance: foF2 1.5 MHz puts every demo channel above the MUF.
    await postFeed(1.5);

    // The watch runs on the feed-update events (it may take a while on a busy machine): wait for
    // the operator's notice through the API, then open the inbox once.
    const opLogin = await fetch(`${baseUrl}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'operator@hopwise.test', password: DEMO_PASSWORD }),
    });
    const operatorToken = ((await opLogin.json()) as { accessToken: string }).accessToken;
    await expect
      .poll(
        async () => {
          const res = await fetch(`${baseUrl}/api/notices`, {
            headers: { authorization: `Bearer ${operatorToken}` },
          }).catch(() => undefined);
          if (!res?.ok) return 0;
          return ((await res.json()) as { unread: number }).unread;
        },
        { timeout: 150_000, interval: 2000 },
      )
      .toBeGreaterThan(0);
    const opContext = await browser.newContext();
    const op = await opContext.newPage();
    await signIn(op, baseUrl, 'operator@hopwise.test');
    const nav = op.getByRole('navigation', { name: 'Main' });
    await nav.getByRole('link', { name: /^Notices/ }).click();
    const notice = op.getByRole('heading', {
      level: 2,
      name: new RegExp(`^Net "${NET_NAME}": \\d+ kHz is above the MUF at \\d\\d:\\d\\d UTC$`),
    });
    await notice.first().waitFor({ timeout: 60_000 });
    await expect
      .poll(() => nav.getByRole('link', { name: /^Notices.*unread/ }).count(), { timeout: 45_000 })
      .toBe(1);
    await op.screenshot({ path: path.join(screenshotDir, 'notices-inbox.png'), fullPage: true });

    // Mark all read: the badge goes away.
    await op.getByRole('button', { name: 'Mark all read' }).click();
    await op.getByText(/^All read/).waitFor();
    await expect
      .poll(() => nav.getByRole('link', { name: /unread/ }).count(), { timeout: 45_000 })
      .toBe(0);
    await opContext.close();
  }, 300_000);
});
