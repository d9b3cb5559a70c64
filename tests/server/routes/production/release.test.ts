import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Order, OrderLine, SchedulePlacement } from '../../../../server/models';
import { orderIn, productionWorld, queuedTo, seen } from './helpers';

let w: Awaited<ReturnType<typeof productionWorld>>;
beforeAll(async () => {
  w = await productionWorld();
});

// A review names the design version the reviewer looked at.
const approve = (orderId: number, lineId: number) => ({
  expect: async (status: number) => {
    const line = (await OrderLine.findByPk(lineId))!;
    return w.engineer
      .post(`/api/orders/${orderId}/lines/${lineId}/review`, {
        decision: 'approve',
        designVersion: line.designVersion,
      })
      .expect(status);
  },
});
const statusOf = async (id: number) => (await Order.findByPk(id))!.status;

describe('the release gate', () => {
  it('does not release on approval alone (deposit terms, deposit unpaid)', async () => {
    const { order, lines } = await orderIn(w.plant, {
      status: 'accepted',
      terms: 'deposit',
      reviews: ['pending'],
    });
    await approve(order.id, lines[0].id).expect(200);
    expect(await statusOf(order.id)).toBe('accepted');
  });

  it('does not release on a paid deposit alone (a design still pending)', async () => {
    const { order, lines } = await orderIn(w.plant, {
      status: 'deposit_paid',
      reviews: ['pending', 'pending'],
    });
    await approve(order.id, lines[0].id).expect(200);
    expect(await statusOf(order.id)).toBe('deposit_paid');
  });

  it('does not release on account terms alone (a design still pending)', async () => {
    const { order, lines } = await orderIn(w.plant, {
      status: 'accepted',
      terms: 'account',
      reviews: ['pending', 'pending'],
    });
    await approve(order.id, lines[1].id).expect(200);
    expect(await statusOf(order.id)).toBe('accepted');
  });

  it('releases by itself when the last design is approved and the deposit is paid: audit, plan, e-mail', async () => {
    const { order, lines, customer } = await orderIn(w.plant, {
      status: 'deposit_paid',
      reviews: ['approved', 'pending'],
    });
    await approve(order.id, lines[1].id).expect(200);
    const o = (await Order.findByPk(order.id))!;
    expect(o.status).toBe('released');
    expect(o.releasedAt).not.toBeNull();
    expect(
      await AuditEvent.count({ where: { subjectId: order.id, action: 'order.released' } }),
    ).toBe(1);
    expect(await SchedulePlacement.count({ where: { orderId: order.id } })).toBeGreaterThan(0);
    expect(o.plannedFinishOn).not.toBeNull();
    expect((await queuedTo(customer.email)).map((m) => m.subject)).toContain(
      `Order ${order.number} is released to production`,
    );
  });

  it('releases an account builder’s order on the last approval', async () => {
    const { order, lines } = await orderIn(w.plant, {
      status: 'accepted',
      terms: 'account',
      reviews: ['pending'],
    });
    await approve(order.id, lines[0].id).expect(200);
    expect(await statusOf(order.id)).toBe('released');
  });

  it('does not release a held order; the plant manager releases it by hand with a reason', async () => {
    const { order, lines } = await orderIn(w.plant, {
      status: 'deposit_paid',
      reviews: ['pending'],
    });
    await w.admin
      .post(`/api/orders/${order.id}/hold`, await seen(order.id, { reason: 'Site not ready' }))
      .expect(200);
    await approve(order.id, lines[0].id).expect(200);
    expect(await statusOf(order.id)).toBe('deposit_paid');
    await w.admin
      .post(`/api/orders/${order.id}/release`, await seen(order.id, { reason: 'x' }))
      .expect(400);
    const res = await w.admin
      .post(`/api/orders/${order.id}/release`, await seen(order.id, { reason: 'Site ready now' }))
      .expect(200);
    expect(res.body.status).toBe('released');
    expect(res.body.history[0].summary).toBe('Released by hand: Site ready now');
  });

  it('never releases by hand past the design review', async () => {
    const { order } = await orderIn(w.plant, { status: 'accepted', reviews: ['pending'] });
    const res = await w.admin
      .post(
        `/api/orders/${order.id}/release`,
        await seen(order.id, { reason: 'Builder is in a hurry' }),
      )
      .expect(409);
    expect(res.body.error.message).toMatch(/approved/);
  });

  it('holding and releasing is the plant manager’s alone', async () => {
    const { order } = await orderIn(w.plant, { status: 'deposit_paid' });
    for (const s of [w.sales, w.foreman, w.engineer])
      await s
        .post(`/api/orders/${order.id}/hold`, await seen(order.id, { reason: 'Because' }))
        .expect(403);
  });
});

describe('the promised delivery date', () => {
  it('is set by the desk, changes only with a reason, is audited and mailed to the builder', async () => {
    const { order, customer } = await orderIn(w.plant, { status: 'accepted' });
    await w.sales
      .post(
        `/api/orders/${order.id}/promised-date`,
        await seen(order.id, { promisedOn: '2030-05-06' }),
      )
      .expect(200);
    const res = await w.sales
      .post(
        `/api/orders/${order.id}/promised-date`,
        await seen(order.id, { promisedOn: '2030-05-08' }),
      )
      .expect(400);
    expect(res.body.error.fields.reason).toBe('Give a reason');
    const ok = await w.sales
      .post(
        `/api/orders/${order.id}/promised-date`,
        await seen(order.id, {
          promisedOn: '2030-05-08',
          reason: 'Crane booked later',
        }),
      )
      .expect(200);
    expect(ok.body.promisedOn).toBe('2030-05-08');
    expect(ok.body.history[0].summary).toBe(
      'Promised date 6 May 2030 → 8 May 2030: Crane booked later',
    );
    const mails = await queuedTo(customer.email);
    expect(mails[0].subject).toMatch(/delivery date changed/); // newest first
    await w.foreman
      .post(
        `/api/orders/${order.id}/promised-date`,
        await seen(order.id, { promisedOn: '2030-05-09', reason: 'no' }),
      )
      .expect(403);
  });

  it('cannot be promised before the builder accepts', async () => {
    const { order } = await orderIn(w.plant, { status: 'quoted' });
    await w.sales
      .post(
        `/api/orders/${order.id}/promised-date`,
        await seen(order.id, { promisedOn: '2030-05-06' }),
      )
      .expect(409);
  });
});
