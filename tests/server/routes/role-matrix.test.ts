import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
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
