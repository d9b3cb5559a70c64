import { beforeAll, describe, expect, it } from 'vitest';
import { createOrder, createPlant, createUser } from '../support/factories';
import { SCREENSHOTS, signInAs } from '../support/browser';
import { servedBrowser } from '../support/servedBrowser';
import { OrderLine, type Order, type User } from '../../server/models';

const web = servedBrowser({ mail: true });
let sales: User;
let order: Order;

beforeAll(async () => {
  const plant = await createPlant({ name: 'Girder Test Plant' });
  sales = await createUser({ role: 'sales', plant });
  order = await createOrder({ plant });
});

describe('a girder with point loads, in the truss editor (desktop)', () => {
  it('enters hung loads in the point-load table, sees them drawn and the ply fastening, saves', async () => {
    const page = await web.browser.newPage();
    await signInAs(web.browser, page, web.base, sales.email);
    await page.goto(`${web.base}/orders/${order.id}/lines/new`);
    await expect.poll(() => page.locator('h1').first().textContent()).toBe('Truss editor');
    await page.getByLabel('Mark', { exact: true }).fill('G1');
    await page.getByLabel('Plies', { exact: true }).fill('2');
    const drawing = page.getByTestId('truss-drawing');
    await expect.poll(() => drawing.getAttribute('data-design-ms')).not.toBeNull();
    expect(await page.getByTestId('point-load-arrows').count()).toBe(0);

    // Two hung trusses' reactions on the bottom chord, between and at panel points.
    for (const [i, [x, dead, live]] of [
      [`9'-0"`, '400', '600'],
      [`14'-0"`, '400', '600'],
    ].entries()) {
      await page.getByRole('button', { name: 'Add point load' }).click();
      await page.getByLabel(`Point load ${i + 1} position`).fill(x);
      await page.getByLabel(`Point load ${i + 1} dead load`).fill(dead);
      await page.getByLabel(`Point load ${i + 1} live load`).fill(live);
    }
    await expect.poll(() => page.getByTestId('point-load-arrows').locator('text').count()).toBe(2);
    await expect
      .poll(() => page.getByTestId('point-load-arrows').locator('text').first().textContent())
      .toBe('D 400 + Lr 600 lb');
    const fastening = page.getByTestId('ply-fastening');
    await expect.poll(() => fastening.textContent()).toMatch(/Bottom chord, 2-ply: .* o\.c\./);

    // A position past the span is refused beside the table, and the drawing keeps the last truss.
    await page.getByLabel('Point load 2 position').fill(`40'`);
    await expect
      .poll(() => page.getByText(/Point load 2: A point load must lie between the heels/).count())
      .toBe(1);
    await page.getByLabel('Point load 2 position').fill(`14'-0"`);
    await page.waitForTimeout(300);
    await page.screenshot({ path: `${SCREENSHOTS}/editor-girder-point-loads.png`, fullPage: true });
    await drawing.screenshot({ path: `${SCREENSHOTS}/editor-girder-drawing.png` });

    await page.getByRole('button', { name: 'Save truss' }).click();
    await page.waitForURL(`${web.base}/orders/${order.id}`);
    const line = await OrderLine.findOne({ where: { orderId: order.id, mark: 'G1' } });
    expect(line!.plies).toBe(2);
    expect(line!.designInput).toMatchObject({
      pointLoads: [
        { x: 108, chord: 'bottom', dead: 400, live: 600, kind: 'roofLive' },
        { x: 168, chord: 'bottom', dead: 400, live: 600, kind: 'roofLive' },
      ],
    });
    // Opened again, the table shows the stored loads as typed.
    await page.goto(`${web.base}/orders/${order.id}/lines/${line!.id}`);
    await expect.poll(() => page.getByLabel('Point load 1 position').inputValue()).toBe(`9'-0"`);
    await page.close();
  });
});
