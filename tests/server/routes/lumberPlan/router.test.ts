import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Customer, Order, Plant } from '../../../../server/models';
import { lumberPlanSchema } from '../../../../shared/api/lumberPlan';
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
  it('the foreman gets every piece planned from the (demo) stock, within its bound', async () => {
    const foreman = await signedIn(app, (await createUser({ role: 'foreman', plant })).email);
    const res = await foreman.get(url(order)).expect(200);
    const plan = lumberPlanSchema.parse(res.body);
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
