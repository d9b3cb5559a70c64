import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../support/db';
import { createJob, createLine, createOrder, FINK_24 } from '../../support/factories';
import { salesDesk, type Session } from '../../support/desk';
import { AuditEvent, OrderLine, Quote, type Plant } from '../../../server/models';

/**
 * The row locks under parallel requests (Promise.all through one app and its pools): every command
 * locks the order, then its lines, so racing requests serialise instead of deadlocking or
 * overwriting each other.
 */
const app = testApp();
let plant: Plant;
let sales: Session;
let engineer: Session;

beforeAll(async () => {
  ({ plant, sales, engineer } = await salesDesk(app));
});

const noServerErrors = (statuses: number[]) =>
  expect(
    statuses.filter((s) => s >= 500),
    statuses.join(','),
  ).toEqual([]);

describe('parallel writes to one order', () => {
  it('a review racing a design edit: exactly one wins, and an approved line carries the design that was reviewed', async () => {
    const outcomes = new Set<string>();
    for (let trial = 0; trial < 12; trial++) {
      const order = await createOrder({ plant });
      const line = await createLine({ order });
      const base = `/api/orders/${order.id}/lines/${line.id}`;
      const [review, edit] = await Promise.all([
        engineer.post(`${base}/review`, { decision: 'approve', designVersion: 1 }),
        sales.patch(base, { design: { ...FINK_24, pitch: 5 } }),
      ]);
      noServerErrors([review.status, edit.status]);
      const after = (await OrderLine.findByPk(line.id))!;
      if (review.status === 200) {
        // Reviewed first: the edit was refused under the lock; the approved design is version 1.
        expect(edit.status).toBe(409);
        expect(edit.body.error.code).toBe('locked');
        expect(after).toMatchObject({ reviewState: 'approved', designVersion: 1 });
        expect(after.designInput).toEqual(line.designInput);
        outcomes.add('review first');
      } else {
        // Edited first: the review named a version that is no longer current.
        expect(review.status).toBe(409);
        expect(review.body.error.code).toBe('stale');
        expect(edit.status).toBe(200);
        expect(edit.body.designVersion).toBe(2);
        expect(after).toMatchObject({ reviewState: 'pending', designVersion: 2 });
        outcomes.add('edit first');
      }
    }
    expect(outcomes.size).toBeGreaterThan(0);
  });

  it('edits, copies, reorders, deletes and reviews of one order at once: no deadlock, no 500', async () => {
    const order = await createOrder({ plant });
    const lines = [];
    for (let i = 0; i < 4; i++) lines.push(await createLine({ order }));
    const base = `/api/orders/${order.id}/lines`;
    const res = await Promise.all([
      ...lines.map((l, i) => sales.patch(`${base}/${l.id}`, { quantity: 10 + i })),
      ...lines.map((l) =>
        engineer.post(`${base}/${l.id}/review`, { decision: 'approve', designVersion: 1 }),
      ),
      sales.patch(`${base}/${lines[0].id}`, { design: { ...FINK_24, pitch: 6 } }),
      sales.post(`${base}/${lines[1].id}/copy`),
      sales.post(`${base}/reorder`, { lineIds: [...lines].reverse().map((l) => l.id) }),
      sales.delete(`${base}/${lines[3].id}`),
    ]);
    noServerErrors(res.map((r) => r.status));
  });

  it('parallel copies get unique, consecutive marks and gapless positions', async () => {
    const order = await createOrder({ plant });
    const line = await createLine({ order, mark: 'T1' });
    const copies = await Promise.all(
      Array.from({ length: 10 }, () => sales.post(`/api/orders/${order.id}/lines/${line.id}/copy`)),
    );
    expect(copies.map((c) => c.status)).toEqual(Array(10).fill(201));
    const stored = await OrderLine.findAll({
      where: { orderId: order.id },
      order: [['position', 'ASC']],
    });
    expect(stored.map((l) => l.position)).toEqual(Array.from({ length: 11 }, (_, i) => i + 1));
    expect(
      stored.map((l) => l.mark).sort((a, b) => Number(a.slice(1)) - Number(b.slice(1))),
    ).toEqual(Array.from({ length: 11 }, (_, i) => `T${i + 1}`));
  });

  it('parallel new orders get unique, consecutive numbers', async () => {
    const job = await createJob({ plant });
    const res = await Promise.all(
      Array.from({ length: 10 }, () => sales.post('/api/orders', { jobId: job.id })),
    );
    expect(res.map((r) => r.status)).toEqual(Array(10).fill(201));
    const seq = res.map((r) => Number(String(r.body.number).split('-')[1])).sort((a, b) => a - b);
    expect(new Set(seq).size).toBe(10);
    expect(seq[9] - seq[0]).toBe(9);
  });

  it('parallel quotes of one order get revisions without gaps, and no identical twin', async () => {
    const order = await createOrder({ plant });
    const line = await createLine({ order });
    // Six identical requests at once: one revision; the rest are offered it (409 quote_unchanged).
    const res = await Promise.all(
      Array.from({ length: 6 }, () => sales.post(`/api/orders/${order.id}/quotes`)),
    );
    expect(res.map((r) => r.status).sort()).toEqual([201, 409, 409, 409, 409, 409]);
    expect(res.filter((r) => r.status === 409).map((r) => r.body.error.code)).toEqual(
      Array(5).fill('quote_unchanged'),
    );
    // Changed orders quoted again: each revision takes the next number.
    for (let i = 0; i < 3; i++) {
      await line.increment('quantity');
      await sales.post(`/api/orders/${order.id}/quotes`).expect(201);
    }
    const numbers = (await Quote.findAll({ where: { orderId: order.id } })).map((q) => q.number);
    expect(numbers.sort((a, b) => a - b)).toEqual([1, 2, 3, 4]);
  });

  it('parallel edits of one line record a true "before" in every audit event', async () => {
    const order = await createOrder({ plant });
    const line = await createLine({ order });
    const res = await Promise.all(
      Array.from({ length: 12 }, (_, i) =>
        sales.patch(`/api/orders/${order.id}/lines/${line.id}`, { quantity: 20 + i }),
      ),
    );
    expect(res.map((r) => r.status)).toEqual(Array(12).fill(200));
    const events = await AuditEvent.findAll({
      where: { subjectType: 'order', subjectId: order.id, action: 'line.updated' },
      order: [['id', 'ASC']],
    });
    expect(events).toHaveLength(12);
    // Each change starts where the previous one (in commit order) ended.
    let quantity = line.quantity;
    for (const e of events) {
      const d = e.data as { before: { quantity: number }; after: { quantity: number } };
      expect(d.before.quantity).toBe(quantity);
      quantity = d.after.quantity;
    }
    expect((await OrderLine.findByPk(line.id))!.quantity).toBe(quantity);
  });
});
