import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { existsSync, writeFileSync } from 'node:fs';
import { SCREENSHOTS } from '../support/browser';
import { browserOrder } from '../support/browserOrder';
import { Quote } from '../../server/models';

// Two lines whose designs the server computed and an engineer approved.
const fx = browserOrder({
  plant: 'Quotes Test Plant',
  customer: 'Harrow Field Homes',
  terms: 'deposit',
  job: 'Harrow Field, lot 2',
  roles: ['sales', 'admin'],
  lines: [
    { mark: 'T1' },
    {
      mark: 'T2',
      design: {
        units: 'imperial',
        profile: 'kingPost',
        span: 120,
        pitch: 6,
        overhang: 12,
        loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
      },
    },
  ],
  demo: true,
  queue: true,
});

describe('quotes, e-mail and plans, in a browser', () => {
  it('sales creates and sends the quote; the plant manager finds it in the demo inbox', async () => {
    const { base, order } = fx;
    const page = await fx.browser.newPage();
    await fx.signIn(page, 'sales');
    await page.goto(`${base}/orders/${order.id}`);
    await page.getByRole('link', { name: 'Quotes' }).click();
    await expect.poll(() => page.locator('h1').first().textContent()).toMatch(/^Quotes for order /);
    await page.getByRole('button', { name: 'Create quote' }).click();
    await page.waitForURL(/\/quotes\/1$/);
    await page.screenshot({ path: `${SCREENSHOTS}/quote-page.png`, fullPage: true });
    await page.getByRole('button', { name: 'Send to builder' }).click();
    await page.getByRole('button', { name: 'Send', exact: true }).click();
    const quote = await Quote.findOne({ where: { orderId: order.id, number: 1 } });
    await expect.poll(async () => (await quote!.reload()).sentTo).toBeTruthy();

    // The PDF the builder receives: kept and rendered for a person to look at.
    const pdf = await page.request.get(`${base}/api/orders/${order.id}/quotes/1/pdf`);
    expect(pdf.headers()['content-type']).toContain('application/pdf');
    writeFileSync(`${SCREENSHOTS}/quote.pdf`, await pdf.body());
    if (existsSync('/usr/bin/pdftoppm')) {
      execFileSync('pdftoppm', [
        '-png',
        '-r',
        '70',
        `${SCREENSHOTS}/quote.pdf`,
        `${SCREENSHOTS}/quote-pdf`,
      ]);
    }

    await fx.signIn(page, 'admin');
    await page.goto(`${base}/inbox`);
    await expect.poll(() => page.locator('h1').first().textContent()).toBe('Demo inbox');
    const subject = `Truss quote ${quote!.reference}`;
    await expect.poll(() => page.getByText(subject, { exact: false }).count()).toBeGreaterThan(0);
    await page.screenshot({ path: `${SCREENSHOTS}/demo-inbox.png`, fullPage: true });
    await page.close();
  });

  it('sales uploads a builder’s plan to the job and sees the progress bar', async () => {
    const { base, job } = fx;
    const page = await fx.browser.newPage();
    await fx.signIn(page, 'sales');
    await page.goto(`${base}/jobs/${job.id}`);
    await page.getByRole('link', { name: 'Plans' }).click();
    await expect.poll(() => page.locator('h1').first().textContent()).toMatch(/^Plans for /);
    // A 3 MB PDF sent at 1 MB/s (throttled through the DevTools protocol) so progress is visible.
    const body = Buffer.concat([
      Buffer.from('%PDF-1.4\n'),
      Buffer.alloc(3 * 1024 * 1024, 0x20),
      Buffer.from('\n%%EOF\n'),
    ]);
    const cdp = await fx.browser.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 5,
      downloadThroughput: -1,
      uploadThroughput: 1024 * 1024,
    });
    await page
      .getByLabel('Plan file')
      .setInputFiles({ name: 'harrow-field-lot2.pdf', mimeType: 'application/pdf', buffer: body });
    await page.getByRole('button', { name: 'Upload', exact: true }).click();
    const bar = page.getByRole('progressbar');
    await bar.waitFor({ state: 'visible', timeout: 10000 });
    await expect
      .poll(async () => Number(await bar.getAttribute('aria-valuenow')), { timeout: 10000 })
      .toBeGreaterThan(0);
    await page.screenshot({ path: `${SCREENSHOTS}/plan-upload-progress.png` });
    await expect
      .poll(() => page.getByText('harrow-field-lot2.pdf').count(), { timeout: 20000 })
      .toBeGreaterThan(0);
    await bar.waitFor({ state: 'detached', timeout: 20000 });
    await page.screenshot({ path: `${SCREENSHOTS}/plan-uploaded.png` });
    await page.close();
  });
});
