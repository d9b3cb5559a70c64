import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import type { Server } from 'node:http';
import { testApp, testMailer } from '../support/db';
import { createPlant, createUser } from '../support/factories';
import { launchBrowser, listen, SCREENSHOTS, signInAs } from '../support/browser';
import { OrderLine, type Plant, type User } from '../../server/models';

let browser: BrowserContext;
let closeBrowser: () => Promise<void>;
let server: Server;
let base: string;
let plant: Plant;
let sales: User;
let engineer: User;
const state: { orderUrl?: string; jobUrl?: string } = {};

const signIn = (page: Page, user: User) => signInAs(browser, page, base, user.email);

beforeAll(async () => {
  plant = await createPlant({ name: 'Sales Desk Test Plant' });
  sales = await createUser({ role: 'sales', plant });
  engineer = await createUser({ role: 'engineer', plant });
  const app = testApp({ demo: true }, 'dist/client', await testMailer());
  ({ server, url: base } = await listen(app));
  ({ browser, close: closeBrowser } = await launchBrowser());
});

afterAll(async () => {
  await closeBrowser?.();
  server?.close();
});

describe('the sales desk, in a browser', () => {
  it('adds a builder, a job and an order, designs a Fink live, saves it', async () => {
    const page = await browser.newPage();
    await signIn(page, sales);

    await page.goto(`${base}/builders`);
    await page.getByRole('button', { name: 'New builder' }).click();
    await page.getByLabel('Company name').fill('Quarry Lane Builders');
    await page.getByLabel('E-mail', { exact: true }).fill('office@quarrylane.test');
    await page.getByLabel('Terms', { exact: true }).selectOption({ label: 'Deposit required' });
    await page.getByRole('button', { name: 'Save builder' }).click();
    await page.waitForURL(/\/builders\/\d+$/);
    await page.getByRole('button', { name: 'Edit details' }).click();
    await page.getByLabel('Phone', { exact: true }).fill('(555) 014-7700');
    await page.getByRole('button', { name: 'Save builder' }).click();
    await expect.poll(() => page.getByText('The builder’s details were saved.').count()).toBe(1);
    await expect.poll(() => page.getByText('(555) 014-7700').count()).toBeGreaterThan(0);

    await page.getByRole('button', { name: 'New job' }).click();
    await page.getByLabel('Job name').fill('Lot 9 — Quarry Lane');
    await page.getByLabel('Site address').fill('9 Quarry Lane, Millbrook');
    await page.getByRole('button', { name: 'Save job' }).click();
    await page.waitForURL(/\/jobs\/\d+$/);
    state.jobUrl = page.url();

    await page.getByRole('button', { name: 'New order' }).click();
    await page.waitForURL(/\/orders\/\d+$/);
    state.orderUrl = page.url();
    await expect.poll(() => page.locator('h1').first().textContent()).toMatch(/^Order /);

    await page.getByRole('link', { name: 'Add truss' }).first().click();
    await expect.poll(() => page.locator('h1').first().textContent()).toBe('Truss editor');
    await page.getByRole('button', { name: 'Fink (W)' }).click();
    await page.getByLabel('Mark', { exact: true }).fill('T1');
    await page.getByLabel('Quantity', { exact: true }).fill('12');
    await page.getByLabel('Pitch', { exact: true }).fill('6/12');
    const drawing = page.getByTestId('truss-drawing');

    await page.getByLabel('Span', { exact: true }).fill(`24'`);
    await expect.poll(() => drawing.getAttribute('data-design-ms')).not.toBeNull();
    const before = await drawing.screenshot({ path: `${SCREENSHOTS}/editor-span-24ft.png` });
    await page.getByLabel('Span', { exact: true }).fill(`36'`);
    await page.waitForTimeout(300);
    const after = await drawing.screenshot({ path: `${SCREENSHOTS}/editor-span-36ft.png` });
    expect(Buffer.compare(before, after)).not.toBe(0); // the drawing redrew for the new span

    await page.getByLabel('Span', { exact: true }).fill(`28'-6 1/2"`);
    await page.waitForTimeout(300);
    const ms = Number(await drawing.getAttribute('data-design-ms'));
    expect(ms).toBeGreaterThan(0);
    await page.screenshot({ path: `${SCREENSHOTS}/editor-fink-28ft-6.5in.png`, fullPage: true });
    await page.getByRole('button', { name: 'Save truss' }).click();
    await page.waitForURL(state.orderUrl);
    await expect
      .poll(() => page.getByRole('cell', { name: 'T1', exact: true }).count())
      .toBeGreaterThan(0);
    await page.screenshot({ path: `${SCREENSHOTS}/order-with-T1.png`, fullPage: true });

    const orderId = Number(state.orderUrl.split('/').pop());
    const line = await OrderLine.findOne({ where: { orderId, mark: 'T1' } });
    // 28'-6 1/2" = 342.5 in, stored as the design input and recomputed by the server.
    expect(line!.designInput).toMatchObject({ profile: 'fink', span: 342.5, pitch: 6 });
    expect(line!.designOk).toBe(true);
    await page.close();
  });

  it('an engineer approves the design from the review queue', async () => {
    const page = await browser.newPage();
    await signIn(page, engineer);
    await page.goto(`${base}/reviews`);
    await expect.poll(() => page.locator('h1').first().textContent()).toBe('Review queue');
    await page.getByRole('link', { name: 'T1' }).first().click();
    await page.screenshot({ path: `${SCREENSHOTS}/review-T1.png`, fullPage: true });
    await page.getByRole('button', { name: 'Approve' }).click();
    // The page says what happened and, with nothing else waiting, leads back to the queue.
    await expect
      .poll(() => page.getByTestId('decision-outcome').textContent())
      .toMatch(/Approved T1.*Nothing else is waiting for review/);
    const orderId = Number(state.orderUrl!.split('/').pop());
    await expect
      .poll(async () => (await OrderLine.findOne({ where: { orderId, mark: 'T1' } }))?.reviewState)
      .toBe('approved');
    await page.close();
  });
});
