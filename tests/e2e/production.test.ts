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
import { Order, OrderLine, ProductionSettings, type User } from '../../server/models';
import { releaseIfReady } from '../../server/commands/release';
import { addCalendarDays } from '../../shared/engine/schedule';

const web = servedBrowser();
let foreman: User;
let stays: Order;
let moves: Order;
const today = new Date().toISOString().slice(0, 10);

const signIn = (page: Page, user: User) => signInAs(web.browser, page, web.base, user.email);

/** A paid order with approved lines, released by the gate itself. */
async function releasedOrder(plantId: number, builder: string, marks: string[]) {
  const plant = { id: plantId } as never;
  const customer = await createCustomer({ plant, name: builder });
  const order = await createOrder({ job: await createJob({ customer }) });
  for (const mark of marks) await createLine({ order, mark, reviewState: 'approved' });
  await order.update({ status: 'deposit_paid', promisedOn: addCalendarDays(today, 6) });
  expect(await releaseIfReady(null, order.id)).toBe(true);
  return order;
}

beforeAll(async () => {
  const plant = await createPlant({ name: 'Schedule Test Plant' });
  foreman = await createUser({ role: 'foreman', plant });
  await ProductionSettings.create({
    plantId: plant.id,
    updatedBy: null,
    data: {
      tables: [
        { id: 1, name: 'North', crew: 3, shifts: 1, hoursPerShift: 8 },
        { id: 2, name: 'South', crew: 2, shifts: 1, hoursPerShift: 8 },
      ],
      workingDays: [0, 1, 2, 3, 4, 5, 6],
      closures: [],
      setupMinutes: 20,
      labour: { perTruss: 6, perPiece: 1.5, perJoint: 1, perPlate: 0, factor: 1 },
      horizonDays: 60,
    },
  });
  stays = await releasedOrder(plant.id, 'Alder Ridge Homes', ['T1', 'T2']);
  moves = await releasedOrder(plant.id, 'Birchwood Builders', ['A1']);
});

describe('production in a browser', () => {
  it('the foreman drags an order to another table and day on the board', async () => {
    const page = await web.browser.newPage();
    await page.setViewportSize({ width: 1440, height: 900 });
    await signIn(page, foreman);
    await page.goto(`${web.base}/schedule`);
    const block = page.getByTestId(`block-${moves.id}-${today}`);
    await block.waitFor();
    const target = addCalendarDays(today, 2);
    const cell = page.getByTestId(`cell-2-${target}`);
    const from = (await block.boundingBox())!;
    const to = (await cell.boundingBox())!;
    await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
    await page.mouse.down();
    await page.mouse.move(from.x + from.width / 2 + 20, from.y + from.height / 2, { steps: 5 });
    await page.mouse.move(to.x + to.width / 2, to.y + to.height / 2, { steps: 20 });
    await page.mouse.up();
    await page.getByTestId(`block-${moves.id}-${target}`).waitFor();
    await expect
      .poll(async () => (await Order.findByPk(moves.id))!.schedulePin)
      .toEqual({
        tableId: 2,
        date: target,
      });
    await page.getByText('Planned hours').first().waitFor();
    await page.screenshot({ path: `${SCREENSHOTS}/schedule-board.png`, fullPage: true });
  });

  it('the foreman moves an order a day back with the keyboard alone', async () => {
    const page = await web.browser.newPage();
    await page.setViewportSize({ width: 1024, height: 768 });
    await signIn(page, foreman);
    await page.goto(`${web.base}/schedule`);
    // Where the drag above left it: South, two days on.
    const from = addCalendarDays(today, 2);
    const block = page.getByTestId(`block-${moves.id}-${from}`);
    await block.focus();
    await page.keyboard.press('Space');
    // The keyboard moves the block 25 px a press; a day's column is 136 px wide.
    for (let i = 0; i < 6; i++) await page.keyboard.press('ArrowLeft');
    await page.screenshot({ path: `${SCREENSHOTS}/schedule-board-keyboard.png` });
    await page.keyboard.press('Space');
    const target = addCalendarDays(today, 1);
    await page.getByTestId(`block-${moves.id}-${target}`).waitFor();
    await expect
      .poll(async () => (await Order.findByPk(moves.id))!.schedulePin)
      .toEqual({ tableId: 2, date: target });
  });

  it('records progress on the tablet page, also while the network is away', async () => {
    const page = await web.browser.newPage();
    await page.setViewportSize({ width: 1024, height: 768 });
    await signIn(page, foreman);
    await page.goto(`${web.base}/floor`);
    const card = page.getByRole('region', { name: `${stays.number} T1` });
    await card.getByRole('button', { name: /0 of 4\s*cut/ }).click();
    await card.getByRole('button', { name: /1 of 4\s*cut/ }).waitFor();
    const line = await OrderLine.findOne({ where: { orderId: stays.id, mark: 'T1' } });
    await expect.poll(async () => (await line!.reload()).cutCount).toBe(1);
    expect((await Order.findByPk(stays.id))!.status).toBe('in_production');

    await web.browser.setOffline(true);
    await card.getByRole('button', { name: /1 of 4\s*cut/ }).click();
    await page.getByText('1 change waiting for the network').waitFor();
    await card.getByRole('button', { name: /2 of 4\s*cut/ }).waitFor();
    await page.screenshot({ path: `${SCREENSHOTS}/floor-offline.png` });
    expect((await line!.reload()).cutCount).toBe(1);
    await web.browser.setOffline(false);
    await page.evaluate(() => window.dispatchEvent(new Event('online')));
    await expect.poll(async () => (await line!.reload()).cutCount).toBe(2);
    await page.getByText(/waiting/).waitFor({ state: 'detached' });
    await page.screenshot({ path: `${SCREENSHOTS}/floor-tablet.png` });
  });
});
