import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createApp } from '../../server/app';
import { startPaymentsFake, type PaymentsFake } from '../../server/fakes/payments';
import { createPayments } from '../../server/services/payments';
import { testDatabaseUrl, testMailer, testSequelize } from './db';

/**
 * The app on a loopback port with the payments fake (the SDK pointed at it, its webhooks at the
 * app) and the test mailer with its queue worker. `close()` stops all of it.
 */
export async function paymentsWorld(clientDir?: string, config: { demo?: boolean } = {}) {
  const fake: PaymentsFake = await startPaymentsFake();
  const payments = createPayments({
    secretKey: fake.secretKey,
    webhookSecret: fake.webhookSecret,
    fakeUrl: fake.url,
  });
  const app = createApp({
    sequelize: testSequelize(),
    databaseUrl: testDatabaseUrl(),
    config: { demo: false, loginAttemptsPer15Min: 1000, ...config },
    clientDir,
    mailer: await testMailer(),
    payments,
  });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  fake.setWebhookUrl(`${base}/api/payments/webhook`);
  return {
    app,
    fake,
    payments,
    base,
    close: async () => {
      await fake.close();
      server.closeAllConnections();
      await new Promise<void>((r) => server.close(() => r()));
      await app.locals.close();
    },
  };
}
