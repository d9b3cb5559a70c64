import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
  FINK_24,
} from '../../../support/factories';
import { signedIn } from '../../../support/session';
import type { Role } from '../../../../shared/api/roles';
import {
  Order,
  type Customer,
  type Job,
  type OrderLine,
  type User,
} from '../../../../server/models';

const app = testApp();
const ROLES: Role[] = ['admin', 'sales', 'engineer', 'foreman', 'builder'];
type S = Awaited<ReturnType<typeof signedIn>>;

// Ours: the plant and builder company of every user below. Theirs: another plant; Other: another company of ours.
let ours: { customer: Customer; job: Job; order: Order; line: OrderLine };
let other: { customer: Customer; job: Job; order: Order; line: OrderLine };
let theirs: { customer: Customer; job: Job; order: Order; line: OrderLine };
const users = {} as Record<Role, User>;

async function world(plant?: Awaited<ReturnType<typeof createPlant>>) {
  const customer = await createCustomer({ plant });
  const job = await createJob({ customer });
  const order = await createOrder({ job });
  const line = await createLine({ order });
  return { customer, job, order, line };
}

beforeAll(async () => {
  const plant = await createPlant();
  ours = await world(plant);
  other = await world(plant);
  theirs = await world();
  for (const role of ROLES)
    users[role] = await createUser({ role, plant, customer: ours.customer });
});

type W = typeof ours;
// Each call is made fresh per role (creates use new data so they can succeed).
const calls: Record<string, (s: S, w: W) => request.Test> = {
  // Each call a new company: the same name or e-mail twice asks first (409 possible_duplicate).
  'POST /api/customers': (s) => {
    const n = Math.random().toString(36).slice(2, 10);
    return s.post('/api/customers', {
      name: `New Co ${n}`,
      email: `new-${n}@co.test`,
      terms: 'deposit',
    });
  },
  'PATCH /api/customers/:id': (s, w) =>
    s.patch(`/api/customers/${w.customer.id}`, { phone: '555-0101' }),
  'POST /api/customers/:id/jobs': (s, w) =>
    s.post(`/api/customers/${w.customer.id}/jobs`, { name: 'J', address: 'A' }),
  'PATCH /api/jobs/:id': (s, w) => s.patch(`/api/jobs/${w.job.id}`, { planRevision: 'Rev Z' }),
  'GET /api/orders': (s) => s.get('/api/orders'),
  'POST /api/orders': (s, w) => s.post('/api/orders', { jobId: w.job.id }),
  'GET /api/orders/:id': (s, w) => s.get(`/api/orders/${w.order.id}`),
  'POST /api/orders/:id/lines': (s, w) =>
    s.post(`/api/orders/${w.order.id}/lines`, {
      mark: `N${Math.random().toString(36).slice(2, 8)}`, // marks are unique within an order
      quantity: 1,
      design: FINK_24,
    }),
  'GET /api/orders/:id/lines/:lineId': (s, w) =>
    s.get(`/api/orders/${w.order.id}/lines/${w.line.id}`),
  'PATCH /api/orders/:id/lines/:lineId': (s, w) =>
    s.patch(`/api/orders/${w.order.id}/lines/${w.line.id}`, { quantity: 2 }),
  'POST /api/orders/:id/lines/:lineId/copy': (s, w) =>
    s.post(`/api/orders/${w.order.id}/lines/${w.line.id}/copy`),
  'POST /api/orders/:id/lines/:lineId/review': (s, w) =>
    s.post(`/api/orders/${w.order.id}/lines/${w.line.id}/review`, {
      decision: 'return',
      comment: 'Check it',
      designVersion: w.line.designVersion,
    }),
  'DELETE /api/orders/:id/lines/:lineId': (s, w) =>
    s.delete(`/api/orders/${w.order.id}/lines/${w.line.id}`),
  'POST /api/orders/:id/lines/reorder': (s, w) =>
    s.post(`/api/orders/${w.order.id}/lines/reorder`, { lineIds: [w.line.id] }),
  'GET /api/reviews': (s) => s.get('/api/reviews'),
  'POST /api/designs/preview': (s) => s.post('/api/designs/preview', FINK_24),
};

const ok = (n: number) => ({ admin: n, sales: n });
const expected: Record<string, Record<Role, number>> = {
  'POST /api/customers': { ...ok(201), engineer: 403, foreman: 403, builder: 403 },
  'PATCH /api/customers/:id': { ...ok(200), engineer: 403, foreman: 403, builder: 403 },
  'POST /api/customers/:id/jobs': { ...ok(201), engineer: 403, foreman: 403, builder: 403 },
  'PATCH /api/jobs/:id': { ...ok(200), engineer: 403, foreman: 403, builder: 403 },
  'GET /api/orders': { ...ok(200), engineer: 200, foreman: 200, builder: 200 },
  'POST /api/orders': { ...ok(201), engineer: 403, foreman: 403, builder: 403 },
  'GET /api/orders/:id': { ...ok(200), engineer: 200, foreman: 200, builder: 200 },
  'POST /api/orders/:id/lines': { ...ok(201), engineer: 403, foreman: 403, builder: 403 },
  'GET /api/orders/:id/lines/:lineId': { ...ok(200), engineer: 200, foreman: 200, builder: 200 },
  'PATCH /api/orders/:id/lines/:lineId': { ...ok(200), engineer: 403, foreman: 403, builder: 403 },
  'POST /api/orders/:id/lines/:lineId/copy': {
    ...ok(201),
    engineer: 403,
    foreman: 403,
    builder: 403,
  },
  'POST /api/orders/:id/lines/:lineId/review': {
    admin: 403,
    sales: 403,
    engineer: 200,
    foreman: 403,
    builder: 403,
  },
  'DELETE /api/orders/:id/lines/:lineId': {
    ...ok(204),
    engineer: 403,
    foreman: 403,
    builder: 403,
  },
  'POST /api/orders/:id/lines/reorder': {
    ...ok(200),
    engineer: 403,
    foreman: 403,
    builder: 403,
  },
  'GET /api/reviews': { admin: 200, sales: 403, engineer: 200, foreman: 403, builder: 403 },
  'POST /api/designs/preview': { ...ok(200), engineer: 200, foreman: 200, builder: 403 },
};
const perRecord = new Set(Object.keys(calls).filter((k) => k.includes(':id')));

describe('sales desk role matrix', () => {
  for (const [route, byRole] of Object.entries(expected)) {
    for (const role of ROLES) {
      it(`${role} → ${route} → ${byRole[role]}`, async () => {
        const s = await signedIn(app, users[role].email);
        const res = await calls[route](s, await worldFor(route));
        expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(byRole[role]);
      });
    }
  }

  for (const route of perRecord) {
    it(`another plant's record → ${route} → 404 for every role`, async () => {
      for (const role of ROLES) {
        const s = await signedIn(app, users[role].email);
        const res = await calls[route](s, theirs);
        // Validation runs before loading, so a 404 is the only answer a foreign id ever gets.
        expect(res.status, `${role}: ${JSON.stringify(res.body).slice(0, 200)}`).toBe(404);
      }
    });
  }

  it("a builder gets 404 for another company's order, line and job", async () => {
    const s = await signedIn(app, users.builder.email);
    await s.get(`/api/orders/${other.order.id}`).expect(404);
    await s.get(`/api/orders/${other.order.id}/lines/${other.line.id}`).expect(404);
    await s.get(`/api/jobs/${other.job.id}`).expect(404);
    const list = await s.get('/api/orders?pageSize=100').expect(200);
    const items = list.body.items as { id: number; customer: { id: number } }[];
    expect(items.map((o) => o.id)).toContain(ours.order.id);
    expect(items.every((o) => o.customer.id === ours.customer.id)).toBe(true);
  });

  it("POST /api/orders with another plant's job answers 404 to the desk and opens nothing", async () => {
    for (const role of ['admin', 'sales'] as const) {
      const s = await signedIn(app, users[role].email);
      const res = await s.post('/api/orders', { jobId: theirs.job.id });
      expect(res.status, JSON.stringify(res.body)).toBe(404);
    }
    expect(await Order.count({ where: { jobId: theirs.job.id } })).toBe(1);
  });

  it('a line id of another order answers 404', async () => {
    const s = await signedIn(app, users.sales.email);
    await s.get(`/api/orders/${ours.order.id}/lines/${other.line.id}`).expect(404);
  });

  it('a review link without its order finds the order; another plant’s line or a bad id is 404', async () => {
    const s = await signedIn(app, users.engineer.email);
    const res = await s.get(`/api/reviews/lines/${ours.line.id}`).expect(200);
    expect(res.body).toEqual({ lineId: ours.line.id, orderId: ours.order.id });
    await s.get(`/api/reviews/lines/${theirs.line.id}`).expect(404);
    await s.get('/api/reviews/lines/abc').expect(404);
    const sales = await signedIn(app, users.sales.email);
    await sales.get(`/api/reviews/lines/${ours.line.id}`).expect(403);
  });

  it('signed out, every route answers 401', async () => {
    for (const path of ['/api/orders', `/api/orders/${ours.order.id}`, '/api/reviews']) {
      expect((await request(app).get(path)).status).toBe(401);
    }
  });
});

// A fresh line per review or delete call, and a fresh one-line order per reorder, so an earlier
// role's call does not change the next one's answer.
async function worldFor(route: string): Promise<W> {
  if (route.endsWith('/reorder')) {
    const order = await createOrder({ job: ours.job });
    return { ...ours, order, line: await createLine({ order }) };
  }
  if (!route.endsWith('/review') && !route.startsWith('DELETE')) return ours;
  return { ...ours, line: await createLine({ order: ours.order }) };
}
