import { beforeAll, describe, expect, it } from 'vitest';
import jsQR from 'jsqr';
import { PNG } from 'pngjs';
import { testApp } from '../../../support/db';
import { createCustomer, createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { OrderLine, type Order } from '../../../../server/models';
import type { TrussTags } from '../../../../shared/api/shopPaper';
import { approvedOrder, binary, keep, pdfPages, pdfPngs } from './helpers';

const PUBLIC_URL = 'https://trusses.example.test';
const app = testApp({ publicUrl: PUBLIC_URL });
let order: Order;
let foreman: string;

beforeAll(async () => {
  const plant = await createPlant();
  order = await approvedOrder(await createCustomer({ plant }));
  foreman = (await createUser({ role: 'foreman', plant })).email;
});

const pdf = async (layout: string) => {
  const s = await signedIn(app, foreman);
  const res = await s.agent
    .get(`/api/orders/${order.id}/shop-paper/tags.pdf?layout=${layout}`)
    .buffer(true)
    .parse(binary)
    .expect(200);
  expect(res.headers['content-type']).toBe('application/pdf');
  keep(`tags-${layout}.pdf`, res.body as Buffer);
  return res.body as Buffer;
};

/** The QR code found on a rendered page (jsQR on the page's RGBA pixels). */
function decodeQr(png: Buffer): string | null {
  const img = PNG.sync.read(png);
  return jsQR(new Uint8ClampedArray(img.data), img.width, img.height)?.data ?? null;
}

/** A rectangle of a decoded PNG as a new PNG. */
function crop(src: PNG, x: number, y: number, w: number, h: number): PNG {
  const out = new PNG({ width: w, height: h });
  PNG.bitblt(src, out, x, y, w, h, 0, 0);
  return out;
}

describe('truss tags', () => {
  it('every truss built has exactly one tag, "n of N" complete per mark', async () => {
    const s = await signedIn(app, foreman);
    const { body } = (await s.get(`/api/orders/${order.id}/shop-paper/tags`).expect(200)) as {
      body: TrussTags;
    };
    const lines = await OrderLine.findAll({ where: { orderId: order.id } });
    expect(body.tags).toHaveLength(lines.reduce((a, l) => a + l.quantity, 0));
    for (const l of lines) {
      const mine = body.tags.filter((t) => t.lineId === l.id);
      expect(mine.map((t) => t.n)).toEqual(Array.from({ length: l.quantity }, (_, i) => i + 1));
      for (const t of mine) {
        expect(t).toMatchObject({ mark: l.mark, of: l.quantity, plies: l.plies });
        expect(t.url).toBe(
          `${PUBLIC_URL}/orders/${order.id}/shop-paper/lines/${l.id}?truss=${t.n}`,
        );
      }
    }
    expect(body.warning).toMatch(/^DO NOT CUT OR ALTER THIS TRUSS/);
    // A 24 ft Fink of 2x4 and 2x6 weighs some 40–100 lb (common practice); the two-ply girder more.
    const t1 = body.tags.find((t) => t.mark === 'T1')!;
    const g1 = body.tags.find((t) => t.mark === 'G1')!;
    expect(t1.weight.value).toBeGreaterThan(40);
    expect(t1.weight.value).toBeLessThan(100);
    expect(g1.weight.value).toBeGreaterThan(2 * t1.weight.value);
  });

  it('prints one 4 × 6 in label per truss; each QR code opens that truss’s page', async () => {
    const { body } = await (
      await signedIn(app, foreman)
    ).get(`/api/orders/${order.id}/shop-paper/tags`);
    const tags = (body as TrussTags).tags;
    const bytes = await pdf('label');
    const pages = pdfPages(bytes);
    expect(pages).toHaveLength(tags.length);
    const pngs = pdfPngs(bytes, 110);
    expect(pngs).toHaveLength(tags.length);
    tags.forEach((t, i) => {
      expect(pages[i]).toContain(t.mark);
      expect(pages[i]).toContain(`${t.n} of ${t.of}`);
      expect(pages[i]).toContain('DO NOT CUT OR ALTER THIS TRUSS');
      expect(decodeQr(pngs[i])).toBe(t.url);
    });
  });

  it('prints a letter sheet of 4 × 2 in labels, ten to a page', async () => {
    const bytes = await pdf('sheet');
    const pages = pdfPages(bytes);
    expect(pages).toHaveLength(1); // five trusses
    const text = pages[0];
    for (const n of [1, 2, 3]) expect(text).toContain(`${n} of 3`);
    for (const n of [1, 2]) expect(text).toContain(`${n} of 2`);
    expect(text.match(/DO NOT CUT OR ALTER THIS TRUSS/g)).toHaveLength(5);
    // Each label's QR code decodes from its slot of the rendered sheet: 5/32 in side margin,
    // ½ in top margin, 3/16 in between the columns, 4 × 2 in labels.
    const dpi = 150;
    const sheet = PNG.sync.read(pdfPngs(bytes, dpi)[0]);
    const { body } = await (
      await signedIn(app, foreman)
    ).get(`/api/orders/${order.id}/shop-paper/tags`);
    (body as TrussTags).tags.forEach((t, i) => {
      const x = ((5 / 32 + (i % 2) * (4 + 3 / 16)) * dpi) | 0;
      const y = ((0.5 + Math.floor(i / 2) * 2) * dpi) | 0;
      expect(decodeQr(PNG.sync.write(crop(sheet, x, y, 4 * dpi, 2 * dpi)))).toBe(t.url);
    });
  });

  it('refuses an unknown layout with 400', async () => {
    const s = await signedIn(app, foreman);
    const res = await s.get(`/api/orders/${order.id}/shop-paper/tags.pdf?layout=poster`);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('Layout is "sheet" or "label".');
  });
});
