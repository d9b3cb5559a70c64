import { Op } from 'sequelize';
import { Payment, Quote } from '../models';
import type { MailAttachment } from '../models/MailMessage';
import { renderQuotePdf } from './quotePdf';
import { renderReceiptPdf } from './receiptPdf';

/** The receipt PDF of a succeeded payment (with what the order had received by then). */
export async function receiptPdf(payment: Payment) {
  const quote = payment.quoteId
    ? await Quote.findByPk(payment.quoteId)
    : await Quote.findOne({ where: { orderId: payment.orderId }, order: [['number', 'DESC']] });
  const earlier = await Payment.findAll({
    where: { orderId: payment.orderId, status: 'succeeded', id: { [Op.lte]: payment.id } },
  });
  const paidToDateCents = earlier.reduce(
    (sum, p) => sum + (p.kind === 'refund' ? -p.amountCents : p.amountCents),
    0,
  );
  return renderReceiptPdf({
    receiptNumber: payment.receiptNumber ?? `P-${payment.id}`,
    paidAt: payment.paidAt ?? payment.updatedAt,
    amountCents: payment.amountCents,
    currency: payment.currency,
    method: payment.method,
    reference: payment.reference,
    kind: payment.kind,
    quote: { reference: quote!.reference, total: Number(quote!.total), snapshot: quote!.snapshot },
    paidToDateCents,
  });
}

/** Render a queued message's attachment when the worker sends it. */
export async function renderAttachment(a: MailAttachment) {
  if (a.type === 'quote') {
    const quote = await Quote.findByPk(a.quoteId);
    return {
      filename: `${quote!.reference}.pdf`,
      content: await renderQuotePdf(quote!),
      contentType: 'application/pdf',
    };
  }
  const payment = await Payment.findByPk(a.paymentId);
  return {
    filename: `Receipt-${payment!.receiptNumber ?? payment!.id}.pdf`,
    content: await receiptPdf(payment!),
    contentType: 'application/pdf',
  };
}
