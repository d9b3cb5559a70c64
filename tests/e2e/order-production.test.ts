import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
} from '../support/factories';
import { SCREENSHOTS, signInAs } from '../support/browser';
import { servedBrowser } from '../support/servedBrowser';
import { AuditEvent, MailMessage, Order, OrderLine, type User } from '../../server/models';

const web = servedBrowser();
let admin: User;
let foreman: User;
let accepted: Order;
let ready: Order;

const signIn = (page: Page, user: User) => signInAs(web.browser, page, web.base, user.email);
/** A card of the page by its title. */
const cardOf = (page: Page, title: string) =>
  page.locator('section', { has: page.getByRole('heading', { name: title, exact: true }) });

async function orderOf(plantId: number, builder: string, status: 'accepted' | 'ready') {
  const customer = await createCustomer({ plant: { id: plantId } as never, name: builder });
  const order = await createOrder({ job: await createJob({ customer }) });
  const line = await createLine({ order, mark: 'T1', reviewState: 'approved' });
  if (status === 'ready')
    await line.update({ cutCount: 4, assembledCount: 4, bandedCount: 4, loadedCount: 4 });
  await order.update({ status, promisedOn: status === 'ready' ? '2026-12-01' : null });
  return order;
}

beforeAll(async () => {
  const plant = await createPlant({ name: 'Order Desk Test Plant' });
  admin = await createUser({ role: 'admin', plant });
  foreman = await createUser({ role: 'foreman', plant });
  accepted = await orderOf(plant.id, 'Cedar Point Homes', 'accepted');
  ready = await orderOf(plant.id, 'Dunmore Framing', 'ready');
});

describe('production changes from the order page and the board', () => {
  it('the plant manager promises a date, changes it with a reason, holds and releases', async () => {
    const page = await web.browser.newPage();
    await page.setViewportSize({ width: 1440, height: 900 });
    await signIn(page, admin);
    await page.goto(`${web.base}/orders/${accepted.id}`);
    const card = cardOf(page, 'Production');
    await card.getByText('Not promised yet').waitFor();

    await card.getByRole('button', { name: 'Promise a date' }).click();
    await page.getByLabel('Promised delivery').fill('2030-03-04');
    await page.getByRole('button', { name: 'Promise date' }).click();
    await card.getByText('Delivery promised for 2030-03-04.').waitFor();

    await card.getByRole('button', { name: 'Change promised date' }).click();
    await page.getByLabel('Promised delivery').fill('2030-03-11');
    await page.getByRole('button', { name: 'Change date' }).click();
    await page.getByText('Give a reason').waitFor();
    await page.getByLabel('Reason (sent to the builder)').fill('Crane booked a week later');
    await page.getByRole('button', { name: 'Change date' }).click();
    await card.getByText(/moved to 2030-03-11/).waitFor();
    expect(
      await MailMessage.count({ where: { orderId: accepted.id, kind: 'production.promised' } }),
    ).toBe(1);

    // Someone else changes the order meanwhile: the page's version is stale.
    await card.getByRole('button', { name: 'Hold' }).click();
    await Order.update({ promisedOn: '2030-03-18' }, { where: { id: accepted.id } });
    await page.getByLabel('Reason').fill('Site access not confirmed');
    await page.getByRole('button', { name: 'Hold order' }).click();
    await page.getByText('Someone changed this order meanwhile').waitFor();
    await page.screenshot({ path: `${SCREENSHOTS}/order-production-stale.png` });
    expect((await Order.findByPk(accepted.id))!.onHold).toBe(false);
    await page.getByRole('button', { name: 'Hold order' }).click();
    await card.getByText(/is on hold/).waitFor();
    await card.getByText(/Site access not confirmed/).waitFor();
    expect((await Order.findByPk(accepted.id))!.onHold).toBe(true);
    await page.screenshot({ path: `${SCREENSHOTS}/order-production-held.png`, fullPage: true });

    await card.getByRole('button', { name: 'Release', exact: true }).click();
    await page.getByLabel('Reason').fill('Cheque for the deposit seen');
    await page.getByRole('button', { name: 'Release order' }).click();
    await card.getByText(/released to production/).waitFor();
    expect((await Order.findByPk(accepted.id))!.status).toBe('released');
    await page.screenshot({ path: `${SCREENSHOTS}/order-production.png`, fullPage: true });
  });

  it('the foreman signs off a delivery from the board on the tablet', async () => {
    const page = await web.browser.newPage();
    await page.setViewportSize({ width: 1024, height: 768 });
    await signIn(page, foreman);
    await page.goto(`${web.base}/schedule`);
    const card = cardOf(page, 'Ready to deliver');
    await card.getByText(ready.number).waitFor();
    await card.getByRole('button', { name: 'Sign off delivery' }).click();
    await page.getByLabel('Received by (name as signed)').fill('Pat Dunmore');
    await page.getByLabel('Note (optional)').fill('Stacked on bearers by the gate');
    await page.screenshot({ path: `${SCREENSHOTS}/board-delivery-dialog.png` });
    await page.getByRole('button', { name: 'Sign off delivery' }).last().click();
    await page.getByText(/signed for by Pat Dunmore/).waitFor();
    await page.screenshot({ path: `${SCREENSHOTS}/board-delivered.png` });
    expect((await Order.findByPk(ready.id))!.status).toBe('delivered');
    expect((await OrderLine.findOne({ where: { orderId: ready.id } }))!.deliveredCount).toBe(4);
    const event = await AuditEvent.findOne({
      where: { subjectId: ready.id, action: 'order.delivered' },
    });
    expect(event!.data).toMatchObject({
      receivedBy: 'Pat Dunmore',
      note: 'Stacked on bearers by the gate',
    });
  });
});
