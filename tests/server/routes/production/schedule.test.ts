import { beforeAll, describe, expect, it } from 'vitest';
import { Order, SchedulePlacement } from '../../../../server/models';
import { scheduleSchema } from '../../../../shared/api/production';
import { addCalendarDays, workingDates } from '../../../../shared/engine/schedule';
import { formatDay } from '../../../../server/services/productionMail';
import { createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { orderIn, productionWorld, queuedTo, seen } from './helpers';
import { binary, pdfText } from '../quotes/helpers';

let w: Awaited<ReturnType<typeof productionWorld>>;
const today = new Date().toISOString().slice(0, 10);
const SETTINGS = {
  tables: [
    { id: 1, name: 'North', crew: 3, shifts: 1, hoursPerShift: 8 },
    { id: 2, name: 'South', crew: 2, shifts: 1, hoursPerShift: 8 },
  ],
  workingDays: [0, 1, 2, 3, 4, 5, 6],
  closures: [],
  setupMinutes: 20,
  labour: { perTruss: 6, perPiece: 1.5, perJoint: 1, perPlate: 0.25, factor: 1.1 },
  horizonDays: 60,
};

beforeAll(async () => {
  w = await productionWorld();
  await w.admin.agent
    .put('/api/production/settings')
    .set('X-CSRF-Token', w.admin.token)
    .send(SETTINGS)
    .expect(200);
});

describe('production settings', () => {
  it('are the plant manager’s to write and refuse bad input with a message', async () => {
    const res = await w.admin.agent
      .put('/api/production/settings')
      .set('X-CSRF-Token', w.admin.token)
      .send({ ...SETTINGS, tables: [] })
      .expect(400);
    expect(res.body.error.message).toBe('Add at least one table');
    await w.foreman.agent
      .put('/api/production/settings')
      .set('X-CSRF-Token', w.foreman.token)
      .send(SETTINGS)
      .expect(403);
    const got = await w.sales.get('/api/production/settings').expect(200);
    expect(got.body).toMatchObject({ demo: false, settings: { tables: SETTINGS.tables } });
  });
});

describe('the schedule', () => {
  it('plans a released order within capacity and moves it when the foreman drags it', async () => {
    const { order } = await orderIn(w.plant, {
      status: 'deposit_paid',
      reviews: ['approved', 'approved'],
    });
    await w.admin
      .post(
        `/api/orders/${order.id}/release`,
        await seen(order.id, { reason: 'Deposit by cheque' }),
      )
      .expect(200);
    const board = scheduleSchema.parse(
      (await w.sales.get('/api/schedule?days=10').expect(200)).body,
    );
    expect(board.days).toEqual(
      workingDates(today, 10, { workingDays: SETTINGS.workingDays, closures: [] }),
    );
    for (const l of board.load) expect(l.used).toBeLessThanOrEqual(l.capacity + 1e-6);
    const mine = board.blocks.filter((b) => b.orderId === order.id);
    expect(mine.reduce((s, b) => s + b.trusses, 0)).toBe(8);

    const target = addCalendarDays(today, 3);
    await w.sales
      .post('/api/schedule/moves', { orderId: order.id, tableId: 2, date: target })
      .expect(403);
    const res = await w.foreman
      .post('/api/schedule/moves', { orderId: order.id, tableId: 2, date: target })
      .expect(200);
    expect(res.body).toMatchObject({ orderId: order.id, late: false });
    const placed = await SchedulePlacement.findAll({ where: { orderId: order.id } });
    expect(placed.every((p) => p.tableId === 2 && p.onDate >= target && p.pinned)).toBe(true);
    expect((await Order.findByPk(order.id))!.schedulePin).toEqual({ tableId: 2, date: target });
  });

  it('flags an order it cannot finish by its promised date, and the builder sees the date it can make', async () => {
    const { order, customer } = await orderIn(w.plant, { status: 'accepted', terms: 'account' });
    await w.sales
      .post(`/api/orders/${order.id}/promised-date`, await seen(order.id, { promisedOn: today }))
      .expect(200);
    await w.foreman
      .post('/api/schedule/moves', { orderId: order.id, tableId: 1, date: today })
      .expect(409); // not released yet
    await w.admin
      .post(`/api/orders/${order.id}/release`, await seen(order.id, { reason: 'Account builder' }))
      .expect(200);
    const res = await w.foreman
      .post('/api/schedule/moves', {
        orderId: order.id,
        tableId: 1,
        date: addCalendarDays(today, 5),
      })
      .expect(200);
    expect(res.body.late).toBe(true);
    const builder = await createUser({ role: 'builder', customer });
    const s = await signedIn(w.app, builder.email);
    const page = await s.get(`/api/orders/${order.id}`).expect(200);
    expect(page.body.promisedOn).toBe(today);
    expect(page.body.plannedDeliveryOn).toBe(addCalendarDays(today, 5));
    const mails = await queuedTo(customer.email);
    expect(mails.map((m) => m.subject)).toContain(
      `Order ${order.number}: planned delivery now ${formatDay(addCalendarDays(today, 5))}`,
    );
  });

  it('refuses a move to a day before release or to an unknown table', async () => {
    const { order } = await orderIn(w.plant, { status: 'released', releasedAt: new Date() });
    await w.foreman
      .post('/api/schedule/moves', { orderId: order.id, tableId: 9, date: today })
      .expect(400);
    await w.foreman
      .post('/api/schedule/moves', {
        orderId: order.id,
        tableId: 1,
        date: addCalendarDays(today, -1),
      })
      .expect(400);
  });
});

describe('the foreman’s daily sheet', () => {
  it('prints, per table, the trusses to build today with their lumber and the cautions', async () => {
    const { order } = await orderIn(w.plant, { status: 'deposit_paid' });
    await w.admin
      .post(
        `/api/orders/${order.id}/release`,
        await seen(order.id, { reason: 'Paid at the counter' }),
      )
      .expect(200);
    const res = await w.foreman
      .get('/api/floor/sheet.pdf')
      .buffer(true)
      .parse(binary)
      .expect(200)
      .expect('Content-Type', /pdf/);
    const text = pdfText(res.body as Buffer);
    expect(text).toContain(`Daily sheet · ${today}`);
    expect(text).toMatch(/T1 — build \d+ \(of 4\)/);
    expect(text).toMatch(/Lumber: 2x\d/);
    expect(text).toContain('Cautions');
    await w.sales.get('/api/floor/sheet.pdf').expect(403);
  });
});
