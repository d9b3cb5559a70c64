import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../support/db';
import { createCustomer, createJob, createPlant, createUser } from '../../support/factories';
import { signedIn } from '../../support/session';
import type { Customer, Job, User } from '../../../server/models';

const app = testApp();
let ours: {
  admin: User;
  sales: User;
  builder: User;
  customer: Customer;
  otherCustomer: Customer;
  job: Job;
  otherCompanyJob: Job;
};
let theirs: { user: User; customer: Customer; job: Job };

beforeAll(async () => {
  const plant = await createPlant();
  const customer = await createCustomer({ plant });
  const otherCustomer = await createCustomer({ plant });
  ours = {
    admin: await createUser({ role: 'admin', plant }),
    sales: await createUser({ role: 'sales', plant }),
    builder: await createUser({ role: 'builder', customer }),
    customer,
    otherCustomer,
    job: await createJob({ customer }),
    otherCompanyJob: await createJob({ customer: otherCustomer }),
  };
  const otherPlant = await createPlant();
  const c = await createCustomer({ plant: otherPlant });
  theirs = {
    user: await createUser({ role: 'foreman', plant: otherPlant }),
    customer: c,
    job: await createJob({ customer: c }),
  };
});

describe('another plant’s records', () => {
  it('answer 404 and never their data', async () => {
    const s = await signedIn(app, ours.admin.email);
    for (const path of [`/api/jobs/${theirs.job.id}`, `/api/customers/${theirs.customer.id}`]) {
      const res = await s.get(path).expect(404);
      expect(JSON.stringify(res.body)).not.toContain(theirs.customer.name);
    }
    await s.patch(`/api/users/${theirs.user.id}`, { name: 'Hijacked' }).expect(404);
    const lists = await Promise.all([
      s.get('/api/jobs?pageSize=100'),
      s.get('/api/customers?pageSize=100'),
      s.get('/api/users?pageSize=100'),
    ]);
    for (const l of lists) expect(JSON.stringify(l.body)).not.toContain(theirs.customer.name);
    expect(lists[2].body.items.map((u: { id: number }) => u.id)).not.toContain(theirs.user.id);
  });
});

describe('another builder company’s records', () => {
  it('answer 404 to a builder, and lists hold only their own company', async () => {
    const s = await signedIn(app, ours.builder.email);
    await s.get(`/api/jobs/${ours.otherCompanyJob.id}`).expect(404);
    await s.get(`/api/customers/${ours.otherCustomer.id}`).expect(404);
    await s.get(`/api/jobs/${ours.job.id}`).expect(200);
    const list = await s.get('/api/jobs?pageSize=100').expect(200);
    expect(list.body.items.map((j: { id: number }) => j.id)).toEqual([ours.job.id]);
  });

  it('staff of the plant see both companies', async () => {
    const s = await signedIn(app, ours.sales.email);
    const list = await s.get('/api/jobs?pageSize=100').expect(200);
    expect(list.body.total).toBe(2);
  });

  it('ids that are not numbers are simply not found', async () => {
    const s = await signedIn(app, ours.sales.email);
    await s.get('/api/jobs/abc').expect(404);
    await s.get('/api/jobs/1e3').expect(404);
  });
});
