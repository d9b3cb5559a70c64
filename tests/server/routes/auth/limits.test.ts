import { describe, expect, it } from 'vitest';
import { randomInt } from 'node:crypto';
import { testApp } from '../../../support/db';
import { createUser, TEST_PASSWORD } from '../../../support/factories';
import { agentFor } from '../../../support/session';

/** A made-up client address per test, believed because the test app trusts one proxy hop. */
const someAddress = () => `10.${randomInt(256)}.${randomInt(256)}.${randomInt(1, 255)}`;

describe('sign-in limits (counters in PostgreSQL)', () => {
  it('keys on the normalised e-mail: padded and upper-case forms are the same address', async () => {
    const app = testApp({ loginAttemptsPer15Min: 3 });
    const user = await createUser();
    const s = await agentFor(app);
    for (const email of [`  ${user.email.toUpperCase()}`, user.email, `${user.email}\t `])
      await s.post('/api/auth/login', { email, password: 'wrong-wrong' }).expect(401);
    const res = await s
      .post('/api/auth/login', { email: ` ${user.email} `, password: TEST_PASSWORD })
      .expect(429);
    expect(res.body.error.code).toBe('rate_limited');
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('counts failures only: any number of good sign-ins is never limited', async () => {
    const app = testApp({ loginAttemptsPer15Min: 2 });
    const user = await createUser();
    for (let i = 0; i < 5; i++) {
      const s = await agentFor(app);
      await s.post('/api/auth/login', { email: user.email, password: TEST_PASSWORD }).expect(200);
    }
    // A success clears the e-mail's earlier failures, too.
    const s = await agentFor(app);
    await s.post('/api/auth/login', { email: user.email, password: 'nope-nope' }).expect(401);
    await s.post('/api/auth/login', { email: user.email, password: TEST_PASSWORD }).expect(200);
    await s.refreshToken();
    await s.post('/api/auth/login', { email: user.email, password: 'nope-nope' }).expect(401);
    await s.post('/api/auth/login', { email: user.email, password: 'nope-nope' }).expect(401);
  });

  it('limits one address across e-mails (password spraying), and only that address', async () => {
    const app = testApp({ loginAttemptsPer15Min: 100, loginAttemptsPerAddress: 4, trustProxy: 1 });
    const user = await createUser();
    const sprayer = someAddress();
    const s = await agentFor(app);
    const from = (address: string, email: string, password: string) =>
      s.agent
        .post('/api/auth/login')
        .set('X-CSRF-Token', s.token)
        .set('X-Forwarded-For', address)
        .send({ email, password });
    for (let i = 0; i < 4; i++)
      await from(sprayer, `someone-${i}@example.test`, 'Spring2026!').expect(401);
    await from(sprayer, user.email, TEST_PASSWORD).expect(429);
    await from(someAddress(), user.email, TEST_PASSWORD).expect(200);
  });

  it('a non-string e-mail or password is a 400, never a 500, and is not counted', async () => {
    const app = testApp({ loginAttemptsPer15Min: 1 });
    const user = await createUser();
    const s = await agentFor(app);
    for (const body of [
      { email: 12345, password: 'x' },
      { email: { toString: 1 }, password: 'x' },
      { email: [user.email], password: 'x' },
      { email: null, password: 'x' },
      { email: user.email, password: { length: 3 } },
      { email: user.email, password: 12 },
    ]) {
      const res = await s.post('/api/auth/login', body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.code).toBe('invalid');
    }
    await s.post('/api/auth/login', { email: user.email, password: TEST_PASSWORD }).expect(200);
  });
});

describe('the CSRF token', () => {
  it('rotates at sign-in and at sign-out; the old one stops working', async () => {
    const app = testApp();
    const user = await createUser();
    const s = await agentFor(app);
    const anonymous = s.token;
    await s.post('/api/auth/login', { email: user.email, password: TEST_PASSWORD }).expect(200);
    const signedInToken = await s.refreshToken();
    expect(signedInToken).not.toBe(anonymous);
    const stale = await s.agent.post('/api/auth/logout').set('X-CSRF-Token', anonymous).expect(403);
    expect(stale.body.error.code).toBe('csrf');
    await s.post('/api/auth/logout').expect(204);
    expect(await s.refreshToken()).not.toBe(signedInToken);
  });
});
