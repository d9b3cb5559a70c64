/**
 * Demo orders with designed truss lines (invented jobs; the designs are computed by the engine like
 * any saved line). Idempotent by order number.
 */
import { AuditEvent, Job, Order, OrderLine, Plant, User } from '../server/models';
import { computeDesign } from '../server/services/design';

const base = {
  units: 'imperial',
  heelHeight: 0,
  spacing: 24,
  loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
};

const ORDERS: {
  job: string;
  number: string;
  lines: { mark: string; quantity: number; design: object; review?: 'approved' | 'returned' }[];
}[] = [
  {
    job: 'Lot 14 — Orchard View',
    number: '2026-0001',
    lines: [
      {
        mark: 'T1',
        quantity: 14,
        design: { ...base, profile: 'fink', span: 336, pitch: 6, overhang: 18 },
        review: 'approved',
      },
      {
        mark: 'T2',
        quantity: 2,
        design: { ...base, profile: 'kingPost', span: 168, pitch: 6, overhang: 18 },
      },
      {
        mark: 'T3',
        quantity: 6,
        design: { ...base, profile: 'scissor', span: 288, pitch: 6, bottomPitch: 3, overhang: 18 },
      },
    ],
  },
  {
    job: 'Tanner Street duplex',
    number: '2026-0002',
    lines: [
      {
        mark: 'T1',
        quantity: 22,
        design: {
          ...base,
          profile: 'howe',
          span: 360,
          pitch: 5,
          overhang: 12,
          loads: { ...base.loads, snow: { pg: 30 } },
        },
      },
      {
        mark: 'T2',
        quantity: 4,
        design: { ...base, profile: 'mono', span: 144, pitch: 4, overhang: 12 },
        review: 'returned',
      },
    ],
  },
  {
    job: 'Mill Race farmhouse',
    number: '2026-0003',
    lines: [
      {
        mark: 'T1',
        quantity: 18,
        design: { ...base, profile: 'doubleFink', span: 432, pitch: 8, overhang: 24 },
      },
    ],
  },
  {
    // Every design approved: ready for the shop, with its cut list and lumber plan seeded.
    job: 'Harlow Bend workshop',
    number: '2026-0004',
    lines: [
      {
        mark: 'T1',
        quantity: 16,
        design: { ...base, profile: 'fink', span: 336, pitch: 6, overhang: 18 },
        review: 'approved',
      },
      {
        mark: 'T2',
        quantity: 8,
        design: { ...base, profile: 'howe', span: 288, pitch: 6, overhang: 18 },
        review: 'approved',
      },
      {
        mark: 'T3',
        quantity: 4,
        design: { ...base, profile: 'kingPost', span: 120, pitch: 6, overhang: 12 },
        review: 'approved',
      },
    ],
  },
];

export async function seedOrders(plant: Plant) {
  const sales = await User.findOne({ where: { plantId: plant.id, role: 'sales' } });
  const engineer = await User.findOne({ where: { plantId: plant.id, role: 'engineer' } });
  let highest = 0;
  for (const o of ORDERS) {
    highest = Math.max(highest, Number(o.number.slice(5)));
    const job = await Job.findOne({ where: { plantId: plant.id, name: o.job } });
    if (!job) continue;
    const [order, created] = await Order.findOrCreate({
      where: { plantId: plant.id, number: o.number },
      defaults: {
        plantId: plant.id,
        customerId: job.customerId,
        jobId: job.id,
        number: o.number,
        createdBy: sales?.id ?? null,
      },
    });
    if (!created) continue;
    const event = (action: string, actor: User | null, data: Record<string, unknown>) =>
      AuditEvent.create({
        plantId: plant.id,
        actorId: actor?.id ?? null,
        action,
        subjectType: 'order',
        subjectId: order.id,
        data,
      });
    await event('order.created', sales, { number: order.number, jobId: job.id });
    for (const [i, l] of o.lines.entries()) {
      const d = computeDesign(l.design, { plies: 1 });
      await OrderLine.create({
        orderId: order.id,
        position: i + 1,
        mark: l.mark,
        quantity: l.quantity,
        plies: 1,
        profile: d.profile,
        designInput: d.input as never,
        designResult: d.result as never,
        engineVersion: d.engineVersion,
        designOk: d.ok,
        maxCsi: d.maxCsi,
        warningCount: d.warningCount,
        description: d.description,
        reviewState: l.review && d.ok ? l.review : l.review === 'returned' ? 'returned' : 'pending',
        reviewComment:
          l.review === 'returned' ? 'Confirm the bearing at the low end with the framer.' : null,
        reviewedBy: l.review ? (engineer?.id ?? null) : null,
        reviewedAt: l.review ? new Date() : null,
      });
      await event('line.added', sales, {
        mark: l.mark,
        quantity: l.quantity,
        description: d.description,
        ok: d.ok,
      });
      if (l.review === 'approved' && d.ok) await event('line.approved', engineer, { mark: l.mark });
      if (l.review === 'returned')
        await event('line.returned', engineer, {
          mark: l.mark,
          comment: 'Confirm the bearing at the low end with the framer.',
        });
    }
  }
  if (plant.nextOrderNumber <= highest) await plant.update({ nextOrderNumber: highest + 1 });
}
