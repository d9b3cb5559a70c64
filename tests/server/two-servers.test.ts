import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../support/db';
import { createJob, createUser, TEST_PASSWORD } from '../support/factories';
import { agentFor, signedIn } from '../support/session';
import { binary, pngBytes, upload, useTempUploadDir } from './routes/files/fixtures';

// Both servers keep plans in one shared folder (UPLOAD_DIR), as a multi-server deployment must.
useTempUploadDir();

/** Two app servers against one database: nothing a request needs lives in one server's memory. */
describe('two app servers, one database', () => {
  const one = testApp({ loginAttemptsPer15Min: 3 });
  const two = testApp({ loginAttemptsPer15Min: 3 });

  it('a session signed in on one is valid on the other, CSRF token included', async () => {
    const user = await createUser({ role: 'sales' });
    const s = await signedIn(one, user.email);
    const cookie = String((await s.agent.get('/api/auth/me').expect(200)).request.cookies ?? '');
    expect(cookie).toMatch(/spanwise\.sid=/);
    const me = await request(two).get('/api/auth/me').set('Cookie', cookie).expect(200);
    expect(me.body.user.id).toBe(user.id);
    await request(two)
      .post('/api/auth/logout')
      .set('Cookie', cookie)
      .set('X-CSRF-Token', s.token)
      .expect(204);
    await s.get('/api/auth/me').expect(401); // signed out on one through the other
  });

  it('the sign-in limit counts attempts on both', async () => {
    const user = await createUser();
    const wrong = { email: user.email, password: 'wrong-wrong' };
    const a = await agentFor(one);
    const b = await agentFor(two);
    await a.post('/api/auth/login', wrong).expect(401);
    await b.post('/api/auth/login', wrong).expect(401);
    await a.post('/api/auth/login', wrong).expect(401);
    await b.post('/api/auth/login', { email: user.email, password: TEST_PASSWORD }).expect(429);
  });

  it('a plan uploaded through one downloads through the other', async () => {
    const user = await createUser({ role: 'sales' });
    const job = await createJob({ plant: undefined });
    await user.update({ plantId: job.plantId });
    const viaOne = await signedIn(one, user.email);
    const viaTwo = await signedIn(two, user.email);
    const res = await upload(viaOne, job.id, pngBytes(), 'roof.png').expect(201);
    const got = await viaTwo
      .get(`/api/files/${res.body.id}`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(Buffer.compare(got.body as Buffer, pngBytes())).toBe(0);
  });
});
