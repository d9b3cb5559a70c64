import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, StockSettings, type Plant } from '../../../../server/models';
import { DEMO_STOCK_SETTINGS, type StockSettings as StockData } from '../../../../shared/api/stock';
import { testApp } from '../../../support/db';
import { createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';

const app = testApp();
let plant: Plant;
let admin: Awaited<ReturnType<typeof signedIn>>;
const put = (who: typeof admin, body: object) =>
  who.agent.put('/api/stock').set('X-CSRF-Token', who.token).send(body);

const SETTINGS: StockData = {
  kerfIn: 0.125,
  trimIn: 0.25,
  lumbers: [
    {
      lumber: '2x4',
      stocks: [
        { lengthFt: 12, price: 7.5, onHand: 40 },
        { lengthFt: 16, price: 10.4, onHand: null },
      ],
    },
  ],
};

beforeAll(async () => {
  plant = await createPlant();
  admin = await signedIn(app, (await createUser({ role: 'admin', plant })).email);
});

describe('stock settings', () => {
  it('are the invented demo stock, flagged demo, until the plant stores its own', async () => {
    const res = await admin.get('/api/stock').expect(200);
    expect(res.body).toMatchObject({ ...DEMO_STOCK_SETTINGS, demo: true, updatedBy: null });
  });

  it('the plant manager stores them (audited); the shop and desk read them', async () => {
    const res = await put(admin, SETTINGS).expect(200);
    expect(res.body).toMatchObject({ ...SETTINGS, demo: false });
    for (const role of ['foreman', 'sales'] as const) {
      const who = await signedIn(app, (await createUser({ role, plant })).email);
      expect((await who.get('/api/stock').expect(200)).body.lumbers).toEqual(SETTINGS.lumbers);
      await put(who, SETTINGS).expect(403);
    }
    for (const role of ['engineer', 'builder'] as const) {
      const who = await signedIn(app, (await createUser({ role, plant })).email);
      await who.get('/api/stock').expect(403);
    }
    expect(
      await AuditEvent.count({ where: { plantId: plant.id, action: 'stock_settings.saved' } }),
    ).toBe(1);
    const elsewhere = await signedIn(app, (await createUser({ role: 'admin' })).email);
    expect((await elsewhere.get('/api/stock').expect(200)).body.demo).toBe(true);
  });

  it('signed out answers 401; bad input 400 and changes nothing', async () => {
    const { agentFor } = await import('../../../support/session');
    await (await agentFor(app)).get('/api/stock').expect(401);
    await put(admin, SETTINGS).expect(200);
    const before = await StockSettings.findOne({ where: { plantId: plant.id } });
    const bad = [
      { ...SETTINGS, kerfIn: -1 },
      { ...SETTINGS, lumbers: [] },
      {
        ...SETTINGS,
        lumbers: [{ lumber: '2x4', stocks: [{ lengthFt: 12, price: 0, onHand: null }] }],
      },
      {
        ...SETTINGS,
        lumbers: [{ lumber: '2x4', stocks: [{ lengthFt: 12, price: 5, onHand: 2.5 }] }],
      },
      {
        ...SETTINGS,
        lumbers: [
          {
            lumber: '2x4',
            stocks: [
              { lengthFt: 12, price: 5 },
              { lengthFt: 12, price: 6 },
            ],
          },
        ],
      },
    ];
    for (const body of bad) {
      const res = await put(admin, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.message).toBeTruthy();
    }
    const after = await StockSettings.findOne({ where: { plantId: plant.id } });
    expect(after!.data).toEqual(before!.data);
  });
});
