import { chromium, type BrowserContext } from 'playwright-core';
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
