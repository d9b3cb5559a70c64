import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import {
  createCustomer,
  createJob,
  createOrder,
  createPlant,
  createUser,
} from '../support/factories';
import { SCREENSHOTS, signInAs } from '../support/browser';
import { servedBrowser } from '../support/servedBrowser';
import type { Plant, User } from '../../server/models';

const web = servedBrowser({ mail: true });
let plant: Plant;
let sales: User;

const signIn = (page: Page, user: User) => signInAs(web.browser, page, web.base, user.email);

beforeAll(async () => {
  plant = await createPlant({ name: 'Desk Day Test Plant' });
  sales = await createUser({ role: 'sales', plant });
});

describe('the desk after a day’s use, in a browser', () => {
  it('asks before creating a builder twice', async () => {
    await createCustomer({ plant, name: 'Birchwood Homes' });
    const page = await web.browser.newPage();
    await signIn(page, sales);
    await page.goto(`${web.base}/builders`);
    await page.getByRole('button', { name: 'New builder' }).click();
    await page.getByLabel('Company name').fill('birchwood homes');
    await page.getByLabel('E-mail', { exact: true }).fill('new@birchwood.test');
    await page.getByRole('button', { name: 'Save builder' }).click();
    await expect.poll(() => page.getByText('This builder may already exist').count()).toBe(1);
    await page.screenshot({ path: `${SCREENSHOTS}/desk-duplicate-builder.png` });
    await page.getByRole('button', { name: 'Create anyway' }).click();
    await page.waitForURL(/\/builders\/\d+$/);
    await page.close();
  });

  it('compares profiles, guards unsaved edits, confirms a save, and redesigns old-load lines', async () => {
    const job = await createJob({ plant, name: 'Lot 4 — Fernhill' });
    const order = await createOrder({ job });
    const page = await web.browser.newPage();
    await page.setViewportSize({ width: 1440, height: 1000 });
    await signIn(page, sales);
    await page.goto(`${web.base}/orders/${order.id}/lines/new`);
    await page.getByLabel('Mark', { exact: true }).fill('T1');
    await page.getByLabel('Span', { exact: true }).fill(`28'`);
    await page.getByRole('button', { name: 'Compare every profile' }).click();
    const table = page.getByTestId('profile-comparison');
    await expect.poll(() => table.locator('tbody tr').count(), { timeout: 20_000 }).toBe(8);
    await table.scrollIntoViewIfNeeded();
    await page.screenshot({ path: `${SCREENSHOTS}/desk-compare-profiles.png`, fullPage: true });
    await page.getByRole('button', { name: 'Use Howe' }).click();
    await expect
      .poll(() => table.locator('tr', { hasText: 'Current' }).textContent())
      .toMatch(/Howe/);

    // Leaving with unsaved edits asks first.
    await page.getByRole('link', { name: 'Back to the order' }).click();
    await expect.poll(() => page.getByText('Leave without saving?').count()).toBe(1);
    await page.getByRole('button', { name: 'Keep editing' }).click();
    expect(page.url()).toContain('/lines/new');

    await page.getByRole('button', { name: 'Save truss' }).click();
    await page.waitForURL(new RegExp(`/orders/${order.id}$`));
    await expect.poll(() => page.getByText(/^Saved T1: Howe/).count()).toBe(1);

    // The job's loads change: the line is flagged, and one click redesigns it.
    await page.goto(`${web.base}/jobs/${job.id}`);
    const csrf = await page.evaluate(async () => {
      const r = await fetch('/api/auth/csrf');
      return ((await r.json()) as { token: string }).token;
    });
    const status = await page.evaluate(
      async ([id, token]) =>
        (
          await fetch(`/api/jobs/${id}`, {
            method: 'PATCH',
            headers: { 'content-type': 'application/json', 'x-csrf-token': token },
            body: JSON.stringify({ criteria: { loads: { tcll: 30 } } }),
          })
        ).status,
      [job.id, csrf] as const,
    );
    expect(status).toBe(200);
    await page.goto(`${web.base}/orders/${order.id}`);
    await expect.poll(() => page.getByText('Designed with old loads: T1').count()).toBe(1);
    await page.screenshot({ path: `${SCREENSHOTS}/desk-old-loads.png`, fullPage: true });
    await page.getByRole('button', { name: 'Redesign T1' }).click();
    await expect.poll(() => page.getByText('Designed with old loads: T1').count()).toBe(0);
    await page.close();
  });
});
