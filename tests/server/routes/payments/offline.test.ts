import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { paymentsWorld } from '../../../support/payments';
import { Payment, type Plant } from '../../../../server/models';
import { sentQuoteWorld, useTestBook } from '../portal/helpers';

let world: Awaited<ReturnType<typeof paymentsWorld>>;
let plant: Plant;

beforeAll(async () => {
  world = await paymentsWorld();
  plant = await createPlant();
  await useTestBook(plant);
});
afterAll(() => world.close());

async function acceptedWithDesk() {
  const w = await sentQuoteWorld(plant);
  const builder = await signedIn(world.app, w.builder.email);
  await builder
    .post(`/api/orders/${w.order.id}/quotes/1/accept`, { name: 'Dana', agree: true })
    .expect(200);
  const sales = await signedIn(world.app, (await createUser({ role: 'sales', plant })).email);
  return { ...w, sales };
}

describe('the desk’s side of an order’s money', () => {
  it('shows the deposit asked, what is still due, paid, refunded and outstanding', async () => {
    const { order, quote, sales } = await acceptedWithDesk();
    const seen = (await sales.get(`/api/orders/${order.id}`).expect(200)).body;
    const before = seen.money;
    expect(before).toEqual({
      currency: 'USD',
      total: Number(quote.total),
      paid: 0,
      balance: Number(quote.total),
      deposit: Number(quote.depositDue),
      depositDue: Number(quote.depositDue),
      refunded: 0,
    });
    await sales
      .post(`/api/orders/${order.id}/payments`, {
        amount: 50,
        method: 'transfer',
        reference: 'TRF 0031',
        version: seen.version,
      })
      .expect(201);
    const view = (await sales.get(`/api/orders/${order.id}`).expect(200)).body;
    // Money arriving raises the order's version: a form opened before it is stale.
    expect(view.version).toBeGreaterThan(seen.version);
    const after = view.money;
    expect(after).toMatchObject({
      paid: 50,
      deposit: Number(quote.depositDue),
      depositDue: Math.round((Number(quote.depositDue) - 50) * 100) / 100,
      refunded: 0,
    });
  });

  it('answers 409 when money was recorded since the desk opened the order, and records nothing', async () => {
    const { order, sales } = await acceptedWithDesk();
    const { version } = (await sales.get(`/api/orders/${order.id}`).expect(200)).body;
    const body = { amount: 100, method: 'cheque', reference: 'Chq 1001', version };
    await sales.post(`/api/orders/${order.id}/payments`, body).expect(201);
    // A second tab still showing the order as it was sends the same cheque again.
    const stale = await sales.post(`/api/orders/${order.id}/payments`, body).expect(409);
    expect(stale.body.error).toMatchObject({ code: 'stale' });
    expect(stale.body.error.message).toMatch(/changed since you opened it.*Check the payments/);
    expect(await Payment.count({ where: { orderId: order.id } })).toBe(1);
    // With the version it now sees, it records the next one.
    const now = (await sales.get(`/api/orders/${order.id}`).expect(200)).body.version;
    await sales
      .post(`/api/orders/${order.id}/payments`, { ...body, reference: 'Chq 1002', version: now })
      .expect(201);
  });

  it('refuses a payment that names no version, and records nothing', async () => {
    const { order, sales } = await acceptedWithDesk();
    const res = await sales
      .post(`/api/orders/${order.id}/payments`, { amount: 5, method: 'cash', reference: 'Till' })
      .expect(400);
    expect(res.body.error.fields.version).toBe('Reload the order: send the version you looked at');
    expect(await Payment.count({ where: { orderId: order.id } })).toBe(0);
  });

  it('refuses bad input with a message beside the field and records nothing', async () => {
    const { order, sales } = await acceptedWithDesk();
    const bad = async (body: object, field: string, message: string) => {
      const res = await sales.post(`/api/orders/${order.id}/payments`, body).expect(400);
      expect(res.body.error.fields[field]).toBe(message);
    };
    await bad(
      { amount: 0, method: 'cheque', reference: 'x', version: 1 },
      'amount',
      'Enter the amount received',
    );
    await bad(
      { amount: 10, method: 'barter', reference: 'x', version: 1 },
      'method',
      'Cheque, transfer or cash',
    );
    await bad(
      { amount: 10, method: 'cheque', reference: '  ', version: 1 },
      'reference',
      'Enter the cheque number or transfer reference',
    );
    expect(await Payment.count({ where: { orderId: order.id } })).toBe(0);
  });
});
