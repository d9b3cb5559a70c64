import { describe, expect, it } from 'vitest';
import { testApp } from '../../../support/db';
import { createCustomer, createPlant, createUser } from '../../../support/factories';
import { agentFor, signedIn } from '../../../support/session';
import { AuditEvent, User } from '../../../../server/models';

const app = testApp();

async function adminWithPlant() {
  const plant = await createPlant();
  const admin = await createUser({ role: 'admin', plant });
  return { plant, admin, s: await signedIn(app, admin.email) };
}

describe('users (plant manager)', () => {
  it('adds a staff user who can then sign in, with an audit event', async () => {
    const { s, admin } = await adminWithPlant();
    const email = `engineer-${Date.now()}@example.test`;
    const res = await s
      .post('/api/users', {
        email,
        name: 'Ada Reviewer',
        role: 'engineer',
        password: 'a-long-password',
      })
      .expect(201);
    expect(res.body).toMatchObject({
      email,
      name: 'Ada Reviewer',
      role: 'engineer',
      active: true,
      customerId: null,
    });
    expect(typeof res.body.id).toBe('number');
    const stored = await User.findByPk(res.body.id);
    expect(stored!.passwordHash).toMatch(/^\$2[aby]\$1[0-9]\$/); // bcrypt, cost ≥ 10
    expect(
      await AuditEvent.count({
        where: { actorId: admin.id, action: 'user.created', subjectId: res.body.id },
      }),
    ).toBe(1);
    const fresh = await agentFor(app);
    await fresh.post('/api/auth/login', { email, password: 'a-long-password' }).expect(200);
  });

  it('adds a builder user only to one of the plant’s own companies', async () => {
    const { s, plant } = await adminWithPlant();
    const mine = await createCustomer({ plant });
    const foreign = await createCustomer();
    const base = { name: 'B. User', role: 'builder', password: 'a-long-password' };
    await s
      .post('/api/users', { ...base, email: `b1-${Date.now()}@example.test`, customerId: mine.id })
      .expect(201);
    const bad = await s
      .post('/api/users', {
        ...base,
        email: `b2-${Date.now()}@example.test`,
        customerId: foreign.id,
      })
      .expect(400);
    expect(bad.body.error.fields).toHaveProperty('customerId');
    const missing = await s
      .post('/api/users', { ...base, email: `b3-${Date.now()}@example.test` })
      .expect(400);
    expect(missing.body.error.fields.customerId).toMatch(/builder company/);
  });

  it('bad input changes nothing', async () => {
    const { s, plant } = await adminWithPlant();
    const before = await User.count({ where: { plantId: plant.id } });
    for (const body of [
      { email: 'x', name: 'X', role: 'sales', password: 'a-long-password' },
      { email: 'ok@example.test', name: '', role: 'sales', password: 'a-long-password' },
      { email: 'ok@example.test', name: 'X', role: 'overlord', password: 'a-long-password' },
      { email: 'ok@example.test', name: 'X', role: 'sales', password: 'short' },
    ]) {
      const res = await s.post('/api/users', body).expect(400);
      expect(res.body.error.message).toBeTruthy();
    }
    expect(await User.count({ where: { plantId: plant.id } })).toBe(before);
  });

  it('refuses a duplicate e-mail with 409', async () => {
    const { s } = await adminWithPlant();
    const other = await createUser();
    const res = await s
      .post('/api/users', {
        email: other.email,
        name: 'Dup',
        role: 'sales',
        password: 'a-long-password',
      })
      .expect(409);
    expect(res.body.error.fields.email).toBeTruthy();
  });

  it('changes a role, lists, searches and sorts', async () => {
    const { s, plant } = await adminWithPlant();
    const u = await createUser({ role: 'sales', plant });
    const res = await s.patch(`/api/users/${u.id}`, { role: 'foreman' }).expect(200);
    expect(res.body.role).toBe('foreman');
    const list = await s.get(`/api/users?q=${encodeURIComponent(u.email)}`).expect(200);
    expect(list.body.items.map((x: { id: number }) => x.id)).toEqual([u.id]);
    await s.get('/api/users?sort=-email').expect(200);
    await s.get('/api/users?sort=passwordHash').expect(400);
    await s.get('/api/users?pageSize=1000').expect(400);
  });

  it('will not let a manager lock themselves out or turn staff into a builder', async () => {
    const { s, admin, plant } = await adminWithPlant();
    await s.patch(`/api/users/${admin.id}`, { active: false }).expect(400);
    await s.patch(`/api/users/${admin.id}`, { role: 'sales' }).expect(400);
    const u = await createUser({ role: 'sales', plant });
    await s.patch(`/api/users/${u.id}`, { role: 'builder' }).expect(400);
    await s.patch(`/api/users/${u.id}`, {}).expect(400);
  });
});
