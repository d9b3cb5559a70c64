import bcrypt from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import type { Role } from '../../shared/api/roles';
import { Customer, Job, Plant, User } from '../../server/models';
import { testSequelize } from './db';

export const TEST_PASSWORD = 'correct horse battery';
// Hashed once: factories stay fast while sign-in still runs the real bcrypt compare.
const HASH = bcrypt.hashSync(TEST_PASSWORD, 10);
const uid = () => randomUUID().slice(0, 8);

/** Each factory builds its own parents when not given them. */
export async function createPlant(
  attrs: Partial<{ name: string; units: 'imperial' | 'metric' }> = {},
) {
  testSequelize();
  return Plant.create({
    name: attrs.name ?? `Plant ${uid()}`,
    units: attrs.units ?? 'imperial',
    address: null,
  });
}

export async function createCustomer(
  attrs: { plant?: Plant; name?: string; terms?: 'account' | 'deposit' } = {},
) {
  const plant = attrs.plant ?? (await createPlant());
  return Customer.create({
    plantId: plant.id,
    name: attrs.name ?? `Builder ${uid()}`,
    email: `office-${uid()}@builders.test`,
    phone: null,
    terms: attrs.terms ?? 'deposit',
    billingAddress: null,
    city: 'Testville',
  });
}

export async function createUser(
  attrs: { role?: Role; plant?: Plant; customer?: Customer; active?: boolean; email?: string } = {},
) {
  const role = attrs.role ?? 'sales';
  const customer =
    role === 'builder' ? (attrs.customer ?? (await createCustomer({ plant: attrs.plant }))) : null;
  const plantId = customer?.plantId ?? (attrs.plant ?? (await createPlant())).id;
  return User.create({
    plantId,
    customerId: customer?.id ?? null,
    email: attrs.email ?? `${role}-${uid()}@example.test`,
    name: `${role} ${uid()}`,
    role,
    passwordHash: HASH,
    active: attrs.active ?? true,
    lastSignInAt: null,
  });
}

export async function createJob(attrs: { customer?: Customer; plant?: Plant; name?: string } = {}) {
  const customer = attrs.customer ?? (await createCustomer({ plant: attrs.plant }));
  return Job.create({
    plantId: customer.plantId,
    customerId: customer.id,
    name: attrs.name ?? `Job ${uid()}`,
    address: '1 Test Road',
    planRevision: null,
  });
}
