import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createShopPlan,
  createUser,
} from '../../support/factories';
import { signedIn } from '../../support/session';
import type { Role } from '../../../shared/api/roles';
import type { Customer, Job, Order, Plant, User } from '../../../server/models';

const app = testApp();
const ROLES: Role[] = ['admin', 'sales', 'engineer', 'foreman', 'builder'];

let plant: Plant;
let customer: Customer;
let job: Job;
let colleague: User;
let approved: Order;
const users = {} as Record<Role, User>;

beforeAll(async () => {
  plant = await createPlant();
  customer = await createCustomer({ plant });
  job = await createJob({ customer });
  colleague = await createUser({ role: 'foreman', plant });
  for (const role of ROLES) users[role] = await createUser({ role, plant, customer });
  approved = await createOrder({ job });
  await createLine({ order: approved, reviewState: 'approved' });
  await createShopPlan(approved);
});

// Shop paper: an order of `customer` whose designs are all approved.
let shopOrder: Order;
beforeAll(async () => {
  shopOrder = await createOrder({ job });
  await createLine({ order: shopOrder, reviewState: 'approved' });
});

type Call = { name: string; run: (s: Awaited<ReturnType<typeof signedIn>>) => request.Test };
const routes: Record<string, Call> = {
  'GET /api/users': { name: 'users.list', run: (s) => s.get('/api/users') },
  'POST /api/users': {
    name: 'users.create',
    run: (s) =>
      s.post('/api/users', {
        email: `new-${Math.random()}@example.test`,
        name: 'New Person',
        role: 'foreman',
        password: 'a-long-password',
      }),
  },
  'PATCH /api/users/:id': {
    name: 'users.update',
    run: (s) => s.patch(`/api/users/${colleague.id}`, { name: 'Renamed' }),
  },
  'GET /api/customers': { name: 'customers.list', run: (s) => s.get('/api/customers') },
  'GET /api/customers/:id': {
    name: 'customers.show',
    run: (s) => s.get(`/api/customers/${customer.id}`),
  },
  'GET /api/jobs': { name: 'jobs.list', run: (s) => s.get('/api/jobs') },
  'GET /api/jobs/:id': { name: 'jobs.show', run: (s) => s.get(`/api/jobs/${job.id}`) },
  'GET /api/plant': { name: 'plant', run: (s) => s.get('/api/plant') },
  'GET /api/stock': { name: 'stock.show', run: (s) => s.get('/api/stock') },
  'GET /api/plant/design-rules': {
    name: 'designRules.show',
    run: (s) => s.get('/api/plant/design-rules'),
  },
  'GET /api/shop/orders/:id/lumber-plan': {
    name: 'lumberPlan.show',
    run: (s) => s.get(`/api/shop/orders/${approved.id}/lumber-plan`),
  },
  'POST /api/shop/orders/:id/lumber-plan/replan': {
    name: 'lumberPlan.replan',
    run: (s) => s.post(`/api/shop/orders/${approved.id}/lumber-plan/replan`),
  },
  'GET /api/shop/orders': { name: 'shop.list', run: (s) => s.get('/api/shop/orders') },
  'GET /api/shop/orders/:id/cut-list': {
    name: 'shop.cutList',
    run: (s) => s.get(`/api/shop/orders/${approved.id}/cut-list`),
  },
  'GET /api/shop/orders/:id/cut-list.csv': {
    name: 'shop.cutListCsv',
    run: (s) => s.get(`/api/shop/orders/${approved.id}/cut-list.csv`),
  },
  'POST /api/shop/orders/:id/cut-list/replan': {
    name: 'shop.replan',
    run: (s) => s.post(`/api/shop/orders/${approved.id}/cut-list/replan`),
  },
  'GET /api/orders/:id/shop-paper/plates': {
    name: 'shopPaper.plates',
    run: (s) => s.get(`/api/orders/${shopOrder.id}/shop-paper/plates`),
  },
  'GET /api/orders/:id/shop-paper/tags': {
    name: 'shopPaper.tags',
    run: (s) => s.get(`/api/orders/${shopOrder.id}/shop-paper/tags`),
  },
  'GET /api/orders/:id/shop-paper/delivery': {
    name: 'shopPaper.delivery',
    run: (s) => s.get(`/api/orders/${shopOrder.id}/shop-paper/delivery`),
  },
};

// Expected status per route group and role (the builder belongs to `customer`).
const expected: Record<string, Record<Role, number>> = {
  'GET /api/users': { admin: 200, sales: 403, engineer: 403, foreman: 403, builder: 403 },
  'POST /api/users': { admin: 201, sales: 403, engineer: 403, foreman: 403, builder: 403 },
  'PATCH /api/users/:id': { admin: 200, sales: 403, engineer: 403, foreman: 403, builder: 403 },
  'GET /api/customers': { admin: 200, sales: 200, engineer: 403, foreman: 403, builder: 403 },
  'GET /api/customers/:id': { admin: 200, sales: 200, engineer: 403, foreman: 403, builder: 200 },
  'GET /api/jobs': { admin: 200, sales: 200, engineer: 200, foreman: 200, builder: 200 },
  'GET /api/jobs/:id': { admin: 200, sales: 200, engineer: 200, foreman: 200, builder: 200 },
  'GET /api/plant': { admin: 200, sales: 200, engineer: 200, foreman: 200, builder: 200 },
  'GET /api/stock': { admin: 200, sales: 200, engineer: 403, foreman: 200, builder: 403 },
  'GET /api/plant/design-rules': {
    admin: 200,
    sales: 200,
    engineer: 200,
    foreman: 200,
    builder: 403,
  },
  'GET /api/shop/orders/:id/lumber-plan': {
    admin: 200,
    sales: 200,
    engineer: 403,
    foreman: 200,
    builder: 403,
  },
  'POST /api/shop/orders/:id/lumber-plan/replan': {
    admin: 202,
    sales: 202,
    engineer: 403,
    foreman: 202,
    builder: 403,
  },
  'GET /api/shop/orders': { admin: 200, sales: 200, engineer: 403, foreman: 200, builder: 403 },
  'GET /api/shop/orders/:id/cut-list': {
    admin: 200,
    sales: 200,
    engineer: 403,
    foreman: 200,
    builder: 403,
  },
  'GET /api/shop/orders/:id/cut-list.csv': {
    admin: 200,
    sales: 200,
    engineer: 403,
    foreman: 200,
    builder: 403,
  },
  'POST /api/shop/orders/:id/cut-list/replan': {
    admin: 202,
    sales: 202,
    engineer: 403,
    foreman: 202,
    builder: 403,
  },
  'GET /api/orders/:id/shop-paper/plates': {
    admin: 200,
    sales: 200,
    engineer: 403,
    foreman: 200,
    builder: 403,
  },
  'GET /api/orders/:id/shop-paper/tags': {
    admin: 200,
    sales: 200,
    engineer: 403,
    foreman: 200,
    builder: 403,
  },
  'GET /api/orders/:id/shop-paper/delivery': {
    admin: 200,
    sales: 200,
    engineer: 403,
    foreman: 200,
    builder: 403,
  },
};

describe('role matrix', () => {
  for (const [route, byRole] of Object.entries(expected)) {
    for (const role of ROLES) {
      it(`${role} → ${route} → ${byRole[role]}`, async () => {
        const s = await signedIn(app, users[role].email);
        const res = await routes[route].run(s);
        expect(res.status, JSON.stringify(res.body)).toBe(byRole[role]);
        if (res.status === 403) expect(res.body.error.code).toBe('forbidden');
      });
    }
  }

  it('signed out, every route answers 401', async () => {
    for (const path of [
      '/api/users',
      '/api/customers',
      `/api/customers/${customer.id}`,
      '/api/jobs',
      `/api/jobs/${job.id}`,
      '/api/plant',
      '/api/auth/me',
      '/api/shop/orders',
      `/api/shop/orders/${approved.id}/cut-list`,
    ]) {
      const res = await request(app).get(path);
      expect(res.status, path).toBe(401);
    }
  });
});

// The builder, route group by route group: their own company's records through the portal's
// routes, another company's (same plant) answering 404 as if it did not exist, and the desk's,
// shop's and production's routes refused: 403 on their own order, 404 on another company's (the
// record is loaded within the builder's scope before the role is checked). Bodies are valid, so
// what answers is the authorization, not validation (which runs first).
describe('role matrix: the builder, every route group', () => {
  type Session = Awaited<ReturnType<typeof signedIn>>;
  type World = { order: Order; job: Job; customer: Customer; lineId: number };
  let s: Session;
  let own: World;
  let other: World;

  beforeAll(async () => {
    const { sentQuoteWorld, useTestBook } = await import('./portal/helpers');
    const { OrderLine } = await import('../../../server/models');
    const p = await createPlant();
    await useTestBook(p);
    const mine = await sentQuoteWorld(p);
    const theirs = await sentQuoteWorld(p);
    const world = async (w: typeof mine) => ({
      order: w.order,
      customer: w.customer,
      job: { id: w.order.jobId } as Job,
      lineId: (await OrderLine.findOne({ where: { orderId: w.order.id } }))!.id,
    });
    own = await world(mine);
    other = await world(theirs);
    s = await signedIn(app, mine.builder.email);
  });

  const row = (
    group: string,
    call: string,
    run: (s: Session, w: World) => request.Test,
    mine: number,
    theirs: number,
  ) => ({ group, call, run, mine, theirs });

  const rows = [
    // The portal and what a builder reads of their own records.
    row('portal', 'GET /api/portal/home', (s) => s.get('/api/portal/home'), 200, 200),
    row('orders', 'GET /api/orders/:id', (s, w) => s.get(`/api/orders/${w.order.id}`), 200, 404),
    row(
      'quotes',
      'GET /api/orders/:id/quotes',
      (s, w) => s.get(`/api/orders/${w.order.id}/quotes`),
      200,
      404,
    ),
    row(
      'quotes',
      'GET /api/orders/:id/quotes/1',
      (s, w) => s.get(`/api/orders/${w.order.id}/quotes/1`),
      200,
      404,
    ),
    row(
      'quotes',
      'GET /api/orders/:id/quotes/1/pdf',
      (s, w) => s.get(`/api/orders/${w.order.id}/quotes/1/pdf`),
      200,
      404,
    ),
    row(
      'portal',
      'POST /api/orders/:id/quotes/1/changes',
      (s, w) =>
        s.post(`/api/orders/${w.order.id}/quotes/1/changes`, {
          message: 'Move the girder to grid C',
        }),
      201,
      404,
    ),
    row('jobs', 'GET /api/jobs/:id', (s, w) => s.get(`/api/jobs/${w.job.id}`), 200, 404),
    row(
      'files',
      'GET /api/jobs/:id/files',
      (s, w) => s.get(`/api/jobs/${w.job.id}/files`),
      200,
      404,
    ),
    row(
      'customers',
      'GET /api/customers/:id',
      (s, w) => s.get(`/api/customers/${w.customer.id}`),
      200,
      404,
    ),
    // The desk's routes.
    row('users', 'GET /api/users', (s) => s.get('/api/users'), 403, 403),
    row('customers', 'GET /api/customers', (s) => s.get('/api/customers'), 403, 403),
    row('price book', 'GET /api/price-book', (s) => s.get('/api/price-book'), 403, 403),
    row('reviews', 'GET /api/reviews', (s) => s.get('/api/reviews'), 403, 403),
    row(
      'orders',
      'POST /api/orders/:id/lines/:lineId/copy',
      (s, w) => s.post(`/api/orders/${w.order.id}/lines/${w.lineId}/copy`),
      403,
      404,
    ),
    row(
      'quotes',
      'POST /api/orders/:id/quotes',
      (s, w) => s.post(`/api/orders/${w.order.id}/quotes`),
      403,
      404,
    ),
    row(
      'quotes',
      'POST /api/orders/:id/quotes/1/send',
      (s, w) => s.post(`/api/orders/${w.order.id}/quotes/1/send`),
      403,
      404,
    ),
    row(
      'payments',
      'GET /api/orders/:id/mail',
      (s, w) => s.get(`/api/orders/${w.order.id}/mail`),
      403,
      404,
    ),
    row(
      'payments',
      'POST /api/orders/:id/payments',
      (s, w) =>
        s.post(`/api/orders/${w.order.id}/payments`, {
          amount: 10,
          method: 'cheque',
          reference: 'Chq 1',
          version: 1,
        }),
      403,
      404,
    ),
    row(
      'payments',
      'POST /api/orders/:id/cancel',
      (s, w) => s.post(`/api/orders/${w.order.id}/cancel`, { reason: 'No longer needed' }),
      403,
      404,
    ),
    row('dev', 'GET /api/dev/mail', (s) => s.get('/api/dev/mail'), 403, 403),
    // The shop's routes.
    row('stock', 'GET /api/stock', (s) => s.get('/api/stock'), 403, 403),
    row('shop', 'GET /api/shop/orders', (s) => s.get('/api/shop/orders'), 403, 403),
    row(
      'shop',
      'GET /api/shop/orders/:id/cut-list',
      (s, w) => s.get(`/api/shop/orders/${w.order.id}/cut-list`),
      403,
      404,
    ),
    row(
      'lumber plan',
      'GET /api/shop/orders/:id/lumber-plan',
      (s, w) => s.get(`/api/shop/orders/${w.order.id}/lumber-plan`),
      403,
      404,
    ),
    row(
      'shop paper',
      'GET /api/orders/:id/shop-paper/tags',
      (s, w) => s.get(`/api/orders/${w.order.id}/shop-paper/tags`),
      403,
      404,
    ),
    // Production's routes.
    row(
      'production',
      'GET /api/production/settings',
      (s) => s.get('/api/production/settings'),
      403,
      403,
    ),
    row('production', 'GET /api/schedule', (s) => s.get('/api/schedule'), 403, 403),
    row('floor', 'GET /api/floor/today', (s) => s.get('/api/floor/today'), 403, 403),
    row(
      'order production',
      'POST /api/orders/:id/release',
      (s, w) =>
        s.post(`/api/orders/${w.order.id}/release`, { reason: 'Site is ready', version: 1 }),
      403,
      404,
    ),
    row(
      'order production',
      'POST /api/orders/:id/hold',
      (s, w) =>
        s.post(`/api/orders/${w.order.id}/hold`, {
          onHold: true,
          reason: 'Site not ready',
          version: 1,
        }),
      403,
      404,
    ),
  ];

  for (const r of rows) {
    it(`builder → ${r.call} (${r.group}): own company ${r.mine}, another company ${r.theirs}`, async () => {
      const mine = await r.run(s, own);
      expect(mine.status, JSON.stringify(mine.body)).toBe(r.mine);
      const theirs = await r.run(s, other);
      expect(theirs.status, JSON.stringify(theirs.body)).toBe(r.theirs);
      if (theirs.status === 404)
        expect(JSON.stringify(theirs.body)).not.toContain(other.customer.name);
      for (const res of [mine, theirs])
        if (res.status === 403) expect(res.body.error.code).toBe('forbidden');
    });
  }
});
