import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Order, OrderLine } from '../../../../server/models';
import { orderIn, productionWorld, versionOf, type Session } from '../production/helpers';

let w: Awaited<ReturnType<typeof productionWorld>>;
beforeAll(async () => {
  w = await productionWorld();
});

/** Nothing about the order changed: same row, no new audit entry. */
async function unchanged(orderId: number, change: () => Promise<unknown>) {
  const before = (await Order.findByPk(orderId))!.toJSON();
  const events = await AuditEvent.count({ where: { subjectId: orderId } });
  await change();
  expect((await Order.findByPk(orderId))!.toJSON()).toEqual(before);
  expect(await AuditEvent.count({ where: { subjectId: orderId } })).toBe(events);
}

const post = (s: Session, id: number, path: string, body: object) =>
  s.post(`/api/orders/${id}/${path}`, body);
const allLoaded = (lineIds: number[]) =>
  OrderLine.update(
    { cutCount: 4, assembledCount: 4, bandedCount: 4, loadedCount: 4 },
    { where: { id: lineIds } },
  );
const tap = (lineId: number) => ({ clientId: randomUUID(), lineId, stage: 'cut', delta: 1 });

describe('production changes carry the order version the user saw', () => {
  it('the order page shows the version, and a change of the order raises it', async () => {
    const { order } = await orderIn(w.plant, { status: 'accepted' });
    const page = await w.sales.get(`/api/orders/${order.id}`).expect(200);
    expect(page.body.version).toBe(await versionOf(order.id));
    const res = await post(w.sales, order.id, 'promised-date', {
      promisedOn: '2030-06-03',
      version: page.body.version,
    }).expect(200);
    expect(res.body.version).toBe(page.body.version + 1);
  });

  const cases: {
    path: string;
    who: 'sales' | 'admin' | 'foreman';
    status: 'accepted' | 'deposit_paid' | 'ready';
    body: object;
  }[] = [
    {
      path: 'promised-date',
      who: 'sales',
      status: 'accepted',
      body: { promisedOn: '2030-07-01', reason: 'Site delayed' },
    },
    { path: 'hold', who: 'admin', status: 'deposit_paid', body: { reason: 'Site not ready' } },
    { path: 'release', who: 'admin', status: 'deposit_paid', body: { reason: 'Cheque seen' } },
    {
      path: 'delivery',
      who: 'foreman',
      status: 'ready',
      body: { receivedBy: 'Sam Site', note: 'Left by the gate' },
    },
  ];
  for (const c of cases)
    it(`${c.path}: a stale version answers 409 stale and changes nothing`, async () => {
      const { order, lines } = await orderIn(w.plant, { status: c.status });
      await allLoaded(lines.map((l) => l.id));
      const seenVersion = await versionOf(order.id);
      // Someone else changes the order meanwhile.
      await Order.update({ promisedOn: '2030-05-01' }, { where: { id: order.id } });
      expect(await versionOf(order.id)).toBe(seenVersion + 1);
      await unchanged(order.id, async () => {
        const res = await post(w[c.who], order.id, c.path, {
          ...c.body,
          version: seenVersion,
        }).expect(409);
        expect(res.body.error.code).toBe('stale');
        expect(res.body.error.message).toMatch(/changed since you opened it/);
      });
      // Reloaded, the same change goes through.
      await post(w[c.who], order.id, c.path, { ...c.body, version: seenVersion + 1 }).expect(200);
    });

  it('a change without a version is a 400 that says to reload', async () => {
    const { order } = await orderIn(w.plant, { status: 'deposit_paid' });
    await unchanged(order.id, async () => {
      const res = await post(w.admin, order.id, 'hold', { reason: 'Site not ready' }).expect(400);
      expect(res.body.error.message).toMatch(/Reload the order/);
    });
  });

  it('floor counts leave the version alone; the status they move raises it', async () => {
    const { order, lines } = await orderIn(w.plant, { status: 'released', releasedAt: new Date() });
    const v = await versionOf(order.id);
    await w.foreman.post('/api/floor/progress', tap(lines[0].id)).expect(201);
    // The first cut puts the order in production: that is a change of the order.
    expect(await versionOf(order.id)).toBe(v + 1);
    await w.foreman.post('/api/floor/progress', tap(lines[0].id)).expect(201);
    expect(await versionOf(order.id)).toBe(v + 1);
  });
});

describe('the delivery sign-off', () => {
  it('records who received the trusses, when and the note; the history says so', async () => {
    const { order, lines } = await orderIn(w.plant, { status: 'ready' });
    await allLoaded(lines.map((l) => l.id));
    const version = await versionOf(order.id);
    await post(w.foreman, order.id, 'delivery', {
      receivedBy: 'Sam Site',
      receivedAt: '2099-01-01T08:00:00Z',
      version,
    }).expect(400);
    await post(w.sales, order.id, 'delivery', { receivedBy: 'Sam Site', version }).expect(403);
    const res = await post(w.foreman, order.id, 'delivery', {
      receivedBy: 'Sam Site',
      receivedAt: '2026-11-30T14:05:00Z',
      note: 'Stacked on bearers by the gate',
      version,
    }).expect(200);
    expect(res.body.status).toBe('delivered');
    expect(res.body.history[0].summary).toBe(
      'Delivered, signed for by Sam Site on 30 Nov 2026, 14:05 UTC: Stacked on bearers by the gate',
    );
  });
});
