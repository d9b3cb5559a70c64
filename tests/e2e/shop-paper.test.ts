import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { SCREENSHOTS } from '../support/browser';
import { browserOrder, TABLET } from '../support/browserOrder';

/** Keep a PDF under test-results/e2e and render its first page to PNG (pdftoppm) to look at. */
function keepPdf(name: string, pdf: Buffer) {
  writeFileSync(`${SCREENSHOTS}/${name}.pdf`, pdf);
  execFileSync('pdftoppm', [
    '-png',
    '-r',
    '80',
    '-f',
    '1',
    '-l',
    '1',
    '-singlefile',
    `${SCREENSHOTS}/${name}.pdf`,
    `${SCREENSHOTS}/${name}`,
  ]);
}

const fx = browserOrder({
  plant: 'Shop Paper Test Plant',
  customer: 'Alder Creek Homes',
  job: 'Alder Creek, lot 9',
  roles: ['foreman'],
  lines: [{ mark: 'T1' }, { mark: 'G1', quantity: 2, plies: 2 }],
  demo: true,
});

describe('shop paper, in a browser on a tablet', () => {
  it('the foreman prints the tags and a shop drawing', async () => {
    const { base, order } = fx;
    const page = await fx.browser.newPage();
    await page.setViewportSize(TABLET);
    await fx.signIn(page, 'foreman');
    await page.goto(`${base}/orders/${order.id}`);
    await page.getByRole('link', { name: 'Shop paper' }).click();
    await expect
      .poll(() => page.locator('h1').first().textContent())
      .toBe(`Shop paper · Order ${order.number}`);
    await page.getByText(/^Pick from the rack — \d+ plates$/).waitFor();
    await page.screenshot({ path: `${SCREENSHOTS}/shop-paper-tablet.png`, fullPage: true });

    // The tag sheet opens as a PDF in the same session.
    const href = await page
      .getByRole('link', { name: 'Truss tags — label sheet (4 × 2 in)' })
      .getAttribute('href');
    const tags = await page.request.get(`${base}${href}`);
    expect(tags.status()).toBe(200);
    expect(tags.headers()['content-type']).toBe('application/pdf');
    keepPdf('shop-tags-sheet', await tags.body());

    await page.getByRole('link', { name: 'Shop drawing T1' }).click();
    await page.getByTestId('shop-drawing').waitFor();
    await expect.poll(() => page.locator('h1').first().textContent()).toMatch(/^T1 /);
    await page.getByRole('button', { name: 'Print shop drawing' }).waitFor();
    await page.screenshot({ path: `${SCREENSHOTS}/shop-drawing-tablet.png`, fullPage: true });
    // Readable on a tablet: nothing wider than the screen.
    const scrollWidth = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(scrollWidth).toBeLessThanOrEqual(TABLET.width);

    // Printed: the print stylesheet drops the app's header and the buttons.
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('body > div header').first().isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print shop drawing' }).isVisible()).toBe(false);
    keepPdf('shop-drawing-printed', await page.pdf({ format: 'Letter', printBackground: true }));
    await page.emulateMedia({ media: 'screen' });

    // The PDF of the same sheet.
    const pdfHref = await page.getByRole('link', { name: 'PDF' }).getAttribute('href');
    const sheet = await page.request.get(`${base}${pdfHref}`);
    expect(sheet.headers()['content-type']).toBe('application/pdf');
    keepPdf('shop-drawing-sheet', await sheet.body());
    await page.close();
  });

  it('a tag’s QR address opens that truss’s shop drawing', async () => {
    const { base, order } = fx;
    const t1 = fx.lines[0]!;
    const page = await fx.browser.newPage();
    await page.setViewportSize(TABLET);
    await fx.signIn(page, 'foreman');
    await page.goto(`${base}/orders/${order.id}/shop-paper/lines/${t1.id}?truss=3`);
    await page.getByText(/truss 3 of 4/).waitFor();
    await page.getByTestId('shop-drawing').waitFor();
    await page.close();
  });
});
