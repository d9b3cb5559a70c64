import { Router } from 'express';
import { Op } from 'sequelize';
import { requireUser } from '../../middleware/auth';
import { authorize } from '../../policies/predicates';
import { portalPolicy } from '../../policies/portal';
import { orderPolicy } from '../../policies/order';
import { MailMessage, Order, Quote, QuoteAcceptance } from '../../models';
import { acceptRefusal } from '../../commands/acceptance';
import { paidCents } from '../../commands/payments';
import { plannedDelivery } from '../../commands/schedule';
import { orderIncludes } from '../orders/queries';
import { handle } from '../load';
import type { QuoteSnapshot } from '../../services/pricing';

const IN_PROGRESS = ['accepted', 'deposit_paid', 'released', 'in_production', 'ready'];
const DAY = 86_400_000;

/** `GET /api/portal/home`: what needs the builder — quotes to answer, deposits due, orders, messages. */
export function portalHomeRouter() {
  const router = Router();
  router.get(
    '/home',
    requireUser,
    authorize(portalPolicy.home),
    handle(async (req, res) => {
      const actor = req.user!;
      const orders = await Order.findAll({
        where: { [Op.and]: [orderPolicy.scope(actor), { status: ['quoted', ...IN_PROGRESS] }] },
        include: orderIncludes,
        order: [['updatedAt', 'DESC']],
        limit: 50,
      });
      const waiting = [];
      const depositsDue = [];
      const inProgress = [];
      const today = new Date(new Date().toISOString().slice(0, 10)).getTime();
      for (const o of orders) {
        const base = { orderId: o.id, orderNumber: o.number, job: o.job!.name, status: o.status };
        if (o.status === 'quoted') {
          const q = await Quote.findOne({
            where: { orderId: o.id, sentAt: { [Op.ne]: null } },
            order: [['number', 'DESC']],
          });
          if (!q || (await acceptRefusal(o, q))) continue;
          const s = q.snapshot as unknown as QuoteSnapshot;
          waiting.push({
            ...base,
            number: q.number,
            reference: q.reference,
            total: Number(q.total),
            currency: s.currency,
            validUntil: q.validUntil,
            daysLeft: Math.round((new Date(q.validUntil).getTime() - today) / DAY),
          });
          continue;
        }
        inProgress.push({ ...base, plannedDelivery: plannedDelivery(o) });
        if (o.status === 'accepted') {
          const a = await QuoteAcceptance.findOne({ where: { orderId: o.id } });
          const q = a ? await Quote.findByPk(a.quoteId) : null;
          const due = q ? Math.round(Number(q.depositDue) * 100) - (await paidCents(o.id)) : 0;
          if (q && due > 0)
            depositsDue.push({
              ...base,
              reference: q.reference,
              amount: due / 100,
              currency: (q.snapshot as unknown as QuoteSnapshot).currency,
            });
        }
      }
      const messages = await MailMessage.findAll({
        where: {
          orderId: orders.map((o) => o.id),
          kind: { [Op.notLike]: '%.desk' },
        },
        order: [['id', 'DESC']],
        limit: 5,
      });
      res.json({
        quotesWaiting: waiting,
        depositsDue,
        inProgress,
        messages: messages.map((m) => ({
          id: m.id,
          orderId: m.orderId,
          subject: m.subject,
          at: m.createdAt.toISOString(),
        })),
      });
    }),
  );
  return router;
}
