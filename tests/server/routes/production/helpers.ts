import { randomUUID } from 'node:crypto';
import { testApp, testMailer } from '../../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
} from '../../../support/factories';
import { signedIn } from '../../../support/session';
import { MailMessage, Order, type Plant } from '../../../../server/models';
import type { OrderStatus } from '../../../../shared/api/orders';

export type Session = Awaited<ReturnType<typeof signedIn>>;

/** One plant with a session per staff role, on an app with the local mail fake. */
export async function productionWorld() {
  const mailer = await testMailer();
  const app = testApp({}, undefined, mailer);
  const plant = await createPlant();
  const as = async (role: 'admin' | 'sales' | 'engineer' | 'foreman') =>
    signedIn(app, (await createUser({ role, plant })).email);
  return {
    app,
    plant,
    mailer,
    admin: await as('admin'),
    sales: await as('sales'),
    engineer: await as('engineer'),
    foreman: await as('foreman'),
  };
}

/** An order of `plant` in `status` with `lines` lines (T1…), reviewed as given. */
export async function orderIn(
  plant: Plant,
  opts: {
    status: OrderStatus;
    terms?: 'account' | 'deposit';
    reviews?: ('pending' | 'approved')[];
    releasedAt?: Date;
  },
) {
  const customer = await createCustomer({ plant, terms: opts.terms ?? 'deposit' });
  const order = await createOrder({ job: await createJob({ customer }) });
  const lines = [];
  for (const [i, r] of (opts.reviews ?? ['approved']).entries())
    lines.push(await createLine({ order, mark: `T${i + 1}`, reviewState: r }));
  await Order.update(
    { status: opts.status, releasedAt: opts.releasedAt ?? null },
    { where: { id: order.id } },
  );
  await order.reload();
  return { customer, order, lines };
}

export const tap = (lineId: number, stage: string, delta = 1, clientId = randomUUID()) => ({
  clientId,
  lineId,
  stage,
  delta,
});

/** The order's version now: what a user who just opened it sends with a production change. */
export const versionOf = async (orderId: number) => (await Order.findByPk(orderId))!.version;

/** A production change's body as sent from a freshly opened page (with the order's version). */
export const seen = async (orderId: number, body: object) => ({
  ...body,
  version: await versionOf(orderId),
});

/** E-mails queued for an address (the outbox the mail queue sends from), newest first. */
export const queuedTo = (to: string) =>
  MailMessage.findAll({ where: { toAddress: to }, order: [['id', 'DESC']] });
