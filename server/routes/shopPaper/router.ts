import { Router, type Response } from 'express';
import type { Config } from '../../config';
import { requireUser } from '../../middleware/auth';
import { authorize } from '../../policies/predicates';
import { shopPaperPolicy } from '../../policies/shopPaper';
import type { Order } from '../../models';
import { plateSchedule, plateScheduleCsv } from '../../services/shopPaper/plateSchedule';
import { renderPlateSchedulePdf } from '../../services/plateSchedulePdf';
import { trussTags } from '../../services/shopPaper/tags';
import { renderTrussTagsPdf } from '../../services/trussTagsPdf';
import { validate } from '../../middleware/validate';
import { tagPdfQuerySchema, type TagLayout } from '../../../shared/api/shopPaper';
import { deliveryTicket } from '../../services/shopPaper/delivery';
import { renderDeliveryTicketPdf } from '../../services/deliveryTicketPdf';
import { shopDrawing } from '../../services/shopPaper/drawing';
import { jointPlateRows } from '../../services/shopPaper/plateSchedule';
import { renderShopDrawingsPdf } from '../../services/shopDrawingPdf';
import { notFound } from '../../errors';
import { parseId } from '../../middleware/validate';
import type { ShopOrderPaper } from '../../services/shopPaper/lines';
import { findOrder } from '../orders/queries';
import { handle, load } from '../load';
import { shopOrderPaper } from './queries';

const order = load('Order', findOrder);
const guard = [requireUser, order, authorize(shopPaperPolicy.show)];
const paperOf = (res: Response) => shopOrderPaper(res.locals.record as Order);

/** Send bytes to open in the browser (PDF) or save (CSV), never cached by shared caches. */
function sendFile(res: Response, type: string, name: string, body: Buffer | string, inline = true) {
  res
    .status(200)
    .type(type)
    .set('Content-Disposition', `${inline ? 'inline' : 'attachment'}; filename="${name}"`)
    .set('Cache-Control', 'private, no-store')
    .send(body);
}

/** Shop paper of one order: `/api/orders/:id/shop-paper/…` (approved designs only). */
export function shopPaperRouter(config: Pick<Config, 'publicUrl'>) {
  const router = Router({ mergeParams: true });

  router.get(
    '/',
    ...guard,
    handle(async (_req, res) => {
      const paper = await paperOf(res);
      res.json({
        order: paper.order,
        marks: paper.lines.map((l) => ({
          lineId: l.id,
          mark: l.mark,
          description: l.description,
          quantity: l.quantity,
          plies: l.plies,
        })),
        totalTrusses: paper.lines.reduce((s, l) => s + l.quantity, 0),
      });
    }),
  );

  router.get(
    '/plates',
    ...guard,
    handle(async (_req, res) => {
      res.json(plateSchedule(await paperOf(res)));
    }),
  );

  router.get(
    '/plates.csv',
    ...guard,
    handle(async (_req, res) => {
      const s = plateSchedule(await paperOf(res));
      sendFile(res, 'text/csv', `plates-${s.order.number}.csv`, plateScheduleCsv(s), false);
    }),
  );

  router.get(
    '/plates.pdf',
    ...guard,
    handle(async (_req, res) => {
      const s = plateSchedule(await paperOf(res));
      sendFile(
        res,
        'application/pdf',
        `plates-${s.order.number}.pdf`,
        await renderPlateSchedulePdf(s),
      );
    }),
  );

  router.get(
    '/tags',
    ...guard,
    handle(async (_req, res) => {
      res.json(trussTags(await paperOf(res), config.publicUrl));
    }),
  );

  router.get(
    '/tags.pdf',
    requireUser,
    validate(tagPdfQuerySchema, 'query'),
    order,
    authorize(shopPaperPolicy.show),
    handle(async (_req, res) => {
      const { layout } = res.locals.query as { layout: TagLayout };
      const tags = trussTags(await paperOf(res), config.publicUrl);
      const pdf = await renderTrussTagsPdf(tags, layout);
      sendFile(res, 'application/pdf', `tags-${tags.order.number}-${layout}.pdf`, pdf);
    }),
  );

  router.get(
    '/delivery',
    ...guard,
    handle(async (_req, res) => {
      res.json(deliveryTicket(await paperOf(res)));
    }),
  );

  router.get(
    '/delivery.pdf',
    ...guard,
    handle(async (_req, res) => {
      const t = deliveryTicket(await paperOf(res));
      const pdf = await renderDeliveryTicketPdf(t);
      sendFile(res, 'application/pdf', `delivery-${t.order.number}.pdf`, pdf);
    }),
  );

  router.get(
    '/drawings.pdf',
    ...guard,
    handle(async (_req, res) => {
      const paper = await paperOf(res);
      const sheets = paper.lines.map((l) => shopDrawing(paper, l, jointPlateRows(l)));
      const pdf = await renderShopDrawingsPdf(sheets);
      sendFile(res, 'application/pdf', `shop-drawings-${paper.order.number}.pdf`, pdf);
    }),
  );

  router.get(
    '/lines/:lineId',
    ...guard,
    handle(async (req, res) => {
      const { paper, line } = await lineOf(req.params.lineId, res);
      res.json(shopDrawing(paper, line, jointPlateRows(line)));
    }),
  );

  router.get(
    '/lines/:lineId/pdf',
    ...guard,
    handle(async (req, res) => {
      const { paper, line } = await lineOf(req.params.lineId, res);
      const pdf = await renderShopDrawingsPdf([shopDrawing(paper, line, jointPlateRows(line))]);
      sendFile(res, 'application/pdf', `shop-drawing-${paper.order.number}-${line.mark}.pdf`, pdf);
    }),
  );

  return router;
}

/** The order's paper and its line named by :lineId (404 for a line of another order). */
async function lineOf(raw: unknown, res: Response) {
  const id = parseId(raw);
  const paper: ShopOrderPaper = await paperOf(res);
  const line = paper.lines.find((l) => l.id === id);
  if (!line) throw notFound('Truss line');
  return { paper, line };
}
