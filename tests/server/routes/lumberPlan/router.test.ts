import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { saveStockSettings } from '../../../../server/commands/stockSettings';
import type { Customer, Order, Plant } from '../../../../server/models';
import { runShopPlan } from '../../../../server/services/shopPlan/job';
import { DEMO_STOCK_SETTINGS } from '../../../../shared/api/stock';
import { shopPlanStatusSchema } from '../../../../shared/api/shopPlan';
import { testApp } from '../../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
} from '../../../support/factories';
import { agentFor, signedIn } from '../../../support/session';

const app = testApp();
let plant: Plant;
let customer: Customer;
let order: Order;
let pending: Order;
const url = (o: Order, suffix = '') => `/api/shop/orders/${o.id}/lumber-plan${suffix}`;

beforeAll(async () => {
  plant = await createPlant();
  customer = await createCustomer({ plant });
  const job = await createJob({ customer });
  order = await createOrder({ job });
  await createLine({ order, reviewState: 'approved' });
  await createLine({ order, reviewState: 'approved', mark: 'T2' });
  pending = await createOrder({ job });
  await createLine({ order: pending, reviewState: 'approved' });
  await createLine({ order: pending, reviewState: 'pending' });
});

describe('the lumber plan of an approved order', () => {
  it('is made on request by the shop-plan job and stored; GET shows it with its age', async () => {
    const foreman = await signedIn(app, (await createUser({ role: 'foreman', plant })).email);
    const before = shopPlanStatusSchema.parse((await foreman.get(url(order)).expect(200)).body);
    expect(before.plan).toBeNull();
    expect(before.run.state).toBe('idle');
    // PDF and CSV wait for a stored plan.
    await foreman.get(url(order, '.csv')).expect(409);
    const queued = await foreman.post(url(order, '/replan')).expect(202);
    expect(shopPlanStatusSchema.parse(queued.body).run.state).toBe('queued');
    // A second request while one waits does not queue another.
    expect((await foreman.post(url(order, '/replan')).expect(202)).body.run.state).toBe('queued');
    await runShopPlan(order.id); // what the queue's worker runs
    const res = await foreman.get(url(order)).expect(200);
    const status = shopPlanStatusSchema.parse(res.body);
    expect(status.run.state).toBe('idle');
    expect(status.outOfDate).toEqual([]);
    expect(Date.parse(status.madeAt!)).toBeGreaterThan(
      Date.parse(before.run.requestedAt ?? '0') || 0,
    );
    const plan = status.plan!;
    expect(plan.demoStock).toBe(true);
    expect(plan.sections.length).toBeGreaterThan(0);
    // 2 lines × 4 trusses × 1 ply × the design's pieces.
    const lineRes = await foreman.get(`/api/orders/${order.id}`).expect(200);
    expect(lineRes.body.lines).toHaveLength(2);
    for (const s of plan.sections) {
      expect(s.error).toBeNull();
      const cut = s.plan!.boards.reduce((n, b) => n + b.count * b.pieces.length, 0);
      expect(cut).toBe(s.pieceCount);
      expect(s.pieceCount % 8).toBe(0);
      expect(s.plan!.totalCost).toBeGreaterThanOrEqual(s.plan!.lowerBound - 0.01);
      for (const b of s.plan!.boards) {
        const used =
          b.pieces.reduce((t, p) => t + p.lengthIn, 0) +
          (b.pieces.length - 1) * plan.kerfIn +
          plan.trimIn;
        expect(used).toBeLessThanOrEqual(b.lengthFt * 12 + 1e-3);
      }
    }
    expect(plan.cautions.length).toBeGreaterThan(0);
  });

  it('is marked out of date when the stock settings change, and current again after a re-plan', async () => {
    const admin = await createUser({ role: 'admin', plant });
    const session = await signedIn(app, admin.email);
    await session.post(url(order, '/replan')).expect(202);
    await runShopPlan(order.id);
    expect((await session.get(url(order)).expect(200)).body.outOfDate).toEqual([]);
    await saveStockSettings(admin, { ...DEMO_STOCK_SETTINGS, kerfIn: 0.25 });
    const stale = shopPlanStatusSchema.parse((await session.get(url(order)).expect(200)).body);
    expect(stale.outOfDate).toEqual(['stock']);
    expect(stale.plan!.kerfIn).toBe(DEMO_STOCK_SETTINGS.kerfIn);
    await session.post(url(order, '/replan')).expect(202);
    await runShopPlan(order.id);
    const fresh = shopPlanStatusSchema.parse((await session.get(url(order)).expect(200)).body);
    expect(fresh.outOfDate).toEqual([]);
    expect(fresh.plan!.kerfIn).toBe(0.25);
  });

  it('the desk and the plant manager may read it; the engineer and a builder may not', async () => {
    for (const role of ['sales', 'admin'] as const) {
      const who = await signedIn(app, (await createUser({ role, plant })).email);
      await who.get(url(order)).expect(200);
    }
    const engineer = await signedIn(app, (await createUser({ role: 'engineer', plant })).email);
    await engineer.get(url(order)).expect(403);
    // A builder of the order's own company reaches the order but not its shop paper: 403;
    // a builder of another company does not reach the order at all: 404.
    const own = await signedIn(app, (await createUser({ role: 'builder', customer })).email);
    await own.get(url(order)).expect(403);
    const other = await signedIn(app, (await createUser({ role: 'builder', plant })).email);
    await other.get(url(order)).expect(404);
  });

  it('another plant’s order answers 404, signed out 401, an order not yet approved 409', async () => {
    const elsewhere = await signedIn(app, (await createUser({ role: 'foreman' })).email);
    await elsewhere.get(url(order)).expect(404);
    await (await agentFor(app)).get(url(order)).expect(401);
    const foreman = await signedIn(app, (await createUser({ role: 'foreman', plant })).email);
    const res = await foreman.get(url(pending)).expect(409);
    expect(res.body.error.message).toMatch(/approved/);
    await foreman.post(url(pending, '/replan')).expect(409);
    const engineer = await signedIn(app, (await createUser({ role: 'engineer', plant })).email);
    await engineer.post(url(order, '/replan')).expect(403);
    await elsewhere.post(url(order, '/replan')).expect(404);
  });

  it('CSV has one row per board group; the PDF renders (looked at with pdftoppm)', async () => {
    const foreman = await signedIn(app, (await createUser({ role: 'foreman', plant })).email);
    const csv = await foreman.get(url(order, '.csv')).expect(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const lines = csv.text.trim().split('\r\n');
    expect(lines[0]).toBe(
      'lumber,board,stock_ft,count,pieces,piece_marks,piece_lengths_in,offcut_in',
    );
    expect(lines.length).toBeGreaterThan(1);
    const pdf = await foreman.agent
      .get(url(order, '.pdf'))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    const dir = mkdtempSync(join(tmpdir(), 'lumber-plan-'));
    writeFileSync(join(dir, 'plan.pdf'), pdf.body as Buffer);
    const text = execFileSync('pdftotext', [join(dir, 'plan.pdf'), '-'], { encoding: 'utf8' });
    expect(text).toMatch(/Lumber plan/);
    expect(text).toMatch(/least possible cost/);
    expect(text).toMatch(/First-fit decreasing would use/);
  });
});
