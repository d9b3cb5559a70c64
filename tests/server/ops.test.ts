import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../support/db';
import { createApp } from '../../server/app';
import { testDatabaseUrl, testSequelize } from '../support/db';

describe('GET /api/health', () => {
  it('reports the database, the mail queue and the payment service separately', async () => {
    const res = await request(testApp()).get('/api/health').expect(200);
    expect(res.body).toMatchObject({
      status: 'ok',
      db: 'ok',
      mail: 'not configured',
      payments: 'not configured',
    });
  });

  it('a failing probe makes it 503 and names the service', async () => {
    const app = createApp({
      sequelize: testSequelize(),
      databaseUrl: testDatabaseUrl(),
      config: { demo: false },
      healthProbes: {
        mail: async () => undefined,
        payments: () => Promise.reject(new Error('no route to the payment service')),
      },
    });
    const res = await request(app).get('/api/health').expect(503);
    expect(res.body).toMatchObject({
      status: 'degraded',
      db: 'ok',
      mail: 'ok',
      payments: 'unreachable',
    });
  });
});

describe('request ids', () => {
  it('every response carries X-Request-Id, and an error body echoes it', async () => {
    const app = testApp();
    const res = await request(app).get('/api/no-such-thing').expect(404);
    const id = res.headers['x-request-id'];
    expect(id).toMatch(/^[0-9a-f-]{36}$/);
    expect(res.body.error.requestId).toBe(id);
    const ok = await request(app).get('/api/health');
    expect(ok.headers['x-request-id']).toBeTruthy();
  });

  it("keeps a load balancer's plain request id, and replaces an odd one", async () => {
    const app = testApp();
    const kept = await request(app)
      .get('/api/auth/me')
      .set('X-Request-Id', 'lb-1234.abc')
      .expect(401);
    expect(kept.body.error.requestId).toBe('lb-1234.abc');
    const odd = await request(app)
      .get('/api/auth/me')
      .set('X-Request-Id', 'a b\tc<script>')
      .expect(401);
    expect(odd.body.error.requestId).not.toContain('<');
  });
});
