import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { createPlant } from '../support/factories';
import { launchBrowser, SCREENSHOTS, signInAs } from '../support/browser';
import { paymentsWorld } from '../support/payments';
import { sentQuoteWorld, useTestBook } from '../server/routes/portal/helpers';
import { Order, QuoteAcceptance, type User } from '../../server/models';

let browser: BrowserContext;
let closeBrowser: () => Promise<void>;
let world: Awaited<ReturnType<typeof paymentsWorld>>;
let sales: User;
let order: Order;

beforeAll(async () => {
  const plant = await createPlant({ name: 'Desk Acceptance Test Plant' });
  await useTestBook(plant);
  ({ sales, order } = await sentQuoteWorld(plant));
  world = await paymentsWorld('dist/client', { demo: true });
  ({ browser, close: closeBrowser } = await launchBrowser());
});

afterAll(async () => {
  await closeBrowser?.();
  await world?.close();
});

describe('sales records an acceptance on the builder’s behalf, on a desktop', () => {
  it('from the order page: a dialog that says so, refused when stale, then shown in the history', async () => {
    const page = await browser.newPage();
    await page.setViewportSize({ width: 1440, height: 1000 });
    const shot = (name: string) =>
      page.screenshot({ path: `${SCREENSHOTS}/desk-acceptance-${name}.png`, fullPage: true });
    await signInAs(browser, page, world.base, sales.email);
    await page.goto(`${world.base}/orders/${order.id}`);
    await page.getByRole('button', { name: 'Record acceptance…' }).click();
    const dialog = page.getByRole('dialog', { name: "Record the builder's acceptance" });
    await dialog.getByText("on the builder's behalf").waitFor();
    // Nothing filled in: the shared schema's own words, nothing sent.
    await dialog.getByRole('button', { name: 'Record acceptance for the builder' }).click();
    await dialog.getByText('Type your full name').waitFor();
    await dialog.getByText('Tick the box to accept the terms').waitFor();
    await dialog.getByLabel("Builder's person who accepted").fill('Dana Whitaker');
    await dialog.getByLabel('How it was received').selectOption('paper');
    expect(await dialog.getByLabel('Revision accepted').inputValue()).toBe('1');
    await dialog.getByLabel('Note (optional)').fill('Signed copy received by post');
    await dialog.getByRole('checkbox').check();
    await shot('1-dialog');

    // Meanwhile the order changes under the page (any write to its own columns raises the version).
    const before = (await Order.findByPk(order.id))!.version;
    await Order.update({ promisedOn: '2027-03-01' }, { where: { id: order.id } });
    expect((await Order.findByPk(order.id))!.version).toBe(before + 1);
    const refetched = page.waitForResponse(
      (r) => r.url().endsWith(`/api/orders/${order.id}`) && r.request().method() === 'GET',
    );
    await dialog.getByRole('button', { name: 'Record acceptance for the builder' }).click();
    await dialog.getByText(/changed since you opened it/).waitFor();
    await refetched;
    expect(await QuoteAcceptance.count({ where: { orderId: order.id } })).toBe(0);
    await shot('2-stale');

    // The order refetched: the same dialog now carries the new version and goes through.
    await dialog.getByRole('button', { name: 'Record acceptance for the builder' }).click();
    await dialog.waitFor({ state: 'hidden' });
    const card = page.getByTestId('order-acceptance');
    await card.getByText(/accepted by Dana Whitaker on paper/).waitFor();
    expect(await card.textContent()).toContain("recorded by the desk on the builder's behalf");
    await page
      .getByText(
        /Accepted .* as “Dana Whitaker” on the builder's behalf \(by paper\): Signed copy received by post/,
      )
      .waitFor();
    expect(await QuoteAcceptance.count({ where: { orderId: order.id, onBehalf: true } })).toBe(1);
    await shot('3-recorded');
  });
});
