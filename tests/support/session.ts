import request from 'supertest';
import type { Express } from 'express';
import { TEST_PASSWORD } from './factories';

/** A supertest agent with a cookie jar and the session's CSRF token. */
export async function agentFor(app: Express) {
  const agent = request.agent(app);
  const { body } = await agent.get('/api/auth/csrf').expect(200);
  const token = body.token as string;
  return {
    agent,
    token,
    get: (url: string) => agent.get(url),
    post: (url: string, data?: object) =>
      agent
        .post(url)
        .set('X-CSRF-Token', token)
        .send(data ?? {}),
    patch: (url: string, data?: object) =>
      agent
        .patch(url)
        .set('X-CSRF-Token', token)
        .send(data ?? {}),
    delete: (url: string) => agent.delete(url).set('X-CSRF-Token', token),
  };
}

/** Signed in as `email` (the factories' password unless given). */
export async function signedIn(app: Express, email: string, password = TEST_PASSWORD) {
  const s = await agentFor(app);
  await s.post('/api/auth/login', { email, password }).expect(200);
  return s;
}
