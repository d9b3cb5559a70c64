import { beforeAll, describe, expect, it } from 'vitest';
import { SchedulePlacement } from '../../../../server/models';
import { scheduleSchema } from '../../../../shared/api/production';
import { orderIn, productionWorld, seen, versionOf, type Session } from './helpers';

let w: Awaited<ReturnType<typeof productionWorld>>;

beforeAll(async () => {
  w = await productionWorld();
  await w.admin.agent
    .put('/api/production/settings')
    .set('X-CSRF-Token', w.admin.token)
    .send({
      tables: [{ id: 1, name: 'North', crew: 3, shifts: 1, hoursPerShift: 8 }],
      workingDays: [0, 1, 2, 3, 4, 5, 6],
      closures: [],
      setupMinutes: 20,
      labour: { perTruss: 6, perPiece: 1.5, perJoint: 1, perPlate: 0.25, factor: 1 },
      horizonDays: 60,
    })
    .expect(200);
});

const boardAs = async (s: Session) =>
  scheduleSchema.parse((await s.get('/api/schedule?days=10').expect(200)).body);

describe('holding and releasing from the board', () => {
  it('takes a held order off the board and lists it with its reason until released', async () => {
    const { order } = await orderIn(w.plant, { status: 'deposit_paid' });
    await w.admin
      .post(`/api/orders/${order.id}/release`, await seen(order.id, { reason: 'Deposit in' }))
      .expect(200);
    let board = await boardAs(w.admin);
    const version = board.orders.find((o) => o.id === order.id)!.version;
    expect(board.blocks.some((b) => b.orderId === order.id)).toBe(true);
    expect(version).toBe(await versionOf(order.id));

    await w.admin
      .post(`/api/orders/${order.id}/hold`, { reason: 'Builder asked to wait', version })
      .expect(200);
    // Re-planned in the same transaction: nothing of it stays on the tables.
    expect(await SchedulePlacement.count({ where: { orderId: order.id } })).toBe(0);
    board = await boardAs(w.foreman);
    expect(board.blocks.some((b) => b.orderId === order.id)).toBe(false);
    const held = board.held.find((o) => o.id === order.id)!;
    expect(held).toMatchObject({ holdReason: 'Builder asked to wait', status: 'released' });

    // The board the plant manager looked at before the hold is stale now.
    const stale = await w.admin
      .post(`/api/orders/${order.id}/release`, { reason: 'Go ahead', version })
      .expect(409);
    expect(stale.body.error.code).toBe('stale');
    expect((await boardAs(w.admin)).held.some((o) => o.id === order.id)).toBe(true);

    await w.admin
      .post(`/api/orders/${order.id}/release`, { reason: 'Go ahead', version: held.version })
      .expect(200);
    board = await boardAs(w.admin);
    expect(board.held.some((o) => o.id === order.id)).toBe(false);
    expect(board.blocks.some((b) => b.orderId === order.id)).toBe(true);
  });

  it('lets only the plant manager hold or release; the foreman and the desk read the list', async () => {
    const { order } = await orderIn(w.plant, { status: 'accepted', terms: 'account' });
    await w.admin
      .post(`/api/orders/${order.id}/hold`, await seen(order.id, { reason: 'Credit check' }))
      .expect(200);
    for (const s of [w.foreman, w.sales, w.engineer]) {
      await s
        .post(`/api/orders/${order.id}/release`, await seen(order.id, { reason: 'Please' }))
        .expect(403);
      await s
        .post(`/api/orders/${order.id}/hold`, await seen(order.id, { reason: 'Again' }))
        .expect(403);
    }
    for (const s of [w.foreman, w.sales])
      expect((await boardAs(s)).held.find((o) => o.id === order.id)?.holdReason).toBe(
        'Credit check',
      );
  });
});
