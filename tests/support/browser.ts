import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { TEST_PASSWORD } from './factories';
import { mkdtempSync, mkdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import type { Express } from 'express';

export const SCREENSHOTS = 'test-results/e2e';

/** Debian's Chromium, headless, with no network chatter and a fresh profile. */
export async function launchBrowser(): Promise<{
  browser: BrowserContext;
  close: () => Promise<void>;
}> {
  const profile = mkdtempSync(join(tmpdir(), 'spanwise-chromium-'));
  mkdirSync(SCREENSHOTS, { recursive: true });
  // A persistent context is how Playwright takes a fresh --user-data-dir of our own.
  const browser = await chromium.launchPersistentContext(profile, {
    viewport: { width: 1280, height: 800 },
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
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
  return {
    browser,
    close: async () => {
      await browser.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Listen on a free loopback port. */
export async function listen(app: Express): Promise<{ url: string; server: Server }> {
  return new Promise((resolve) => {
    const server = app.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as AddressInfo;
      resolve({ url: `http://127.0.0.1:${port}`, server });
    });
  });
}

/**
 * Sign in through the sign-in page as a person does, starting signed out (one browser profile
 * serves a whole test file), and wait for the start page.
 */
export async function signInAs(
  browser: BrowserContext,
  page: Page,
  base: string,
  email: string,
  password = TEST_PASSWORD,
) {
  await browser.clearCookies();
  await page.goto(`${base}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${base}/`);
}
