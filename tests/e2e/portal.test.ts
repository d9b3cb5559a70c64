import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { createPlant, TEST_PASSWORD } from '../support/factories';
import { launchBrowser, SCREENSHOTS } from '../support/browser';
import { paymentsWorld } from '../support/payments';
import { sentQuoteWorld, useTestBook } from '../server/routes/portal/helpers';
import type { Order, Quote, User } from '../../server/models';

let browser: BrowserContext;
let closeBrowser: () => Promise<void>;
let world: Awaited<ReturnType<typeof paymentsWorld>>;
let builder: User;
let order: Order;
let quote: Quote;

beforeAll(async () => {
  const plant = await createPlant({ name: 'Portal Test Plant' });
  await useTestBook(plant);
  ({ builder, order, quote } = await sentQuoteWorld(plant));
  world = await paymentsWorld('dist/client', { demo: true });
  ({ browser, close: closeBrowser } = await launchBrowser());
});

afterAll(async () => {
  await closeBrowser?.();
  await world?.close();
});

const money = (v: number) =>
  new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(v);

describe('the builder portal on a phone (390 × 844)', () => {
  it('signs in, reads the quote, accepts it, pays the deposit on the hosted page, sees the receipt', async () => {
    const page = await browser.newPage();
    await page.setViewportSize({ width: 390, height: 844 });
    const shot = (name: string) =>
      page.screenshot({ path: `${SCREENSHOTS}/portal-${name}.png`, fullPage: true });

    await page.goto(`${world.base}/sign-in`);
    await page.getByLabel('E-mail').fill(builder.email);
    await page.getByLabel('Password').fill(TEST_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${world.base}/portal`);
    await page.getByRole('link', { name: new RegExp(quote.reference) }).waitFor();
    await shot('1-home');

    await page.getByRole('link', { name: new RegExp(quote.reference) }).click();
    await page.waitForURL(/\/portal\/orders\/\d+\/quotes\/1$/);
    await page.getByTestId('quote-total').waitFor();
    expect(await page.getByTestId('quote-total').textContent()).toBe(money(Number(quote.total)));
    expect(await page.locator('svg').count()).toBeGreaterThan(0);
    await page.getByText('Local codes govern', { exact: false }).first().waitFor();
    await shot('2-quote');

    // The form refuses without the tick, then accepts.
    await page.getByLabel('Your full name').fill('Dana Whitaker');
    await page.getByRole('button', { name: 'Accept quote' }).click();
    await page.getByText('Tick the box to accept the terms').waitFor();
    await page.getByRole('checkbox').check();
    await page.getByRole('button', { name: 'Accept quote' }).click();
    await page.waitForURL(`${world.base}/portal/orders/${order.id}`);
    await page.getByTestId('deposit-due').waitFor();
    expect(await page.getByTestId('deposit-due').textContent()).toBe(
      money(Number(quote.depositDue)),
    );
    await shot('3-accepted');

    await page.getByRole('button', { name: 'Pay deposit' }).click();
    await page.waitForURL(new RegExp(`^${world.fake.url}/pay/cs_test_`));
    await page.getByLabel('Card number').fill('4000 0000 0000 0002');
    await page.getByRole('button', { name: /^Pay / }).click();
    await page.getByText('Your card was declined').waitFor();
    await shot('4-declined');
    await page.getByLabel('Card number').fill('4242 4242 4242 4242');
    await page.getByRole('button', { name: /^Pay / }).click();
    await page.waitForURL(new RegExp(`/portal/orders/${order.id}\\?deposit=done`));
    await page.getByText('Deposit received', { exact: true }).waitFor({ timeout: 30000 });
    await page.getByRole('link', { name: /Receipt R-/ }).waitFor();
    await shot('5-deposit-received');
    await page.close();
  });
});
