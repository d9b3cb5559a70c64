import type { OrderDetail } from '../../../shared/api/orders';
import { Payment, Quote, type AuditEvent, type User } from '../../models';
import { findAcceptance } from '../../commands/acceptance';
import {
  presentAcceptance,
  presentBuilderHistory,
  presentMoney,
  presentPayment,
} from '../../presenters/portal';

/** What a builder reads of the order page: their history, and lines without reviewers' notes. */
export const builderView = {
  history: (events: AuditEvent[]) => presentBuilderHistory(events),
  page: (page: OrderDetail): OrderDetail => ({
    ...page,
    lines: page.lines.map((l) => ({
      ...l,
      reviewComment: null,
      reviewedBy: null,
      warningCount: 0,
    })),
  }),
};

/** Payments (refunds and pending sessions included for the desk), money and the acceptance. */
export async function orderMoneyParts(orderId: number, actor: User) {
  const [payments, acceptance] = await Promise.all([
    Payment.findAll({ where: { orderId }, order: [['createdAt', 'ASC']] }),
    findAcceptance(orderId),
  ]);
  // A builder sees money that moved, not checkout sessions they left open.
  const shown =
    actor.role === 'builder' ? payments.filter((p) => p.status !== 'pending') : payments;
  const quote = acceptance?.quote ? await Quote.findByPk(acceptance.quoteId) : null;
  return {
    payments: shown.map(presentPayment),
    money: presentMoney(quote, payments),
    acceptance: presentAcceptance(acceptance),
  };
}
