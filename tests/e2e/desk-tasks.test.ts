import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import type { Server } from 'node:http';
import { execFileSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import { testApp, testMailer } from '../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
  FINK_24,
  TEST_PASSWORD,
} from '../support/factories';
import { launchBrowser, listen, SCREENSHOTS, signInAs } from '../support/browser';
import {
  MailMessage,
  OrderLine,
  StoredFile,
  type Customer,
  type Job,
  type Order,
  type User,
} from '../../server/models';

let browser: BrowserContext;
let closeBrowser: () => Promise<void>;
let server: Server;
let base: string;
const u = {} as Record<'sales' | 'engineer' | 'foreman' | 'admin' | 'builder', User>;
let customer: Customer;
let job: Job;
let order: Order;
let released: Order;

const signIn = (page: Page, user: User) => signInAs(browser, page, base, user.email);
/** A busy machine loads lazy pages slowly: polls wait up to 20 s. */
const PATIENT = { timeout: 20_000 };

/** Print a page as the browser would (print media), keep the PDF and a PNG of its first page. */
async function printed(page: Page, name: string) {
  await page.emulateMedia({ media: 'print' });
  const pdf = await page.pdf({ format: 'Letter', printBackground: true });
  await page.emulateMedia({ media: 'screen' });
  const file = `${SCREENSHOTS}/${name}.pdf`;
  writeFileSync(file, pdf);
  execFileSync('pdftoppm', [
    '-png',
    '-r',
    '60',
    '-f',
    '1',
    '-l',
    '2',
    file,
    `${SCREENSHOTS}/${name}`,
  ]);
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
}

beforeAll(async () => {
  const plant = await createPlant({ name: 'Tasks Test Plant' });
  for (const role of ['sales', 'engineer', 'foreman', 'admin'] as const)
    u[role] = await createUser({ role, plant });
  customer = await createCustomer({ plant, name: 'Castillo & Reed Test Homes' });
  await customer.update({
    contacts: [
      { name: 'Ana Castillo', title: 'Owner', email: 'ana@castillo-reed.test', phone: null },
      { name: 'Ben Reed', title: 'Site lead', email: 'ben@castillo-reed.test', phone: null },
      { name: 'Cal Ortiz', title: 'Framer', email: null, phone: '555-0100' },
    ],
  });
  u.builder = await createUser({ role: 'builder', plant, customer });
  job = await createJob({ customer, name: 'Lot 14 — Orchard Rise' });
  order = await createOrder({ job });
  // Two designs waiting for review: a 2'-0" overhang and a 1'-0" one.
  await createLine({ order, mark: 'T1', design: { ...FINK_24, overhang: 24, spacing: 24 } });
  await createLine({ order, mark: 'T2' });
  released = await createOrder({ job });
  await createLine({ order: released, mark: 'G1', reviewState: 'approved' });
  await released.update({ status: 'released', promisedOn: '2026-12-18' });
  await StoredFile.create({
    plantId: plant.id,
    customerId: customer.id,
    jobId: job.id,
    originalName: 'orchard-rise-roof-plan-rev-c.pdf',
    storedName: `${randomUUID()}.pdf`,
    contentType: 'application/pdf',
    size: 48_213,
    uploadedBy: u.builder.id,
  });
  const app = testApp({ demo: true }, 'dist/client', await testMailer());
  ({ server, url: base } = await listen(app));
  ({ browser, close: closeBrowser } = await launchBrowser());
});

afterAll(async () => {
  await closeBrowser?.();
  server?.close();
});

describe('the desk after a day’s use, in a browser', () => {
  it('the reviewer starts from the task list, signs off with everything on one page and moves to the next line', async () => {
    const page = await browser.newPage();
    await signIn(page, u.engineer);
    const waiting = page.getByRole('list', { name: 'Designs waiting for review' });
    await expect.poll(() => waiting.getByRole('link').count(), PATIENT).toBe(2);
    await page.screenshot({ path: `${SCREENSHOTS}/home-engineer-tasks.png`, fullPage: true });
    // The whole row is one link the keyboard reaches: focus it and press Enter.
    const first = waiting.getByRole('link').first();
    await first.focus();
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/reviews\/\d+\?order=/);
    const summary = page.locator('section', { hasText: 'What you sign off on' });
    await expect.poll(() => summary.textContent(), PATIENT).toContain('Lot 14 — Orchard Rise');
    const text = (await summary.textContent()) ?? '';
    for (const fact of ['TCLL20 psf', 'TCDL10 psf', 'BCLL0 psf', 'BCDL10 psf', 'SnowNone'])
      expect(text).toContain(fact);
    expect(text).toContain(`Spacing2'-0" o.c.`);
    expect(text).toContain(`Overhangs2'-0" each end`);
    expect(text).toMatch(/Top chord2[x×]\d/);
    expect(text).toContain(`Order ${order.number}`);
    await expect
      .poll(
        () => page.getByRole('link', { name: /^Plans of Lot 14/ }).getAttribute('href'),
        PATIENT,
      )
      .toBe(`/jobs/${job.id}/files`);
    await page.waitForSelector('svg[data-testid="truss-drawing"]');
    await page.screenshot({ path: `${SCREENSHOTS}/review-sign-off.png`, fullPage: true });

    // On paper: the summary and drawing, no navigation, no buttons.
    const paper = await printed(page, 'review-print');
    expect(paper).toContain('What you sign off on');
    expect(paper).not.toContain('Approve');
    expect(paper).not.toContain('Back to the queue');

    await page.getByRole('button', { name: 'Approve' }).click();
    const outcome = page.getByTestId('decision-outcome');
    await expect.poll(() => outcome.textContent(), PATIENT).toContain('Approved T1');
    await expect
      .poll(() => outcome.getByRole('link', { name: /Next in queue: T2/ }).count(), PATIENT)
      .toBe(1);
    await page.screenshot({ path: `${SCREENSHOTS}/review-approved-next.png`, fullPage: true });
    await outcome.getByRole('link', { name: /Next in queue: T2/ }).click();
    await expect
      .poll(() => page.locator('h1').first().textContent(), PATIENT)
      .toBe('Design review: T2');
    await page.getByLabel('Comment').fill('Check the heel: raise it to 10 in for the insulation.');
    await page.getByRole('button', { name: 'Send back' }).click();
    await expect
      .poll(() => page.getByTestId('decision-outcome').textContent(), PATIENT)
      .toMatch(/Sent T2 back.*Nothing else is waiting for review/);
    await page.screenshot({
      path: `${SCREENSHOTS}/review-sent-back-none-left.png`,
      fullPage: true,
    });
    const t2 = await OrderLine.findOne({ where: { orderId: order.id, mark: 'T2' } });
    expect(t2!.reviewState).toBe('returned');
    await page.close();
  }, 240_000);

  it('sales sees the line sent back and the new plans, and the order fits a 768 px tablet', async () => {
    const page = await browser.newPage();
    await signIn(page, u.sales);
    const back = page.getByRole('list', { name: 'Sent back by the reviewer' });
    await expect.poll(() => back.textContent(), PATIENT).toContain('Fix T2');
    expect(await back.textContent()).toContain('raise it to 10 in');
    const plans = page.getByRole('list', { name: /New plans/ });
    expect(await plans.textContent()).toContain('orchard-rise-roof-plan-rev-c.pdf');
    await page.screenshot({ path: `${SCREENSHOTS}/home-sales-tasks.png`, fullPage: true });
    await back.getByRole('link').first().click();
    await page.waitForURL(new RegExp(`/orders/${order.id}/lines/\\d+$`));
    await expect.poll(() => page.locator('h1').first().textContent(), PATIENT).toBe('Truss editor');
    await page.waitForSelector('svg[data-testid="truss-drawing"]');
    const editorPaper = await printed(page, 'editor-print');
    expect(editorPaper).not.toContain('Save truss');
    // On paper the form is a fact list beside the drawing, not a page of empty-looking inputs.
    expect(editorPaper).toMatch(/Truss T\d+ — design input/);
    expect(editorPaper).toContain('TCLL');
    expect(editorPaper).not.toContain('Truss type');
    await page.goto(`${base}/orders/${order.id}`);
    await expect
      .poll(() => page.getByRole('cell', { name: 'T2' }).count(), PATIENT)
      .toBeGreaterThan(0);
    const orderPaper = await printed(page, 'order-print');
    expect(orderPaper).toContain(`Order ${order.number}`);
    expect(orderPaper).not.toContain('Add truss');
    expect(orderPaper).not.toContain('← Orders');
    expect(orderPaper).not.toContain('E-mail about this order');

    await page.setViewportSize({ width: 768, height: 1024 });
    await page.waitForTimeout(300);
    const overflow = await page.evaluate(
      () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
    );
    await page.screenshot({ path: `${SCREENSHOTS}/order-768.png`, fullPage: true });
    expect(overflow).toBe(0);
    await page.close();
  }, 240_000);

  it('the send dialog lets the desk pick the builder’s people; each gets an e-mail by name', async () => {
    const page = await browser.newPage();
    await signIn(page, u.sales);
    await page.goto(`${base}/orders/${order.id}/quotes`);
    await page.getByRole('button', { name: 'Create quote' }).click();
    await page.waitForURL(/\/quotes\/1$/);
    await page.getByRole('button', { name: 'Send to builder' }).click();
    const dialog = page.getByRole('dialog');
    await expect.poll(() => dialog.getByRole('checkbox').count(), PATIENT).toBe(3);
    // Ana (first contact) is ticked; Cal has no address so is not offered.
    expect(await dialog.getByRole('checkbox', { name: /Ana Castillo/ }).isChecked()).toBe(true);
    expect(await dialog.getByText('Cal Ortiz').count()).toBe(0);
    await dialog.getByRole('checkbox', { name: /Ana Castillo/ }).uncheck();
    await dialog.getByRole('button', { name: 'Send', exact: true }).click();
    await expect
      .poll(() => dialog.getByRole('alert').textContent(), PATIENT)
      .toBe('Choose at least one person to send the quote to');
    await dialog.getByRole('checkbox', { name: /Ana Castillo/ }).check();
    await dialog.getByRole('checkbox', { name: /Ben Reed/ }).check();
    await page.screenshot({ path: `${SCREENSHOTS}/send-quote-contacts.png` });
    await dialog.getByRole('button', { name: 'Send to 2 people' }).click();
    await expect
      .poll(
        async () =>
          (await MailMessage.findAll({ where: { orderId: order.id, kind: 'quote' } }))
            .map((m) => m.toAddress)
            .sort(),
        PATIENT,
      )
      .toEqual(['ana@castillo-reed.test', 'ben@castillo-reed.test']);
    const ana = await MailMessage.findOne({ where: { toAddress: 'ana@castillo-reed.test' } });
    expect(ana!.body).toMatch(/^Hello Ana,/);
    await page.close();
  });

  it('the foreman and the plant manager see what fits them; the builder reaches every job', async () => {
    const page = await browser.newPage();
    await signIn(page, u.foreman);
    const shop = page.getByRole('list', { name: 'Released to the shop' });
    await expect.poll(() => shop.textContent(), PATIENT).toContain(`Order ${released.number}`);
    await page.screenshot({ path: `${SCREENSHOTS}/home-foreman-tasks.png`, fullPage: true });
    await signIn(page, u.admin);
    await expect
      .poll(() => page.getByRole('list', { name: 'Released to the shop' }).count(), PATIENT)
      .toBe(1);
    await page.screenshot({ path: `${SCREENSHOTS}/home-admin-tasks.png`, fullPage: true });

    await page.setViewportSize({ width: 390, height: 844 });
    await browser.clearCookies();
    await page.goto(`${base}/sign-in`);
    await page.getByLabel('E-mail').fill(u.builder.email);
    await page.getByLabel('Password').fill(TEST_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${base}/portal`);
    const jobs = page.getByRole('list', { name: 'All your jobs' });
    await expect.poll(() => jobs.textContent(), PATIENT).toContain('Lot 14 — Orchard Rise');
    expect(await jobs.getByRole('link', { name: /Plans of Lot 14/ }).count()).toBe(1);
    await page.screenshot({ path: `${SCREENSHOTS}/portal-all-jobs-phone.png`, fullPage: true });
    await page.close();
  });
});
