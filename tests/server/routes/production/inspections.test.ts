import { beforeAll, describe, expect, it } from 'vitest';
import { productionWorld } from './helpers';

let w: Awaited<ReturnType<typeof productionWorld>>;
beforeAll(async () => {
  w = await productionWorld();
});

const ok = {
  dimensions: true,
  lumberGrade: true,
  platePosition: true,
  plateEmbedment: true,
  gaps: true,
};

describe('the inspection log', () => {
  it('shows each station owing three per shift this week (ANSI/TPI 1-2014 §3.3.2) and logs records', async () => {
    const before = await w.foreman.get('/api/floor/inspections').expect(200);
    // Demo settings: two tables of one shift each.
    expect(before.body.stations.map((s: { due: number }) => s.due)).toEqual([3, 3]);
    await w.foreman
      .post('/api/floor/inspections', { tableId: 1, truss: '2026-0001 T1 #3', checks: ok })
      .expect(201);
    const res = await w.foreman
      .post('/api/floor/inspections', {
        tableId: 1,
        truss: '2026-0001 T2 #1',
        checks: { ...ok, gaps: false },
        notes: 'Heel gap 3/16 in; re-pressed',
      })
      .expect(201);
    expect(res.body.stations[0]).toMatchObject({ required: 3, done: 2, due: 1 });
    expect(res.body.records[0]).toMatchObject({ passed: false, truss: '2026-0001 T2 #1' });
    expect(res.body.records[0].inspector).toMatch(/^foreman /);
  });

  it('refuses an unknown station or missing checks, and other roles', async () => {
    await w.foreman
      .post('/api/floor/inspections', { tableId: 9, truss: 'x', checks: ok })
      .expect(400);
    await w.foreman.post('/api/floor/inspections', { tableId: 1, truss: 'x' }).expect(400);
    await w.sales.get('/api/floor/inspections').expect(403);
  });
});
