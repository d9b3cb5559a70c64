/** The API alone (used by `npm run dev`, behind Vite's dev server). Needs DATABASE_URL. */
import { connect } from './db/sequelize';
import { createApp } from './app';
import { readConfig } from './config';
import { provideMailer } from './services/provideMailer';
import { providePayments } from './services/providePayments';
import { startMailQueue } from './services/mailQueue';
import { renderAttachment } from './services/mailAttachments';

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL is required (npm run dev sets it)');
const config = readConfig();
const sequelize = connect(url);
const mailer = await provideMailer();
const mailQueue = await startMailQueue({ databaseUrl: url, mailer, render: renderAttachment });
const { payments } = await providePayments(
  `http://${config.host}:${config.port}/api/payments/webhook`,
);
const app = createApp({ sequelize, databaseUrl: url, config, mailer, mailQueue, payments });
app.listen(config.port, config.host, () =>
  console.log(`API on http://${config.host}:${config.port}`),
);
