import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import { createJob, createPlant, createUser, FINK_24 } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { AuditEvent, Customer, OrderLine, Quote, type Plant } from '../../../../server/models';

const app = testApp();
let plant: Plant;
let sales: Awaited<ReturnType<typeof signedIn>>;
let engineer: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  plant = await createPlant();
  sales = await signedIn(app, (await createUser({ role: 'sales', plant })).email);
  engineer = await signedIn(app, (await createUser({ role: 'engineer', plant })).email);
});

const newOrder = async () => {
  const job = await createJob({ plant });
  const res = await sales.post('/api/orders', { jobId: job.id }).expect(201);
  return { job, order: res.body as { id: number; number: string } };
};
const addLine = (orderId: number, mark: string, design: object = FINK_24) =>
  sales.post(`/api/orders/${orderId}/lines`, { mark, quantity: 2, plies: 1, design });
const historyOf = async (orderId: number) =>
  (await sales.get(`/api/orders/${orderId}`).expect(200)).body.history as { action: string }[];

describe('truss marks are unique within an order', () => {
  it('refuses a second T1 (any case) on add and on rename, with a message on the field', async () => {
    const { order } = await newOrder();
    await addLine(order.id, 'T1').expect(201);
    const t4 = (await addLine(order.id, 'T4').expect(201)).body;
    const dup = await addLine(order.id, 't1').expect(409);
    expect(dup.body.error).toMatchObject({ code: 'duplicate_mark' });
    expect(dup.body.error.fields.mark).toMatch(/already used/);
    const rename = await sales
      .patch(`/api/orders/${order.id}/lines/${t4.id}`, { mark: 'T1' })
      .expect(409);
    expect(rename.body.error.fields.mark).toMatch(/T1/);
    expect((await OrderLine.findByPk(t4.id))!.mark).toBe('T4');
    // Renaming a line to its own mark in another case is not a clash.
    await sales.patch(`/api/orders/${order.id}/lines/${t4.id}`, { mark: 't4' }).expect(200);
    // The same mark in another order is fine.
    const other = await newOrder();
    await addLine(other.order.id, 'T1').expect(201);
  });

  it('holds under concurrent adds: one line gets the mark, the rest are refused', async () => {
    const { order } = await newOrder();
    const results = await Promise.all(Array.from({ length: 6 }, () => addLine(order.id, 'G1')));
    expect(results.map((r) => r.status).sort()).toEqual([201, 409, 409, 409, 409, 409]);
    expect(await OrderLine.count({ where: { orderId: order.id } })).toBe(1);
  });
});

describe('a save that changes nothing records nothing', () => {
  it('leaves history, review and design alone', async () => {
    const { order } = await newOrder();
    const line = (await addLine(order.id, 'T1').expect(201)).body;
    await engineer
      .post(`/api/orders/${order.id}/lines/${line.id}/review`, {
        decision: 'approve',
        designVersion: line.designVersion,
      })
      .expect(200);
    const before = await historyOf(order.id);
    const same = await sales
      .patch(`/api/orders/${order.id}/lines/${line.id}`, {
        mark: 'T1',
        quantity: 2,
        plies: 1,
        design: FINK_24,
      })
      .expect(200);
    expect(same.body.reviewState).toBe('approved');
    expect(await historyOf(order.id)).toEqual(before);
  });
});

describe('builders are not duplicated silently', () => {
  const base = { terms: 'account', contacts: [] };
  it('asks first for the same name or e-mail, and creates when confirmed', async () => {
    await sales
      .post('/api/customers', { ...base, name: 'Lakeside Framing Co', email: 'a@lakeside.test' })
      .expect(201);
    const byName = await sales
      .post('/api/customers', { ...base, name: '  lakeside  framing co', email: 'b@x.test' })
      .expect(409);
    expect(byName.body.error).toMatchObject({ code: 'possible_duplicate' });
    expect(byName.body.error.message).toMatch(/Lakeside Framing Co already exists/);
    const byMail = await sales
      .post('/api/customers', { ...base, name: 'Other Name', email: 'A@Lakeside.test' })
      .expect(409);
    expect(byMail.body.error.message).toMatch(/a@lakeside.test/);
    expect(await Customer.count({ where: { plantId: plant.id, email: 'b@x.test' } })).toBe(0);
    await sales
      .post('/api/customers', {
        ...base,
        name: 'Lakeside Framing Co',
        email: 'b@x.test',
        confirmDuplicate: true,
      })
      .expect(201);
  });
});

describe('lines designed with a job’s old loads', () => {
  it('are marked out of date (approved ones too), block quoting, and redesign in one click', async () => {
    const { job, order } = await newOrder();
    const a = (await addLine(order.id, 'T1').expect(201)).body;
    const b = (await addLine(order.id, 'T2').expect(201)).body;
    await engineer
      .post(`/api/orders/${order.id}/lines/${a.id}/review`, {
        decision: 'approve',
        designVersion: a.designVersion,
      })
      .expect(200);
    await sales.post(`/api/orders/${order.id}/quotes`).expect(201);

    await sales.patch(`/api/jobs/${job.id}`, { criteria: { loads: { tcll: 30 } } }).expect(200);
    const page = (await sales.get(`/api/orders/${order.id}`).expect(200)).body;
    expect(page.lines.map((l: { loadsOutOfDate: boolean }) => l.loadsOutOfDate)).toEqual([
      true,
      true,
    ]);
    expect(page.lines[0].outOfDateReason).toMatch(/TCLL 20 → 30 psf/);
    expect(page.history.map((h: { action: string }) => h.action)).toContain('lines.out_of_date');
    const refused = await sales.post(`/api/orders/${order.id}/quotes`).expect(409);
    expect(refused.body.error.message).toMatch(/T1, T2/);

    const re = await sales.post(`/api/orders/${order.id}/lines/${a.id}/redesign`).expect(200);
    expect(re.body).toMatchObject({ loadsOutOfDate: false, reviewState: 'pending' });
    expect(re.body.design.loads.tcll).toBe(30);
    expect(re.body.design.span).toBe(FINK_24.span);
    await sales.post(`/api/orders/${order.id}/lines/${b.id}/redesign`).expect(200);
    await sales.post(`/api/orders/${order.id}/quotes`).expect(201);
    expect(
      await AuditEvent.count({ where: { action: 'line.redesigned', subjectId: order.id } }),
    ).toBe(2);
  });

  it('a change of other job fields marks nothing', async () => {
    const { job, order } = await newOrder();
    await addLine(order.id, 'T1').expect(201);
    await sales.patch(`/api/jobs/${job.id}`, { address: '9 Other Road' }).expect(200);
    const page = (await sales.get(`/api/orders/${order.id}`).expect(200)).body;
    expect(page.lines[0].loadsOutOfDate).toBe(false);
  });
});

describe('a quote with nothing changed', () => {
  it('offers the existing revision instead of an identical new one', async () => {
    const { order } = await newOrder();
    const line = (await addLine(order.id, 'T1').expect(201)).body;
    await sales.post(`/api/orders/${order.id}/quotes`).expect(201);
    const again = await sales.post(`/api/orders/${order.id}/quotes`).expect(409);
    expect(again.body.error).toMatchObject({ code: 'quote_unchanged', fields: { number: '1' } });
    expect(await Quote.count({ where: { orderId: order.id } })).toBe(1);
    await sales.patch(`/api/orders/${order.id}/lines/${line.id}`, { quantity: 3 }).expect(200);
    await sales.post(`/api/orders/${order.id}/quotes`).expect(201);
  });
});
