import type { Server } from 'node:http';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { launchBrowser, listen } from './browser';
import { testApp, testMailer } from './db';

/** The app serving the built client on a loopback port, and Chromium, for one browser-test file. */
export interface ServedBrowser {
  base: string;
  browser: BrowserContext;
}

/**
 * Starts the app (demo settings, the built client) and Chromium before the file's tests and stops
 * both after them: call it at the top of a test file; its fields are filled in by `beforeAll`.
 * With `mail`, the app sends its e-mail to the test SMTP fake (as `npm start` does).
 */
export function servedBrowser(options: { mail?: boolean } = {}): ServedBrowser {
  const web = {} as ServedBrowser;
  let server: Server | undefined;
  let close: (() => Promise<void>) | undefined;
  beforeAll(async () => {
    const mailer = options.mail ? await testMailer() : undefined;
    ({ server, url: web.base } = await listen(testApp({ demo: true }, 'dist/client', mailer)));
    ({ browser: web.browser, close } = await launchBrowser());
  });
  afterAll(async () => {
    await close?.();
    server?.close();
  });
  return web;
}
