/**
 * npm start: the project's PostgreSQL (or DATABASE_URL), migrations, demo data when the database is
 * empty, a production build of the client, then app + API on http://127.0.0.1:3000. Ctrl-C stops
 * the app and the database cleanly.
 */
import { build } from 'vite';
import { connect } from '../server/db/sequelize';
import { migrator } from '../server/db/migrator';
import { createApp } from '../server/app';
import { readConfig } from '../server/config';
import { User } from '../server/models';
import { DEMO_PASSWORD, DEMO_SIGN_INS, seedDemo } from '../seeders/demo';
import { APP_PG_PORT, provideDatabase } from './database';
import { provideMailer } from '../server/services/provideMailer';

const config = readConfig();
const db = await provideDatabase({ dir: '.data/postgres', port: APP_PG_PORT, name: 'spanwise' });
console.log(
  db.cluster
    ? `PostgreSQL: 127.0.0.1:${APP_PG_PORT} (data in .data/postgres)`
    : 'PostgreSQL: DATABASE_URL',
);
const sequelize = connect(db.url);
const applied = await migrator(sequelize).up();
if (applied.length) console.log(`Migrations applied: ${applied.map((m) => m.name).join(', ')}`);
if (config.demo && (await User.count()) === 0) {
  await seedDemo();
  console.log('Demo data seeded.');
}
if (process.env.SKIP_BUILD !== '1') {
  console.log('Building the client…');
  await build({ logLevel: 'warn' });
}
const mail = await provideMailer();
console.log(
  mail.fake
    ? `Mail: local SMTP fake on ${mail.fake.url} (inbox at /inbox for the plant manager)`
    : 'Mail: SMTP_URL',
);
const app = createApp({
  sequelize,
  databaseUrl: db.url,
  config,
  clientDir: 'dist/client',
  mailer: mail,
});
const server = app.listen(config.port, config.host, () => {
  console.log(`\nSpanwise is running at http://${config.host}:${config.port}`);
  if (config.demo) {
    console.log(`Demo sign-ins (password "${DEMO_PASSWORD}"):`);
    for (const u of DEMO_SIGN_INS) console.log(`  ${u.role.padEnd(9)} ${u.email}`);
  }
  console.log('Press Ctrl-C to stop.');
});

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  console.log('\nStopping…');
  server.close();
  server.closeAllConnections();
  await app.locals.close();
  await mail.fake?.close();
  await sequelize.close();
  db.stop();
  console.log('Stopped app and database.');
  process.exit(0);
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
