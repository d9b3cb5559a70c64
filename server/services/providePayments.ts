/**
 * STRIPE_SECRET_KEY (with STRIPE_WEBHOOK_SECRET) points the SDK at the hosted service; without it
 * the local fake starts on 127.0.0.1:PAYMENTS_FAKE_PORT (12111) and sends its webhooks to the app.
 */
import { startPaymentsFake, type PaymentsFake } from '../fakes/payments';
import { createPayments, type Payments } from './payments';

export const PAYMENTS_FAKE_PORT = Number(process.env.PAYMENTS_FAKE_PORT ?? 12111);

export async function providePayments(
  webhookUrl: string,
): Promise<{ payments: Payments; fake: PaymentsFake | null }> {
  const key = process.env.STRIPE_SECRET_KEY;
  if (key) {
    const secret = process.env.STRIPE_WEBHOOK_SECRET;
    if (!secret) throw new Error('STRIPE_WEBHOOK_SECRET must be set with STRIPE_SECRET_KEY');
    return { payments: createPayments({ secretKey: key, webhookSecret: secret }), fake: null };
  }
  const fake = await startPaymentsFake({ port: PAYMENTS_FAKE_PORT, webhookUrl });
  return {
    payments: createPayments({
      secretKey: fake.secretKey,
      webhookSecret: fake.webhookSecret,
      fakeUrl: fake.url,
    }),
    fake,
  };
}
