// Each demo account signs in through the real client and sees only the areas its role may use.
// The expectation is written out here (not computed from the permission table) so that a change
// to the table shows up as a failing test.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import path from 'node:path';
import { launchBrowser, screenshotDir, signIn } from '../support/browser.js';

const ALL_AREAS = ['Dashboard', 'Map', 'Links', 'Profiles', 'Nets', 'Notices', 'Admin'];
const EXPECTED: Record<string, string[]> = {
  'operator@hopwise.test': ['Dashboard', 'Map', 'Links', 'Profiles', 'Nets', 'Notices'],
  'netcontrol@hopwise.test': ['Dashboard', 'Map', 'Links', 'Profiles', 'Nets', 'Notices'],
  'analyst@hopwise.test': ['Dashboard', 'Map', 'Links', 'Profiles', 'Nets', 'Notices'],
  'admin@hopwise.test': ALL_AREAS,
};

describe('navigation per demo role (browser)', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  for (const [email, expected] of Object.entries(EXPECTED)) {
    it(`${email} sees ${expected.join(', ')}`, async () => {
      const context = await browser.newContext();
      const page = await context.newPage();
      await signIn(page, baseUrl, email);
      const nav = page.getByRole('navigation', { name: 'Main' });
      for (const area of ALL_AREAS) {
        // The Notices link also announces unread notices ("Notices 3 unread"), which other
        // browser tests sharing this server may have created.
        const name = new RegExp(`^${area}(\\s*\\d+ unread)?$`);
        const count = await nav.getByRole('link', { name }).count();
        expect(count, `${email}: link ${area}`).toBe(expected.includes(area) ? 1 : 0);
      }
      await page.screenshot({
        path: path.join(screenshotDir, `nav-${email.split('@')[0]}.png`),
        fullPage: true,
      });
      await context.close();
    });
  }

  it('the admin users page lists the four demo accounts', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, baseUrl, 'admin@hopwise.test');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Admin' })
      .click();
    for (const email of Object.keys(EXPECTED)) {
      await page.getByRole('cell', { name: email }).first().waitFor({ timeout: 10_000 });
      expect(await page.getByRole('cell', { name: email }).count()).toBeGreaterThan(0);
    }
    await page.screenshot({ path: path.join(screenshotDir, 'admin-users.png'), fullPage: true });
    await context.close();
  });

  it('an operator who opens the admin page is told it is not available', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, baseUrl, 'operator@hopwise.test');
    await page.goto(`${baseUrl}/admin/users`);
    await page.getByText('Not available for your role').waitFor({ timeout: 10_000 });
    await context.close();
  });
});
