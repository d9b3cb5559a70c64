import { Router, type RequestHandler } from 'express';
import { Op } from 'sequelize';
import { requireUser } from '../../middleware/auth';
import { validate } from '../../middleware/validate';
import { sendQuoteSchema, type SendQuoteInput } from '../../../shared/api/quoteSend';
import { authorize } from '../../policies/predicates';
import { quotePolicy } from '../../policies/quote';
import { createQuote, sendQuote } from '../../commands/quotes';
import { Quote, User, type Order } from '../../models';
import { notFound } from '../../errors';
import { presentQuote } from '../../presenters/quote';
import { renderQuotePdf } from '../../services/quotePdf';
import { findOrder } from '../orders/queries';
import { handle, load } from '../load';
import { builderQuote } from '../portal/builderQuote';

const order = load('Order', findOrder);
const withCreator = [{ model: User, as: 'creator' }];

/** A builder sees only the revisions the plant sent them, never drafts made since. */
const visibleTo = (viewer: User) =>
  viewer.role === 'builder' ? { sentAt: { [Op.ne]: null } } : {};

/** The order's revisions, newest first. */
const revisions = (o: Order, viewer: User) =>
  Quote.findAll({
    where: { orderId: o.id, plantId: o.plantId, ...visibleTo(viewer) },
    include: withCreator,
    order: [['number', 'DESC']],
  });

/** load (second step): the revision named by :number within the loaded (scoped) order. */
export const loadQuote: RequestHandler = handle(async (req, res, next) => {
  const o = res.locals.record as Order;
  const raw = req.params.number;
  const number = typeof raw === 'string' && /^\d{1,6}$/.test(raw) ? Number(raw) : null;
  const quote = number
    ? await Quote.findOne({
        where: { orderId: o.id, plantId: o.plantId, number, ...visibleTo(req.user!) },
        include: withCreator,
      })
    : null;
  if (!quote) return next(notFound('Quote'));
  res.locals.quote = quote;
  next();
});

const isSuperseded = async (q: Quote) =>
  ((await Quote.max('number', { where: { orderId: q.orderId } })) as number) > q.number;

/** Quote revisions of an order, their PDF, and sending them to the builder. */
export function quotesRouter() {
  const router = Router({ mergeParams: true });

  router.get(
    '/',
    requireUser,
    order,
    authorize(quotePolicy.list),
    handle(async (req, res) => {
      const list = await revisions(res.locals.record, req.user!);
      const latest = (await Quote.max('number', {
        where: { orderId: res.locals.record.id },
      })) as number;
      res.json({ items: list.map((q) => presentQuote(q, q.number < latest, req.user!)) });
    }),
  );

  router.post(
    '/',
    requireUser,
    order,
    authorize(quotePolicy.create),
    handle(async (req, res) => {
      const created = await createQuote(req.user!, res.locals.record);
      const quote = await Quote.findByPk(created.id, { include: withCreator });
      res.status(201).json(presentQuote(quote!, false, req.user!));
    }),
  );

  router.get(
    '/:number',
    requireUser,
    order,
    loadQuote,
    authorize(quotePolicy.show),
    handle(async (req, res) => {
      const quote = res.locals.quote as Quote;
      const superseded = await isSuperseded(quote);
      res.json(
        req.user!.role === 'builder'
          ? await builderQuote(res.locals.record, quote, superseded, req.user!)
          : presentQuote(quote, superseded, req.user!),
      );
    }),
  );

  router.get(
    '/:number/pdf',
    requireUser,
    order,
    loadQuote,
    authorize(quotePolicy.show),
    handle(async (_req, res) => {
      const quote = res.locals.quote as Quote;
      const pdf = await renderQuotePdf(quote);
      res
        .status(200)
        .type('application/pdf')
        .set('Content-Disposition', `inline; filename="${quote.reference}.pdf"`)
        .set('Cache-Control', 'private, no-store')
        .send(pdf);
    }),
  );

  router.post(
    '/:number/send',
    requireUser,
    validate(sendQuoteSchema),
    order,
    loadQuote,
    authorize(quotePolicy.send),
    handle(async (req, res) => {
      const body = res.locals.body as SendQuoteInput;
      const sent = await sendQuote(req.user!, res.locals.record, res.locals.quote, body.recipients);
      res.json(presentQuote(sent, false, req.user!));
    }),
  );

  return router;
}
