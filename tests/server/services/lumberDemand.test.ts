import { describe, expect, it } from 'vitest';
import { stockFor } from '../../../server/commands/stockSettings';
import { orderCutList } from '../../../server/services/cutList';
import { lumberDemand } from '../../../server/services/lumberDemand';
import { lumberPlanFor } from '../../../server/services/lumberPlan';
import { createLine, createOrder, createPlant, FINK_24 } from '../../support/factories';
import { createCustomer, createJob } from '../../support/factories';

const HOWE_28 = {
  units: 'imperial',
  profile: 'howe',
  span: 336,
  pitch: 6,
  heelHeight: 4,
  overhang: 18,
  loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
};

/** "mark|length in sixteenths" → how many, from a list of (key, count). */
const tally = (entries: [string, number][]) => {
  const m = new Map<string, number>();
  for (const [k, n] of entries) m.set(k, (m.get(k) ?? 0) + n);
  return m;
};
const key = (mark: string, inches: number) => `${mark}|${Math.round(inches * 16)}`;

describe('the lumber plan cuts what the cut list lists', () => {
  it('every cut-list piece, by quantity, is on exactly one board of the plan', async () => {
    const plant = await createPlant();
    const job = await createJob({ customer: await createCustomer({ plant }) });
    const order = await createOrder({ job });
    const lines = [
      await createLine({ order, mark: 'T1', quantity: 5, reviewState: 'approved' }),
      await createLine({ order, mark: 'T2', design: HOWE_28, quantity: 3, plies: 2 }),
      await createLine({ order, mark: 'T3', design: { ...FINK_24, overhang: 0 }, quantity: 2 }),
    ];
    const cutList = orderCutList(lines);
    const plan = await lumberPlanFor(order, cutList, await stockFor(plant.id));

    const listed = tally(
      cutList.groups.flatMap((g) =>
        g.rows.map((r): [string, number] => [key(r.mark, r.length / 25.4), r.quantity]),
      ),
    );
    const planned = tally(
      plan.sections.flatMap((s) => {
        expect(s.error).toBeNull();
        return s.plan!.boards.flatMap((b) =>
          b.pieces.map((p): [string, number] => [key(p.mark, p.lengthIn), b.count]),
        );
      }),
    );
    expect(planned).toEqual(listed);
    expect(plan.sections.map((s) => s.lumber)).toEqual(cutList.groups.map((g) => g.lumber));
    expect(plan.sections.reduce((n, s) => n + s.pieceCount, 0)).toBe(cutList.quantity);
  });

  it('takes the long-point lengths as cut, not the design’s centre-line lengths', async () => {
    const line = await createLine({ reviewState: 'approved' });
    const cutList = orderCutList([line]);
    const demand = [...lumberDemand(cutList).values()].flat();
    expect(demand.length).toBe(cutList.groups.reduce((n, g) => n + g.rows.length, 0));
    for (const g of cutList.groups)
      for (const r of g.rows)
        expect(demand).toContainEqual({
          mark: r.mark,
          lumber: r.lumber,
          lengthMm: r.length,
          quantity: r.quantity,
        });
    // Webs are cut back to the chord edges and tails run past their panel points, so the cut
    // lengths are not the design's centre-line piece lengths.
    const stored = (line.designResult as { pieces: { mark: string; length: { value: number } }[] })
      .pieces;
    const centre = new Map(stored.map((p) => [`${line.mark}-${p.mark}`, p.length.value * 25.4]));
    const differs = demand.filter(
      (d) => centre.has(d.mark) && Math.abs(centre.get(d.mark)! - d.lengthMm) > 1,
    );
    expect(differs.length).toBeGreaterThan(0);
  });
});
