/**
 * The payment service, only ever through the official `stripe` SDK: the local fake (host, port and
 * protocol point the SDK at it) or, with STRIPE_SECRET_KEY set, the hosted service.
 */
import Stripe from 'stripe';

export interface Payments {
  stripe: Stripe;
  webhookSecret: string;
  /** `fake`: the local stand-in on loopback; `hosted`: the real service. */
  mode: 'fake' | 'hosted';
  /** Where the SDK sends requests, for the health probe. */
  api: string;
}

export function createPayments(opts: {
  secretKey: string;
  webhookSecret: string;
  /** The local fake's address (http://127.0.0.1:PORT); omitted for the hosted service. */
  fakeUrl?: string;
}): Payments {
  const fake = opts.fakeUrl ? new URL(opts.fakeUrl) : null;
  const stripe = new Stripe(opts.secretKey, {
    maxNetworkRetries: 2,
    timeout: 20_000,
    telemetry: false,
    appInfo: { name: 'Spanwise' },
    ...(fake
      ? {
          host: fake.hostname,
          port: Number(fake.port),
          protocol: fake.protocol === 'https:' ? 'https' : 'http',
        }
      : {}),
  });
  return {
    stripe,
    webhookSecret: opts.webhookSecret,
    mode: fake ? 'fake' : 'hosted',
    api: fake ? fake.origin : 'https://api.stripe.com',
  };
}

/** Health probe: configured or not, and which service the SDK talks to. */
export function paymentsProbe(payments: Payments | null) {
  return payments
    ? { status: 'ok', mode: payments.mode, api: payments.api }
    : { status: 'not_configured' };
}
