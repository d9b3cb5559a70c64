import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../../support/db';
import { createUser, TEST_PASSWORD } from '../../../support/factories';
import { agentFor, signedIn } from '../../../support/session';
import { AuditEvent } from '../../../../server/models';

const app = testApp();

describe('sign-in', () => {
  it('signs in with the right password and presents the user, plant and company', async () => {
    const user = await createUser({ role: 'builder' });
    const s = await agentFor(app);
    const res = await s
      .post('/api/auth/login', { email: user.email.toUpperCase(), password: TEST_PASSWORD })
      .expect(200);
    expect(res.body.user).toEqual({
      id: user.id,
      email: user.email,
      name: user.name,
      role: 'builder',
      plantId: user.plantId,
      customerId: user.customerId,
    });
    expect(res.body.customer.id).toBe(user.customerId);
    expect(res.headers['set-cookie']?.[0]).toMatch(/spanwise\.sid=.*HttpOnly/i);
    const me = await s.get('/api/auth/me').expect(200);
    expect(me.body.user.id).toBe(user.id);
    expect(await AuditEvent.count({ where: { actorId: user.id, action: 'user.signed_in' } })).toBe(
      1,
    );
  });

  it('answers 401 with one generic message for a wrong password or an unknown e-mail', async () => {
    const user = await createUser();
    const s = await agentFor(app);
    const wrong = await s
      .post('/api/auth/login', { email: user.email, password: 'nope-nope' })
      .expect(401);
    const unknown = await s
      .post('/api/auth/login', { email: 'nobody@example.test', password: 'nope-nope' })
      .expect(401);
    expect(wrong.body.error).toMatchObject({
      code: 'bad_credentials',
      message: 'Wrong e-mail or password.',
    });
    expect(unknown.body.error.message).toBe(wrong.body.error.message);
    await s.get('/api/auth/me').expect(401);
  });

  it('rejects malformed bodies with 400 and field messages, never 500', async () => {
    const s = await agentFor(app);
    const res = await s.post('/api/auth/login', { email: 'not-an-email' }).expect(400);
    expect(res.body.error.fields).toHaveProperty('email');
    await s.agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', s.token)
      .set('content-type', 'application/json')
      .send('{bad json')
      .expect(400);
  });

  it('regenerates the session id at sign-in', async () => {
    const user = await createUser();
    const s = await agentFor(app);
    const before = await s.agent.get('/api/auth/csrf');
    const cookieBefore = String(before.headers['set-cookie'] ?? '');
    const res = await s
      .post('/api/auth/login', { email: user.email, password: TEST_PASSWORD })
      .expect(200);
    const cookieAfter = String(res.headers['set-cookie'] ?? '');
    expect(cookieAfter).toMatch(/spanwise\.sid=/);
    expect(cookieAfter.split(';')[0]).not.toBe(cookieBefore.split(';')[0]);
  });

  it('signs out', async () => {
    const user = await createUser();
    const s = await signedIn(app, user.email);
    await s.post('/api/auth/logout').expect(204);
    await s.get('/api/auth/me').expect(401);
  });
});

describe('CSRF', () => {
  it('refuses a non-GET request without the token, or with a wrong one', async () => {
    const user = await createUser();
    const s = await agentFor(app);
    const none = await s.agent
      .post('/api/auth/login')
      .send({ email: user.email, password: TEST_PASSWORD })
      .expect(403);
    expect(none.body.error.code).toBe('csrf');
    await s.agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', 'x'.repeat(s.token.length))
      .send({ email: user.email, password: TEST_PASSWORD })
      .expect(403);
    // A token of another session is no good either.
    const other = await agentFor(app);
    await s.agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', other.token)
      .send({ email: user.email, password: TEST_PASSWORD })
      .expect(403);
    await s.get('/api/auth/me').expect(401);
  });
});

describe('rate limiting', () => {
  it('answers 429 with a clear message after too many attempts for one e-mail', async () => {
    const limited = testApp({ loginAttemptsPer15Min: 3 });
    const user = await createUser();
    const s = await agentFor(limited);
    for (let i = 0; i < 3; i++)
      await s.post('/api/auth/login', { email: user.email, password: 'wrong-wrong' }).expect(401);
    const res = await s
      .post('/api/auth/login', { email: user.email, password: TEST_PASSWORD })
      .expect(429);
    expect(res.body.error).toMatchObject({ code: 'rate_limited' });
    expect(res.body.error.message).toMatch(/Too many sign-in attempts/);
    // A colleague at the same address is not locked out.
    const colleague = await createUser();
    await s
      .post('/api/auth/login', { email: colleague.email, password: TEST_PASSWORD })
      .expect(200);
  });
});

describe('deactivated user', () => {
  it('cannot sign in, and their open sessions stop working at once', async () => {
    const admin = await createUser({ role: 'admin' });
    const user = await createUser({ role: 'sales', plant: undefined });
    await user.update({ plantId: admin.plantId });
    const victim = await signedIn(app, user.email);
    await victim.get('/api/jobs').expect(200);
    const a = await signedIn(app, admin.email);
    await a.patch(`/api/users/${user.id}`, { active: false }).expect(200);
    await victim.get('/api/jobs').expect(401);
    await victim.get('/api/auth/me').expect(401);
    const again = await agentFor(app);
    await again.post('/api/auth/login', { email: user.email, password: TEST_PASSWORD }).expect(401);
  });
});

describe('health', () => {
  it('reports the database', async () => {
    const res = await request(app).get('/api/health').expect(200);
    expect(res.body).toMatchObject({ status: 'ok', db: 'ok' });
  });
  it('answers unknown API paths with a JSON 404', async () => {
    const res = await request(app).get('/api/no-such-thing').expect(404);
    expect(res.body.error.code).toBe('not_found');
  });
});

describe('demo mode', () => {
  it('belongs to each app, not to the process', async () => {
    const user = await createUser();
    const demoApp = testApp({ demo: true });
    const plainApp = testApp({ demo: false });
    const a = await signedIn(demoApp, user.email);
    const b = await signedIn(plainApp, user.email);
    expect((await a.get('/api/auth/me').expect(200)).body.plant.demo).toBe(true);
    expect((await b.get('/api/auth/me').expect(200)).body.plant.demo).toBe(false);
    expect((await a.get('/api/plant').expect(200)).body.demo).toBe(true);
  });
});
