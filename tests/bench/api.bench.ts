/**
 * API benchmark (a script, not a test): its own PostgreSQL (.data/bench-postgres, port 54349), a
 * 60-line order, then autocannon on loopback with 20 connections against
 * POST /api/designs/preview and GET /api/orders/:id. Prints p50/p95 latency and throughput.
 */
import autocannon from 'autocannon';
import type { AddressInfo } from 'node:net';
import { connect } from '../../server/db/sequelize';
import { migrator } from '../../server/db/migrator';
import { createApp } from '../../server/app';
import { provideDatabase } from '../../scripts/database';
import {
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
  FINK_24,
  TEST_PASSWORD,
} from '../support/factories';

const db = await provideDatabase({
  dir: '.data/bench-postgres',
  port: 54349,
  name: 'spanwise_bench',
  fresh: true,
  useEnv: false,
});
process.env.TEST_DATABASE_URL = db.url; // the factories' connection
const sequelize = connect(db.url);
await migrator(sequelize).up();

const plant = await createPlant({ name: 'Bench Plant' });
const sales = await createUser({ role: 'sales', plant });
const order = await createOrder({ job: await createJob({ plant }) });
for (let i = 0; i < 60; i++) await createLine({ order, mark: `T${i + 1}` });

const app = createApp({
  sequelize,
  databaseUrl: db.url,
  config: { demo: false, loginAttemptsPer15Min: 1000, loginAttemptsPerAddress: 100_000 },
});
const server = app.listen(0, '127.0.0.1');
await new Promise((r) => server.once('listening', r));
const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

// Sign in once; every request then carries the session cookie and the CSRF token.
const csrf = await fetch(`${base}/api/auth/csrf`);
let cookie = (csrf.headers.get('set-cookie') ?? '').split(';')[0];
const { token } = (await csrf.json()) as { token: string };
const login = await fetch(`${base}/api/auth/login`, {
  method: 'POST',
  headers: { 'content-type': 'application/json', 'x-csrf-token': token, cookie },
  body: JSON.stringify({ email: sales.email, password: TEST_PASSWORD }),
});
cookie = (login.headers.get('set-cookie') ?? cookie).split(';')[0];
// Sign-in rotates the CSRF token: fetch the new one with the signed-in session.
const rotated = (await (await fetch(`${base}/api/auth/csrf`, { headers: { cookie } })).json()) as {
  token: string;
};
const headers = { cookie, 'x-csrf-token': rotated.token, 'content-type': 'application/json' };

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];

/** Run one autocannon load and report p50/p95 from every response's own latency. */
async function run(title: string, opts: autocannon.Options) {
  const times: number[] = [];
  // Without a callback autocannon returns a promise that is also the instance's event emitter.
  const instance = autocannon({
    connections: 20,
    duration: 10,
    ...opts,
    headers,
  }) as unknown as autocannon.Instance & Promise<autocannon.Result>;
  instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) =>
    times.push(ms),
  );
  const r = await instance;
  times.sort((a, b) => a - b);
  const fmt = (v: number) => `${v.toFixed(1)} ms`.padStart(9);
  console.log(
    `${title.padEnd(32)} p50 ${fmt(percentile(times, 50))}   p95 ${fmt(percentile(times, 95))}   ${Math.round(r.requests.average)} req/s   ${r.non2xx + r.errors} non-2xx of ${r.requests.total}`,
  );
}

console.log(`API benchmark: 20 connections, 10 s each, Node ${process.version}, loopback.`);
await run('POST /api/designs/preview', {
  url: `${base}/api/designs/preview`,
  method: 'POST',
  body: JSON.stringify(FINK_24),
});
await run(`GET /api/orders/:id (60 lines)`, { url: `${base}/api/orders/${order.id}` });

await new Promise((r) => setTimeout(r, 500)); // let the last session writes land
server.close();
server.closeAllConnections();
await app.locals.close();
await sequelize.close();
db.stop();
process.exit(0);
