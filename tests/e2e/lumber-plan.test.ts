import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { SCREENSHOTS } from '../support/browser';
import { browserOrder, TABLET } from '../support/browserOrder';

// With the job queue the app runs the shop-plan worker, which makes the plans.
const fx = browserOrder({
  plant: 'Lumber Plan Test Plant',
  customer: 'Alder Creek Homes',
  job: 'Alder Creek, lot 7',
  roles: ['foreman', 'admin'],
  lines: [
    { mark: 'T1' },
    {
      mark: 'T2',
      design: {
        units: 'imperial',
        profile: 'howe',
        span: 336,
        pitch: 6,
        heelHeight: 4,
        overhang: 18,
        loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
      },
    },
  ],
  demo: true,
  queue: true,
});

describe('lumber plans, in a browser', () => {
  it('the foreman opens an approved order’s lumber plan, has it made and prints it', async () => {
    const page = await fx.browser.newPage();
    await page.setViewportSize(TABLET);
    await fx.signIn(page, 'foreman');
    await page.goto(`${fx.base}/orders/${fx.order.id}`);
    await page.getByRole('link', { name: 'Lumber plan' }).click();
    await page.waitForURL(/\/shop\/orders\/\d+\/lumber-plan$/);
    await expect
      .poll(() => page.locator('h1').first().textContent(), { timeout: 30000 })
      .toMatch(/^Lumber plan — order /);
    // Lines approved outside the review have no plan yet: the foreman asks for one, and the page
    // follows the job queue's run until the stored plan is there.
    await page.getByRole('button', { name: 'Make the plan' }).click();
    await expect
      .poll(() => page.getByText(/Waiting for the job queue|Planning|Cutting|Plan made/).count(), {
        timeout: 30000,
      })
      .toBeGreaterThan(0);
    await page.screenshot({ path: `${SCREENSHOTS}/lumber-plan-running-tablet.png` });
    await expect.poll(() => page.getByText(/^Plan made /).count(), { timeout: 60000 }).toBe(1);
    await expect
      .poll(() => page.getByText(/least possible cost/).count(), { timeout: 30000 })
      .toBeGreaterThan(0);
    await expect
      .poll(() => page.getByText(/First-fit decreasing would have used/).count(), {
        timeout: 30000,
      })
      .toBeGreaterThan(0);
    await page.screenshot({ path: `${SCREENSHOTS}/lumber-plan-tablet.png`, fullPage: true });
    // On paper: no navigation and no buttons.
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('nav').first().isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    await page.pdf({ path: `${SCREENSHOTS}/lumber-plan-print.pdf`, format: 'Letter' });
    execFileSync('pdftoppm', [
      '-png',
      '-r',
      '50',
      '-f',
      '1',
      '-l',
      '1',
      `${SCREENSHOTS}/lumber-plan-print.pdf`,
      `${SCREENSHOTS}/lumber-plan-print`,
    ]);
    const server = await page.request.get(
      `${fx.base}/api/shop/orders/${fx.order.id}/lumber-plan.pdf`,
    );
    expect(server.headers()['content-type']).toBe('application/pdf');
    await page.close();
  });

  it('the plant manager keeps the stock lengths, prices and counts on hand', async () => {
    const page = await fx.browser.newPage();
    await page.setViewportSize({ width: 1440, height: 900 });
    await fx.signIn(page, 'admin');
    await page.getByRole('button', { name: 'Plant' }).click(); // the plant manager's settings menu
    await page.getByRole('link', { name: 'Lumber stock' }).first().click();
    await page.waitForURL(/\/stock$/);
    await expect
      .poll(() => page.getByText('Invented demo values').count(), { timeout: 30000 })
      .toBe(1);
    await page.getByLabel('2x4 12 ft on hand').fill('40');
    await page.getByRole('button', { name: 'Save stock' }).click();
    await expect.poll(() => page.getByText(/Last saved/).count(), { timeout: 30000 }).toBe(1);
    await page.screenshot({ path: `${SCREENSHOTS}/stock-settings-desktop.png`, fullPage: true });
    await page.close();
  });

  it('after the stock changed, the plan says it is out of date until the foreman re-plans', async () => {
    const page = await fx.browser.newPage();
    await page.setViewportSize(TABLET);
    await fx.signIn(page, 'foreman');
    await page.goto(`${fx.base}/shop/orders/${fx.order.id}/lumber-plan`);
    await expect
      .poll(() => page.getByText(/the stock settings changed/).count(), { timeout: 30000 })
      .toBe(1);
    await page.screenshot({ path: `${SCREENSHOTS}/lumber-plan-out-of-date-tablet.png` });
    await page.getByRole('button', { name: 'Re-plan' }).click();
    await expect
      .poll(() => page.getByText(/the stock settings changed/).count(), { timeout: 60000 })
      .toBe(0);
    await expect.poll(() => page.getByText(/^Plan made /).count(), { timeout: 60000 }).toBe(1);
    await page.close();
  });
});
