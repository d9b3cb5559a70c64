/** The API alone (used by `npm run dev`, behind Vite's dev server). Needs DATABASE_URL. */
import { connect } from './db/sequelize';
import { createApp } from './app';
import { readConfig } from './config';
import { provideMailer } from './services/provideMailer';

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL is required (npm run dev sets it)');
const config = readConfig();
const sequelize = connect(url);
const mailer = await provideMailer();
const app = createApp({ sequelize, databaseUrl: url, config, mailer });
app.listen(config.port, config.host, () =>
  console.log(`API on http://${config.host}:${config.port}`),
);
