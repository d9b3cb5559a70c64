import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import { createLine, createOrder, FINK_24 } from '../../../support/factories';
import { salesDesk, type Session } from '../../../support/desk';
import { AuditEvent, OrderLine, type Plant } from '../../../../server/models';

const app = testApp();
let plant: Plant;
let sales: Session;
let engineer: Session;

beforeAll(async () => {
  ({ plant, sales, engineer } = await salesDesk(app));
});

describe('a line’s design version', () => {
  it('is in every line the API returns and rises with each design change, not with quantity or mark', async () => {
    const order = await createOrder({ plant });
    const line = await createLine({ order });
    const base = `/api/orders/${order.id}/lines/${line.id}`;
    expect((await sales.get(base).expect(200)).body.designVersion).toBe(1);
    const page = await sales.get(`/api/orders/${order.id}`).expect(200);
    expect(page.body.lines[0].designVersion).toBe(1);
    const queue = await engineer.get('/api/reviews?pageSize=100').expect(200);
    const item = queue.body.items.find((i: { id: number }) => i.id === line.id);
    expect(item.designVersion).toBe(1);

    expect(
      (await sales.patch(base, { quantity: 7, mark: 'TX' }).expect(200)).body.designVersion,
    ).toBe(1);
    expect(
      (await sales.patch(base, { design: { ...FINK_24, pitch: 5 } }).expect(200)).body
        .designVersion,
    ).toBe(2);
    expect((await sales.patch(base, { plies: 2 }).expect(200)).body.designVersion).toBe(3);
    const copy = await sales.post(`${base}/copy`).expect(201);
    expect(copy.body.designVersion).toBe(1);
  });

  it('a review names the version it looked at: an older one answers 409 stale and changes nothing', async () => {
    const order = await createOrder({ plant });
    const line = await createLine({ order });
    const base = `/api/orders/${order.id}/lines/${line.id}`;
    // The reviewer opened version 1; sales changes the design meanwhile.
    await sales.patch(base, { design: { ...FINK_24, pitch: 6 } }).expect(200);
    const stale = await engineer
      .post(`${base}/review`, { decision: 'approve', designVersion: 1 })
      .expect(409);
    expect(stale.body.error.code).toBe('stale');
    expect(stale.body.error.message).toMatch(/changed since you opened it/);
    expect(await OrderLine.findByPk(line.id)).toMatchObject({
      reviewState: 'pending',
      designVersion: 2,
    });
    expect(
      await AuditEvent.count({ where: { subjectId: order.id, action: 'line.approved' } }),
    ).toBe(0);
    // Without a version the review is refused as bad input.
    await engineer.post(`${base}/review`, { decision: 'approve' }).expect(400);
    const ok = await engineer
      .post(`${base}/review`, { decision: 'approve', designVersion: 2 })
      .expect(200);
    expect(ok.body).toMatchObject({ reviewState: 'approved', designVersion: 2 });
  });

  it('an approved line can be deleted from a draft order; the history records its approval went with it', async () => {
    const order = await createOrder({ plant });
    const line = await createLine({ order, reviewState: 'approved' });
    await sales.delete(`/api/orders/${order.id}/lines/${line.id}`).expect(204);
    expect(await OrderLine.findByPk(line.id)).toBeNull();
    const e = await AuditEvent.findOne({ where: { subjectId: order.id, action: 'line.deleted' } });
    expect(e!.data).toMatchObject({ lineId: line.id, reviewState: 'approved', designVersion: 1 });
    // Gone means gone: a second delete and a review of it answer 404.
    await sales.delete(`/api/orders/${order.id}/lines/${line.id}`).expect(404);
    await engineer
      .post(`/api/orders/${order.id}/lines/${line.id}/review`, {
        decision: 'approve',
        designVersion: 1,
      })
      .expect(404);
  });
});
