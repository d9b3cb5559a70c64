import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import { createPlant, createUser, FINK_24 } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import type { ProfileComparison } from '../../../../shared/api/compare';
import type { Plant } from '../../../../server/models';

const app = testApp();
let plant: Plant;

beforeAll(async () => {
  plant = await createPlant();
});

describe('POST /api/designs/compare', () => {
  it('designs every pitched profile with the same span, pitch and loads, priced for the desk', async () => {
    const sales = await signedIn(app, (await createUser({ role: 'sales', plant })).email);
    const res = await sales.post('/api/designs/compare', FINK_24).expect(200);
    const rows = res.body.rows as ProfileComparison[];
    expect(rows.map((r) => r.profile)).toEqual([
      'kingPost',
      'queenPost',
      'fink',
      'howe',
      'fan',
      'doubleFink',
      'scissor',
      'mono',
    ]);
    expect(res.body.weightUnit).toBe('lb');
    const fink = rows.find((r) => r.profile === 'fink')!;
    // The same request as a preview gives the same design.
    const preview = (await sales.post('/api/designs/preview', FINK_24).expect(200)).body;
    expect(fink.ok).toBe(preview.ok);
    expect(fink.maxCsi).toBeCloseTo(
      Math.max(...preview.members.map((m: { csi: number }) => m.csi)),
      9,
    );
    // Plates on both faces of every plated joint (common practice), one ply.
    expect(fink.plates).toBe(
      preview.plates.filter((p: { plate: string | null }) => p.plate).length * 2,
    );
    for (const r of rows.filter((x) => x.fits)) {
      expect(r.unitPrice).toBeGreaterThan(0);
      expect(r.boardFeet).toBeGreaterThan(0);
      // A 24 ft residential truss of 2x4/2x6 weighs tens of pounds, not hundreds (common practice).
      expect(r.weight).toBeGreaterThan(30);
      expect(r.weight).toBeLessThan(250);
    }
  });

  it('shows no prices to the design reviewer, and bad input answers 400', async () => {
    const engineer = await signedIn(app, (await createUser({ role: 'engineer', plant })).email);
    const res = await engineer.post('/api/designs/compare', FINK_24).expect(200);
    expect((res.body.rows as ProfileComparison[]).every((r) => r.unitPrice === null)).toBe(true);
    const bad = await engineer
      .post('/api/designs/compare', { ...FINK_24, span: 'wide' })
      .expect(400);
    expect(bad.body.error.message).toBeTruthy();
    const builder = await signedIn(app, (await createUser({ role: 'builder', plant })).email);
    await builder.post('/api/designs/compare', FINK_24).expect(403);
  });
});
