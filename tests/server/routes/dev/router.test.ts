import { describe, expect, it } from 'vitest';
import { testApp, testMailer } from '../../../support/db';
import { createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';

describe('GET /api/dev/mail', () => {
  it('shows the fake inbox to the plant manager only, and only while the fake is in use', async () => {
    const mailer = await testMailer();
    const app = testApp({}, undefined, mailer);
    const plant = await createPlant();
    await mailer.send({
      to: 'someone@example.test',
      subject: 'Hello inbox',
      text: 'x',
      plantId: plant.id,
    });
    const admin = await signedIn(app, (await createUser({ role: 'admin', plant })).email);
    const res = await admin.get('/api/dev/mail').expect(200);
    expect(res.body.items.map((m: { subject: string }) => m.subject)).toContain('Hello inbox');
    const sales = await signedIn(app, (await createUser({ role: 'sales', plant })).email);
    await sales.get('/api/dev/mail').expect(403);
    // Another plant's manager sees none of this plant's mail.
    const elsewhere = await signedIn(app, (await createUser({ role: 'admin' })).email);
    const theirs = await elsewhere.get('/api/dev/mail').expect(200);
    expect(theirs.body.items.map((m: { subject: string }) => m.subject)).not.toContain(
      'Hello inbox',
    );
    const noFake = testApp();
    const admin2 = await signedIn(noFake, (await createUser({ role: 'admin', plant })).email);
    await admin2.get('/api/dev/mail').expect(404);
  });
});
