// An operator enters two stations and a link through the real client, runs a link study on the
// quiet-day reference profile, and sees the 1F2 mode, a drawn group-delay chart, and the map with
// its bundled basemap — with every request to anything but the product blocked.
//
// Path: 47.2° N 8.6° E → 52.0° N 1.0° W, 872.6 km on the sphere R₀ = 6371 km (pathGeometry, from
// GeographicLib). At 9 MHz the quiet-day profile (profiles/quiet-day.json, invented demo data)
// gives 1F2 low and high rays at this range (checked with POST /api/compute/oblique: MUF(1 hop)
// ≈ 12.86 MHz), so a 1F2 row must appear.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import path from 'node:path';
import { DEMO_PASSWORD, launchBrowser, screenshotDir } from '../support/browser.js';

const FROM = { name: 'Kestrel Knoll', lat: '47.2', lon: '8.6' };
const TO = { name: 'Marrowby Fen', lat: '52.0', lon: '-1.0' };
const LINK_NAME = `${FROM.name} – ${TO.name}`;

/** Signs in through the form (its e-mail field is labelled "E-mail"). */
async function signIn(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel(/^e-?mail/i).fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

async function addStation(page: Page, station: typeof FROM): Promise<void> {
  await page.getByRole('button', { name: 'Add station' }).first().click();
  const dialog = page.getByRole('dialog', { name: 'Add a station' });
  await dialog.getByLabel('Station name').fill(station.name);
  await dialog.getByLabel('Latitude (°)').fill(station.lat);
  await dialog.getByLabel('Longitude (°)').fill(station.lon);
  await dialog.getByRole('button', { name: 'Add station' }).click();
  await dialog.waitFor({ state: 'detached', timeout: 10_000 });
  await page
    .getByRole('table', { name: 'Stations' })
    .getByRole('cell', { name: station.name })
    .first()
    .waitFor({ timeout: 10_000 });
}

describe('link study (browser)', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  let context: BrowserContext;
  let page: Page;
  const outside: string[] = [];

  beforeAll(async () => {
    browser = await launchBrowser();
    context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    // No network but the product itself: anything else is recorded and refused.
    await context.route('**/*', async (route) => {
      const url = route.request().url();
      if (url.startsWith(baseUrl) || url.startsWith('data:') || url.startsWith('blob:')) {
        await route.continue();
      } else {
        outside.push(url);
        await route.abort();
      }
    });
    page = await context.newPage();
    await signIn(page, baseUrl, 'operator@hopwise.test');
  });

  afterAll(async () => {
    await context?.close();
    await browser?.close();
  });

  it('adds two stations and a link with its great-circle distance', async () => {
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Links' })
      .click();
    await page.getByRole('heading', { name: 'Stations' }).waitFor();
    await addStation(page, FROM);
    await addStation(page, TO);

    await page.getByRole('button', { name: 'Add link' }).click();
    const dialog = page.getByRole('dialog', { name: 'Add a link' });
    await dialog.getByLabel('From station').selectOption({ label: FROM.name });
    await dialog.getByLabel('To station').selectOption({ label: TO.name });
    expect(await dialog.getByLabel('Link name').inputValue()).toBe(LINK_NAME);
    await dialog.getByRole('button', { name: 'Add link' }).click();
    await dialog.waitFor({ state: 'detached', timeout: 10_000 });

    const row = page
      .getByRole('table', { name: 'Links' })
      .getByRole('row', { name: new RegExp(FROM.name) });
    await row.waitFor({ timeout: 10_000 });
    // 872.6 km: great circle on R₀ = 6371 km between the two points (GeographicLib on a sphere).
    expect(await row.textContent()).toContain('872.6 km');
    await page.screenshot({ path: path.join(screenshotDir, 'links-page.png'), fullPage: true });
  });

  it('runs a study on the quiet-day profile and shows 1F2 and the group-delay chart', async () => {
    const row = page
      .getByRole('table', { name: 'Links' })
      .getByRole('row', { name: new RegExp(FROM.name) });
    await row.getByRole('link', { name: 'Study' }).click();
    await page.getByRole('heading', { name: 'Link study' }).waitFor();

    const profiles = page.getByRole('combobox', { name: 'Reference profile' });
    await profiles
      .locator('option', { hasText: 'Quiet day' })
      .first()
      .waitFor({ state: 'attached' });
    const quietDayValue = await profiles
      .locator('option', { hasText: 'Quiet day' })
      .first()
      .getAttribute('value');
    await profiles.selectOption(quietDayValue ?? '');
    await page.getByLabel('Frequency (MHz)').fill('9');
    await page.getByRole('button', { name: 'Run and save' }).click();

    const modes = page.getByRole('table', { name: 'Modes at 9 MHz' });
    await modes.waitFor({ timeout: 30_000 });
    expect(await modes.getByRole('cell', { name: '1F2', exact: true }).count()).toBeGreaterThan(0);

    // The sweep finishes, then the chart holds at least one curve with several points.
    await page.getByText(/^Group delay at \d+ frequencies/).waitFor({ timeout: 60_000 });
    const curves = page.locator('figure[data-chart="group-delay"] svg path');
    await curves.first().waitFor({ timeout: 20_000 });
    const ds = await curves.evaluateAll((nodes) => nodes.map((n) => n.getAttribute('d') ?? ''));
    const longest = Math.max(...ds.map((d) => (d.match(/L/g) ?? []).length));
    expect(longest).toBeGreaterThan(5);
    await page
      .locator('figure[data-chart="ray-diagram"] svg path')
      .first()
      .waitFor({ timeout: 20_000 });
    await page.screenshot({ path: path.join(screenshotDir, 'link-study.png'), fullPage: true });
  });

  it('draws the bundled basemap, the link and its stations on the map without any network', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Map' }).click();
    const basemap = page.locator('.leaflet-hw-basemap-pane path');
    await basemap.first().waitFor({ timeout: 20_000 });
    // Land, borders and graticule, drawn from the bundled Natural Earth data: hundreds of
    // vertices even after Leaflet's simplification at world zoom.
    const ds = await basemap.evaluateAll((nodes) => nodes.map((n) => n.getAttribute('d') ?? ''));
    expect(ds.length).toBeGreaterThanOrEqual(3);
    expect(ds.reduce((sum, d) => sum + (d.match(/L/g) ?? []).length, 0)).toBeGreaterThan(500);
    // A station marker can be chosen from the keyboard-friendly list and shows its links.
    await page.getByRole('button', { name: FROM.name }).click();
    const panel = page.getByRole('complementary', { name: `Station ${FROM.name}` });
    await panel.getByText(LINK_NAME).waitFor();
    expect(await panel.textContent()).toContain('872.6 km');
    await page.screenshot({ path: path.join(screenshotDir, 'map.png'), fullPage: true });
    expect(outside).toEqual([]);
  });

  it('shows the latest study on the dashboard', async () => {
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Dashboard' })
      .click();
    const card = page
      .getByRole('group', { name: LINK_NAME })
      .or(page.locator('[aria-labelledby^="link-card-"]', { hasText: LINK_NAME }));
    await card.first().getByText('MUF, 1 hop').waitFor({ timeout: 10_000 });
    await page.screenshot({
      path: path.join(screenshotDir, 'dashboard-links.png'),
      fullPage: true,
    });
  });
});
