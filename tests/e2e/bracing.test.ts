import { beforeAll, describe, expect, it } from 'vitest';
import { createOrder, createPlant, createUser } from '../support/factories';
import { SCREENSHOTS, signInAs } from '../support/browser';
import { servedBrowser } from '../support/servedBrowser';
import { OrderLine, type Order, type User } from '../../server/models';

const web = servedBrowser({ mail: true });
let sales: User;
let engineer: User;
let order: Order;

beforeAll(async () => {
  const plant = await createPlant({ name: 'Bracing Test Plant' });
  sales = await createUser({ role: 'sales', plant });
  engineer = await createUser({ role: 'engineer', plant });
  order = await createOrder({ plant });
});

/**
 * A truss over an open space (no ceiling) under net wind uplift: the bottom chord goes into
 * compression under 0.6D + 0.6W and buckles sideways between its lateral braces, so the spacing
 * typed in the Bracing section decides it. NDS 2018 §3.7.1.4: le/d ≤ 50, so 10 ft on a 1.5 in
 * face (le/d = 80) fails and 2 ft (le/d = 16) does not.
 */
describe('the Bracing section of the truss editor (desktop)', () => {
  it('no ceiling: the bottom chord is checked over the bracing spacing typed; saved and reviewed', async () => {
    const page = await web.browser.newPage();
    await signInAs(web.browser, page, web.base, sales.email);
    await page.goto(`${web.base}/orders/${order.id}/lines/new`);
    await expect.poll(() => page.locator('h1').first().textContent()).toBe('Truss editor');
    await page.getByLabel('Mark', { exact: true }).fill('B1');
    await page.getByLabel('Wind uplift (psf)').fill('30');
    const drawing = page.getByTestId('truss-drawing');
    await expect.poll(() => drawing.getAttribute('data-design-ms')).not.toBeNull();

    await page.getByLabel('Ceiling on bottom chord').uncheck();
    await expect
      .poll(() => page.getByText(/No ceiling: lateral bracing at 10'-0" o\.c\./).count())
      .toBeGreaterThan(0);
    // The bottom chord's CSI is le/d / 50 = 80/50 = 1.60 (the slenderness limit governs).
    const chordRow = page.getByRole('row').filter({ hasText: /^AB/ });
    await page.screenshot({ path: `${SCREENSHOTS}/editor-bracing-no-ceiling.png`, fullPage: true });
    await expect.poll(() => chordRow.first().textContent()).toMatch(/1\.60/);

    await page.getByLabel('Bottom chord bracing').fill(`2'-0"`);
    await page.getByLabel('Top chord sheathed').uncheck();
    await page.getByLabel('Purlin spacing').fill('');
    await expect
      .poll(() =>
        page.getByText('Enter the purlin spacing (the top chord has no sheathing)').count(),
      )
      .toBe(1);
    await page.getByLabel('Purlin spacing').fill(`2'-0"`);
    await page.getByLabel('Braced webs get').selectOption('tBrace');
    await expect
      .poll(() => page.getByText(/No ceiling: lateral bracing at 2'-0" o\.c\./).count())
      .toBeGreaterThan(0);
    await expect.poll(() => chordRow.first().textContent()).not.toMatch(/1\.60/);
    await page.waitForTimeout(300);
    await page.screenshot({ path: `${SCREENSHOTS}/editor-bracing.png`, fullPage: true });

    await page.getByRole('button', { name: 'Save truss' }).click();
    await page.waitForURL(`${web.base}/orders/${order.id}`);
    const line = await OrderLine.findOne({ where: { orderId: order.id, mark: 'B1' } });
    expect(line!.designInput).toMatchObject({
      bracing: {
        ceiling: false,
        bottomChordBracing: 24,
        sheathing: false,
        purlinSpacing: 24,
        webBrace: 'tBrace',
      },
    });
    // The server's own design used the bracing too.
    const notes = (line!.designResult as { notes: string[] }).notes.join(' ');
    expect(notes).toMatch(/purlins at 2'-0" o\.c\..*no ceiling\) by lateral bracing at 2'-0"/);

    // Opened again, the section shows what was saved.
    await page.goto(`${web.base}/orders/${order.id}/lines/${line!.id}`);
    await expect.poll(() => page.getByLabel('Purlin spacing').inputValue()).toBe(`2'-0"`);
    expect(await page.getByLabel('Ceiling on bottom chord').isChecked()).toBe(false);

    // The reviewer sees it beside the loads.
    await signInAs(web.browser, page, web.base, engineer.email);
    await page.goto(`${web.base}/reviews/${line!.id}?order=${order.id}`);
    await expect
      .poll(() =>
        page
          .getByText(
            `Top chord: purlins at 2'-0" o.c. · no ceiling, bottom chord braced at 2'-0" o.c. · braced webs: T-brace`,
          )
          .count(),
      )
      .toBe(1);
    await page.screenshot({ path: `${SCREENSHOTS}/review-bracing.png`, fullPage: true });
    await page.close();
  });
});
