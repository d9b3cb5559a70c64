import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import { createCustomer, createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { OrderLine, type Order } from '../../../../server/models';
import type { PresentedDesign } from '../../../../shared/engine/design';
import type { PlateSchedule } from '../../../../shared/api/shopPaper';
import { approvedOrder, binary, keep, pdfText } from './helpers';

const app = testApp();
let order: Order;
let foreman: string;

beforeAll(async () => {
  const plant = await createPlant();
  order = await approvedOrder(await createCustomer({ plant }));
  foreman = (await createUser({ role: 'foreman', plant })).email;
});

/**
 * Independent count from the stored designs: every designed joint plate × 2 faces (DESIGN.md
 * §4.5, common practice) × plies × trusses of the line.
 */
async function expectedTotals() {
  const lines = await OrderLine.findAll({ where: { orderId: order.id } });
  const by = new Map<string, number>();
  for (const l of lines) {
    for (const p of (l.designResult as unknown as PresentedDesign).plates) {
      by.set(p.plate!, (by.get(p.plate!) ?? 0) + 2 * l.plies * l.quantity);
    }
  }
  return by;
}

describe('plate schedule', () => {
  it('totals equal the designs’ plates × trusses × plies × 2 faces', async () => {
    const s = await signedIn(app, foreman);
    const { body } = (await s.get(`/api/orders/${order.id}/shop-paper/plates`).expect(200)) as {
      body: PlateSchedule;
    };
    const want = await expectedTotals();
    expect(Object.fromEntries(body.totals.map((t) => [t.plate, t.count]))).toEqual(
      Object.fromEntries(want),
    );
    expect(body.totalPlates).toBe([...want.values()].reduce((a, b) => a + b, 0));
    // 3 single-ply Finks and 2 two-ply girders.
    const t1 = body.marks.find((m) => m.mark === 'T1')!;
    const g1 = body.marks.find((m) => m.mark === 'G1')!;
    expect(t1.perTruss.reduce((a, c) => a + c.count, 0)).toBe(t1.joints.length * 2);
    expect(g1.perTruss.reduce((a, c) => a + c.count, 0)).toBe(g1.joints.length * 2 * 2);
    expect(g1.line.reduce((a, c) => a + c.count, 0)).toBe(g1.joints.length * 2 * 2 * 2);
    // Largest plates first on the rack list.
    const areas = body.totals.map((t) => t.widthIn * t.lengthIn);
    expect(areas).toEqual([...areas].sort((a, b) => b - a));
  });

  it('gives each joint’s plate with both faces and its position', async () => {
    const s = await signedIn(app, foreman);
    const { body } = (await s.get(`/api/orders/${order.id}/shop-paper/plates`).expect(200)) as {
      body: PlateSchedule;
    };
    const t1 = body.marks.find((m) => m.mark === 'T1')!;
    const line = await OrderLine.findByPk(t1.lineId);
    const design = line!.designResult as unknown as PresentedDesign;
    expect(t1.joints.map((j) => j.joint)).toEqual(design.plates.map((p) => p.joint));
    for (const j of t1.joints) {
      expect(j.faces).toBe(2);
      expect(j.angleDeg).not.toBeNull();
      expect(j.position).toMatch(/^(Centred on the joint|Centre .+ of the joint)$/);
      // The slide is square to the plate axis: (dx, dy) · (cos a, sin a) = 0.
      const a = (j.angleDeg! * Math.PI) / 180;
      expect(Math.abs(j.dx!.value * Math.cos(a) + j.dy!.value * Math.sin(a))).toBeLessThan(0.002);
    }
    // Heels sit centred (README: plates sit centred on heels and splices).
    for (const j of t1.joints.filter((x) => x.kind === 'heel'))
      expect(j.position).toBe('Centred on the joint');
  });

  it('prints the same schedule as CSV and PDF', async () => {
    const s = await signedIn(app, foreman);
    const json = (await s.get(`/api/orders/${order.id}/shop-paper/plates`)).body as PlateSchedule;
    const csv = await s.get(`/api/orders/${order.id}/shop-paper/plates.csv`).expect(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    const rows = csv.text
      .trim()
      .split('\r\n')
      .map((r) => r.split(','));
    const header = rows[0];
    const total = rows.filter((r) => r[0] === 'total');
    expect(total.map((r) => [r[3], Number(r[header.indexOf('count')])])).toEqual(
      json.totals.map((t) => [t.plate, t.count]),
    );
    const jointRows = rows.filter((r) => r[0] === 'joint');
    expect(jointRows).toHaveLength(json.marks.reduce((a, m) => a + m.joints.length, 0));

    const pdf = await s.agent
      .get(`/api/orders/${order.id}/shop-paper/plates.pdf`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    keep('plates.pdf', pdf.body as Buffer);
    const text = pdfText(pdf.body as Buffer);
    expect(text).toContain(`Pick from the rack — ${json.totalPlates} plates`);
    for (const t of json.totals)
      expect(text).toMatch(new RegExp(`${t.plate}\\s+\\d+\\s+.*${t.count}`));
    expect(text).toContain('without a written repair');
  });

  it('answers 409 while any design waits for approval', async () => {
    const { createLine } = await import('../../../support/factories');
    const plant = await createPlant();
    const pending = await approvedOrder(await createCustomer({ plant }));
    await createLine({ order: pending, mark: 'P1' });
    const s = await signedIn(app, (await createUser({ role: 'foreman', plant })).email);
    const res = await s.get(`/api/orders/${pending.id}/shop-paper/plates`).expect(409);
    expect(res.body.error.code).toBe('not_approved');
    expect(res.body.error.message).toContain('P1');
  });
});
