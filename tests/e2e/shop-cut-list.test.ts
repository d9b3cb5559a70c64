import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import type { Server } from 'node:http';
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { testApp } from '../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
} from '../support/factories';
import { launchBrowser, listen, SCREENSHOTS, signInAs } from '../support/browser';
import type { Order, User } from '../../server/models';

let browser: BrowserContext;
let closeBrowser: () => Promise<void>;
let server: Server;
let base: string;
let foreman: User;
let order: Order;

const signIn = (page: Page, user: User) => signInAs(browser, page, base, user.email);

beforeAll(async () => {
  const plant = await createPlant({ name: 'Shop Test Plant' });
  foreman = await createUser({ role: 'foreman', plant });
  const customer = await createCustomer({ plant, name: 'Millbrook Homes' });
  const job = await createJob({ customer, name: 'Millbrook, lot 7' });
  order = await createOrder({ job });
  // Two lines whose designs the server computed and the design reviewer approved.
  await createLine({ order, mark: 'T1', reviewState: 'approved' });
  await createLine({
    order,
    mark: 'K1',
    reviewState: 'approved',
    design: {
      units: 'imperial',
      profile: 'kingPost',
      span: 192,
      pitch: 6,
      overhang: 12,
      loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
    },
  });
  const app = testApp({}, 'dist/client');
  ({ server, url: base } = await listen(app));
  ({ browser, close: closeBrowser } = await launchBrowser());
});

afterAll(async () => {
  await closeBrowser?.();
  server?.close();
});

describe('the shop floor, in a browser', () => {
  it('the foreman opens an approved order and prints its cut list', async () => {
    const page = await browser.newPage();
    await page.setViewportSize({ width: 1024, height: 768 });
    await signIn(page, foreman);
    await page.getByRole('link', { name: 'Ready for the shop' }).first().click();
    await page.waitForURL(`${base}/shop`);
    await page.getByRole('link', { name: order.number }).click();
    await page.waitForURL(`${base}/shop/orders/${order.id}`);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toBe(`Cut list · Order ${order.number}`);
    // The king post's top chords: a mirror pair, 2 per truss × 4 trusses.
    const tc = page.getByRole('row', { name: /K1-TC1/ });
    await expect.poll(() => tc.count()).toBe(1);
    expect(await tc.textContent()).toMatch(/8\s*\d+'-\d+/);
    expect(await page.getByRole('link', { name: 'CSV' }).getAttribute('href')).toBe(
      `/api/shop/orders/${order.id}/cut-list.csv`,
    );
    await page.screenshot({ path: `${SCREENSHOTS}/shop-cut-list-1024.png`, fullPage: false });

    // On paper: no navigation, no buttons; the table and the cautions.
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('header nav').first().isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    const pdf = await page.pdf({ format: 'Letter', landscape: true, printBackground: true });
    const file = `${SCREENSHOTS}/shop-cut-list-print.pdf`;
    writeFileSync(file, pdf);
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
    expect(text).toContain(`Cut list · Order ${order.number}`);
    expect(text).toContain('K1-TC1');
    expect(text).not.toContain('Sign out');
    expect(text).toMatch(/No truss may be\s+cut or altered/);
    execFileSync('pdftoppm', ['-png', '-r', '60', file, `${SCREENSHOTS}/shop-cut-list-print`]);
    await page.close();
  });
});
