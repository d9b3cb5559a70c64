import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp, testMailer } from '../../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
} from '../../../support/factories';
import { signedIn } from '../../../support/session';
import type { Role } from '../../../../shared/api/roles';
import {
  OrderLine,
  Quote,
  type Customer,
  type Order,
  type Plant,
  type User,
} from '../../../../server/models';
import { createQuote, sendQuote } from '../../../../server/commands/quotes';
import { Op } from 'sequelize';
import { binary, TEST_BOOK } from './helpers';

const ROLES: Role[] = ['admin', 'sales', 'engineer', 'foreman', 'builder'];
type S = Awaited<ReturnType<typeof signedIn>>;
let app: ReturnType<typeof testApp>;
const users = {} as Record<Role, User>;
// Ours: the builder user's company. Other: another company of the plant. Theirs: another plant.
let ours: Order;
let other: Order;
let theirs: Order;

/** An order of the customer (a new one of the plant when not given) with one quote revision. */
async function quotedOrder(plant: Plant, customer?: Customer) {
  const job = await createJob({ customer: customer ?? (await createCustomer({ plant })) });
  const order = await createOrder({ job });
  await createLine({ order });
  const sales = await createUser({ role: 'sales', plant });
  // Sent: a builder reads only the revisions the plant sent them.
  const quote = await createQuote(sales, order);
  await sendQuote(sales, await order.reload(), quote);
  return order.reload();
}

beforeAll(async () => {
  app = testApp({}, undefined, await testMailer());
  const plant = await createPlant();
  const customer = await createCustomer({ plant });
  for (const role of ROLES) users[role] = await createUser({ role, plant, customer });
  ours = await quotedOrder(plant, customer);
  other = await quotedOrder(plant);
  theirs = await quotedOrder(await createPlant());
});

const latest = async (o: Order) =>
  (await Quote.max('number', { where: { orderId: o.id } })) as number;
/** The latest revision sent to the builder (POST /quotes adds unsent ones along the way). */
const latestSent = async (o: Order) =>
  (await Quote.max('number', { where: { orderId: o.id, sentAt: { [Op.ne]: null } } })) as number;
const put = (s: S, url: string, body: object) =>
  s.agent.put(url).set('X-CSRF-Token', s.token).send(body);

const calls: Record<string, (s: S, o: Order) => Promise<request.Response>> = {
  'GET /api/price-book': async (s) => s.get('/api/price-book'),
  'PUT /api/price-book': async (s) => put(s, '/api/price-book', TEST_BOOK),
  // A change first: an identical revision is refused (the existing one is offered instead).
  'POST /api/orders/:id/quotes': async (s, o) => {
    await OrderLine.increment('quantity', { where: { orderId: o.id } });
    return s.post(`/api/orders/${o.id}/quotes`);
  },
  'GET /api/orders/:id/quotes': async (s, o) => s.get(`/api/orders/${o.id}/quotes`),
  'GET /api/orders/:id/quotes/:number': async (s, o) =>
    s.get(`/api/orders/${o.id}/quotes/${await latestSent(o)}`),
  'GET /api/orders/:id/quotes/:number/pdf': async (s, o) =>
    s.agent
      .get(`/api/orders/${o.id}/quotes/${await latestSent(o)}/pdf`)
      .buffer(true)
      .parse(binary),
  'POST /api/orders/:id/quotes/:number/send': async (s, o) =>
    s.post(`/api/orders/${o.id}/quotes/${await latest(o)}/send`),
};

const only = (ok: number, allowed: Role[]): Record<Role, number> =>
  Object.fromEntries(ROLES.map((r) => [r, allowed.includes(r) ? ok : 403])) as Record<Role, number>;
const expected: Record<string, Record<Role, number>> = {
  'GET /api/price-book': only(200, ['admin', 'sales']),
  'PUT /api/price-book': only(200, ['admin']),
  'POST /api/orders/:id/quotes': only(201, ['admin', 'sales']),
  'GET /api/orders/:id/quotes': only(200, ['admin', 'sales', 'builder']),
  'GET /api/orders/:id/quotes/:number': only(200, ['admin', 'sales', 'builder']),
  'GET /api/orders/:id/quotes/:number/pdf': only(200, ['admin', 'sales', 'builder']),
  'POST /api/orders/:id/quotes/:number/send': only(200, ['admin', 'sales']),
};

describe('quotes and price book role matrix', () => {
  for (const [route, byRole] of Object.entries(expected)) {
    for (const role of ROLES) {
      it(`${role} → ${route} → ${byRole[role]}`, async () => {
        const s = await signedIn(app, users[role].email);
        const res = await calls[route](s, ours);
        expect(res.status, String(res.text ?? '').slice(0, 300)).toBe(byRole[role]);
        // The PDF route's body arrives as bytes (its error is still JSON).
        if (res.status === 403) {
          const body = Buffer.isBuffer(res.body) ? JSON.parse(res.body.toString()) : res.body;
          expect(body.error.code).toBe('forbidden');
        }
      });
    }
  }

  for (const route of Object.keys(calls).filter((k) => k.includes(':id'))) {
    it(`another plant's order → ${route} → 404 for every role`, async () => {
      for (const role of ROLES) {
        const s = await signedIn(app, users[role].email);
        const res = await calls[route](s, theirs);
        expect(res.status, `${role}: ${JSON.stringify(res.body).slice(0, 200)}`).toBe(404);
      }
    });
  }

  it("a builder gets 404 for another company's quotes", async () => {
    const s = await signedIn(app, users.builder.email);
    await s.get(`/api/orders/${other.id}/quotes`).expect(404);
    await s.get(`/api/orders/${other.id}/quotes/1`).expect(404);
    await s.get(`/api/orders/${other.id}/quotes/1/pdf`).expect(404);
  });

  it('signed out, every route answers 401', async () => {
    const anon = request(app);
    const paths = [
      '/api/price-book',
      `/api/orders/${ours.id}/quotes`,
      `/api/orders/${ours.id}/quotes/1`,
      `/api/orders/${ours.id}/quotes/1/pdf`,
    ];
    for (const path of paths) expect((await anon.get(path)).status, path).toBe(401);
  });
});
