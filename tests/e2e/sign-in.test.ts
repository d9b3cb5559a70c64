import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import type { Server } from 'node:http';
import { testApp } from '../support/db';
import {
  createCustomer,
  createPlant,
  createUser,
  createJob,
  TEST_PASSWORD,
} from '../support/factories';
import { launchBrowser, listen, SCREENSHOTS } from '../support/browser';
import type { Role } from '../../shared/api/roles';
import type { User } from '../../server/models';

const LANDING: Record<Role, string> = {
  admin: 'Plant overview',
  sales: 'Sales desk',
  engineer: 'Design review',
  foreman: 'Shop floor',
  builder: 'What needs you',
};

let browser: BrowserContext;
let closeBrowser: () => Promise<void>;
let server: Server;
let base: string;
const users = {} as Record<Role, User>;

beforeAll(async () => {
  const plant = await createPlant({ name: 'Browser Test Plant' });
  const customer = await createCustomer({ plant, name: 'Browser Test Builders' });
  await createJob({ customer, name: 'Lot 7 test house' });
  for (const role of Object.keys(LANDING) as Role[])
    users[role] = await createUser({ role, plant, customer });
  const app = testApp({ demo: true }, 'dist/client');
  ({ server, url: base } = await listen(app));
  ({ browser, close: closeBrowser } = await launchBrowser());
});

afterAll(async () => {
  await closeBrowser?.();
  server?.close();
});

describe('signing in from the browser', () => {
  for (const role of Object.keys(LANDING) as Role[]) {
    it(`${role} lands on “${LANDING[role]}”`, async () => {
      const page = await browser.newPage();
      await page.goto(`${base}/`);
      await page.waitForURL(/\/sign-in/);
      await page.getByLabel('E-mail').fill(users[role].email);
      await page.getByLabel('Password').fill(TEST_PASSWORD);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await expect
        .poll(() => page.locator('h1').first().textContent(), { timeout: 15000 })
        .toBe(LANDING[role]);
      await page.screenshot({ path: `${SCREENSHOTS}/landing-${role}.png`, fullPage: true });
      await page.getByRole('button', { name: 'Sign out' }).first().click();
      await page.waitForURL(/\/sign-in/);
      await page.close();
    });
  }

  it('shows the server’s message for a wrong password', async () => {
    const page = await browser.newPage();
    await page.goto(`${base}/sign-in`);
    await page.getByLabel('E-mail').fill(users.sales.email);
    await page.getByLabel('Password').fill('not the password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect
      .poll(() => page.getByRole('alert').first().textContent())
      .toContain('Wrong e-mail or password.');
    await page.screenshot({ path: `${SCREENSHOTS}/sign-in-wrong-password.png` });
    await page.close();
  });
});
