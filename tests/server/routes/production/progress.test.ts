import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { Order, OrderLine, ProgressEvent } from '../../../../server/models';
import { orderIn, productionWorld, seen, tap } from './helpers';

let w: Awaited<ReturnType<typeof productionWorld>>;
beforeAll(async () => {
  w = await productionWorld();
});

const released = () => orderIn(w.plant, { status: 'released', releasedAt: new Date() });

describe('progress on the floor', () => {
  it('never counts above the quantity (400, nothing changes)', async () => {
    const { lines } = await released();
    const line = lines[0]; // quantity 4
    await w.foreman.post('/api/floor/progress', tap(line.id, 'cut', 4)).expect(201);
    const res = await w.foreman.post('/api/floor/progress', tap(line.id, 'cut', 1)).expect(400);
    expect(res.body.error.message).toBe('T1 has 4 trusses; 5 cut is too many.');
    expect((await OrderLine.findByPk(line.id))!.cutCount).toBe(4);
    // Nor more assembled than cut, nor below zero.
    await w.foreman.post('/api/floor/progress', tap(line.id, 'assembled', 2)).expect(201);
    await w.foreman.post('/api/floor/progress', tap(line.id, 'banded', 3)).expect(400);
    await w.foreman.post('/api/floor/progress', tap(line.id, 'assembled', -3)).expect(400);
    expect((await OrderLine.findByPk(line.id))!.assembledCount).toBe(2);
  });

  it('counts a replayed change once', async () => {
    const { lines } = await released();
    const change = tap(lines[0].id, 'cut', 1, randomUUID());
    const first = await w.foreman.post('/api/floor/progress', change).expect(201);
    const again = await w.foreman.post('/api/floor/progress', change).expect(200);
    expect(first.body.counts.cut).toBe(1);
    expect(again.body).toMatchObject({ replayed: true, counts: { cut: 1 } });
    // Even when the replays race each other.
    const race = tap(lines[0].id, 'cut', 1, randomUUID());
    await Promise.all([1, 2, 3].map(() => w.foreman.post('/api/floor/progress', race)));
    expect((await OrderLine.findByPk(lines[0].id))!.cutCount).toBe(2);
    expect(await ProgressEvent.count({ where: { clientId: race.clientId } })).toBe(1);
  });

  it('a refused change leaves no record, so its replay is refused again', async () => {
    const { lines } = await released();
    const change = tap(lines[0].id, 'cut', 9);
    await w.foreman.post('/api/floor/progress', change).expect(400);
    await w.foreman.post('/api/floor/progress', change).expect(400);
    expect(await ProgressEvent.count({ where: { clientId: change.clientId } })).toBe(0);
  });

  it('moves the order: in production at the first cut, ready when all banded, delivered on sign-off', async () => {
    const { order, lines } = await orderIn(w.plant, {
      status: 'released',
      releasedAt: new Date(),
      reviews: ['approved', 'approved'],
    });
    const status = async () => (await Order.findByPk(order.id))!.status;
    await w.foreman.post('/api/floor/progress', tap(lines[0].id, 'cut', 1)).expect(201);
    expect(await status()).toBe('in_production');
    for (const l of lines) {
      await w.foreman.post('/api/floor/progress', tap(l.id, 'cut', l.id === lines[0].id ? 3 : 4));
      await w.foreman.post('/api/floor/progress', tap(l.id, 'assembled', 4)).expect(201);
    }
    await w.foreman.post('/api/floor/progress', tap(lines[0].id, 'banded', 4)).expect(201);
    expect(await status()).toBe('in_production');
    await w.foreman.post('/api/floor/progress', tap(lines[1].id, 'banded', 4)).expect(201);
    expect(await status()).toBe('ready');
    await w.foreman
      .post(`/api/orders/${order.id}/delivery`, await seen(order.id, { receivedBy: 'Sam Site' }))
      .expect(409);
    for (const l of lines) await w.foreman.post('/api/floor/progress', tap(l.id, 'loaded', 4));
    const res = await w.foreman
      .post(`/api/orders/${order.id}/delivery`, await seen(order.id, { receivedBy: 'Sam Site' }))
      .expect(200);
    expect(res.body.status).toBe('delivered');
    expect((await OrderLine.findByPk(lines[1].id))!.deliveredCount).toBe(4);
  });

  it('is the foreman’s and the plant manager’s; another plant’s line is not found', async () => {
    const { lines } = await released();
    await w.sales.post('/api/floor/progress', tap(lines[0].id, 'cut')).expect(403);
    const other = await productionWorld();
    await other.foreman.post('/api/floor/progress', tap(lines[0].id, 'cut')).expect(404);
    await w.foreman
      .post('/api/floor/progress', { ...tap(lines[0].id, 'cut'), clientId: 'x' })
      .expect(400);
  });
});
