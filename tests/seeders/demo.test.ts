import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { Sequelize } from 'sequelize';
import { connect } from '../../server/db/sequelize';
import { migrator } from '../../server/db/migrator';
import { createApp } from '../../server/app';
import {
  AuditEvent,
  Order,
  OrderLine,
  Payment,
  PaymentEvent,
  SchedulePlacement,
  ShopPlan,
  User,
} from '../../server/models';
import { seedDemo } from '../../seeders/demo';
import { SCENARIO } from '../../seeders/scenario';
import { DEMO_PASSWORD } from '../../shared/api/demo';
import { testDatabaseUrl } from '../support/db';
import { signedIn } from '../support/session';

// A scratch database on the test server: the demo seed owns its plant, users and order numbers.
const name = `spanwise_seed_${process.pid}`;
const url = new URL(testDatabaseUrl());
const admin = new Sequelize(url.toString(), { logging: false });
let scratch: Sequelize;
let app: Express;

const TABLES = [
  'plants',
  'customers',
  'users',
  'jobs',
  'orders',
  'order_lines',
  'quotes',
  'quote_acceptances',
  'payments',
  'payment_events',
  'progress_events',
  'schedule_placements',
  'shop_plans',
  'mail_messages',
  'audit_events',
];
/** Row count and latest change of every table the seed writes. */
const snapshot = async () => {
  const out: Record<string, unknown> = {};
  for (const t of TABLES) {
    const [[row]] = await scratch.query(`SELECT count(*)::int AS n FROM ${t}`);
    out[t] = row;
  }
  const [orders] = await scratch.query(
    'SELECT id, status, version, promised_on, planned_finish_on, updated_at FROM orders ORDER BY id',
  );
  out.orders = orders;
  return out;
};

const orderOn = async (job: string) => {
  const o = await Order.findOne({ include: [{ association: 'job', where: { name: job } }] });
  return o!;
};

beforeAll(async () => {
  await admin.query(`DROP DATABASE IF EXISTS ${name}`);
  await admin.query(`CREATE DATABASE ${name}`);
  const scratchUrl = new URL(url);
  scratchUrl.pathname = `/${name}`;
  scratch = connect(scratchUrl.toString());
  await migrator(scratch).up();
  await seedDemo();
  app = createApp({
    sequelize: scratch,
    databaseUrl: scratchUrl.toString(),
    config: { demo: true, loginAttemptsPer15Min: 1000, loginAttemptsPerAddress: 100_000 },
  });
}, 300_000);

afterAll(async () => {
  await app?.locals.close();
  await scratch?.close();
  await admin.query(`DROP DATABASE IF EXISTS ${name}`);
  await admin.close();
});

describe('the demo seed on a fresh database', () => {
  it('has an order at every stage, each line designed OK and approved by the engineer', async () => {
    const statuses = (await Order.findAll()).map((o) => o.status).sort();
    expect(statuses).toEqual(
      [
        'draft',
        'draft',
        'draft',
        'quoted',
        'accepted',
        'in_production',
        'released',
        'released',
        'released',
        'ready',
        'delivered',
      ].sort(),
    );
    const engineer = await User.findOne({ where: { email: 'engineer@spanwise.test' } });
    for (const s of SCENARIO) {
      const order = await orderOn(s.job.name);
      const lines = await OrderLine.findAll({ where: { orderId: order.id } });
      expect(lines.map((l) => l.mark).sort()).toEqual(s.lines.map((l) => l.mark).sort());
      for (const l of lines) {
        expect(l.designOk, `${s.job.name} ${l.mark}`).toBe(true);
        expect(l.reviewState).toBe('approved');
        expect(l.reviewedBy).toBe(engineer!.id);
      }
      if (order.status !== 'quoted') expect(order.promisedOn).not.toBeNull();
    }
  });

  it('records the paid deposit as the payment webhook does, with a receipt, and releases', async () => {
    const order = await orderOn('Quarry Hill fourplex');
    const [payment] = await Payment.findAll({ where: { orderId: order.id } });
    expect(payment).toMatchObject({ kind: 'deposit', method: 'card', status: 'succeeded' });
    expect(payment.receiptNumber).toBe(`R-${order.number}-${payment.id}`);
    expect(await PaymentEvent.count({ where: { orderId: order.id } })).toBe(1);
    const actions = (await AuditEvent.findAll({ where: { subjectId: order.id } })).map(
      (e) => e.action,
    );
    expect(actions).toEqual(
      expect.arrayContaining(['payment.received', 'order.released', 'order.in_production']),
    );
  });

  it('plans the released orders on the schedule and shows floor progress on the first day', async () => {
    const placements = await SchedulePlacement.findAll({ order: [['onDate', 'ASC']] });
    const orders = new Set(placements.map((p) => p.orderId));
    expect(orders.size).toBe(4); // the order in production and three released ones
    const days = [...new Set(placements.map((p) => p.onDate))];
    expect(days.length).toBeGreaterThanOrEqual(3);
    const building = await orderOn('Quarry Hill fourplex');
    const t1 = (await OrderLine.findOne({ where: { orderId: building.id, mark: 'T1' } }))!;
    expect([t1.cutCount, t1.assembledCount, t1.quantity]).toEqual([14, 6, 14]);
    // Its 8 trusses still to assemble are on the plan's first day.
    const first = placements.filter((p) => p.onDate === days[0] && p.orderLineId === t1.id);
    expect(first.reduce((s, p) => s + p.quantity, 0)).toBe(8);
    expect(await ShopPlan.count({ where: { orderId: building.id, runState: 'idle' } })).toBe(1);
  });

  it('has a ready order and a delivered one with its signed ticket', async () => {
    const ready = await orderOn('Kessler garage addition');
    expect(ready.status).toBe('ready');
    const delivered = await orderOn('Clubhouse pavilion');
    const signed = await AuditEvent.findOne({
      where: { subjectId: delivered.id, action: 'order.delivered' },
    });
    expect(signed!.data).toMatchObject({ receivedBy: 'Ray Dunmore (site lead)' });
    for (const l of await OrderLine.findAll({ where: { orderId: delivered.id } }))
      expect(l.deliveredCount).toBe(l.quantity);
  });

  it('shows builder1 a waiting quote and builder2 a deposit due in the portal', async () => {
    const b1 = await signedIn(app, 'builder1@spanwise.test', DEMO_PASSWORD);
    const home1 = (await b1.get('/api/portal/home').expect(200)).body;
    expect(home1.quotesWaiting).toHaveLength(1);
    expect(home1.quotesWaiting[0]).toMatchObject({ job: 'Lot 15 — Orchard View' });
    expect(home1.quotesWaiting[0].daysLeft).toBeGreaterThan(0);
    expect(home1.inProgress.map((o: { status: string }) => o.status).sort()).toEqual([
      'ready',
      'released',
    ]);
    // Each order in progress says when it comes (the promised date the plan makes).
    for (const o of home1.inProgress) expect(o.plannedDelivery).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    const b2 = await signedIn(app, 'builder2@spanwise.test', DEMO_PASSWORD);
    const home2 = (await b2.get('/api/portal/home').expect(200)).body;
    expect(home2.depositsDue).toHaveLength(1);
    expect(home2.depositsDue[0]).toMatchObject({ job: 'Birchwood ranch' });
  });

  it('changes nothing when it runs again', async () => {
    const before = await snapshot();
    await seedDemo();
    expect(await snapshot()).toEqual(before);
  }, 120_000);
});
