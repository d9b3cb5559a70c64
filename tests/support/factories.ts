import bcrypt from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import type { Role } from '../../shared/api/roles';
import { nextFreeMark } from '../../shared/api/marks';
import { Customer, Job, Order, OrderLine, Plant, ShopPlan, User } from '../../server/models';
import { queueShopPlan } from '../../server/commands/shopPlans';
import { computeDesign } from '../../server/services/design';
import { runShopPlan } from '../../server/services/shopPlan/job';
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

/** A light 24 ft 4/12 Fink at 20/10/0/10 psf, 24 in o.c. (common practice residential loads). */
export const FINK_24 = {
  units: 'imperial',
  profile: 'fink',
  span: 288,
  pitch: 4,
  heelHeight: 0,
  overhang: 12,
  spacing: 24,
  loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
} as const;

export async function createOrder(attrs: { job?: Job; customer?: Customer; plant?: Plant } = {}) {
  const job = attrs.job ?? (await createJob({ customer: attrs.customer, plant: attrs.plant }));
  return Order.create({
    plantId: job.plantId,
    customerId: job.customerId,
    jobId: job.id,
    number: `T-${uid()}`,
    createdBy: null,
  });
}

/** A stored line whose design the server computed (as the API would). */
export async function createLine(
  attrs: {
    order?: Order;
    mark?: string;
    design?: object;
    reviewState?: 'pending' | 'approved' | 'returned';
    quantity?: number;
    plies?: number;
  } = {},
) {
  const order = attrs.order ?? (await createOrder());
  const d = computeDesign(attrs.design ?? FINK_24, { plies: attrs.plies ?? 1 });
  const position =
    ((await OrderLine.max('position', { where: { orderId: order.id } })) as number | null) ?? 0;
  return OrderLine.create({
    orderId: order.id,
    position: position + 1,
    // Marks are unique per order: one past the highest T-number (positions may have gaps).
    mark: attrs.mark ?? (await nextTestMark(order.id)),
    quantity: attrs.quantity ?? 4,
    plies: attrs.plies ?? 1,
    profile: d.profile,
    designInput: d.input as unknown as Record<string, unknown>,
    designResult: d.result as unknown as Record<string, unknown>,
    engineVersion: d.engineVersion,
    designOk: d.ok,
    maxCsi: d.maxCsi,
    warningCount: d.warningCount,
    description: d.description,
    reviewState: attrs.reviewState ?? 'pending',
  });
}

async function nextTestMark(orderId: number) {
  const lines = await OrderLine.findAll({ where: { orderId }, attributes: ['mark'] });
  return nextFreeMark(lines.map((l) => l.mark));
}

/**
 * The order's stored shop plan (cut list and lumber plan), made by the real shop-plan job as the
 * job queue's worker would run it. The order's lines must all be approved.
 */
export async function createShopPlan(order: Order) {
  await testSequelize().transaction((t) => queueShopPlan(t, order, null));
  await runShopPlan(order.id);
  return ShopPlan.findOne({ where: { orderId: order.id }, rejectOnEmpty: true });
}
