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
import { Order, ProductionSettings, SchedulePlacement, type User } from '../../server/models';
import { releaseIfReady } from '../../server/commands/release';
import { addCalendarDays } from '../../shared/engine/schedule';

const web = servedBrowser();
let admin: User;
let foreman: User;
let order: Order;
const today = new Date().toISOString().slice(0, 10);

const signIn = (page: Page, user: User) => signInAs(web.browser, page, web.base, user.email);
const cardOf = (page: Page, title: string) =>
  page.locator('section', { has: page.getByRole('heading', { name: title, exact: true }) });

/** The board on the foreman's tablet, with the order's first block tapped. */
async function boardWithPanel(user: User) {
  const page = await web.browser.newPage();
  await page.setViewportSize({ width: 1024, height: 768 });
  await signIn(page, user);
  await page.goto(`${web.base}/schedule`);
  await page.getByTestId(`block-${order.id}-${today}`).click();
  await cardOf(page, `Order ${order.number}`).getByText('Planned to finish').waitFor();
  return page;
}

beforeAll(async () => {
  const plant = await createPlant({ name: 'Board Hold Test Plant' });
  admin = await createUser({ role: 'admin', plant });
  foreman = await createUser({ role: 'foreman', plant });
  await ProductionSettings.create({
    plantId: plant.id,
    updatedBy: null,
    data: {
      tables: [{ id: 1, name: 'North', crew: 3, shifts: 1, hoursPerShift: 8 }],
      workingDays: [0, 1, 2, 3, 4, 5, 6],
      closures: [],
      setupMinutes: 20,
      labour: { perTruss: 6, perPiece: 1.5, perJoint: 1, perPlate: 0, factor: 1 },
      horizonDays: 60,
    },
  });
  const customer = await createCustomer({ plant, name: 'Larch Hollow Homes' });
  order = await createOrder({ job: await createJob({ customer }) });
  await createLine({ order, mark: 'T1', reviewState: 'approved' });
  await order.update({ status: 'deposit_paid', promisedOn: addCalendarDays(today, 6) });
  expect(await releaseIfReady(null, order.id)).toBe(true);
});

describe('hold and release from the schedule board', () => {
  it('the foreman sees the order’s panel without Hold', async () => {
    const page = await boardWithPanel(foreman);
    const panel = cardOf(page, `Order ${order.number}`);
    await panel.getByText('Larch Hollow Homes').waitFor();
    expect(await panel.getByRole('button', { name: 'Hold' }).count()).toBe(0);
    await page.close();
  });

  it('the plant manager holds an order on the tablet, then releases it after a stale try', async () => {
    const page = await boardWithPanel(admin);
    await cardOf(page, `Order ${order.number}`).getByRole('button', { name: 'Hold' }).click();
    await page.getByLabel('Reason').fill('Builder’s site is flooded');
    await page.screenshot({ path: `${SCREENSHOTS}/board-hold-dialog.png` });
    await page.getByRole('button', { name: 'Hold order' }).click();
    await page.getByText(`Order ${order.number} is on hold.`).waitFor();
    await page.getByTestId(`block-${order.id}-${today}`).waitFor({ state: 'detached' });
    const held = cardOf(page, 'On hold');
    await held.getByText('Builder’s site is flooded').waitFor();
    expect(await SchedulePlacement.count({ where: { orderId: order.id } })).toBe(0);
    await page.screenshot({ path: `${SCREENSHOTS}/board-held-tablet.png` });

    // Someone changes the order meanwhile: the board's version is stale, nothing changes.
    await held.getByRole('button', { name: `Release order ${order.number}` }).click();
    await Order.update({ promisedOn: addCalendarDays(today, 8) }, { where: { id: order.id } });
    await page.getByLabel('Reason').fill('Site drained');
    await page.getByRole('button', { name: 'Release order', exact: true }).click();
    await page.getByText('Someone changed this order meanwhile').waitFor();
    expect((await Order.findByPk(order.id))!.onHold).toBe(true);
    await page.getByRole('button', { name: 'Release order', exact: true }).click();
    await page.getByText(`Order ${order.number} is released to production.`).waitFor();
    await page.getByTestId(`block-${order.id}-${today}`).waitFor();
    expect((await Order.findByPk(order.id))!.onHold).toBe(false);
    await page.screenshot({ path: `${SCREENSHOTS}/board-released-tablet.png` });
  });
});
