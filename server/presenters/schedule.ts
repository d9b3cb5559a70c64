import { Op, QueryTypes } from 'sequelize';
import type { Schedule, ScheduleBlock } from '../../shared/api/production';
import { tableDayMinutes, workingDates, dayNumber } from '../../shared/engine/schedule';
import { Customer, Order, SchedulePlacement } from '../models';
import { settingsFor } from '../commands/productionSettings';
import { SCHEDULED_STATUSES } from '../commands/schedule';

/** Orders ready to deliver (every truss banded), oldest promise first, with whether all is loaded. */
async function readyOrders(plantId: number) {
  const rows = await Order.sequelize!.query<{
    id: number;
    number: string;
    customer: string;
    promised_on: string | null;
    loaded: boolean;
    version: number;
  }>(
    `SELECT o.id, o.number, c.name AS customer, o.promised_on, o.version,
            NOT EXISTS (SELECT 1 FROM order_lines l
                         WHERE l.order_id = o.id AND l.loaded_count < l.quantity) AS loaded
       FROM orders o JOIN customers c ON c.id = o.customer_id
      WHERE o.plant_id = :plantId AND o.status = 'ready'
      ORDER BY o.promised_on NULLS LAST, o.id`,
    { replacements: { plantId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    id: r.id,
    number: r.number,
    customer: r.customer,
    promisedOn: r.promised_on,
    loaded: r.loaded,
    version: r.version,
  }));
}

/** Orders on hold that the board lists for release (held before or after their release). */
async function heldOrders(plantId: number) {
  const orders = await Order.findAll({
    where: {
      plantId,
      onHold: true,
      status: ['accepted', 'deposit_paid', ...SCHEDULED_STATUSES],
    },
    include: [{ model: Customer, as: 'customer', attributes: ['name'] }],
    order: [
      ['promisedOn', 'ASC NULLS LAST'],
      ['id', 'ASC'],
    ],
  });
  return orders.map((o) => ({
    id: o.id,
    number: o.number,
    customer: o.customer?.name ?? '',
    status: o.status,
    promisedOn: o.promisedOn,
    holdReason: o.holdReason,
    version: o.version,
  }));
}

/** The board: working days from…to, each table's load against capacity, one block per order per table-day. */
export async function presentSchedule(
  plantId: number,
  from: string,
  to: string,
): Promise<Schedule> {
  const { settings } = await settingsFor(plantId);
  const days = workingDates(from, dayNumber(to) - dayNumber(from) + 1, {
    workingDays: settings.workingDays,
    closures: settings.closures,
  });
  const placements = await SchedulePlacement.findAll({
    where: { plantId, onDate: { [Op.between]: [from, to] } },
    order: [
      ['onDate', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  const orders = await Order.findAll({
    where: { plantId, status: SCHEDULED_STATUSES as unknown as string[] },
    include: [{ model: Customer, as: 'customer', attributes: ['name'] }],
    order: [['id', 'ASC']],
  });
  const byId = new Map(orders.map((o) => [o.id, o]));
  const blocks = new Map<string, ScheduleBlock>();
  const used = new Map<string, number>();
  const minutes = new Map<number, number>();
  for (const p of placements) {
    const o = byId.get(p.orderId);
    if (!o) continue;
    const k = `${p.orderId}|${p.tableId}|${p.onDate}`;
    const b = blocks.get(k) ?? {
      orderId: o.id,
      number: o.number,
      customer: o.customer?.name ?? '',
      tableId: p.tableId,
      date: p.onDate,
      minutes: 0,
      trusses: 0,
      marks: [],
      pinned: p.pinned,
    };
    b.minutes += p.minutes;
    b.trusses += p.quantity;
    if (!b.marks.includes(p.mark)) b.marks.push(p.mark);
    blocks.set(k, b);
    const lk = `${p.tableId}|${p.onDate}`;
    used.set(lk, (used.get(lk) ?? 0) + p.minutes);
    minutes.set(o.id, (minutes.get(o.id) ?? 0) + p.minutes);
  }
  const tables = settings.tables.map((t) => ({ ...t, capacity: tableDayMinutes(t) }));
  return {
    from,
    days,
    tables,
    load: tables.flatMap((t) =>
      days.map((d) => ({
        tableId: t.id,
        date: d,
        capacity: t.capacity,
        used: used.get(`${t.id}|${d}`) ?? 0,
      })),
    ),
    blocks: [...blocks.values()],
    orders: orders.map((o) => ({
      id: o.id,
      number: o.number,
      customer: o.customer?.name ?? '',
      status: o.status,
      promisedOn: o.promisedOn,
      plannedFinishOn: o.plannedFinishOn,
      late: o.plannedLate,
      minutes: minutes.get(o.id) ?? 0,
      version: o.version,
    })),
    ready: await readyOrders(plantId),
    held: await heldOrders(plantId),
  };
}
