/**
 * Start the payments fake on loopback. The app's SDK points at it with host/port/protocol; its
 * webhooks go to `webhookUrl` (settable later, when the app's own port is known).
 */
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { fakeApp } from './app';
import { createStore } from './store';
import { createSender } from './webhooks';

/** Local-only credentials of the fake (never valid anywhere else). */
export const FAKE_SECRET_KEY = 'sk_test_spanwise_local_fake';
export const FAKE_WEBHOOK_SECRET = 'whsec_spanwise_local_fake';

export interface PaymentsFake {
  url: string;
  port: number;
  secretKey: string;
  webhookSecret: string;
  setWebhookUrl: (url: string | null) => void;
  /** Every webhook attempt so far (event id and HTTP status, null when unreachable). */
  attempts: () => { eventId: string; status: number | null }[];
  close: () => Promise<void>;
}

export async function startPaymentsFake(
  opts: {
    port?: number;
    webhookUrl?: string | null;
    secretKey?: string;
    webhookSecret?: string;
  } = {},
): Promise<PaymentsFake> {
  const secretKey = opts.secretKey ?? FAKE_SECRET_KEY;
  const webhookSecret = opts.webhookSecret ?? FAKE_WEBHOOK_SECRET;
  let webhookUrl = opts.webhookUrl ?? null;
  let base = '';
  const sender = createSender({ secret: webhookSecret, url: () => webhookUrl });
  const app = fakeApp({
    secretKey,
    store: createStore(),
    send: (e) => sender.deliver(e),
    baseUrl: () => base,
  });
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(opts.port ?? 0, '127.0.0.1', () => resolve(s));
    s.once('error', reject);
  });
  const port = (server.address() as AddressInfo).port;
  base = `http://127.0.0.1:${port}`;
  return {
    url: base,
    port,
    secretKey,
    webhookSecret,
    setWebhookUrl: (url) => void (webhookUrl = url),
    attempts: sender.attempts,
    close: async () => {
      sender.close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
