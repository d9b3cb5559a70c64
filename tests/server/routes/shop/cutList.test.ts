import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../../support/db';
import {
  FINK_24,
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createShopPlan,
  createUser,
} from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { binary, pdfText } from '../quotes/helpers';
import type { Role } from '../../../../shared/api/roles';
import { cutListStatusSchema } from '../../../../shared/api/shopPlan';
import { generateProfile } from '../../../../shared/engine/profiles';
import { ENGINE_VERSION } from '../../../../shared/engine/version';
import { runShopPlan } from '../../../../server/services/shopPlan/job';
import {
  OrderLine,
  type Customer,
  type Order,
  type Plant,
  type User,
} from '../../../../server/models';
import { saveStockSettings } from '../../../../server/commands/stockSettings';
import { DEMO_STOCK_SETTINGS } from '../../../../shared/api/stock';

const ROLES: Role[] = ['admin', 'sales', 'engineer', 'foreman', 'builder'];
const ALLOWED: Role[] = ['admin', 'sales', 'foreman'];
const app = testApp();
const users = {} as Record<Role, User>;
let plant: Plant;
let ready: Order;
let waiting: Order;
let theirs: Order;
let customer: Customer;

const KING_20 = { ...FINK_24, profile: 'kingPost', span: 240, pitch: 6, overhang: 0 };

async function approvedOrder(p: Plant, customer?: Customer) {
  const order = await createOrder({
    job: await createJob({ customer: customer ?? (await createCustomer({ plant: p })) }),
  });
  await createLine({ order, mark: 'A1', reviewState: 'approved' });
  const king = await createLine({ order, mark: 'K1', design: KING_20, reviewState: 'approved' });
  await king.update({ plies: 2, quantity: 3 });
  await createShopPlan(order);
  return order;
}

beforeAll(async () => {
  plant = await createPlant();
  customer = await createCustomer({ plant });
  for (const role of ROLES) users[role] = await createUser({ role, plant, customer });
  ready = await approvedOrder(plant, customer);
  waiting = await createOrder({ job: await createJob({ customer }) });
  await createLine({ order: waiting, mark: 'B1', reviewState: 'approved' });
  await createLine({ order: waiting, mark: 'B2' });
  theirs = await approvedOrder(await createPlant());
});

const url = (o: Order, suffix = '') => `/api/shop/orders/${o.id}/cut-list${suffix}`;

/** The stored cut list as the page reads it. */
async function storedView(s: Awaited<ReturnType<typeof signedIn>>, o: Order = ready) {
  const status = cutListStatusSchema.parse((await s.get(url(o)).expect(200)).body);
  return status.cutList!;
}

describe('GET /api/shop/orders/:id/cut-list per role', () => {
  for (const role of ROLES) {
    const allowed = ALLOWED.includes(role);
    it(`${role}: JSON ${allowed ? '200' : '403'}`, async () => {
      const s = await signedIn(app, users[role].email);
      const res = await s.get(url(ready));
      expect(res.status, JSON.stringify(res.body)).toBe(allowed ? 200 : 403);
      if (!allowed) expect(res.body.error.code).toBe('forbidden');
    });
    it(`${role}: CSV and PDF ${allowed ? '200' : '403'}`, async () => {
      const s = await signedIn(app, users[role].email);
      expect((await s.get(url(ready, '.csv'))).status).toBe(allowed ? 200 : 403);
      expect((await s.get(url(ready, '?format=pdf'))).status).toBe(allowed ? 200 : 403);
    });
  }

  it('another plant’s order answers 404; signed out 401', async () => {
    const s = await signedIn(app, users.foreman.email);
    expect((await s.get(url(theirs))).status).toBe(404);
    expect((await request(app).get(url(ready))).status).toBe(401);
  });

  it('an order with a design still waiting answers 409 naming it', async () => {
    const s = await signedIn(app, users.foreman.email);
    const res = await s.get(url(waiting));
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/waiting: B2/);
  });

  it('a bad format answers 400 with a clear message', async () => {
    const s = await signedIn(app, users.foreman.email);
    const res = await s.get(url(ready, '?format=xls'));
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/json, csv or pdf/);
  });
});

describe('the cut list', () => {
  it('every member of every truss in exactly one row; quantities per truss × trusses × plies', async () => {
    const s = await signedIn(app, users.foreman.email);
    const view = await storedView(s);
    const rows = view.groups.flatMap((g) => g.rows);
    // The king post line: 3 trusses × 2 plies; a 20 ft king post has 2 top chords, 1 bottom
    // chord (20 ft fits the stock) and the post: 4 pieces each, in 3 distinct rows.
    const king = rows.filter((r) => r.truss === 'K1');
    expect(king.reduce((s, r) => s + r.quantity, 0)).toBe(4 * 3 * 2);
    expect(king.find((r) => r.piece === 'TC1')).toMatchObject({ perTruss: 2, quantity: 12 });
    const fink = generateProfile({
      kind: 'fink',
      span: 288 * 25.4,
      pitch: 4,
      heelHeight: 0,
      overhangLeft: 304.8,
      overhangRight: 304.8,
    });
    const finkRows = rows.filter((r) => r.truss === 'A1');
    expect(finkRows.reduce((s, r) => s + r.perTruss, 0)).toBe(fink.pieces.length);
    expect(finkRows.reduce((s, r) => s + r.quantity, 0)).toBe(fink.pieces.length * 4);
    expect(view.quantity).toBe(4 * 3 * 2 + fink.pieces.length * 4);
    // Longest first within each lumber; lengths as feet-inches-sixteenths.
    for (const g of view.groups) {
      const lengths = g.rows.map((r) => r.length.value);
      expect(lengths).toEqual([...lengths].sort((a, b) => b - a));
    }
    expect(rows[0].length.text).toMatch(/^\d+'-\d+( \d+\/\d+)?"$/);
    expect(view.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    expect(view.cautions.join(' ')).toMatch(/reviewed/);
  });

  it('CSV: one line per row with the header, quoted where needed', async () => {
    const s = await signedIn(app, users.sales.email);
    const view = await storedView(s);
    const res = await s.get(url(ready, '.csv')).expect(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="cut-list-/);
    const lines = res.text.trimEnd().split('\r\n');
    expect(lines[0]).toBe(
      'Lumber,Mark,Truss,Piece,Quantity,Per truss,Trusses,Plies,Length,Length (in),First end,Second end,Notes',
    );
    expect(lines).toHaveLength(1 + view.groups.reduce((n, g) => n + g.rows.length, 0));
    expect(lines.some((l) => l.includes('K1-TC1') && l.includes(',12,2,3,2,'))).toBe(true);
  });

  it('PDF: every row mark, the order and the cautions, read back by pdftotext', async () => {
    const s = await signedIn(app, users.admin.email);
    const view = await storedView(s);
    const res = await s.agent.get(url(ready, '.pdf')).buffer(true).parse(binary).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const text = pdfText(res.body as Buffer);
    expect(text).toContain('CUT LIST');
    expect(text).toContain(`Order ${view.order.number}`);
    for (const r of view.groups.flatMap((g) => g.rows)) expect(text).toContain(r.mark);
    expect(text).toMatch(/No truss may be\s+cut or altered/);
  });
});

describe('the stored cut list (made by the shop-plan job, never on request)', () => {
  it('no plan yet: the status says so, exports answer 409, Make the plan queues the job', async () => {
    const order = await createOrder({ job: await createJob({ customer }) });
    const line = await createLine({ order, mark: 'N1', design: KING_20, reviewState: 'approved' });
    const s = await signedIn(app, users.foreman.email);
    const none = cutListStatusSchema.parse((await s.get(url(order)).expect(200)).body);
    expect(none).toMatchObject({ cutList: null, madeAt: null, engineVersion: null, outOfDate: [] });
    expect(none.run.state).toBe('idle');
    expect(none.order.number).toBe(order.number);
    const csv = await s.get(url(order, '.csv')).expect(409);
    expect(csv.body.error.message).toMatch(/No cut list has been made.*Make the plan/);
    await s.get(url(order, '.pdf')).expect(409);

    const queued = await s.post(url(order, '/replan')).expect(202);
    expect(cutListStatusSchema.parse(queued.body).run.state).toBe('queued');
    expect((await s.get(url(order, '.csv')).expect(409)).body.error.message).toMatch(/being made/);
    await runShopPlan(order.id); // what the queue's worker runs
    const made = cutListStatusSchema.parse((await s.get(url(order)).expect(200)).body);
    expect(made.run.state).toBe('idle');
    expect(made.engineVersion).toBe(ENGINE_VERSION);
    expect(made.cutList!.engineVersion).toBe(ENGINE_VERSION);
    expect(Date.parse(made.madeAt!)).toBeGreaterThan(0);
    expect(made.cutList!.quantity).toBe(4 * 4);

    // A design change does not recompute: the stored list stays, said to be out of date.
    await OrderLine.update({ quantity: 6 }, { where: { id: line.id } });
    const stale = cutListStatusSchema.parse((await s.get(url(order)).expect(200)).body);
    expect(stale.outOfDate).toEqual(['designs']);
    expect(stale.cutList!.quantity).toBe(4 * 4);
    expect(stale.madeAt).toBe(made.madeAt);
    const pdf = await s.agent.get(url(order, '.pdf')).buffer(true).parse(binary).expect(200);
    expect(pdfText(pdf.body as Buffer)).toMatch(
      /OUT OF DATE: This plan was made before the\s+order’s designs changed/,
    );
    await s.post(url(order, '/replan')).expect(202);
    await runShopPlan(order.id);
    const fresh = cutListStatusSchema.parse((await s.get(url(order)).expect(200)).body);
    expect(fresh.outOfDate).toEqual([]);
    expect(fresh.cutList!.quantity).toBe(4 * 6);
  });

  it('a change of the stock settings marks it out of date for the stock', async () => {
    const other = await createPlant();
    const admin = await createUser({ role: 'admin', plant: other });
    const order = await approvedOrder(other);
    const s = await signedIn(app, admin.email);
    expect((await s.get(url(order)).expect(200)).body.outOfDate).toEqual([]);
    await saveStockSettings(admin, { ...DEMO_STOCK_SETTINGS, trimIn: 1 });
    expect((await s.get(url(order)).expect(200)).body.outOfDate).toEqual(['stock']);
  });

  it('Re-plan per role: the foreman, desk and plant manager 202; engineer and builder 403', async () => {
    for (const role of ROLES) {
      const s = await signedIn(app, users[role].email);
      const res = await s.post(url(ready, '/replan'));
      expect(res.status, role).toBe(ALLOWED.includes(role) ? 202 : 403);
    }
    await runShopPlan(ready.id);
    const s = await signedIn(app, users.foreman.email);
    await s.post(url(theirs, '/replan')).expect(404);
    await s.post(url(waiting, '/replan')).expect(409);
  });
});

describe('GET /api/shop/orders', () => {
  it('lists the plant’s orders whose designs are all approved', async () => {
    const s = await signedIn(app, users.foreman.email);
    const { body } = await s.get('/api/shop/orders').expect(200);
    const ids = body.items.map((o: { id: number }) => o.id);
    expect(ids).toContain(ready.id);
    expect(ids).not.toContain(waiting.id);
    expect(ids).not.toContain(theirs.id);
  });

  it('a builder and an engineer may not list it', async () => {
    for (const role of ['builder', 'engineer'] as const) {
      const s = await signedIn(app, users[role].email);
      expect((await s.get('/api/shop/orders')).status).toBe(403);
    }
  });
});
