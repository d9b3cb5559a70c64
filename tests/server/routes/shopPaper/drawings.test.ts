import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import { createCustomer, createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { OrderLine, type Order } from '../../../../server/models';
import type { PresentedDesign } from '../../../../shared/engine/design';
import type { ShopDrawing } from '../../../../shared/api/shopPaper';
import { formatFeetInches } from '../../../../shared/engine/format';
import { approvedOrder, binary, keep, pdfPages } from './helpers';

const app = testApp();
let order: Order;
let foreman: string;
let lines: OrderLine[];

beforeAll(async () => {
  const plant = await createPlant();
  order = await approvedOrder(await createCustomer({ plant }));
  foreman = (await createUser({ role: 'foreman', plant })).email;
  lines = await OrderLine.findAll({ where: { orderId: order.id }, order: [['position', 'ASC']] });
});

describe('shop drawings', () => {
  it('draws every member, plate and piece of the mark, dimensioned to panel points', async () => {
    const s = await signedIn(app, foreman);
    const line = lines[0];
    const design = line.designResult as unknown as PresentedDesign;
    const { body } = (await s
      .get(`/api/orders/${order.id}/shop-paper/lines/${line.id}`)
      .expect(200)) as { body: ShopDrawing };
    expect(body.mark).toBe('T1');
    // One outline per piece as cut (a chord's outline spans its panels).
    expect(body.geometry.outlines.map((o) => o.piece).sort()).toEqual(
      design.pieces.map((p) => p.mark).sort(),
    );
    expect(body.geometry.plates.map((p) => p.joint)).toEqual(design.plates.map((p) => p.joint));
    expect(body.pieces.map((p) => p.mark)).toEqual(design.pieces.map((p) => p.mark));
    expect(body.geometry.pieceLabels.map((l) => l.text).sort()).toEqual(
      design.pieces.map((p) => p.mark).sort(),
    );
    // A web's outline is as wide as the dressed lumber across its centre line (3.5 in for a 2x4,
    // NDS Supplement Table 1A) and cut back to the chords' edges along it, so shorter than the
    // centre line between its panel points; its listed length is the long point as cut.
    const web = body.geometry.outlines.find((o) => o.role === 'web')!;
    const member = design.members.find((m) => m.piece === web.piece)!;
    const at = (id: string) => design.joints.find((j) => j.id === id)!;
    const [a, b] = [at(member.from), at(member.to)];
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    const u = [(b.x - a.x) / len, (b.y - a.y) / len];
    const across = web.points.map(([x, y]) => (x - a.x) * -u[1] + (y - a.y) * u[0]);
    const along = web.points.map(([x, y]) => (x - a.x) * u[0] + (y - a.y) * u[1]);
    expect(Math.max(...across) - Math.min(...across)).toBeCloseTo(3.5, 2);
    const longPoint = Math.max(...along) - Math.min(...along);
    expect(longPoint).toBeLessThan(len);
    const listed = body.pieces.find((p) => p.mark === web.piece)!.length;
    expect(listed).toBe(formatFeetInches(longPoint * 25.4));
    // The bottom chord chain runs heel to heel in feet-inches-sixteenths and adds up to the span.
    const below = body.geometry.dimensions.filter((x) => x.offset < 0);
    const chain = below.slice(0, -1);
    const run = chain.reduce((t, x) => t + (x.to[0] - x.from[0]), 0);
    expect(run).toBeCloseTo(design.span.value, 2);
    for (const x of chain) expect(x.text).toBe(formatFeetInches((x.to[0] - x.from[0]) * 25.4));
    expect(body.cautions.join(' ')).toContain('without a written repair');
  });

  it('prints one sheet per truss mark', async () => {
    const s = await signedIn(app, foreman);
    const res = await s.agent
      .get(`/api/orders/${order.id}/shop-paper/drawings.pdf`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    keep('drawings.pdf', res.body as Buffer);
    const pages = pdfPages(res.body as Buffer);
    expect(pages).toHaveLength(lines.length);
    lines.forEach((l, i) => {
      const design = l.designResult as unknown as PresentedDesign;
      expect(pages[i]).toContain(l.mark);
      for (const p of design.pieces) expect(pages[i]).toContain(p.mark);
      for (const p of design.plates) expect(pages[i]).toContain(p.plate!);
      expect(pages[i]).toContain('without a written repair');
    });
    const one = await s.agent
      .get(`/api/orders/${order.id}/shop-paper/lines/${lines[1].id}/pdf`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(pdfPages(one.body as Buffer)).toHaveLength(1);
  });

  it('answers 404 for a line of another order', async () => {
    const s = await signedIn(app, foreman);
    const other = await approvedOrder(
      await createCustomer({
        plant: await lines[0]
          .reload()
          .then(() => order.plantId)
          .then((id) => ({ id }) as never),
      }),
    );
    const otherLine = await OrderLine.findOne({ where: { orderId: other.id } });
    await s.get(`/api/orders/${order.id}/shop-paper/lines/${otherLine!.id}`).expect(404);
    await s.get(`/api/orders/${order.id}/shop-paper/lines/junk`).expect(404);
  });
});
