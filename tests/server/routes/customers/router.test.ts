import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import { createCustomer, createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { AuditEvent, Customer, Job, type Plant } from '../../../../server/models';

const app = testApp();
let plant: Plant;
let sales: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  plant = await createPlant();
  sales = await signedIn(app, (await createUser({ role: 'sales', plant })).email);
});

const builder = {
  name: 'Riverbend Homes',
  email: 'Office@Riverbend.test',
  terms: 'account',
  city: 'Riverbend',
  contacts: [
    { name: 'Ola Nordin', title: 'Estimator', email: 'ola@riverbend.test', phone: '555-0100' },
  ],
};

describe('builders', () => {
  it('creates a builder company: 201 with its id at the top level, and an audit event', async () => {
    const res = await sales.post('/api/customers', builder).expect(201);
    expect(res.body).toMatchObject({
      name: 'Riverbend Homes',
      email: 'office@riverbend.test',
      terms: 'account',
      jobCount: 0,
    });
    expect(res.body.contacts).toHaveLength(1);
    expect(typeof res.body.id).toBe('number');
    expect(
      await AuditEvent.count({ where: { action: 'customer.created', subjectId: res.body.id } }),
    ).toBe(1);
  });

  it('answers 400 with field messages for bad input and stores nothing', async () => {
    const before = await Customer.count({ where: { plantId: plant.id } });
    const res = await sales
      .post('/api/customers', { ...builder, email: 'nope', terms: 'cash' })
      .expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['email', 'terms']));
    await sales.post('/api/customers', { ...builder, contacts: [{ name: '' }] }).expect(400);
    expect(await Customer.count({ where: { plantId: plant.id } })).toBe(before);
  });

  it('edits terms and contacts', async () => {
    const c = await createCustomer({ plant });
    const res = await sales
      .patch(`/api/customers/${c.id}`, { terms: 'account', contacts: [] })
      .expect(200);
    expect(res.body.terms).toBe('account');
    await sales.patch(`/api/customers/${c.id}`, {}).expect(400);
  });

  it('filters by terms, searches and sorts the table server-side', async () => {
    await createCustomer({ plant, name: 'Zephyr Framing', terms: 'deposit' });
    await createCustomer({ plant, name: 'Aspen Row Builders', terms: 'account' });
    const deposit = await sales.get('/api/customers?terms=deposit&pageSize=100').expect(200);
    expect(deposit.body.items.every((c: { terms: string }) => c.terms === 'deposit')).toBe(true);
    const desc = await sales.get('/api/customers?sort=-name&pageSize=100').expect(200);
    const names = desc.body.items.map((c: { name: string }) => c.name);
    expect(names).toEqual([...names].sort().reverse());
    const found = await sales.get('/api/customers?q=zephyr').expect(200);
    expect(found.body.items.map((c: { name: string }) => c.name)).toEqual(['Zephyr Framing']);
    const paged = await sales.get('/api/customers?pageSize=1&page=2').expect(200);
    expect(paged.body).toMatchObject({ page: 2, pageSize: 1 });
    expect(paged.body.items).toHaveLength(1);
  });

  it('adds a job with design criteria; the job page shows the loads a truss starts from', async () => {
    const c = await createCustomer({ plant });
    const res = await sales
      .post(`/api/customers/${c.id}/jobs`, {
        name: 'Lot 3',
        address: '3 Hill Road',
        planRevision: 'Rev A',
        criteria: { groundSnow: 30, exposureNotes: 'Open field to the west', loads: { tcdl: 15 } },
      })
      .expect(201);
    expect(res.body).toMatchObject({ name: 'Lot 3', customer: { id: c.id }, units: 'imperial' });
    // Plant defaults 20/10/0/10 psf (common practice) with this job's TCDL override.
    expect(res.body.effectiveLoads).toEqual({ tcll: 20, tcdl: 15, bcll: 0, bcdl: 10 });
    const patched = await sales
      .patch(`/api/jobs/${res.body.id}`, { criteria: { loads: { tcll: 25 } } })
      .expect(200);
    expect(patched.body.effectiveLoads).toEqual({ tcll: 25, tcdl: 10, bcll: 0, bcdl: 10 });
    await sales.post(`/api/customers/${c.id}/jobs`, { name: '', address: '' }).expect(400);
    expect(await Job.count({ where: { customerId: c.id } })).toBe(1);
  });

  it('filters jobs by builder', async () => {
    const c = await createCustomer({ plant });
    await sales
      .post(`/api/customers/${c.id}/jobs`, { name: 'Only job', address: 'Somewhere' })
      .expect(201);
    const res = await sales.get(`/api/jobs?customerId=${c.id}`).expect(200);
    expect(res.body.items.map((j: { name: string }) => j.name)).toEqual(['Only job']);
  });
});

describe('partial edits', () => {
  it('leave fields that were not sent as they are', async () => {
    const created = await sales
      .post('/api/customers', { ...builder, name: 'Keep Contacts Co', email: 'keep@contacts.test' })
      .expect(201);
    await sales.patch(`/api/customers/${created.body.id}`, { phone: '555-0199' }).expect(200);
    const c = await sales.get(`/api/customers/${created.body.id}`).expect(200);
    expect(c.body.contacts).toHaveLength(1);
    const job = await sales
      .post(`/api/customers/${created.body.id}/jobs`, {
        name: 'J',
        address: 'A',
        criteria: { groundSnow: 40 },
      })
      .expect(201);
    const patched = await sales.patch(`/api/jobs/${job.body.id}`, { name: 'J2' }).expect(200);
    expect(patched.body.criteria.groundSnow).toBe(40);
  });
});
