import request from 'supertest';
import type { Express } from 'express';
import { TEST_PASSWORD } from './factories';

/** A supertest agent with a cookie jar and the session's CSRF token (fetched again as it rotates). */
export async function agentFor(app: Express) {
  const agent = request.agent(app);
  const fetchToken = async () =>
    (await agent.get('/api/auth/csrf').expect(200)).body.token as string;
  let token = await fetchToken();
  return {
    agent,
    get token() {
      return token;
    },
    /** Sign-in and sign-out rotate the token: fetch the new one, as the client does. */
    refreshToken: async () => (token = await fetchToken()),
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
    put: (url: string, data?: object) =>
      agent
        .put(url)
        .set('X-CSRF-Token', token)
        .send(data ?? {}),
    delete: (url: string) => agent.delete(url).set('X-CSRF-Token', token),
  };
}

/** Signed in as `email` (the factories' password unless given). */
export async function signedIn(app: Express, email: string, password = TEST_PASSWORD) {
  const s = await agentFor(app);
  await s.post('/api/auth/login', { email, password }).expect(200);
  await s.refreshToken();
  return s;
}
