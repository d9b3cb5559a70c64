import { describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import { createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';

const app = testApp();

describe('a password reset by the plant manager', () => {
  it('ends every session of that user; the new password signs in', async () => {
    const plant = await createPlant();
    const admin = await signedIn(app, (await createUser({ role: 'admin', plant })).email);
    const user = await createUser({ role: 'sales', plant });
    const phone = await signedIn(app, user.email);
    const desk = await signedIn(app, user.email);
    await admin.patch(`/api/users/${user.id}`, { password: 'a-brand-new-password' }).expect(200);
    await phone.get('/api/auth/me').expect(401);
    await desk.get('/api/auth/me').expect(401);
    await signedIn(app, user.email, 'a-brand-new-password');
  });

  it('of their own password keeps the session that made it, and ends their others', async () => {
    const plant = await createPlant();
    const manager = await createUser({ role: 'admin', plant });
    const here = await signedIn(app, manager.email);
    const elsewhere = await signedIn(app, manager.email);
    await here.patch(`/api/users/${manager.id}`, { password: 'another-long-password' }).expect(200);
    await here.get('/api/auth/me').expect(200);
    await elsewhere.get('/api/auth/me').expect(401);
  });

  it('a rename leaves the sessions alone', async () => {
    const plant = await createPlant();
    const admin = await signedIn(app, (await createUser({ role: 'admin', plant })).email);
    const user = await createUser({ role: 'sales', plant });
    const s = await signedIn(app, user.email);
    await admin.patch(`/api/users/${user.id}`, { name: 'New Name' }).expect(200);
    expect((await s.get('/api/auth/me').expect(200)).body.user.name).toBe('New Name');
  });
});
