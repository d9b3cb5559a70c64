/**
 * Demo orders with designed truss lines (invented jobs; the designs are computed by the engine like
 * any saved line). Idempotent by order number.
 */
import { AuditEvent, Job, Order, OrderLine, Plant, User } from '../server/models';
import { computeDesign } from '../server/services/design';
import { ORDERS } from './orderLines';

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
