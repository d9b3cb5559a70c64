/**
 * npm start: the project's PostgreSQL (or DATABASE_URL), migrations, demo data when the database is
 * empty, a production build of the client, the local SMTP fake (unless SMTP_URL), then app + API on
 * http://127.0.0.1:3000. Ctrl-C stops the app, the mail fake and the database cleanly.
 */
import type { Server } from 'node:http';
import { build } from 'vite';
import { connect } from '../server/db/sequelize';
import { migrator } from '../server/db/migrator';
import { createApp } from '../server/app';
import { readConfig } from '../server/config';
import { User } from '../server/models';
import { provideMailer } from '../server/services/provideMailer';
import type { Mailer } from '../server/services/mail';
import { seedDemo } from '../seeders/demo';
import { providePayments } from '../server/services/providePayments';
import { startMailQueue, type MailQueue } from '../server/services/mailQueue';
import { renderAttachment } from '../server/services/mailAttachments';
import { DEMO_PASSWORD, DEMO_SIGN_INS } from '../shared/api/demo';
import { APP_PG_PORT, provideAppDatabase } from './database';

const config = readConfig();
const db = await provideAppDatabase();
const sequelize = connect(db.url);
let server: Server | null = null;
let mail: Mailer | null = null;
let mailQueue: MailQueue | null = null;
let payments: Awaited<ReturnType<typeof providePayments>> | null = null;
let closeApp: () => Promise<void> = async () => undefined;

let stopping = false;
/** Stop whatever has started, in reverse order; the database last. */
async function stop(code = 0) {
  if (stopping) return;
  stopping = true;
  console.log('\nStopping…');
  server?.close();
  server?.closeAllConnections();
  await closeApp().catch(() => undefined);
  await mailQueue?.stop().catch(() => undefined);
  await payments?.fake?.close().catch(() => undefined);
  await mail?.fake?.close().catch(() => undefined);
  await sequelize.close().catch(() => undefined);
  db.stop();
  console.log('Stopped app and database.');
  process.exit(code);
}
process.on('SIGINT', () => void stop());
process.on('SIGTERM', () => void stop());

try {
  console.log(
    db.cluster
      ? `PostgreSQL: 127.0.0.1:${APP_PG_PORT} (data in .data/postgres)`
      : 'PostgreSQL: DATABASE_URL',
  );
  const applied = await migrator(sequelize).up();
  if (applied.length) console.log(`Migrations applied: ${applied.map((m) => m.name).join(', ')}`);
  if (config.demo && (await User.count()) === 0) {
    await seedDemo();
    console.log('Demo data seeded.');
  }
  if (process.env.SKIP_BUILD !== '1') {
    console.log('Building the client…');
    // Vite's build sets NODE_ENV=production for itself; the app keeps the mode the user chose.
    const nodeEnv = process.env.NODE_ENV;
    await build({ logLevel: 'warn' });
    if (nodeEnv === undefined) delete process.env.NODE_ENV;
    else process.env.NODE_ENV = nodeEnv;
  }
  mail = await provideMailer();
  console.log(
    mail.fake
      ? `Mail: local SMTP fake on ${mail.fake.url} (the plant manager's Demo inbox shows it)`
      : 'Mail: SMTP_URL',
  );
  mailQueue = await startMailQueue({ databaseUrl: db.url, mailer: mail, render: renderAttachment });
  console.log('Mail queue: pg-boss worker started (outbox in mail_messages)');
  payments = await providePayments(`http://${config.host}:${config.port}/api/payments/webhook`);
  console.log(
    payments.fake
      ? `Payments: local fake of the hosted payment API on ${payments.fake.url} (key ${payments.fake.secretKey}, webhook secret ${payments.fake.webhookSecret})`
      : 'Payments: hosted service (STRIPE_SECRET_KEY)',
  );
  const app = createApp({
    sequelize,
    databaseUrl: db.url,
    config,
    clientDir: 'dist/client',
    mailer: mail,
    mailQueue,
    payments: payments.payments,
  });
  closeApp = app.locals.close;
  server = app.listen(config.port, config.host, () => {
    console.log(`\nSpanwise is running at http://${config.host}:${config.port}`);
    if (config.demo) {
      console.log(`Demo sign-ins (password "${DEMO_PASSWORD}"):`);
      for (const u of DEMO_SIGN_INS) console.log(`  ${u.role.padEnd(9)} ${u.email}`);
    }
    console.log('Press Ctrl-C to stop.');
  });
  server.on('error', (e) => {
    console.error(`Could not listen on ${config.host}:${config.port}: ${e.message}`);
    void stop(1);
  });
} catch (e) {
  console.error(e);
  await stop(1);
}
