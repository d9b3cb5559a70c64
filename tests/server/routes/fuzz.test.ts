import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { QueryTypes } from 'sequelize';
import type request from 'supertest';
import { testApp, testSequelize } from '../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
  FINK_24,
} from '../../support/factories';
import { agentFor, signedIn } from '../../support/session';
import type { Session } from '../../support/desk';
import type { Plant } from '../../../server/models';
import { TEST_BOOK } from './quotes/helpers';

/**
 * Every write route and list query under fuzzed input: never a 5xx, and a refused request changes
 * nothing. The seed is fixed under CI (FUZZ_SEED overrides it); elsewhere each run explores anew and
 * a failure prints the seed and path that reproduce it.
 */
const seed = process.env.FUZZ_SEED
  ? Number(process.env.FUZZ_SEED)
  : process.env.CI
    ? 20261202
    : Date.now() % 2 ** 31;
const numRuns = Number(process.env.FUZZ_RUNS ?? 12);

const app = testApp();
let plant: Plant;
let admin: Session;
let engineer: Session;
const ids = { customer: 0, job: 0, order: 0, line: 0, user: 0, line2: 0 };

beforeAll(async () => {
  plant = await createPlant();
  admin = await signedIn(app, (await createUser({ role: 'admin', plant })).email);
  engineer = await signedIn(app, (await createUser({ role: 'engineer', plant })).email);
  const customer = await createCustomer({ plant });
  const job = await createJob({ customer });
  const order = await createOrder({ job });
  const line = await createLine({ order });
  const line2 = await createLine({ order });
  const colleague = await createUser({ role: 'foreman', plant });
  Object.assign(ids, {
    customer: customer.id,
    job: job.id,
    order: order.id,
    line: line.id,
    line2: line2.id,
    user: colleague.id,
  });
});

/** Everything of the test's plant, as one hash: equal before and after means nothing changed. */
async function fingerprint() {
  const [row] = await testSequelize().query<{ h: string }>(
    `SELECT md5(coalesce(string_agg(x, '|' ORDER BY x), '')) AS h FROM (
       SELECT 'p' || p::text AS x FROM plants p WHERE id = :p
       UNION ALL SELECT 'c' || c::text FROM customers c WHERE plant_id = :p
       UNION ALL SELECT 'j' || j::text FROM jobs j WHERE plant_id = :p
       UNION ALL SELECT 'o' || o::text FROM orders o WHERE plant_id = :p
       UNION ALL SELECT 'l' || l::text FROM order_lines l JOIN orders o ON o.id = l.order_id
                  WHERE o.plant_id = :p
       UNION ALL SELECT 'u' || u::text FROM users u WHERE plant_id = :p
       UNION ALL SELECT 'q' || q::text FROM quotes q WHERE plant_id = :p
       UNION ALL SELECT 'b' || b::text FROM price_books b WHERE plant_id = :p
       UNION ALL SELECT 'a' || a::text FROM audit_events a WHERE plant_id = :p
     ) t`,
    { replacements: { p: plant.id }, type: QueryTypes.SELECT },
  );
  return row.h;
}

// Text that PostgreSQL refuses or that trips naive code: NUL, lone surrogates, prototype names.
const nasty = fc.constantFrom(
  'a\u0000b',
  '\u0000',
  '\ud800',
  'x\udfffy',
  'constructor',
  '__proto__',
  'toString',
  '-valueOf',
  ' '.repeat(500),
  'é'.repeat(300),
  "'; DROP TABLE users; --",
  '%_\\',
);
const text = fc.oneof(nasty, fc.string({ unit: 'binary', maxLength: 40 }), fc.string());
const value = fc.oneof(text, fc.anything({ maxDepth: 3 }), fc.integer(), fc.double());

/** A valid body, one with a field replaced or added, or anything at all. */
const bodyFrom = (template: Record<string, unknown>) => {
  const keys = Object.keys(template);
  return fc.oneof(
    fc.constant(template),
    fc
      .record({ k: fc.constantFrom(...keys), v: value })
      .map(({ k, v }) => ({ ...template, [k]: v })),
    fc.record({ k: text, v: value }).map(({ k, v }) => ({ ...template, [k]: v })),
    fc.dictionary(text, value, { maxKeys: 4 }),
    fc.jsonValue({ maxDepth: 3 }),
  );
};

const listQuery = fc.record(
  {
    q: text,
    page: fc.oneof(text, fc.integer().map(String)),
    pageSize: fc.oneof(text, fc.integer().map(String)),
    sort: fc.oneof(
      nasty,
      fc.constantFrom('constructor', 'toString', 'valueOf', 'hasOwnProperty', '-__proto__', 'name'),
      text,
    ),
    status: text,
    terms: text,
    state: text,
    customerId: fc.oneof(text, fc.integer().map(String)),
    jobId: fc.oneof(text, fc.integer().map(String)),
  },
  { requiredKeys: [] },
);

type Write = {
  as: () => Session;
  method: 'post' | 'patch' | 'put';
  path: () => string;
  body: Record<string, unknown>;
};
const customer = { name: 'Fuzz Co', email: 'fuzz@co.test', terms: 'deposit', contacts: [] };
const writes: Record<string, Write> = {
  'POST /api/customers': {
    as: () => admin,
    method: 'post',
    path: () => '/api/customers',
    body: customer,
  },
  'PATCH /api/customers/:id': {
    as: () => admin,
    method: 'patch',
    path: () => `/api/customers/${ids.customer}`,
    body: { phone: '555-0100', billingAddress: 'x' },
  },
  'POST /api/customers/:id/jobs': {
    as: () => admin,
    method: 'post',
    path: () => `/api/customers/${ids.customer}/jobs`,
    body: { name: 'J', address: 'A', criteria: { exposureNotes: 'n' } },
  },
  'PATCH /api/jobs/:id': {
    as: () => admin,
    method: 'patch',
    path: () => `/api/jobs/${ids.job}`,
    body: { planRevision: 'Rev B', criteria: { exposureNotes: 'coastal' } },
  },
  'POST /api/orders': {
    as: () => admin,
    method: 'post',
    path: () => '/api/orders',
    body: { jobId: 0 },
  },
  'POST /api/orders/:id/lines': {
    as: () => admin,
    method: 'post',
    path: () => `/api/orders/${ids.order}/lines`,
    body: { mark: 'T9', quantity: 2, design: FINK_24 },
  },
  'PATCH /api/orders/:id/lines/:lineId': {
    as: () => admin,
    method: 'patch',
    path: () => `/api/orders/${ids.order}/lines/${ids.line}`,
    body: { quantity: 3, mark: 'T1' },
  },
  'POST /api/orders/:id/lines/reorder': {
    as: () => admin,
    method: 'post',
    path: () => `/api/orders/${ids.order}/lines/reorder`,
    body: { lineIds: [] },
  },
  'POST /api/orders/:id/lines/:lineId/review': {
    as: () => engineer,
    method: 'post',
    path: () => `/api/orders/${ids.order}/lines/${ids.line2}/review`,
    body: { decision: 'return', comment: 'c', designVersion: 1 },
  },
  'POST /api/designs/preview': {
    as: () => admin,
    method: 'post',
    path: () => '/api/designs/preview',
    body: { ...FINK_24 },
  },
  'PUT /api/price-book': {
    as: () => admin,
    method: 'put',
    path: () => '/api/price-book',
    body: { ...TEST_BOOK },
  },
  'POST /api/users': {
    as: () => admin,
    method: 'post',
    path: () => '/api/users',
    body: { email: 'f@u.test', name: 'F', role: 'foreman', password: 'a-long-password' },
  },
  'PATCH /api/users/:id': {
    as: () => admin,
    method: 'patch',
    path: () => `/api/users/${ids.user}`,
    body: { name: 'Renamed' },
  },
};
const lists = ['/api/customers', '/api/jobs', '/api/orders', '/api/users', '/api/reviews'];

const send = (w: Write, body: unknown): request.Test => {
  const s = w.as();
  return s.agent[w.method](w.path())
    .set('X-CSRF-Token', s.token)
    .set('Content-Type', 'application/json')
    .send(JSON.stringify(body)); // a bare value (true, 3) is a body too: send it as JSON text
};

describe(`fuzzed input (seed ${seed})`, () => {
  for (const [route, w] of Object.entries(writes)) {
    it(`${route}: no 5xx, and a refusal changes nothing`, async () => {
      // POST /api/orders needs a real job id in its template.
      if (route === 'POST /api/orders') w.body = { jobId: ids.job };
      await fc.assert(
        fc.asyncProperty(bodyFrom(w.body), async (body) => {
          const before = await fingerprint();
          const res = await send(w, body);
          expect(res.status, JSON.stringify(res.body)).toBeLessThan(500);
          if (res.status >= 400) {
            expect(res.body.error?.message, JSON.stringify(res.body)).toBeTruthy();
            expect(await fingerprint()).toBe(before);
          }
        }),
        { seed, numRuns },
      );
    });
  }

  it('POST /api/auth/login: no 5xx, and nothing but a good sign-in lets anyone in', async () => {
    await fc.assert(
      fc.asyncProperty(bodyFrom({ email: 'someone@example.test', password: 'x' }), async (body) => {
        const s = await agentFor(app);
        const res = await s.agent
          .post('/api/auth/login')
          .set('X-CSRF-Token', s.token)
          .set('Content-Type', 'application/json')
          .send(JSON.stringify(body));
        expect(res.status, JSON.stringify(res.body)).toBeLessThan(500);
        expect(res.status).not.toBe(200);
      }),
      { seed, numRuns: numRuns * 2 },
    );
  });

  for (const path of lists) {
    it(`GET ${path}: no 5xx for any query`, async () => {
      await fc.assert(
        fc.asyncProperty(listQuery, async (query) => {
          const res = await (path === '/api/reviews' ? engineer : admin).agent
            .get(path)
            .query(query);
          expect(res.status, `${JSON.stringify(query)} → ${JSON.stringify(res.body)}`).toBeLessThan(
            500,
          );
          if (res.status >= 400) expect(res.body.error.code).toBe('invalid');
        }),
        { seed, numRuns: numRuns * 2 },
      );
    });
  }

  it('every inherited property name as a sort key answers 400 on every list', async () => {
    for (const path of lists)
      for (const key of Object.getOwnPropertyNames(Object.prototype)) {
        for (const sort of [key, `-${key}`]) {
          const res = await (path === '/api/reviews' ? engineer : admin).get(
            `${path}?sort=${encodeURIComponent(sort)}`,
          );
          expect(res.status, `${path} sort=${sort}`).toBeLessThan(500);
        }
      }
  });
});
