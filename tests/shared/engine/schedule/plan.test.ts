import fc from 'fast-check';
import highsLoader from 'highs';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  addCalendarDays,
  planSchedule,
  tableDayMinutes,
  trussMinutes,
  workingDates,
  calibrationFactor,
  type ScheduleInput,
  type ScheduleOrder,
} from '../../../../shared/engine/schedule';

const MON = '2027-01-04'; // a Monday
const WEEKDAYS = { workingDays: [1, 2, 3, 4, 5], closures: [] as string[] };
const table = (id: number, hours = 8, crew = 1) => ({
  id,
  name: `Table ${id}`,
  crew,
  shifts: 1,
  hoursPerShift: hours,
});

describe('planSchedule: a worked case', () => {
  it('plans the earlier promise first and continues a group on the next day', () => {
    // One table, 480 crew-minutes a day. Order 2 (due Tue) needs 60 + 20 × 30 = 660 min: all of
    // Monday (14 trusses after set-up) and 180 min Tuesday (6). Order 1 (due Wed) needs 30 + 10 × 30
    // = 330 min: the 300 left on Tuesday (9 trusses) and 30 on Wednesday (1).
    const plan = planSchedule({
      start: MON,
      horizonDays: 14,
      tables: [table(1)],
      calendar: WEEKDAYS,
      orders: [
        {
          id: 1,
          releasedOn: MON,
          promisedOn: '2027-01-06',
          groups: [{ key: 'a', mark: 'T1', quantity: 10, minutesPerTruss: 30, setupMinutes: 30 }],
        },
        {
          id: 2,
          releasedOn: MON,
          promisedOn: '2027-01-05',
          groups: [{ key: 'b', mark: 'T2', quantity: 20, minutesPerTruss: 30, setupMinutes: 60 }],
        },
      ],
    });
    const rows = plan.placements.map((p) => [p.orderId, p.date, p.minutes, p.quantity]);
    expect(rows).toEqual([
      [2, '2027-01-04', 480, 14],
      [2, '2027-01-05', 180, 6],
      [1, '2027-01-05', 300, 9],
      [1, '2027-01-06', 30, 1],
    ]);
    expect(plan.orders.find((o) => o.orderId === 1)).toMatchObject({
      finishOn: '2027-01-06',
      late: false,
    });
  });

  it('flags an order that cannot make its date with the date it can make', () => {
    const plan = planSchedule({
      start: MON,
      horizonDays: 14,
      tables: [table(1)],
      calendar: { workingDays: [1, 2, 3, 4, 5], closures: ['2027-01-05'] },
      orders: [
        {
          id: 7,
          releasedOn: MON,
          promisedOn: '2027-01-05',
          groups: [{ key: 'a', mark: 'G1', quantity: 4, minutesPerTruss: 200, setupMinutes: 0 }],
        },
      ],
    });
    // 800 min: Monday 480, Tuesday closed, Wednesday 320.
    expect(plan.orders[0]).toMatchObject({ late: true, canMakeOn: '2027-01-06' });
  });

  it('starts a pinned order on its table and day, never before release', () => {
    const plan = planSchedule({
      start: MON,
      horizonDays: 14,
      tables: [table(1), table(2)],
      calendar: WEEKDAYS,
      orders: [
        {
          id: 1,
          releasedOn: '2027-01-06',
          promisedOn: null,
          pin: { tableId: 2, date: MON },
          groups: [{ key: 'a', mark: 'T1', quantity: 2, minutesPerTruss: 30, setupMinutes: 0 }],
        },
      ],
    });
    expect(plan.placements).toMatchObject([{ tableId: 2, date: '2027-01-06', pinned: true }]);
  });
});

describe('labour model', () => {
  it('counts minutes per ply and calibrates to measured time', () => {
    const model = { perTruss: 6, perPiece: 1.5, perJoint: 1, perPlate: 0.5, factor: 1 };
    const work = { pieces: 9, joints: 8, plates: 16, plies: 2 };
    // 6 + 2 × (13.5 + 8 + 8) = 65
    expect(trussMinutes(work, model)).toBe(65);
    const f = calibrationFactor([{ work, measuredMinutes: 78 }], model);
    expect(f).toBeCloseTo(1.2, 12);
    expect(trussMinutes(work, { ...model, factor: f })).toBeCloseTo(78, 9);
  });
});

const orderArb = (tables: number, maxDays: number) =>
  fc.record({
    release: fc.integer({ min: 0, max: maxDays }),
    due: fc.option(fc.integer({ min: 0, max: maxDays + 10 }), { nil: null }),
    pin: fc.option(
      fc.record({
        table: fc.integer({ min: 1, max: tables }),
        day: fc.integer({ min: 0, max: 10 }),
      }),
      { nil: null, freq: 4 },
    ),
    groups: fc.array(
      fc.record({
        quantity: fc.integer({ min: 1, max: 20 }),
        minutes: fc.integer({ min: 5, max: 90 }),
        setup: fc.integer({ min: 0, max: 60 }),
      }),
      { minLength: 1, maxLength: 3 },
    ),
  });

const instanceArb = fc
  .record({
    tables: fc.array(
      fc.record({
        crew: fc.integer({ min: 1, max: 4 }),
        shifts: fc.integer({ min: 1, max: 2 }),
        hours: fc.integer({ min: 2, max: 10 }),
      }),
      { minLength: 1, maxLength: 4 },
    ),
    closures: fc.array(fc.integer({ min: 0, max: 30 }), { maxLength: 4 }),
    saturday: fc.boolean(),
  })
  .chain((base) =>
    fc.record({
      base: fc.constant(base),
      orders: fc.array(orderArb(base.tables.length, 20), { minLength: 1, maxLength: 12 }),
    }),
  )
  .map(({ base, orders }): ScheduleInput => ({
    start: MON,
    horizonDays: 42,
    tables: base.tables.map((t, i) => ({
      id: i + 1,
      name: `T${i + 1}`,
      crew: t.crew,
      shifts: t.shifts,
      hoursPerShift: t.hours,
    })),
    calendar: {
      workingDays: base.saturday ? [1, 2, 3, 4, 5, 6] : [1, 2, 3, 4, 5],
      closures: base.closures.map((d) => addCalendarDays(MON, d)),
    },
    orders: orders.map((o, i): ScheduleOrder => ({
      id: i + 1,
      releasedOn: addCalendarDays(MON, o.release),
      promisedOn: o.due === null ? null : addCalendarDays(MON, o.due),
      pin: o.pin ? { tableId: o.pin.table, date: addCalendarDays(MON, o.pin.day) } : null,
      groups: o.groups.map((g, j) => ({
        key: `${i + 1}-${j}`,
        mark: `T${j + 1}`,
        quantity: g.quantity,
        minutesPerTruss: g.minutes,
        setupMinutes: g.setup,
      })),
    })),
  }));

describe('planSchedule: properties', () => {
  it('never exceeds a table-day’s capacity, and the load agrees with the placements', () => {
    fc.assert(
      fc.property(instanceArb, (input) => {
        const plan = planSchedule(input);
        const used = new Map<string, number>();
        for (const p of plan.placements) {
          const k = `${p.tableId}|${p.date}`;
          used.set(k, (used.get(k) ?? 0) + p.minutes);
        }
        for (const l of plan.load) {
          expect(l.used).toBeLessThanOrEqual(l.capacity + 1e-6);
          expect(used.get(`${l.tableId}|${l.date}`) ?? 0).toBeCloseTo(l.used, 6);
        }
        const days = new Set(workingDates(input.start, input.horizonDays, input.calendar));
        for (const p of plan.placements) expect(days.has(p.date)).toBe(true);
      }),
    );
  });

  it('plans nothing before an order’s release (or its pin), and a pinned order only on its table', () => {
    fc.assert(
      fc.property(instanceArb, (input) => {
        const plan = planSchedule(input);
        const byId = new Map(input.orders.map((o) => [o.id, o]));
        for (const p of plan.placements) {
          const o = byId.get(p.orderId)!;
          expect(p.date >= o.releasedOn).toBe(true);
          if (o.pin) {
            expect(p.tableId).toBe(o.pin.tableId);
            expect(p.date >= o.pin.date).toBe(true);
          }
        }
      }),
    );
  });

  it('schedules every truss of every placed group, on one table, and flags the rest', () => {
    fc.assert(
      fc.property(instanceArb, (input) => {
        const plan = planSchedule(input);
        for (const o of input.orders) {
          const op = plan.orders.find((x) => x.orderId === o.id)!;
          for (const g of o.groups) {
            const ps = plan.placements.filter((p) => p.orderId === o.id && p.groupKey === g.key);
            if (op.unplaced.includes(g.key)) {
              expect(ps).toHaveLength(0);
              expect(op.late).toBe(true);
              continue;
            }
            expect(ps.reduce((s, p) => s + p.quantity, 0)).toBe(g.quantity);
            expect(ps.reduce((s, p) => s + p.minutes, 0)).toBeCloseTo(
              g.setupMinutes + g.quantity * g.minutesPerTruss,
              6,
            );
            expect(new Set(ps.map((p) => p.tableId)).size).toBe(1);
          }
          if (op.finishOn && o.promisedOn)
            expect(op.late).toBe(op.finishOn > o.promisedOn || op.unplaced.length > 0);
        }
      }),
    );
  });
});

/**
 * Independent check of "dates met whenever a feasible plan exists" on one table: the plan exists
 * iff the transportation LP (work of each group spread over the working days between its release
 * and its promised date, each day's total within capacity) is feasible, solved by HiGHS.
 */
describe('planSchedule against an LP feasibility check (HiGHS), one table', () => {
  let highs: Awaited<ReturnType<typeof highsLoader>>;
  beforeAll(async () => {
    highs = await highsLoader();
  });

  const lpFeasible = (input: ScheduleInput) => {
    const dates = workingDates(input.start, input.horizonDays, input.calendar);
    const cap = tableDayMinutes(input.tables[0]);
    const vars: string[] = [];
    const perDay = dates.map(() => [] as string[]);
    const rows: string[] = [];
    input.orders.forEach((o, i) =>
      o.groups.forEach((g, j) => {
        const work = g.setupMinutes + g.quantity * g.minutesPerTruss;
        const mine: string[] = [];
        dates.forEach((d, k) => {
          if (d >= o.releasedOn && (o.promisedOn === null || d <= o.promisedOn)) {
            const v = `x_${i}_${j}_${k}`;
            mine.push(v);
            vars.push(v);
            perDay[k].push(v);
          }
        });
        if (mine.length === 0) rows.push(` w_${i}_${j}: 0 x_dummy = ${work}`);
        else rows.push(` w_${i}_${j}: ${mine.join(' + ')} = ${work}`);
      }),
    );
    perDay.forEach((vs, k) => {
      if (vs.length) rows.push(` c_${k}: ${vs.join(' + ')} <= ${cap}`);
    });
    const lp = [
      'Minimize',
      ` obj: ${vars.length ? vars.join(' + ') : '0 x_dummy'}`,
      'Subject To',
      ...rows,
      'Bounds',
      ' x_dummy = 0',
      'End',
    ].join('\n');
    const status = highs.solve(lp).Status;
    expect(['Optimal', 'Infeasible']).toContain(status);
    return status === 'Optimal';
  };

  it('meets every promised date exactly when the LP says a plan exists', () => {
    let feasibleSeen = 0;
    let infeasibleSeen = 0;
    fc.assert(
      fc.property(
        fc.array(orderArb(1, 6), { minLength: 1, maxLength: 5 }),
        fc.integer({ min: 2, max: 8 }),
        (orders, hours) => {
          const input: ScheduleInput = {
            start: MON,
            horizonDays: 28,
            tables: [table(1, hours)],
            calendar: WEEKDAYS,
            orders: orders.map((o, i) => ({
              id: i + 1,
              releasedOn: addCalendarDays(MON, o.release),
              promisedOn: addCalendarDays(MON, o.release + ((o.due ?? 0) % 9)),
              groups: o.groups.map((g, j) => ({
                key: `${j}`,
                mark: `T${j + 1}`,
                quantity: g.quantity,
                minutesPerTruss: g.minutes,
                setupMinutes: g.setup,
              })),
            })),
          };
          const feasible = lpFeasible(input);
          const allMet = planSchedule(input).orders.every((o) => !o.late);
          if (feasible) feasibleSeen++;
          else infeasibleSeen++;
          expect(allMet).toBe(feasible);
        },
      ),
      { numRuns: 200 },
    );
    // Both kinds of case were exercised (the cases are random: one run saw 19 feasible of 200,
    // so the floor is 10, which still rules out a generator that makes only one kind).
    expect(feasibleSeen).toBeGreaterThan(10);
    expect(infeasibleSeen).toBeGreaterThan(10);
  }, 60_000);
});
