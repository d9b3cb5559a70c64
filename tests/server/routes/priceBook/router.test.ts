import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import { createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { AuditEvent, PriceBook, type Plant } from '../../../../server/models';
import { priceBookSchema } from '../../../../shared/api/pricing';
import { TEST_BOOK } from '../quotes/helpers';

const app = testApp();
let plant: Plant;
let admin: Awaited<ReturnType<typeof signedIn>>;
const put = (body: object) =>
  admin.agent.put('/api/price-book').set('X-CSRF-Token', admin.token).send(body);

beforeAll(async () => {
  plant = await createPlant();
  admin = await signedIn(app, (await createUser({ role: 'admin', plant })).email);
});

describe('the price book', () => {
  it('is an invented plant default, flagged demo, until one is stored', async () => {
    const res = await admin.get('/api/price-book').expect(200);
    expect(res.body).toMatchObject({ demo: true, updatedAt: null, updatedBy: null });
    expect(() => priceBookSchema.parse(res.body)).not.toThrow();
  });

  it('the plant manager stores one; the answer is the stored book, and it is audited', async () => {
    const res = await put({ ...TEST_BOOK, currency: 'cad' }).expect(200);
    expect(res.body).toMatchObject({ ...TEST_BOOK, currency: 'CAD', demo: false });
    expect(res.body.updatedBy).toBeTruthy();
    const again = await admin.get('/api/price-book').expect(200);
    expect(again.body).toEqual(res.body);
    const sales = await signedIn(app, (await createUser({ role: 'sales', plant })).email);
    expect((await sales.get('/api/price-book').expect(200)).body.margin).toBe(0.2);
    const events = await AuditEvent.findAll({
      where: { plantId: plant.id, action: 'price_book.saved' },
    });
    expect(events).toHaveLength(1);
    // Another plant still sees its own (default) book.
    const elsewhere = await signedIn(app, (await createUser({ role: 'admin' })).email);
    expect((await elsewhere.get('/api/price-book').expect(200)).body.demo).toBe(true);
  });

  it('bad input answers 400 with field messages and changes nothing', async () => {
    await put(TEST_BOOK).expect(200);
    const before = await PriceBook.findOne({ where: { plantId: plant.id } });
    const bad = [
      { ...TEST_BOOK, margin: 0.95 },
      { ...TEST_BOOK, taxRate: -0.1 },
      { ...TEST_BOOK, currency: 'DOLLARS' },
      { ...TEST_BOOK, labour: { ...TEST_BOOK.labour, ratePerHour: 'sixty' } },
      { ...TEST_BOOK, lumber: { defaultPerBoardFoot: 1, byLumber: { '2x4 SPF-1/2': -1 } } },
      { ...TEST_BOOK, quoteValidityDays: 0.5 },
      { currency: 'USD' },
    ];
    for (const body of bad) {
      const res = await put(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.message).toBeTruthy();
      expect(Object.keys(res.body.error.fields ?? {})).not.toHaveLength(0);
    }
    const after = await PriceBook.findOne({ where: { plantId: plant.id } });
    expect(after!.data).toEqual(before!.data);
    expect(after!.updatedAt.getTime()).toBe(before!.updatedAt.getTime());
  });
});
