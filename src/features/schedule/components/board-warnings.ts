import type { Schedule, ScheduleBlock } from '../../../../shared/api/production';

/**
 * What a drop would break, said before it happens: the target day's capacity (the block's work
 * does not fit beside what is there, so it runs on) and the order's promised date.
 */
export function moveWarnings(
  board: Schedule,
  block: ScheduleBlock,
  target: { tableId: number; date: string },
): string[] {
  const out: string[] = [];
  const load = board.load.find((l) => l.tableId === target.tableId && l.date === target.date);
  const same = block.tableId === target.tableId && block.date === target.date;
  const orderMinutes = board.orders.find((o) => o.id === block.orderId)?.minutes ?? block.minutes;
  if (load && !same && load.used + Math.min(orderMinutes, load.capacity) > load.capacity + 1e-6)
    out.push(
      `That day is ${Math.round((100 * load.used) / load.capacity)} % loaded: order ${block.number} ` +
        'will not fit and runs into the following days.',
    );
  const order = board.orders.find((o) => o.id === block.orderId);
  if (order?.promisedOn && target.date > order.promisedOn)
    out.push(
      `Order ${block.number} is promised for ${order.promisedOn}; starting on ${target.date} misses it.`,
    );
  return out;
}

/** Hours with one decimal, for load labels. */
export const hours = (minutes: number) => `${(minutes / 60).toFixed(1)} h`;
