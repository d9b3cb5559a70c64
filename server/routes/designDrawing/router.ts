import { Router } from 'express';
import { Op } from 'sequelize';
import type { PresentedDesign } from '../../../shared/engine/design';
import { requireUser } from '../../middleware/auth';
import { parseId } from '../../middleware/validate';
import { notFound } from '../../errors';
import { OrderLine, Plant, Quote, User, type Order } from '../../models';
import { authorize } from '../../policies/predicates';
import { designDrawingPolicy } from '../../policies/designDrawing';
import { renderDesignDrawingPdf } from '../../services/designDrawingPdf';
import { designDrawingSheet } from '../../services/designDrawingPdf/sheet';
import { findLine, findOrder } from '../orders/queries';
import { handle, load } from '../load';

/** Marks of the lines in quotes the plant sent for this order. */
async function sentMarks(orderId: number): Promise<Set<string>> {
  const sent = await Quote.findAll({
    where: { orderId, sentAt: { [Op.ne]: null } },
    attributes: ['snapshot'],
  });
  const marks = sent.flatMap((q) =>
    ((q.snapshot.designs as { mark: string }[] | undefined) ?? []).map((d) => d.mark),
  );
  return new Set(marks);
}

/** The line named by :lineId, or by :mark (pages that know only marks, as a quote's). */
async function lineOf(order: Order, params: Record<string, string | string[] | undefined>) {
  if (typeof params.mark === 'string')
    return OrderLine.findOne({
      where: { orderId: order.id, mark: params.mark },
      include: [{ model: User, as: 'reviewer' }],
    });
  const lineId = parseId(params.lineId);
  return lineId === null ? null : findLine(order.id, lineId);
}

/**
 * `GET /api/orders/:id/lines/:lineId/design-drawing.pdf` and
 * `GET /api/orders/:id/design-drawings/:mark.pdf`: one line's truss design drawing.
 */
export function designDrawingRouter() {
  const router = Router();
  router.get(
    ['/:id/lines/:lineId/design-drawing.pdf', '/:id/design-drawings/:mark.pdf'],
    requireUser,
    load('Order', findOrder),
    authorize(designDrawingPolicy.show),
    handle(async (req, res, next) => {
      const order = res.locals.record as Order;
      const line = await lineOf(order, req.params);
      const marks = req.user!.role === 'builder' ? await sentMarks(order.id) : new Set<string>();
      if (!line || !designDrawingPolicy.visible(req.user!.role, line, marks))
        return next(notFound('Line'));
      const plant = await Plant.findByPk(order.plantId);
      const sheet = designDrawingSheet({
        plant: {
          name: plant?.name ?? '',
          address: plant?.address ?? null,
          phone: plant?.settings?.phone,
          email: plant?.settings?.email,
        },
        order: {
          number: order.number,
          job: order.job!.name,
          jobAddress: order.job!.address,
          builder: order.customer!.name,
        },
        line: {
          id: line.id,
          mark: line.mark,
          description: line.description,
          quantity: line.quantity,
          plies: line.plies,
          engineVersion: line.engineVersion,
          designInput: line.designInput,
          design: line.designResult as unknown as PresentedDesign,
          reviewState: line.reviewState,
          reviewedBy: line.reviewer?.name ?? null,
          reviewedAt: line.reviewedAt,
        },
        printedAt: new Date(),
      });
      const pdf = await renderDesignDrawingPdf([sheet]);
      res
        .status(200)
        .type('application/pdf')
        .set(
          'Content-Disposition',
          `inline; filename="design-drawing-${order.number}-${line.mark.replace(/[^\w-]/g, '')}.pdf"`,
        )
        .set('Cache-Control', 'private, no-store')
        .send(pdf);
    }),
  );
  return router;
}
