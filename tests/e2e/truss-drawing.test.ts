import { beforeAll, describe, expect, it } from 'vitest';
import {
  createCustomer,
  createJob,
  createOrder,
  createPlant,
  createUser,
} from '../support/factories';
import { SCREENSHOTS, signInAs } from '../support/browser';
import { servedBrowser } from '../support/servedBrowser';
import { PROFILE_KINDS } from '../../shared/engine/profiles';
import type { Order, User } from '../../server/models';

const web = servedBrowser();
let sales: User;
let order: Order;

beforeAll(async () => {
  const plant = await createPlant({ name: 'Drawing Test Plant' });
  sales = await createUser({ role: 'sales', plant });
  order = await createOrder({
    job: await createJob({ customer: await createCustomer({ plant }) }),
  });
});

describe('the truss drawing, every profile', () => {
  it('dimensions heel, height, overhangs and panel points, clips no label and keeps joint letters off the T/C tags', async () => {
    const page = await web.browser.newPage();
    await page.setViewportSize({ width: 1280, height: 900 });
    await signInAs(web.browser, page, web.base, sales.email);
    await page.goto(`${web.base}/orders/${order.id}/lines/new`);
    for (const p of PROFILE_KINDS) {
      await page.getByRole('button', { name: p.label, exact: true }).click();
      const drawing = page.getByTestId('truss-drawing');
      await expect.poll(() => drawing.getAttribute('data-design-ms')).not.toBeNull();
      await page.waitForTimeout(400);
      await drawing.screenshot({ path: `${SCREENSHOTS}/drawing-${p.kind}.png` });
      const check = await drawing.evaluate((svg: SVGSVGElement) => {
        const view = svg.viewBox.baseVal;
        const box = (e: SVGGraphicsElement) => {
          // Screen-space box back into viewBox units (text may be rotated).
          const r = e.getBoundingClientRect();
          const s = svg.getBoundingClientRect();
          const k = view.width / s.width;
          return {
            x: (r.left - s.left) * k,
            y: (r.top - s.top) * k,
            w: r.width * k,
            h: r.height * k,
          };
        };
        const texts = [...svg.querySelectorAll('text')].map((t) => ({
          text: t.textContent,
          ...box(t),
        }));
        const clipped = texts.filter(
          (t) =>
            t.x < -0.5 ||
            t.y < -0.5 ||
            t.x + t.w > view.width + 0.5 ||
            t.y + t.h > view.height + 0.5,
        );
        const tags = [...svg.querySelectorAll('rect[rx="3"]')].map((r) =>
          box(r as SVGGraphicsElement),
        );
        const letters = [...svg.querySelectorAll('text.fill-timber-800')].map((t) => ({
          text: t.textContent,
          ...box(t as SVGGraphicsElement),
        }));
        const overlaps = letters.filter((l) =>
          tags.some(
            (g) => l.x < g.x + g.w && g.x < l.x + l.w && l.y < g.y + g.h && g.y < l.y + l.h,
          ),
        );
        const dims = [...svg.querySelectorAll('[data-dimension]')].map((g) =>
          g.getAttribute('data-dimension'),
        );
        return { clipped, overlaps: overlaps.map((o) => o.text), dims };
      });
      expect(check.clipped, p.kind).toEqual([]);
      expect(check.overlaps, p.kind).toEqual([]);
      expect(check.dims, p.kind).toContain('span');
      expect(check.dims, p.kind).toContain('height');
      if (p.kind !== 'kingPost')
        expect(
          check.dims.some((d) => d?.startsWith('panel-')),
          p.kind,
        ).toBe(true);
    }
  });
});
