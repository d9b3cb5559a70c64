import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import { createPlant } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import type { Plant } from '../../../../server/models';
import { meSchema } from '../../../../shared/api/auth';
import { jobSummarySchema, pageOf } from '../../../../shared/api/list';
import { orderSummarySchema } from '../../../../shared/api/orders';
import { portalHomeSchema } from '../../../../shared/api/portal';
import { sentQuoteWorld, useTestBook } from './helpers';

// The portal's first load types these answers without parsing them (it carries no zod), so the
// shared schemas are held to them here.
const app = testApp();
let plant: Plant;

beforeAll(async () => {
  plant = await createPlant();
  await useTestBook(plant);
});
afterAll(() => app.locals.close());

describe('the answers a builder’s first load reads', () => {
  it('the session, the home, the jobs and the orders match the shared schemas', async () => {
    const { builder, order } = await sentQuoteWorld(plant);
    const s = await signedIn(app, builder.email);
    const me = meSchema.parse((await s.get('/api/auth/me').expect(200)).body);
    expect(me.user.role).toBe('builder');
    const home = portalHomeSchema.parse((await s.get('/api/portal/home').expect(200)).body);
    expect(home.quotesWaiting.map((q) => q.orderId)).toEqual([order.id]);
    const jobs = pageOf(jobSummarySchema).parse(
      (await s.get('/api/jobs?pageSize=100').expect(200)).body,
    );
    expect(jobs.items).toHaveLength(1);
    const orders = pageOf(orderSummarySchema).parse(
      (await s.get('/api/orders?pageSize=100').expect(200)).body,
    );
    expect(orders.items.map((o) => o.id)).toEqual([order.id]);
  });
});
