import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { createApiClient, isApiError, withQuery } from '../../../src/lib/api-client';

interface Call {
  url: string;
  init: RequestInit;
}

/** A scripted fetch: answers each call with the next response and records what was sent. */
function scriptedFetch(responses: Array<() => Response>) {
  const calls: Call[] = [];
  const fetchImpl = (async (url: string, init: RequestInit = {}) => {
    calls.push({ url, init });
    const next = responses.shift();
    if (!next) throw new Error(`unexpected request ${url}`);
    return next();
  }) as unknown as typeof fetch;
  return { calls, fetchImpl };
}

const json = (status: number, body: unknown) => () =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
const header = (call: Call, name: string) => (call.init.headers as Record<string, string>)[name];

describe('createApiClient', () => {
  it('sends GETs with same-origin credentials and no CSRF token', async () => {
    const { calls, fetchImpl } = scriptedFetch([json(200, { ok: true })]);
    const client = createApiClient(fetchImpl);
    await expect(client.request('/api/plant')).resolves.toEqual({ ok: true });
    expect(calls).toHaveLength(1);
    expect(calls[0].init.credentials).toBe('same-origin');
    expect(header(calls[0], 'X-CSRF-Token')).toBeUndefined();
  });

  it('fetches the CSRF token once and sends it on every non-GET', async () => {
    const { calls, fetchImpl } = scriptedFetch([
      json(200, { token: 't1' }),
      json(201, { id: 1 }),
      json(200, { id: 1 }),
    ]);
    const client = createApiClient(fetchImpl);
    await client.request('/api/users', { method: 'POST', body: { a: 1 } });
    await client.request('/api/users/1', { method: 'PATCH', body: { active: false } });
    expect(calls.map((c) => c.url)).toEqual(['/api/auth/csrf', '/api/users', '/api/users/1']);
    expect(header(calls[1], 'X-CSRF-Token')).toBe('t1');
    expect(header(calls[2], 'X-CSRF-Token')).toBe('t1');
    expect(header(calls[1], 'Content-Type')).toBe('application/json');
    expect(calls[1].init.body).toBe('{"a":1}');
  });

  it('on 403 csrf refetches the token and retries once', async () => {
    const stale = json(403, { error: { code: 'csrf', message: 'stale' } });
    const { calls, fetchImpl } = scriptedFetch([
      json(200, { token: 'old' }),
      stale,
      json(200, { token: 'new' }),
      () => new Response(null, { status: 204 }),
    ]);
    const client = createApiClient(fetchImpl);
    await expect(client.request('/api/auth/logout', { method: 'POST' })).resolves.toBeUndefined();
    expect(header(calls[1], 'X-CSRF-Token')).toBe('old');
    expect(header(calls[3], 'X-CSRF-Token')).toBe('new');
  });

  it('gives up after one retry and throws the second csrf error', async () => {
    const stale = json(403, { error: { code: 'csrf', message: 'Reload the page.' } });
    const { calls, fetchImpl } = scriptedFetch([
      json(200, { token: 'a' }),
      stale,
      json(200, { token: 'b' }),
      stale,
    ]);
    const client = createApiClient(fetchImpl);
    const error = await client
      .request('/api/users', { method: 'POST', body: {} })
      .catch((e: unknown) => e);
    expect(isApiError(error) && error.code).toBe('csrf');
    expect(calls).toHaveLength(4);
  });

  it('does not retry a 403 with another code', async () => {
    const { calls, fetchImpl } = scriptedFetch([
      json(200, { token: 'a' }),
      json(403, { error: { code: 'forbidden', message: 'Not your role.' } }),
    ]);
    const client = createApiClient(fetchImpl);
    await expect(client.request('/api/users', { method: 'POST', body: {} })).rejects.toMatchObject({
      status: 403,
      code: 'forbidden',
    });
    expect(calls).toHaveLength(2);
  });

  it('parses { error: { code, message, fields } } into an ApiError', async () => {
    const { fetchImpl } = scriptedFetch([
      json(200, { token: 'a' }),
      json(401, { error: { code: 'bad_credentials', message: 'Wrong e-mail or password.' } }),
    ]);
    const client = createApiClient(fetchImpl);
    const error = await client
      .request('/api/auth/login', { method: 'POST', body: {} })
      .catch((e: unknown) => e);
    expect(isApiError(error)).toBe(true);
    expect(error).toMatchObject({
      status: 401,
      code: 'bad_credentials',
      message: 'Wrong e-mail or password.',
      fields: {},
    });
  });

  it('keeps per-field messages', async () => {
    const body = {
      error: { code: 'validation', message: 'Check the form.', fields: { email: 'Taken' } },
    };
    const { fetchImpl } = scriptedFetch([json(200, { token: 'a' }), json(400, body)]);
    const client = createApiClient(fetchImpl);
    await expect(client.request('/api/users', { method: 'POST', body: {} })).rejects.toMatchObject({
      fields: { email: 'Taken' },
    });
  });

  it('turns a non-JSON server failure into a readable message', async () => {
    const { fetchImpl } = scriptedFetch([
      () => new Response('<html>Bad gateway</html>', { status: 502 }),
    ]);
    const client = createApiClient(fetchImpl);
    await expect(client.request('/api/jobs')).rejects.toMatchObject({
      status: 502,
      message: 'The server had a problem. Try again in a moment.',
    });
  });

  it('reports a network failure as status 0', async () => {
    const fetchImpl = (async () => {
      throw new TypeError('Failed to fetch');
    }) as unknown as typeof fetch;
    await expect(createApiClient(fetchImpl).request('/api/jobs')).rejects.toMatchObject({
      status: 0,
      code: 'network',
    });
  });

  it('validates responses with the given schema', async () => {
    const { fetchImpl } = scriptedFetch([json(200, { id: 'x' })]);
    const client = createApiClient(fetchImpl);
    await expect(
      client.request('/api/plant', { schema: z.object({ id: z.number() }) }),
    ).rejects.toMatchObject({
      code: 'bad_response',
    });
  });

  it('retries a failed token fetch on the next request', async () => {
    const { fetchImpl } = scriptedFetch([
      json(500, { error: { code: 'internal', message: 'Down' } }),
      json(200, { token: 'ok' }),
      json(200, {}),
    ]);
    const client = createApiClient(fetchImpl);
    await expect(client.request('/api/x', { method: 'POST' })).rejects.toMatchObject({
      status: 500,
    });
    await expect(client.request('/api/x', { method: 'POST' })).resolves.toEqual({});
  });
});

describe('withQuery', () => {
  it('drops empty values and encodes the rest', () => {
    expect(
      withQuery('/api/jobs', { q: 'oak & pine', page: 2, sort: undefined, pageSize: null }),
    ).toBe('/api/jobs?q=oak+%26+pine&page=2');
    expect(withQuery('/api/jobs', { q: '' })).toBe('/api/jobs');
  });
});
