import { EngineError } from '../errors';
import { tableDayMinutes, workingDates } from './calendar';
import type {
  DayLoad,
  MarkGroup,
  OrderPlan,
  Placement,
  ScheduleInput,
  ScheduleOrder,
  SchedulePlan,
} from './types';

// Crew-minutes below this are float noise, not work.
const EPS = 1e-6;

/** First index of `dates` (sorted ISO) at or after `iso`. */
function firstIndexFrom(dates: readonly string[], iso: string): number {
  let lo = 0;
  let hi = dates.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (dates[mid] < iso) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Pinned orders first (by pin date), then earliest promised date, earliest release, lowest id. */
function planningOrder(orders: readonly ScheduleOrder[]): ScheduleOrder[] {
  const key = (o: ScheduleOrder) => [
    o.pin ? 0 : 1,
    o.pin ? o.pin.date : (o.promisedOn ?? '9999-12-31'),
    o.releasedOn,
  ];
  return [...orders].sort((a, b) => {
    const ka = key(a);
    const kb = key(b);
    for (let i = 0; i < ka.length; i++) {
      if (ka[i] !== kb[i]) return ka[i] < kb[i] ? -1 : 1;
    }
    return a.id - b.id;
  });
}

/** Trusses of a group finished once `done` of its crew-minutes are spent (set-up first). */
function trussesDone(group: MarkGroup, done: number): number {
  if (group.minutesPerTruss <= 0) return done + EPS >= group.setupMinutes ? group.quantity : 0;
  const n = Math.floor((done - group.setupMinutes) / group.minutesPerTruss + EPS);
  return Math.max(0, Math.min(group.quantity, n));
}

function validate(input: ScheduleInput) {
  const bad = (msg: string) => new EngineError('invalid', msg);
  if (!/^\d{4}-\d{2}-\d{2}$/.test(input.start)) throw bad('The plan needs a start date.');
  const ids = new Set(input.tables.map((t) => t.id));
  for (const o of input.orders) {
    if (o.pin && !ids.has(o.pin.tableId))
      throw bad(`Order ${o.id} is pinned to a table that does not exist.`);
    for (const g of o.groups) {
      if (!(g.quantity > 0 && g.minutesPerTruss >= 0 && g.setupMinutes >= 0))
        throw bad(`Order ${o.id}, mark ${g.mark}: quantity and minutes must be positive.`);
    }
  }
}

/**
 * Plan released orders onto tables and days. The rule (earliest-due-date list scheduling):
 *
 * 1. Orders are taken one at a time: manually pinned orders first (by pin date), then by promised
 *    date (undated last), then release date, then id.
 * 2. Each of an order's mark groups (its trusses of one mark) goes whole onto ONE table, so the
 *    set-up is paid once; it fills that table's free crew-minutes day after day from the order's
 *    release (or its pin date) until done, so a group may continue on the next working day.
 * 3. The table is the one where the group finishes earliest (then starts earliest, then the first
 *    listed); a pinned order uses its pinned table.
 * 4. An order whose last truss is built after its promised date is `late`, with the date it can
 *    make; a group that does not fit within the horizon is left unplaced and the order is late.
 *
 * Capacity is never exceeded and nothing is planned before release. On one table this rule meets
 * every promised date whenever any plan can (the earliest-due-date argument in the README); with
 * several tables a group's table choice is a packing problem and the rule is a heuristic.
 */
export function planSchedule(input: ScheduleInput): SchedulePlan {
  validate(input);
  const dates = workingDates(input.start, input.horizonDays, input.calendar);
  const D = dates.length;
  const tables = input.tables;
  const capacity = tables.map(tableDayMinutes);
  const free = new Float64Array(tables.length * D);
  tables.forEach((_, t) => free.fill(capacity[t], t * D, (t + 1) * D));

  const placements: Placement[] = [];
  const plans: OrderPlan[] = [];

  // Last day index a group of `work` minutes reaches on table t from day `from`, or -1.
  const finishOn = (t: number, from: number, work: number): number => {
    let left = work;
    for (let i = from; i < D; i++) {
      left -= free[t * D + i];
      if (left <= EPS) return i;
    }
    return -1;
  };

  for (const order of planningOrder(input.orders)) {
    const released = input.start > order.releasedOn ? input.start : order.releasedOn;
    const pinFrom = order.pin && order.pin.date > released ? order.pin.date : released;
    const from = firstIndexFrom(dates, pinFrom);
    const candidates = order.pin
      ? [tables.findIndex((t) => t.id === order.pin!.tableId)]
      : tables.map((_, t) => t);
    const unplaced: string[] = [];
    let first = Infinity;
    let last = -1;
    for (const group of order.groups) {
      const work = group.setupMinutes + group.quantity * group.minutesPerTruss;
      let best = -1;
      let bestFinish = Infinity;
      for (const t of candidates) {
        const f = finishOn(t, from, work);
        if (f >= 0 && f < bestFinish) {
          best = t;
          bestFinish = f;
        }
      }
      if (best < 0) {
        unplaced.push(group.key);
        continue;
      }
      let done = 0;
      let built = 0;
      for (let i = from; i <= bestFinish; i++) {
        const k = best * D + i;
        const take = Math.min(free[k], work - done);
        if (take <= EPS) continue;
        free[k] -= take;
        const setupBefore = Math.min(done, group.setupMinutes);
        done += take;
        const nowBuilt = i === bestFinish ? group.quantity : trussesDone(group, done);
        placements.push({
          orderId: order.id,
          groupKey: group.key,
          mark: group.mark,
          tableId: tables[best].id,
          date: dates[i],
          minutes: take,
          setupMinutes: Math.min(done, group.setupMinutes) - setupBefore,
          quantity: nowBuilt - built,
          pinned: !!order.pin,
        });
        built = nowBuilt;
        first = Math.min(first, i);
        last = Math.max(last, i);
      }
    }
    const finish = last >= 0 ? dates[last] : null;
    const late =
      unplaced.length > 0 ||
      (order.promisedOn !== null && finish !== null && finish > order.promisedOn);
    plans.push({
      orderId: order.id,
      startOn: Number.isFinite(first) ? dates[first] : null,
      finishOn: finish,
      promisedOn: order.promisedOn,
      late,
      canMakeOn: unplaced.length > 0 ? null : finish,
      unplaced,
    });
  }

  const load: DayLoad[] = [];
  tables.forEach((table, t) => {
    for (let i = 0; i < D; i++)
      load.push({
        tableId: table.id,
        date: dates[i],
        capacity: capacity[t],
        used: capacity[t] - free[t * D + i],
      });
  });
  return { placements, orders: plans, load };
}
