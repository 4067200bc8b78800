// The analyst's workbench through the real client: upload a sounding trace through the drop
// zone's file input, invert it, save the result as a profile, compare it with the quiet-day
// reference profile of the demo library, export the comparison as CSV, and publish the profile.
// The trace file is invented demo data (profiles/examples/README: synthesised from the F2 layer of
// profiles/quiet-day.json), so no physical value is asserted here: only what the analyst sees.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { DEMO_PASSWORD, launchBrowser, screenshotDir } from '../support/browser.js';

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const TRACE_FILE = path.join(repoRoot, 'profiles/examples/sounding-trace-quiet-day.csv');
const BAD_TRACE_FILE = path.join(repoRoot, 'profiles/examples/bad-trace.csv');
const REFERENCE_NAME = 'Quiet day, mid-latitude (demo)';
const TRACE_NAME = 'Workbench trace, quiet day';
const PROFILE_NAME = 'Workbench inversion, quiet day';
// The header row of GET /api/profiles/compare.csv (api/src/profiles/profile-compare.service.ts).
const CSV_HEADER =
  'id,name,foEMHz,foF1MHz,foF2MHz,hmF2Km,semiThicknessKm,verticalTecu,frequencyMHz,groundRangeKm,muf1MHz,groupDelayMs';

/** Signs in through the form (its e-mail field is labelled "E-mail"; support/browser.ts looks for "Email"). */
async function signIn(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel(/^E-?mail/).fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

const shot = (page: Page, name: string) =>
  page.screenshot({ path: path.join(screenshotDir, `workbench-${name}.png`), fullPage: true });

/** Waits until no chart says "Computing…" (the debounced server previews have answered). */
async function settled(page: Page) {
  await page.getByText('Computing…').first().waitFor({ state: 'detached', timeout: 30_000 });
}

async function openUpload(page: Page, baseUrl: string) {
  await page.goto(`${baseUrl}/profiles/upload`);
  await page.getByRole('heading', { level: 1, name: 'Upload a trace or a profile' }).waitFor();
  await page.getByRole('radio', { name: /Sounding trace/ }).check();
}

describe('analyst workbench (browser)', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('uploads a trace, inverts it, saves, compares, exports CSV and publishes', async () => {
    const context = await browser.newContext({
      acceptDownloads: true,
      viewport: { width: 1400, height: 900 },
    });
    const page = await context.newPage();
    await signIn(page, baseUrl, 'analyst@hopwise.test');

    // 1. Upload the trace through the drop zone's file input.
    await openUpload(page, baseUrl);
    await page.getByTestId('upload-file-input').setInputFiles(TRACE_FILE);
    await page.getByText('Chosen: sounding-trace-quiet-day.csv').waitFor();
    await page.getByLabel('Name').fill(TRACE_NAME);
    await page.getByLabel(/Latitude/).fill('47.2');
    await page.getByLabel(/Longitude/).fill('8.6');
    await page.getByRole('button', { name: 'Upload', exact: true }).click();
    await page.getByText('Sounding stored').waitFor({ timeout: 20_000 });
    await shot(page, '1-uploaded');

    // 2. Invert it: the trace, the inverted N(h) and the synthetic ionogram over the trace.
    await page.getByRole('button', { name: 'Invert this trace' }).click();
    await page.getByRole('heading', { level: 1, name: 'Invert a sounding trace' }).waitFor();
    await page.getByRole('button', { name: 'Save as profile' }).waitFor({ timeout: 30_000 });
    await settled(page);
    expect(await page.getByRole('combobox', { name: 'Sounding' }).inputValue()).not.toBe('');
    await shot(page, '2-inversion');

    // 3. Save as profile: lands on the profile's page.
    await page.getByLabel('Profile name').fill(PROFILE_NAME);
    await page.getByRole('button', { name: 'Save as profile' }).click();
    await page.getByRole('heading', { level: 1, name: PROFILE_NAME }).waitFor({ timeout: 20_000 });
    await page.getByText('Inverted trace').first().waitFor();
    await settled(page);
    const profileUrl = page.url();
    await shot(page, '3-profile');

    // 4. Compare it with the quiet-day reference from the demo library.
    await page.getByRole('link', { name: 'Compare with…' }).click();
    await page.getByRole('heading', { level: 1, name: 'Compare profiles' }).waitFor();
    await page.getByRole('combobox', { name: /Profiles to compare/ }).click();
    // Fluent's multi-select dropdown lists its options as checkable menu items.
    await page.getByRole('menuitemcheckbox', { name: REFERENCE_NAME }).click();
    await page.keyboard.press('Escape');
    const table = page.getByRole('table', { name: 'Differences between the profiles' });
    await table.waitFor({ timeout: 30_000 });
    await table.getByRole('columnheader', { name: REFERENCE_NAME }).waitFor();
    expect(await table.getByRole('row').count()).toBe(10); // header + 9 quantities
    await settled(page);
    await shot(page, '4-compare');

    // 5. Export CSV: the download carries the comparison's header row.
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export CSV' }).click(),
    ]);
    const csvPath = await download.path();
    const lines = readFileSync(csvPath, 'utf8').trim().split(/\r?\n/);
    expect(lines[0]).toBe(CSV_HEADER);
    expect(lines).toHaveLength(1 + 2 * 2); // two profiles × two ground ranges
    expect(download.suggestedFilename()).toMatch(/\.csv$/);

    // 6. Publish it from its page; the library shows it as published.
    await page.goto(profileUrl);
    await page.getByRole('button', { name: `Publish ${PROFILE_NAME}` }).click();
    await page.getByRole('button', { name: `Unpublish ${PROFILE_NAME}` }).waitFor();
    await page.goto(`${baseUrl}/profiles`);
    const row = page.getByRole('row', { name: new RegExp(PROFILE_NAME) });
    await row.waitFor();
    expect(await row.getByText('Published', { exact: true }).count()).toBe(1);
    await shot(page, '5-library');
    await context.close();
  });

  it('lists every refused row of a bad trace file, and stores nothing', async () => {
    const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
    const page = await context.newPage();
    await signIn(page, baseUrl, 'analyst@hopwise.test');
    await openUpload(page, baseUrl);
    await page.getByTestId('upload-file-input').setInputFiles(BAD_TRACE_FILE);
    await page.getByLabel(/Latitude/).fill('47.2');
    await page.getByLabel(/Longitude/).fill('8.6');
    await page.getByRole('button', { name: 'Upload', exact: true }).click();
    const refused = page.getByRole('table', { name: 'Rows the server refused' });
    await refused.waitFor({ timeout: 20_000 });
    // bad-trace.csv: data rows 2–4 each carry one fault (its own comment line says so).
    expect(await refused.getByRole('row').count()).toBeGreaterThanOrEqual(1 + 3);
    await shot(page, '6-refused-rows');
    await context.close();
  });

  it('an analyst builds a profile from layers with live previews', async () => {
    const context = await browser.newContext({ viewport: { width: 1400, height: 1000 } });
    const page = await context.newPage();
    await signIn(page, baseUrl, 'analyst@hopwise.test');
    await page.goto(`${baseUrl}/profiles/build`);
    await page.getByRole('heading', { level: 1, name: 'Build a profile from layers' }).waitFor();
    await page.getByLabel('F1 semi-thickness yₘ (km)').fill('250');
    await page.getByText(/must not exceed peakHeightKm/).waitFor();
    await page.getByLabel('F1 semi-thickness yₘ (km)').fill('40');
    await settled(page);
    await shot(page, '7-builder');
    await context.close();
  });
});
