// Headless Debian Chromium driven by playwright-core (STACK gotcha 13: never download a browser).
import { chromium, type Browser, type Page } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const screenshotDir = path.resolve(
  path.dirname(fileURLToPath(import.meta.url)),
  '../../test-output/screenshots',
);

export async function launchBrowser(): Promise<Browser> {
  mkdirSync(screenshotDir, { recursive: true });
  return chromium.launch({
    executablePath: process.env.HOPWISE_CHROMIUM ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export const DEMO_PASSWORD = 'hopwise-demo';

export async function signIn(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel(/^E-?mail/).fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}
