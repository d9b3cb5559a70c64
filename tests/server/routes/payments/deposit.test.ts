import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { testMailer } from '../../../support/db';
import { paymentsWorld } from '../../../support/payments';
import {
  AuditEvent,
  MailMessage,
  Order,
  Payment,
  PaymentEvent,
  type Plant,
} from '../../../../server/models';
import { depositSessionSchema } from '../../../../shared/api/portal';
import { sentQuoteWorld, useTestBook } from '../portal/helpers';

let world: Awaited<ReturnType<typeof paymentsWorld>>;
let plant: Plant;

beforeAll(async () => {
  world = await paymentsWorld();
  plant = await createPlant();
  await useTestBook(plant);
});
afterAll(() => world.close());

/** A sent quote accepted by its builder; the builder's session. */
async function accepted(terms: 'deposit' | 'account' = 'deposit') {
  const w = await sentQuoteWorld(plant, { terms });
  const s = await signedIn(world.app, w.builder.email);
  await s
    .post(`/api/orders/${w.order.id}/quotes/1/accept`, { name: 'Dana', agree: true })
    .expect(200);
  return { ...w, s };
}

const until = <T>(fn: () => Promise<T | null | undefined | false>, timeout = 20000) =>
  vi.waitFor(
    async () => {
      const v = await fn();
      if (!v) throw new Error('not yet');
      return v;
    },
    { timeout, interval: 150 },
  );

/** Post the hosted page's form as a browser would; the answer is not followed. */
const payOnPage = (url: string, card: string) =>
  fetch(url, {
    method: 'POST',
    body: new URLSearchParams({ card }),
    headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
    redirect: 'manual',
  });

describe('the deposit', () => {
  it('is the price book’s deposit share of the stored total, in cents, as a checkout session', async () => {
    const { s, order, quote } = await accepted();
    const res = await s.post(`/api/orders/${order.id}/deposit`).expect(201);
    const body = depositSessionSchema.parse(res.body);
    // TEST_BOOK.depositRate = 0.4 of the stored total, rounded to the cent once.
    const expected = Math.round(Number(quote.total) * 0.4 * 100);
    expect(Math.round(body.amount * 100)).toBe(expected);
    expect(body).toMatchObject({ currency: 'USD', url: expect.stringContaining(world.fake.url) });
    // The session as the SDK reads it back from the service.
    const session = await world.payments.stripe.checkout.sessions.retrieve(body.sessionId);
    expect(session).toMatchObject({ amount_total: expected, currency: 'usd', status: 'open' });
    expect(session.metadata).toMatchObject({ orderId: String(order.id) });
  });

  it('two concurrent requests give one session and one pending payment', async () => {
    const { s, order } = await accepted();
    const [a, b] = await Promise.all([
      s.post(`/api/orders/${order.id}/deposit`),
      s.post(`/api/orders/${order.id}/deposit`),
    ]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.sessionId).toBe(b.body.sessionId);
    expect(await Payment.count({ where: { orderId: order.id } })).toBe(1);
    const again = await s.post(`/api/orders/${order.id}/deposit`).expect(201);
    expect(again.body.sessionId).toBe(a.body.sessionId);
  });

  it('is refused for account builders, for orders not accepted, and for other companies', async () => {
    const account = await accepted('account');
    const res = await account.s.post(`/api/orders/${account.order.id}/deposit`).expect(409);
    expect(res.body.error.message).toMatch(/account terms/);
    const open = await sentQuoteWorld(plant);
    const s = await signedIn(world.app, open.builder.email);
    await s.post(`/api/orders/${open.order.id}/deposit`).expect(409);
    await account.s.post(`/api/orders/${open.order.id}/deposit`).expect(404);
  });
});

describe('paying through the SDK against the fake', () => {
  it('session → hosted page form → signed webhook → deposit paid, receipt mailed', async () => {
    const { s, order, customer } = await accepted();
    const { url, amount, sessionId } = (await s.post(`/api/orders/${order.id}/deposit`).expect(201))
      .body;
    const page = await fetch(url);
    expect(await page.text()).toMatch(/<input[^>]+name="card"/);
    const paid = await payOnPage(url, '4242 4242 4242 4242');
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toContain(`session_id=${sessionId}`);

    await until(async () => (await Order.findByPk(order.id))!.status === 'deposit_paid');
    const view = (await s.get(`/api/orders/${order.id}`).expect(200)).body;
    expect(view.payments).toEqual([
      expect.objectContaining({ amount, currency: 'USD', status: 'succeeded', kind: 'deposit' }),
    ]);
    expect(view.payments[0].receiptNumber).toMatch(/^R-/);
    expect(view.money.depositDue).toBe(0);
    expect(view.history.map((h: { action: string }) => h.action)).toContain('payment.received');
    expect(
      await AuditEvent.count({ where: { subjectId: order.id, action: 'payment.received' } }),
    ).toBe(1);

    // Both events were sent and are listed newest first, as the hosted API lists them.
    const events = await world.payments.stripe.events.list({ limit: 10 });
    const ours = events.data.filter(
      (e) =>
        (e.data.object as { metadata?: { orderId?: string } }).metadata?.orderId ===
        String(order.id),
    );
    expect(ours.map((e) => e.type).slice(0, 2)).toEqual([
      'payment_intent.succeeded',
      'checkout.session.completed',
    ]);

    // The receipt goes out through the mail queue with its PDF.
    const mail = await until(async () =>
      (await testMailer())
        .fake!.messages()
        .find((m) => m.to.includes(customer.email) && /Receipt/.test(m.subject)),
    );
    expect(mail.attachments[0]).toMatchObject({ contentType: 'application/pdf' });
    const receipt = await s.agent
      .get(`/api/orders/${order.id}/payments/${view.payments[0].id}/receipt`)
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect((receipt.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
  });

  it('a declined card: the page says so, the session stays open, nothing is recorded', async () => {
    const { s, order } = await accepted();
    const { url, sessionId } = (await s.post(`/api/orders/${order.id}/deposit`).expect(201)).body;
    const declined = await payOnPage(url, '4000000000000002');
    expect(declined.status).toBe(402);
    expect(await declined.text()).toMatch(/declined/i);
    const session = await world.payments.stripe.checkout.sessions.retrieve(sessionId);
    expect(session).toMatchObject({ status: 'open', payment_status: 'unpaid' });
    expect((await Order.findByPk(order.id))!.status).toBe('accepted');
    expect(await Payment.count({ where: { orderId: order.id, status: 'succeeded' } })).toBe(0);
  });
});

describe('the webhook', () => {
  const post = (payload: string, signature?: string) => {
    const r = request(world.app)
      .post('/api/payments/webhook')
      .set('Content-Type', 'application/json');
    return (signature ? r.set('Stripe-Signature', signature) : r).send(payload);
  };
  const signed = (payload: string, secret = world.fake.webhookSecret) =>
    world.payments.stripe.webhooks.generateTestHeaderString({ payload, secret });

  /** The hosted API's event for a paid session of this order. */
  const completedEvent = (id: string, sessionId: string, orderId: number) =>
    JSON.stringify({
      id,
      object: 'event',
      type: 'checkout.session.completed',
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      api_version: '2025-10-29.clover',
      data: {
        object: {
          id: sessionId,
          object: 'checkout.session',
          payment_status: 'paid',
          status: 'complete',
          payment_intent: `pi_${id}`,
          metadata: { orderId: String(orderId) },
        },
      },
    });

  it('a bad or missing signature answers 400 and records nothing', async () => {
    const { s, order } = await accepted();
    const { sessionId } = (await s.post(`/api/orders/${order.id}/deposit`).expect(201)).body;
    const payload = completedEvent('evt_badsig_1', sessionId, order.id);
    const wrong = await post(payload, signed(payload, 'whsec_not_ours')).expect(400);
    expect(wrong.body.error.code).toBe('bad_signature');
    await post(payload).expect(400);
    await post(payload.replace('paid', 'PAID'), signed(payload)).expect(400);
    expect(await PaymentEvent.count({ where: { id: 'evt_badsig_1' } })).toBe(0);
    expect((await Order.findByPk(order.id))!.status).toBe('accepted');
  });

  it('the same event delivered 10 times records one payment; the intent event arriving first is fine', async () => {
    const { s, order } = await accepted();
    const { sessionId, amount } = (await s.post(`/api/orders/${order.id}/deposit`).expect(201))
      .body;
    const cents = Math.round(amount * 100);
    const intentFirst = JSON.stringify({
      id: `evt_pi_${order.id}`,
      object: 'event',
      type: 'payment_intent.succeeded',
      created: Math.floor(Date.now() / 1000),
      livemode: false,
      data: {
        object: {
          id: `pi_x_${order.id}`,
          object: 'payment_intent',
          amount: cents,
          amount_received: cents,
          currency: 'usd',
          status: 'succeeded',
          metadata: { orderId: String(order.id) },
        },
      },
    });
    await post(intentFirst, signed(intentFirst)).expect(200);
    const payload = completedEvent(`evt_dup_${order.id}`, sessionId, order.id);
    const answers = await Promise.all(
      Array.from({ length: 10 }, () => post(payload, signed(payload))),
    );
    expect(answers.map((a) => a.status)).toEqual(Array(10).fill(200));
    expect(answers.filter((a) => a.body.duplicate === false)).toHaveLength(1);
    expect(await Payment.count({ where: { orderId: order.id, status: 'succeeded' } })).toBe(1);
    expect(await PaymentEvent.count({ where: { orderId: order.id } })).toBe(2);
    expect(
      await AuditEvent.count({ where: { subjectId: order.id, action: 'payment.received' } }),
    ).toBe(1);
    expect(await MailMessage.count({ where: { orderId: order.id, kind: 'receipt' } })).toBe(1);
    expect((await Order.findByPk(order.id))!.status).toBe('deposit_paid');
  });
});

describe('refunds and offline payments', () => {
  it('the plant manager cancels before production: deposit less the cancellation fee, recorded from the webhook', async () => {
    const { s, order } = await accepted();
    const { url, amount } = (await s.post(`/api/orders/${order.id}/deposit`).expect(201)).body;
    await payOnPage(url, '4242424242424242');
    await until(async () => (await Order.findByPk(order.id))!.status === 'deposit_paid');
    const admin = await signedIn(world.app, (await createUser({ role: 'admin', plant })).email);
    const sales = await signedIn(world.app, (await createUser({ role: 'sales', plant })).email);
    await sales.post(`/api/orders/${order.id}/cancel`, { reason: 'Job postponed' }).expect(403);
    const res = await admin
      .post(`/api/orders/${order.id}/cancel`, { reason: 'Job postponed' })
      .expect(200);
    expect(res.body.status).toBe('cancelled');
    // The $100.00 cancellation fee of the test book is kept.
    const refundCents = Math.round(amount * 100) - 10000;
    const refund = await until(() =>
      Payment.findOne({ where: { orderId: order.id, kind: 'refund', status: 'succeeded' } }),
    );
    expect(refund.amountCents).toBe(refundCents);
    expect(refund.providerRefundId).toMatch(/^re_/);
    const view = (await s.get(`/api/orders/${order.id}`).expect(200)).body;
    expect(view.money.paid).toBeCloseTo(100, 2);
    expect(view.history.map((h: { action: string }) => h.action)).toEqual(
      expect.arrayContaining(['order.cancelled', 'refund.succeeded']),
    );
    await admin.post(`/api/orders/${order.id}/cancel`, { reason: 'again' }).expect(409);
  });

  it('the desk records a cheque with its reference; the deposit is then covered', async () => {
    const { order, quote } = await accepted();
    const sales = await signedIn(world.app, (await createUser({ role: 'sales', plant })).email);
    const due = Number(quote.depositDue);
    await sales
      .post(`/api/orders/${order.id}/payments`, { amount: due, method: 'cheque' })
      .expect(400);
    const { version } = (await sales.get(`/api/orders/${order.id}`).expect(200)).body;
    const res = await sales
      .post(`/api/orders/${order.id}/payments`, {
        amount: due,
        method: 'cheque',
        reference: 'Chq 20411',
        version,
      })
      .expect(201);
    expect(res.body).toMatchObject({
      kind: 'offline',
      method: 'cheque',
      reference: 'Chq 20411',
      status: 'succeeded',
    });
    const view = (await sales.get(`/api/orders/${order.id}`).expect(200)).body;
    expect(view.status).toBe('deposit_paid');
    expect(view.money.balance).toBeCloseTo(Number(quote.total) - due, 2);
    const mail = (await sales.get(`/api/orders/${order.id}/mail`).expect(200)).body.items;
    expect(mail.map((m: { kind: string }) => m.kind)).toContain('receipt');
  });
});
