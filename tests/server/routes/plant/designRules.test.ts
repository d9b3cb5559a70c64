import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, OrderLine, type Plant } from '../../../../server/models';
import { testApp } from '../../../support/db';
import { createOrder, createPlant, createUser, FINK_24 } from '../../../support/factories';
import { agentFor, signedIn } from '../../../support/session';

const app = testApp();
let plant: Plant;
let admin: Awaited<ReturnType<typeof signedIn>>;
let sales: Awaited<ReturnType<typeof signedIn>>;
const put = (who: typeof admin, body: object) =>
  who.agent.put('/api/plant/design-rules').set('X-CSRF-Token', who.token).send(body);
const post = (who: typeof admin, path: string, body: object) =>
  who.agent.post(path).set('X-CSRF-Token', who.token).send(body);

/** The 24 ft Fink with its top chord held at 2x4 DF-L No.2, so only the check can change. */
const FIXED = { ...FINK_24, lumber: { topChord: '2x4 DFL-2' } };
type Member = { id: string; role: string; csi: number; governingCheck: string };
const topChord = (body: { members: Member[] }) => body.members.find((m) => m.id === 'AE')!;

beforeAll(async () => {
  plant = await createPlant();
  admin = await signedIn(app, (await createUser({ role: 'admin', plant })).email);
  sales = await signedIn(app, (await createUser({ role: 'sales', plant })).email);
});

/**
 * NDS 2018 §3.9.2: (fc/Fc′)² + fb/[Fb′(1 − fc/FcE1)] ≤ 1. Common practice checks the moment at a
 * panel point without the amplifier 1/(1 − fc/FcE1) (the chord is held in plane there); the plant
 * may ask for the stricter reading. With fc > 0 the amplifier exceeds 1, so a top chord in
 * compression and bending gets a higher CSI when it is on.
 */
describe('the plant design rule: amplified panel-point moment', () => {
  it('is off by default; turning it on raises the CSI of a chord in compression and bending', async () => {
    expect((await admin.get('/api/plant/design-rules').expect(200)).body).toEqual({
      amplifyPanelPointMoment: false,
      version: 0,
    });
    expect((await sales.get('/api/plant').expect(200)).body.designRules).toEqual({
      amplifyPanelPointMoment: false,
    });
    const before = (await post(sales, '/api/designs/preview', FIXED).expect(200)).body;
    expect(before.designRules).toEqual({ amplifyPanelPointMoment: false });
    expect(before.notes.join(' ')).toMatch(/checked without the NDS 2018 §3\.9\.2 amplifier/);
    expect(topChord(before).governingCheck).toMatch(/compression/);

    const saved = await put(admin, { amplifyPanelPointMoment: true, version: 0 }).expect(200);
    expect(saved.body).toEqual({ amplifyPanelPointMoment: true, version: 1 });
    const after = (await post(sales, '/api/designs/preview', FIXED).expect(200)).body;
    expect(after.designRules).toEqual({ amplifyPanelPointMoment: true });
    expect(after.notes.join(' ')).toMatch(/checked with the NDS 2018 §3\.9\.2 amplifier/);
    expect(topChord(after).csi).toBeGreaterThan(topChord(before).csi * 1.01);
    expect(
      await AuditEvent.count({
        where: { plantId: plant.id, action: 'plant.design_rules_changed' },
      }),
    ).toBe(1);

    // A saved line is designed with the rule, and records it beside its result.
    const order = await createOrder({ plant });
    await post(sales, `/api/orders/${order.id}/lines`, {
      mark: 'A1',
      quantity: 2,
      plies: 1,
      design: FIXED,
    }).expect(201);
    const line = await OrderLine.findOne({ where: { orderId: order.id, mark: 'A1' } });
    const result = line!.designResult as { designRules: object; members: Member[] };
    expect(result.designRules).toEqual({ amplifyPanelPointMoment: true });
    expect(topChord(result).csi).toBeCloseTo(topChord(after).csi, 9);

    // Another plant keeps common practice.
    const elsewhere = await signedIn(app, (await createUser({ role: 'sales' })).email);
    const other = (await post(elsewhere, '/api/designs/preview', FIXED).expect(200)).body;
    expect(topChord(other).csi).toBeCloseTo(topChord(before).csi, 9);
  });

  it('only the plant manager changes it; a stale version answers 409; bad input 400', async () => {
    for (const role of ['sales', 'engineer', 'foreman'] as const) {
      const who = await signedIn(app, (await createUser({ role, plant })).email);
      await who.get('/api/plant/design-rules').expect(200);
      await put(who, { amplifyPanelPointMoment: false, version: 1 }).expect(403);
    }
    const builder = await signedIn(app, (await createUser({ role: 'builder', plant })).email);
    await builder.get('/api/plant/design-rules').expect(403);
    await put(builder, { amplifyPanelPointMoment: false, version: 1 }).expect(403);
    await (await agentFor(app)).get('/api/plant/design-rules').expect(401);

    const current = (await admin.get('/api/plant/design-rules').expect(200)).body.version;
    const stale = await put(admin, { amplifyPanelPointMoment: false, version: current - 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale');
    const bad = await put(admin, { amplifyPanelPointMoment: 'yes', version: current });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('Amplified panel-point moment must be on or off');
    expect((await admin.get('/api/plant/design-rules').expect(200)).body.version).toBe(current);
  });
});
