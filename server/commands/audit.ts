import type { Transaction } from 'sequelize';
import { AuditEvent, Order, type User } from '../models';

/** Append one audit event inside the command's transaction. */
export function audit(
  t: Transaction,
  e: {
    plantId: number;
    actorId: number | null;
    action: string;
    subjectType: string;
    subjectId: number | null;
    data?: Record<string, unknown>;
  },
) {
  return AuditEvent.create({ ...e, data: e.data ?? {} }, { transaction: t });
}

/** Every change to an order lands in its history, and marks the order as touched. */
export async function orderEvent(
  t: Transaction,
  actor: User,
  order: Order,
  action: string,
  data: Record<string, unknown>,
) {
  await Order.sequelize!.query('UPDATE orders SET updated_at = now() WHERE id = :id', {
    replacements: { id: order.id },
    transaction: t,
  });
  await audit(t, {
    plantId: order.plantId,
    actorId: actor.id,
    action,
    subjectType: 'order',
    subjectId: order.id,
    data,
  });
}
