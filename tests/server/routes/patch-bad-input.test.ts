import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
} from '../../support/factories';
import { signedIn } from '../../support/session';
import type { Session } from '../../support/desk';
import { AuditEvent, Customer, Job, OrderLine, User } from '../../../server/models';

/** PATCH of jobs, lines, customers and users: bad input answers 400 with a message and changes nothing. */
const app = testApp();
let admin: Session;
let records: { customer: Customer; job: Job; line: OrderLine; user: User; orderId: number };

beforeAll(async () => {
  const plant = await createPlant();
  admin = await signedIn(app, (await createUser({ role: 'admin', plant })).email);
  const customer = await createCustomer({ plant });
  const job = await createJob({ customer });
  const order = await createOrder({ job });
  const line = await createLine({ order });
  const user = await createUser({ role: 'foreman', plant });
  records = { customer, job, line, user, orderId: order.id };
});

const cases: Record<
  string,
  { path: () => string; reload: () => Promise<unknown>; bodies: unknown[] }
> = {
  customer: {
    path: () => `/api/customers/${records.customer.id}`,
    reload: () => Customer.findByPk(records.customer.id, { raw: true }),
    bodies: [
      {},
      { name: '' },
      { email: 'not-mail' },
      { terms: 'cash' },
      { contacts: 'x' },
      { name: 'a\u0000b' },
      { name: 7 },
    ],
  },
  job: {
    path: () => `/api/jobs/${records.job.id}`,
    reload: () => Job.findByPk(records.job.id, { raw: true }),
    bodies: [
      {},
      { name: '' },
      { address: 'x'.repeat(401) },
      { criteria: { groundSnow: 'lots' } },
      { criteria: { exposureNotes: 'sea\u0000' } },
      { planRevision: ['A'] },
    ],
  },
  line: {
    path: () => `/api/orders/${records.orderId}/lines/${records.line.id}`,
    reload: () => OrderLine.findByPk(records.line.id, { raw: true }),
    bodies: [
      {},
      { quantity: 0 },
      { quantity: 1.5 },
      { plies: 9 },
      { mark: '' },
      { design: 'fink' },
      { design: { profile: 'nope' } },
    ],
  },
  user: {
    path: () => `/api/users/${records.user.id}`,
    reload: () => User.findByPk(records.user.id, { raw: true }),
    bodies: [
      {},
      { name: '' },
      { role: 'overlord' },
      { password: 'short' },
      { active: 'yes' },
      { name: '\ud800' },
    ],
  },
};

describe('PATCH with bad input', () => {
  for (const [what, c] of Object.entries(cases)) {
    it(`of a ${what}: 400 with a message, and nothing changes`, async () => {
      const before = await c.reload();
      const events = await AuditEvent.count({ where: { plantId: records.job.plantId } });
      for (const body of c.bodies) {
        const res = await admin.patch(c.path(), body as object);
        expect(res.status, `${JSON.stringify(body)} → ${JSON.stringify(res.body)}`).toBe(400);
        expect(res.body.error.message).toBeTruthy();
      }
      expect(await c.reload()).toEqual(before);
      expect(await AuditEvent.count({ where: { plantId: records.job.plantId } })).toBe(events);
    });
  }
});
