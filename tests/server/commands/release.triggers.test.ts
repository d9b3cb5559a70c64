import type Stripe from 'stripe';
import { beforeAll, describe, expect, it } from 'vitest';
import { acceptQuote } from '../../../server/commands/acceptance';
import { reviewLine } from '../../../server/commands/orders';
import { applyPaymentEvent } from '../../../server/commands/paymentEvents';
import { recordOfflinePayment } from '../../../server/commands/payments';
import {
  AuditEvent,
  MailMessage,
  Order,
  OrderLine,
  Payment,
  type Plant,
} from '../../../server/models';
import { createPlant, createUser } from '../../support/factories';
import { sentQuoteWorld, useTestBook } from '../routes/portal/helpers';

// The automatic release is each command's after-commit step: no route calls it.
let plant: Plant;
beforeAll(async () => {
  plant = await createPlant();
  await useTestBook(plant);
});

const approveAll = (orderId: number) =>
  OrderLine.update({ reviewState: 'approved' }, { where: { orderId } });
const accept = (w: Awaited<ReturnType<typeof sentQuoteWorld>>) =>
  acceptQuote(w.builder, w.order, w.quote, { name: 'Dana Whitaker', agree: true }, null);

async function expectReleased(orderId: number) {
  const o = (await Order.findByPk(orderId))!;
  expect(o.status).toBe('released');
  expect(await AuditEvent.count({ where: { subjectId: orderId, action: 'order.released' } })).toBe(
    1,
  );
  const kinds = (await MailMessage.findAll({ where: { orderId } })).map((m) => m.kind);
  expect(kinds).toContain('production.released');
}

describe('an order releases by itself when a command completes the gate', () => {
  it('on the last design approval (deposit paid)', async () => {
    const w = await sentQuoteWorld(plant);
    await accept(w);
    await Order.update({ status: 'deposit_paid' }, { where: { id: w.order.id } });
    const line = (await OrderLine.findOne({ where: { orderId: w.order.id } }))!;
    const engineer = await createUser({ role: 'engineer', plant });
    await reviewLine(engineer, (await Order.findByPk(w.order.id))!, line, {
      decision: 'approve',
      designVersion: line.designVersion,
      comment: '',
    });
    await expectReleased(w.order.id);
  });

  it('on the builder’s acceptance (account terms, designs approved)', async () => {
    const w = await sentQuoteWorld(plant, { terms: 'account' });
    await approveAll(w.order.id);
    await accept(w);
    await expectReleased(w.order.id);
  });

  it('on an offline deposit recorded by the desk', async () => {
    const w = await sentQuoteWorld(plant);
    await approveAll(w.order.id);
    await accept(w);
    expect((await Order.findByPk(w.order.id))!.status).toBe('accepted');
    const seen = (await Order.findByPk(w.order.id))!;
    await recordOfflinePayment(w.sales, seen, {
      amount: Number(w.quote.depositDue),
      method: 'cheque',
      reference: 'CHQ 1001',
      version: seen.version,
    });
    await expectReleased(w.order.id);
  });

  it('on the payment service’s event for a card deposit', async () => {
    const w = await sentQuoteWorld(plant);
    await approveAll(w.order.id);
    await accept(w);
    const sessionId = `cs_test_${w.order.id}`;
    await Payment.create({
      plantId: plant.id,
      orderId: w.order.id,
      quoteId: w.quote.id,
      kind: 'deposit',
      method: 'card',
      amountCents: Math.round(Number(w.quote.depositDue) * 100),
      currency: 'USD',
      status: 'pending',
      providerSessionId: sessionId,
    });
    const event = {
      id: `evt_release_${w.order.id}`,
      type: 'checkout.session.completed',
      data: {
        object: {
          id: sessionId,
          payment_status: 'paid',
          payment_intent: `pi_${w.order.id}`,
          metadata: { orderId: String(w.order.id) },
        },
      },
    } as unknown as Stripe.Event;
    expect(await applyPaymentEvent(event)).toBe(true);
    await expectReleased(w.order.id);
  });

  it('not when the gate is still open: a design pending, the deposit paid', async () => {
    const w = await sentQuoteWorld(plant);
    await accept(w);
    const seen = (await Order.findByPk(w.order.id))!;
    await recordOfflinePayment(w.sales, seen, {
      amount: Number(w.quote.depositDue),
      method: 'cheque',
      reference: 'CHQ 1002',
      version: seen.version,
    });
    expect((await Order.findByPk(w.order.id))!.status).toBe('deposit_paid');
  });
});
