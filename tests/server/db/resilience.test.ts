import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { createApp } from '../../../server/app';
import { signedIn } from '../../support/session';
import { scratchCluster } from '../../support/scratchCluster';

type Scratch = Awaited<ReturnType<typeof scratchCluster>>;
let db: Scratch;
let app: Express;

beforeAll(async () => {
  db = await scratchCluster('outage', 2);
  app = createApp({
    sequelize: db.sequelize,
    databaseUrl: db.cluster.url,
    config: { demo: false, loginAttemptsPer15Min: 1000, loginAttemptsPerAddress: 100_000 },
  });
}, 120_000);

afterAll(async () => {
  await (app?.locals.close as (() => Promise<void>) | undefined)?.();
  await db?.close();
});

/** Ask until the answer is 200; every answer on the way is 200 or a clear 503, never a 500. */
async function servesAgain(
  get: () => Promise<{ status: number; body: { error?: { code: string } } }>,
) {
  const seen: number[] = [];
  for (let i = 0; i < 100; i++) {
    const res = await get();
    seen.push(res.status);
    if (res.status === 503) expect(res.body.error?.code).toBe('db_unavailable');
    else expect(res.status).toBe(200);
    if (res.status === 200) return seen;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`never served again: ${seen.join(',')}`);
}

describe('the database dropping connections', () => {
  it('survives its connections being terminated, and a restart of the server, and serves again by itself', async () => {
    const user = await db.user('sales');
    const s = await signedIn(app, user.email);
    await s.get('/api/customers').expect(200);

    // Every backend of the app (the session store's pool and Sequelize's) is ended by the server.
    const admin = await db.admin();
    const ended = await admin.query(
      `SELECT pg_terminate_backend(pid) FROM pg_stat_activity
        WHERE datname = current_database() AND pid <> pg_backend_pid()`,
    );
    await admin.end();
    expect(ended.rowCount).toBeGreaterThan(0);
    await new Promise((r) => setTimeout(r, 300)); // let the pools see their connections close
    await servesAgain(() => s.get('/api/auth/me'));
    await servesAgain(() => s.get('/api/customers'));

    // The server goes away: a clear 503 on every path that needs it, the health check says so.
    db.stop();
    const away = await s.get('/api/customers').expect(503);
    expect(away.body.error).toMatchObject({ code: 'db_unavailable' });
    expect(away.body.error.message).toMatch(/database/i);
    await s.get('/api/auth/me').expect(503);
    const health = await s.get('/api/health').expect(503);
    expect(health.body.db).not.toBe('ok');

    // It comes back: the same session serves again without restarting the app.
    db.start();
    await servesAgain(() => s.get('/api/auth/me'));
    await servesAgain(() => s.get('/api/customers'));
    await s.get('/api/health').expect(200);
  });
});
