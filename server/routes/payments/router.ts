import { Router, type RequestHandler } from 'express';
import { requireUser } from '../../middleware/auth';
import { parseId, validate } from '../../middleware/validate';
import { authorize } from '../../policies/predicates';
import { portalPolicy } from '../../policies/portal';
import {
  cancelOrder,
  openDeposit,
  recordOfflinePayment,
  requirePayments,
} from '../../commands/payments';
import { MailMessage, Payment, type Order } from '../../models';
import { notFound } from '../../errors';
import { presentMailState, presentPayment } from '../../presenters/portal';
import { receiptPdf } from '../../services/mailAttachments';
import { findOrder, orderPage } from '../orders/queries';
import { handle, load } from '../load';
import { cancelOrderSchema, offlinePaymentSchema } from '../../../shared/api/portal';

const order = load('Order', findOrder);

/** load (second step): a payment of the loaded order; a builder's only once money moved. */
const loadPayment: RequestHandler = handle(async (req, res, next) => {
  const id = parseId(req.params.paymentId);
  const o = res.locals.record as Order;
  const p = id
    ? await Payment.findOne({ where: { id, orderId: o.id, status: 'succeeded' } })
    : null;
  if (!p) return next(notFound('Payment'));
  res.locals.payment = p;
  next();
});

/** `/api/orders/:id/…`: deposit checkout, offline payments, receipts, cancellation, mail states. */
export function orderPaymentsRouter() {
  const router = Router();

  router.post(
    '/:id/deposit',
    requireUser,
    order,
    authorize(portalPolicy.deposit),
    handle(async (req, res) => {
      const payments = requirePayments(req.app.locals.payments ?? null);
      const base = `${req.protocol}://${req.get('host')}`;
      res.status(201).json(await openDeposit(req.user!, res.locals.record, payments, base));
    }),
  );

  router.post(
    '/:id/payments',
    requireUser,
    validate(offlinePaymentSchema),
    order,
    authorize(portalPolicy.recordPayment),
    handle(async (req, res) => {
      const p = await recordOfflinePayment(req.user!, res.locals.record, res.locals.body);
      res.status(201).json(presentPayment(p));
    }),
  );

  router.get(
    '/:id/payments/:paymentId/receipt',
    requireUser,
    order,
    authorize(portalPolicy.receipt),
    loadPayment,
    handle(async (_req, res) => {
      const p = res.locals.payment as Payment;
      res
        .type('application/pdf')
        .set('Content-Disposition', `inline; filename="Receipt-${p.receiptNumber}.pdf"`)
        .set('Cache-Control', 'private, no-store')
        .send(await receiptPdf(p));
    }),
  );

  router.post(
    '/:id/cancel',
    requireUser,
    validate(cancelOrderSchema),
    order,
    authorize(portalPolicy.cancel),
    handle(async (req, res) => {
      await cancelOrder(
        req.user!,
        res.locals.record,
        res.locals.body.reason,
        req.app.locals.payments ?? null,
      );
      res.json(await orderPage((res.locals.record as Order).id, req.user!));
    }),
  );

  router.get(
    '/:id/mail',
    requireUser,
    order,
    authorize(portalPolicy.mail),
    handle(async (_req, res) => {
      const rows = await MailMessage.findAll({
        where: { orderId: (res.locals.record as Order).id },
        order: [['id', 'DESC']],
        limit: 100,
      });
      res.json({ items: rows.map(presentMailState) });
    }),
  );

  return router;
}
