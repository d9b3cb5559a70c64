import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { createPlant, createUser } from '../support/factories';
import { launchBrowser, SCREENSHOTS, signInAs } from '../support/browser';
import { signedIn } from '../support/session';
import { paymentsWorld } from '../support/payments';
import { sentQuoteWorld, useTestBook } from '../server/routes/portal/helpers';
import type { Order, Plant, Quote, User } from '../../server/models';

let browser: BrowserContext;
let closeBrowser: () => Promise<void>;
let world: Awaited<ReturnType<typeof paymentsWorld>>;
let plant: Plant;
let sales: User;
let order: Order;
let quote: Quote;

const money = (v: number) =>
  new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(v);

beforeAll(async () => {
  plant = await createPlant({ name: 'Desk Payments Test Plant' });
  await useTestBook(plant);
  let builder: User;
  ({ builder, sales, order, quote } = await sentQuoteWorld(plant));
  world = await paymentsWorld('dist/client', { demo: true });
  const s = await signedIn(world.app, builder.email);
  await s
    .post(`/api/orders/${order.id}/quotes/1/accept`, { name: 'Dana Whitaker', agree: true })
    .expect(200);
  ({ browser, close: closeBrowser } = await launchBrowser());
});

afterAll(async () => {
  await closeBrowser?.();
  await world?.close();
});

describe('the desk’s side of payments, on a desktop', () => {
  it('shows the balance, records a cheque, refuses a stale or incomplete one, shows the mail', async () => {
    const page = await browser.newPage();
    await page.setViewportSize({ width: 1440, height: 1000 });
    const shot = (name: string) =>
      page.screenshot({ path: `${SCREENSHOTS}/desk-payments-${name}.png`, fullPage: true });
    await signInAs(browser, page, world.base, sales.email);
    await page.goto(`${world.base}/orders/${order.id}`);
    const figures = page.getByTestId('order-money');
    await figures.waitFor();
    const deposit = Number(quote.depositDue);
    expect(await figures.textContent()).toContain(money(deposit));
    expect(await figures.textContent()).toContain(money(Number(quote.total)));
    // The acceptance confirmation went to the builder and the desk.
    await page
      .getByTestId('order-mail')
      .getByText(/^Acceptance confirmation · to/)
      .waitFor();
    await shot('1-accepted');

    // No reference: the message sits beside the field and nothing is sent.
    await page.getByLabel('Reference').fill('');
    await page.getByRole('button', { name: 'Record payment' }).click();
    await page.getByText('Enter the cheque number or transfer reference').first().waitFor();
    expect(await page.getByLabel(/^Amount/).inputValue()).toBe(String(deposit));

    // Meanwhile a colleague records a transfer: this page's "paid" is stale.
    const colleague = await signedIn(world.app, (await createUser({ role: 'sales', plant })).email);
    await colleague
      .post(`/api/orders/${order.id}/payments`, {
        amount: 20,
        method: 'transfer',
        reference: 'TRF 88',
        version: (await colleague.get(`/api/orders/${order.id}`).expect(200)).body.version,
      })
      .expect(201);
    await page.getByLabel('Reference').fill('Chq 20411');
    await page.getByRole('button', { name: 'Record payment' }).click();
    await page.getByText(/changed since you opened it.*Check the payments below/).waitFor();
    await page.getByTestId('order-payments').getByText('TRF 88').waitFor();
    await shot('2-stale');

    // Now it sees the transfer; the cheque goes in.
    await page.getByLabel(/^Amount/).fill(String(deposit - 20));
    await page.getByRole('button', { name: 'Record payment' }).click();
    await page.getByText(/recorded, receipt R-/).waitFor();
    await page.getByTestId('order-payments').getByText('Chq 20411').waitFor();
    await expect
      .poll(() => page.getByTestId('order-money').textContent())
      .toContain(money(Number(quote.total) - deposit));
    await expect
      .poll(
        () =>
          page
            .getByTestId('order-mail')
            .getByText(/^Receipt · to/)
            .count(),
        { timeout: 20000 },
      )
      .toBe(2);
    await expect
      .poll(
        async () => {
          await page.reload();
          await page.getByTestId('order-mail').waitFor();
          return page.getByTestId('order-mail').getByText('Sent', { exact: true }).count();
        },
        { timeout: 30000, interval: 1000 },
      )
      .toBeGreaterThanOrEqual(3);
    await shot('3-cheque-recorded');
    await page.close();
  });

  it('the plant manager sets the cancellation fee in the price book', async () => {
    const admin = await createUser({ role: 'admin', plant });
    const page = await browser.newPage();
    await page.setViewportSize({ width: 1440, height: 1000 });
    await signInAs(browser, page, world.base, admin.email);
    await page.goto(`${world.base}/price-book`);
    const fee = page.getByLabel('Cancellation fee');
    await fee.waitFor();
    expect(await fee.inputValue()).toBe('100');
    await fee.fill('-5');
    await page.getByRole('button', { name: 'Save price book' }).click();
    await page.getByText('Cancellation fee cannot be negative').waitFor();
    await fee.fill('125');
    await page.getByRole('button', { name: 'Save price book' }).click();
    await page.getByText('Price book saved.', { exact: false }).waitFor();
    await page.screenshot({ path: `${SCREENSHOTS}/desk-price-book-fee.png`, fullPage: true });
    const stored = await (
      await signedIn(world.app, admin.email)
    )
      .get('/api/price-book')
      .expect(200);
    expect(stored.body.cancellationFee).toBe(125);
    await page.close();
  });
});
