import { Op, QueryTypes, type Transaction } from 'sequelize';
import {
  plannedDelivery,
  planSchedule,
  trussMinutes,
  type ScheduleOrder,
} from '../../shared/engine/schedule';
import { formatDay, queueBuilderMail, type BuilderMail } from '../services/productionMail';
import { Customer, Order, SchedulePlacement, type User } from '../models';
import { badRequest, conflict } from '../errors';
import { orderEvent } from './audit';
import { settingsFor } from './productionSettings';

/** Orders on the schedule: released or in production, and not held. */
export const SCHEDULED_STATUSES = ['released', 'in_production'] as const;

export { plannedDelivery };

/** Today in the plant (UTC date; plants in one time zone per deployment). */
export const plantToday = () => new Date().toISOString().slice(0, 10);

interface LineWork {
  id: number;
  order_id: number;
  mark: string;
  remaining: number;
  plies: number;
  pieces: number;
  joints: number;
  plates: number;
}

/** What the labour model needs of each unfinished line, straight from the stored design JSON. */
const LINE_WORK_SQL = `
  SELECT l.id, l.order_id, l.mark, l.quantity - l.assembled_count AS remaining, l.plies,
         COALESCE(jsonb_array_length(l.design_result->'pieces'), 0) AS pieces,
         COALESCE(jsonb_array_length(l.design_result->'joints'), 0) AS joints,
         (SELECT count(*) FROM jsonb_array_elements(COALESCE(l.design_result->'plates', '[]'))
           p WHERE p->>'plate' IS NOT NULL)::int AS plates
    FROM order_lines l
   WHERE l.order_id IN (:ids) AND l.quantity > l.assembled_count
   ORDER BY l.order_id, l.position, l.id`;

export interface PlanChange {
  order: Order;
  before: string | null;
  after: string | null;
}

/**
 * Re-plan the plant from today: every released, unheld order's unassembled trusses, pinned moves
 * first (the rule in `planSchedule`). Replaces the stored placements and each order's planned
 * finish, inside the caller's transaction; returns the orders whose planned delivery changed.
 */
export async function replan(t: Transaction, plantId: number, today = plantToday()) {
  // One re-plan at a time per plant: placements are replaced wholesale.
  await Order.sequelize!.query('SELECT pg_advisory_xact_lock(13, :plantId)', {
    replacements: { plantId },
    transaction: t,
  });
  const { settings } = await settingsFor(plantId, t);
  const orders = await Order.findAll({
    where: { plantId, status: SCHEDULED_STATUSES as unknown as string[], onHold: false },
    transaction: t,
  });
  const lines = orders.length
    ? await Order.sequelize!.query<LineWork>(LINE_WORK_SQL, {
        replacements: { ids: orders.map((o) => o.id) },
        type: QueryTypes.SELECT,
        transaction: t,
      })
    : [];
  const byOrder = new Map<number, LineWork[]>();
  for (const l of lines) byOrder.set(l.order_id, [...(byOrder.get(l.order_id) ?? []), l]);
  const input: ScheduleOrder[] = orders
    .filter((o) => byOrder.has(o.id))
    .map((o) => ({
      id: o.id,
      releasedOn: (o.releasedAt ?? o.updatedAt).toISOString().slice(0, 10),
      promisedOn: o.promisedOn,
      pin: o.schedulePin,
      groups: byOrder.get(o.id)!.map((l) => ({
        key: String(l.id),
        mark: l.mark,
        quantity: l.remaining,
        minutesPerTruss: trussMinutes(
          { pieces: l.pieces, joints: l.joints, plates: l.plates, plies: l.plies },
          settings.labour,
        ),
        setupMinutes: settings.setupMinutes,
      })),
    }));
  const plan = planSchedule({
    start: today,
    horizonDays: settings.horizonDays,
    tables: settings.tables,
    calendar: { workingDays: settings.workingDays, closures: settings.closures },
    orders: input,
  });
  await SchedulePlacement.destroy({ where: { plantId }, transaction: t });
  await SchedulePlacement.bulkCreate(
    plan.placements.map((p) => ({
      plantId,
      orderId: p.orderId,
      orderLineId: Number(p.groupKey),
      mark: p.mark,
      tableId: p.tableId,
      onDate: p.date,
      minutes: p.minutes,
      setupMinutes: p.setupMinutes,
      quantity: p.quantity,
      pinned: p.pinned,
    })),
    { transaction: t },
  );
  const planned = new Map(plan.orders.map((o) => [o.orderId, o]));
  const changes: PlanChange[] = [];
  // Held, finished or unscheduled orders lose their planned finish; the rest take the new one.
  const touched = await Order.findAll({
    where: {
      plantId,
      [Op.or]: [{ id: orders.map((o) => o.id) }, { plannedFinishOn: { [Op.ne]: null } }],
    },
    transaction: t,
  });
  for (const o of touched) {
    const p = planned.get(o.id);
    const before = plannedDelivery(o);
    const finish = p?.canMakeOn ?? null;
    const late = p?.late ?? false;
    if (o.plannedFinishOn === finish && o.plannedLate === late) continue;
    await Order.update(
      { plannedFinishOn: finish, plannedLate: late },
      { where: { id: o.id }, transaction: t, silent: true },
    );
    o.plannedFinishOn = finish;
    o.plannedLate = late;
    const after = plannedDelivery(o);
    if (before !== after) changes.push({ order: o, before, after });
  }
  return { plan, changes };
}

/** E-mails to builders whose planned delivery moved (not the first plan: the release mail says it). */
export async function deliveryChangeMails(changes: PlanChange[], t?: Transaction) {
  const mails: BuilderMail[] = [];
  for (const c of changes) {
    if (!c.before || !c.after || !SCHEDULED_STATUSES.includes(c.order.status as never)) continue;
    const customer = await Customer.findByPk(c.order.customerId, { transaction: t });
    mails.push({
      plantId: c.order.plantId,
      orderId: c.order.id,
      kind: 'production.planned',
      to: customer!.email,
      subject: `Order ${c.order.number}: planned delivery now ${formatDay(c.after)}`,
      text:
        `The planned delivery of your order ${c.order.number} moved from ${formatDay(c.before)} ` +
        `to ${formatDay(c.after)}.\n\nWe will confirm the delivery day before we load.`,
    });
  }
  return mails;
}

/**
 * Re-plan (`replan`) and queue the e-mails of builders whose planned delivery moved, in the same
 * transaction; `quiet` is an order whose own e-mail already says it.
 */
export async function replanAndTell(
  t: Transaction,
  plantId: number,
  opts: { today?: string; quiet?: number } = {},
) {
  const result = await replan(t, plantId, opts.today);
  const moved = result.changes.filter((c) => c.order.id !== opts.quiet);
  await queueBuilderMail(t, await deliveryChangeMails(moved, t));
  return result;
}

/**
 * The foreman moves an order: it starts on this table on this day (a pin the re-plan keeps).
 * Refuses a day the plant does not work, a table it does not have, or a day before release.
 */
export async function moveOrder(
  actor: User,
  order: Order,
  target: { tableId: number; date: string },
  today = plantToday(),
) {
  const { settings } = await settingsFor(order.plantId);
  if (!settings.tables.some((t) => t.id === target.tableId))
    throw badRequest('That table is not in the production settings.', { tableId: 'Unknown table' });
  const weekday = new Date(`${target.date}T00:00:00Z`).getUTCDay();
  if (!settings.workingDays.includes(weekday) || settings.closures.includes(target.date))
    throw badRequest('The plant does not work that day.', { date: 'Not a working day' });
  if (target.date < today) throw badRequest('Pick today or a later day.', { date: 'In the past' });
  return Order.sequelize!.transaction(async (t) => {
    const o = await Order.findByPk(order.id, { transaction: t, lock: t.LOCK.UPDATE });
    if (!o || !SCHEDULED_STATUSES.includes(o.status as never) || o.onHold)
      throw conflict('Only a released order that is not on hold can be moved.');
    const released = o.releasedAt!.toISOString().slice(0, 10);
    if (target.date < released)
      throw badRequest(`Order ${o.number} was released on ${released}; it cannot start before.`, {
        date: 'Before release',
      });
    await o.update({ schedulePin: target }, { transaction: t });
    await orderEvent(t, actor, o, 'order.moved', { ...target });
    const result = await replanAndTell(t, o.plantId, { today });
    return { order: o, ...result };
  });
}
