import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { OrderLine } from '../../server/models';
import { SCREENSHOTS } from '../support/browser';
import { browserOrder, TABLET } from '../support/browserOrder';

// Two lines whose designs the server computed and the design reviewer approved, outside the
// review (so no plan was queued); the app runs the job queue that makes it.
const fx = browserOrder({
  plant: 'Shop Test Plant',
  customer: 'Millbrook Homes',
  job: 'Millbrook, lot 7',
  roles: ['foreman'],
  lines: [
    { mark: 'T1' },
    {
      mark: 'K1',
      design: {
        units: 'imperial',
        profile: 'kingPost',
        span: 192,
        pitch: 6,
        overhang: 12,
        loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
      },
    },
  ],
  queue: true,
});

describe('the shop floor, in a browser', () => {
  it('the foreman opens an approved order, has its plan made and prints its cut list', async () => {
    const { base, order } = fx;
    const page = await fx.browser.newPage();
    await page.setViewportSize(TABLET);
    await fx.signIn(page, 'foreman');
    await page.getByRole('link', { name: 'Ready for the shop' }).first().click();
    await page.waitForURL(`${base}/shop`);
    await page.getByRole('link', { name: order.number }).click();
    await page.waitForURL(`${base}/shop/orders/${order.id}`);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toBe(`Cut list · Order ${order.number}`);
    // No stored plan yet: said plainly, nothing computed on the spot, no exports to offer.
    await expect
      .poll(() => page.getByText('No plan has been made for this order yet.').count())
      .toBe(1);
    expect(await page.getByRole('link', { name: 'CSV' }).count()).toBe(0);
    await page.screenshot({ path: `${SCREENSHOTS}/shop-cut-list-no-plan-1024.png` });
    await page.getByRole('button', { name: 'Make the plan' }).click();
    await expect.poll(() => page.getByText(/^Plan made /).count(), { timeout: 60000 }).toBe(1);

    // The king post's top chords: a mirror pair, 2 per truss × 4 trusses.
    const tc = page.getByRole('row', { name: /K1-TC1/ });
    await expect.poll(() => tc.count()).toBe(1);
    expect(await tc.textContent()).toMatch(/8\s*\d+'-\d+/);
    expect(await page.getByRole('link', { name: 'CSV' }).getAttribute('href')).toBe(
      `/api/shop/orders/${order.id}/cut-list.csv`,
    );
    await page.screenshot({ path: `${SCREENSHOTS}/shop-cut-list-1024.png`, fullPage: false });

    // On paper: no navigation, no buttons; the table and the cautions.
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('header nav').first().isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Re-plan' }).isVisible()).toBe(false);
    const pdf = await page.pdf({ format: 'Letter', landscape: true, printBackground: true });
    const file = `${SCREENSHOTS}/shop-cut-list-print.pdf`;
    writeFileSync(file, pdf);
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
    expect(text).toContain(`Cut list · Order ${order.number}`);
    expect(text).toContain('K1-TC1');
    expect(text).not.toContain('Sign out');
    expect(text).toMatch(/No truss may be\s+cut or altered/);
    execFileSync('pdftoppm', ['-png', '-r', '60', file, `${SCREENSHOTS}/shop-cut-list-print`]);

    // The server's PDF of the stored list, kept and rendered to look at.
    const server = await page.request.get(`${base}/api/shop/orders/${order.id}/cut-list.pdf`);
    expect(server.headers()['content-type']).toBe('application/pdf');
    writeFileSync(`${SCREENSHOTS}/shop-cut-list-server.pdf`, await server.body());
    execFileSync('pdftoppm', [
      ...['-png', '-r', '60', '-f', '1', '-l', '1'],
      `${SCREENSHOTS}/shop-cut-list-server.pdf`,
      `${SCREENSHOTS}/shop-cut-list-server`,
    ]);
    await page.close();
  });

  it('after a design changed, the stored list says it is out of date until re-planned', async () => {
    const { base, order } = fx;
    await OrderLine.update({ quantity: 6 }, { where: { id: fx.lines[1]!.id } });
    const page = await fx.browser.newPage();
    await page.setViewportSize(TABLET);
    await fx.signIn(page, 'foreman');
    await page.goto(`${base}/shop/orders/${order.id}`);
    await expect
      .poll(() => page.getByText(/the order’s designs changed/).count(), { timeout: 30000 })
      .toBe(1);
    // Still the stored list: 2 × 4 king-post top chords, not 2 × 6.
    expect(await page.getByRole('row', { name: /K1-TC1/ }).textContent()).toMatch(/8\s*\d+'-/);
    await page.screenshot({ path: `${SCREENSHOTS}/shop-cut-list-out-of-date-1024.png` });
    await page.getByRole('button', { name: 'Re-plan' }).click();
    await expect
      .poll(() => page.getByText(/the order’s designs changed/).count(), { timeout: 60000 })
      .toBe(0);
    await expect
      .poll(() => page.getByRole('row', { name: /K1-TC1/ }).textContent(), { timeout: 30000 })
      .toMatch(/12\s*\d+'-/);
    await page.close();
  });
});
