import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
} from '../../../support/factories';
import { signedIn } from '../../../support/session';
import type { Order } from '../../../../server/models';
import type { DeliveryTicket } from '../../../../shared/api/shopPaper';
import { binary, keep, pdfText } from './helpers';

const app = testApp();
let order: Order;
let foreman: string;

beforeAll(async () => {
  const plant = await createPlant();
  const customer = await createCustomer({ plant, name: 'Harrow Lane Homes' });
  order = await createOrder({ job: await createJob({ customer, name: 'Lot 14 Birch Court' }) });
  await createLine({ order, mark: 'A1', quantity: 23, reviewState: 'approved' });
  await createLine({ order, mark: 'B1', quantity: 1, reviewState: 'approved' });
  foreman = (await createUser({ role: 'foreman', plant })).email;
});

describe('delivery ticket', () => {
  it('bundles every truss once, one mark to a bundle, at most ten', async () => {
    const s = await signedIn(app, foreman);
    const { body } = (await s.get(`/api/orders/${order.id}/shop-paper/delivery`).expect(200)) as {
      body: DeliveryTicket;
    };
    expect(body.bundles.map((b) => [b.number, b.mark, b.count, b.trusses])).toEqual([
      [1, 'A1', 10, '1–10 of 23'],
      [2, 'A1', 10, '11–20 of 23'],
      [3, 'A1', 3, '21–23 of 23'],
      [4, 'B1', 1, '1 of 1'],
    ]);
    expect(body.marks).toEqual([
      expect.objectContaining({ mark: 'A1', count: 23 }),
      expect.objectContaining({ mark: 'B1', count: 1 }),
    ]);
    expect(body.totalTrusses).toBe(24);
    expect(body.order.job.address).toBe('1 Test Road');
    expect(body.order.builder.name).toBe('Harrow Lane Homes');
  });

  it('prints the ticket with the site, builder, bundles and a signature line', async () => {
    const s = await signedIn(app, foreman);
    const res = await s.agent
      .get(`/api/orders/${order.id}/shop-paper/delivery.pdf`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    keep('delivery.pdf', res.body as Buffer);
    const text = pdfText(res.body as Buffer);
    for (const want of [
      'Delivery ticket',
      'Lot 14 Birch Court',
      '1 Test Road',
      'Harrow Lane Homes',
      '11–20 of 23',
      'Received by',
      'Signature',
      'Date and time',
      'without a written repair',
    ])
      expect(text).toContain(want);
  });
});
