import express, { Router } from 'express';
import type Stripe from 'stripe';
import { AppError } from '../../errors';
import { applyPaymentEvent } from '../../commands/paymentEvents';
import type { Payments } from '../../services/payments';
import { handle } from '../load';

/**
 * `POST /api/payments/webhook`: the payment service's events, verified by the SDK over the raw
 * body (mounted before the JSON parser). A bad or missing signature answers 400 and records nothing;
 * a duplicate answers 200 and changes nothing.
 */
export function paymentsWebhookRouter() {
  const router = Router();
  router.post(
    '/',
    express.raw({ type: '*/*', limit: '1mb' }),
    handle(async (req, res) => {
      const payments = req.app.locals.payments as Payments | null;
      if (!payments)
        throw new AppError(503, 'payments_unavailable', 'Payments are not configured here.');
      let event: Stripe.Event;
      try {
        event = payments.stripe.webhooks.constructEvent(
          Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0),
          req.get('stripe-signature') ?? '',
          payments.webhookSecret,
        );
      } catch {
        throw new AppError(400, 'bad_signature', 'The webhook signature does not verify.');
      }
      const fresh = await applyPaymentEvent(event);
      res.json({ received: true, duplicate: !fresh });
    }),
  );
  return router;
}
