/**
 * The fixture of the shop's (and the desk's) browser tests: a plant with its people, a builder
 * with a job, an order of approved truss lines, the app serving the built client on a loopback
 * port, and Debian's Chromium. Call `browserOrder` at the top of a test file: it registers the
 * `beforeAll`/`afterAll` that build and tear it down and returns the object they fill in.
 */
import type { Server } from 'node:http';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import type { Role } from '../../shared/api/roles';
import type { Customer, Job, Order, OrderLine, Plant, User } from '../../server/models';
import { launchBrowser, listen, signInAs } from './browser';
import { testApp, testMailer } from './db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createShopPlan,
  createUser,
} from './factories';

/** The shop floor's tablet. */
export const TABLET = { width: 1024, height: 768 };

/** One approved line of the order (`createLine`'s design by default: a 24 ft Fink). */
export interface FixtureLine {
  mark: string;
  quantity?: number;
  plies?: number;
  design?: object;
}

export interface BrowserOrderOptions {
  plant: string;
  customer: string;
  /** The customer's payment terms (`deposit` for a builder without an account). */
  terms?: 'deposit' | 'account';
  job: string;
  /** The plant's people signed in by the tests. */
  roles: Role[];
  lines: FixtureLine[];
  /** The invented demo stock and price book. */
  demo?: boolean;
  /** Run the job queue (mail, shop plans) inside the app. */
  queue?: boolean;
  /** Store the order's shop plan (cut list and lumber plan) before the tests, as the job would. */
  planned?: boolean;
}

export interface BrowserOrder {
  base: string;
  browser: BrowserContext;
  plant: Plant;
  customer: Customer;
  job: Job;
  order: Order;
  lines: OrderLine[];
  users: Record<Role, User>;
  /** Sign `page` in as the fixture's person of `role` (starting signed out). */
  signIn: (page: Page, role: Role) => Promise<void>;
}

export function browserOrder(options: BrowserOrderOptions): BrowserOrder {
  const fx = { users: {}, lines: [] } as unknown as BrowserOrder;
  let server: Server | undefined;
  let closeBrowser: (() => Promise<void>) | undefined;
  let app: ReturnType<typeof testApp> | undefined;

  beforeAll(async () => {
    fx.plant = await createPlant({ name: options.plant });
    fx.customer = await createCustomer({
      plant: fx.plant,
      name: options.customer,
      ...(options.terms && { terms: options.terms }),
    });
    for (const role of options.roles) {
      fx.users[role] = await createUser({
        role,
        plant: fx.plant,
        ...(role === 'builder' && { customer: fx.customer }),
      });
    }
    fx.job = await createJob({ customer: fx.customer, name: options.job });
    fx.order = await createOrder({ job: fx.job });
    for (const l of options.lines) {
      fx.lines.push(await createLine({ order: fx.order, reviewState: 'approved', ...l }));
    }
    if (options.planned) await createShopPlan(fx.order);
    app = testApp(
      { demo: options.demo ?? false },
      'dist/client',
      options.queue ? await testMailer() : undefined,
    );
    ({ server, url: fx.base } = await listen(app));
    ({ browser: fx.browser, close: closeBrowser } = await launchBrowser());
    fx.signIn = (page, role) => signInAs(fx.browser, page, fx.base, fx.users[role].email);
  });

  afterAll(async () => {
    await closeBrowser?.();
    server?.close();
    await (app?.locals.close as (() => Promise<void>) | undefined)?.();
  });

  return fx;
}
