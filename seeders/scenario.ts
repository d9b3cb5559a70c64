/**
 * The demo plant's orders past "quote sent" (an invented scenario): a quote waiting for
 * builder1's answer, a deposit due, a card deposit paid and in production, an account order
 * scheduled over the coming two weeks, an order ready to go and one delivered. Each order is taken
 * through the app's own commands (lines, review, quote, send, acceptance, payment event, release,
 * promised date, floor progress, delivery sign-off), so its status, history, outbox mail, schedule
 * and shop plan are what the app itself would have made.
 *
 * Idempotent: an order is made only when its job has none yet. The seeded mail waits in the outbox
 * and the app's queue sends it to the local SMTP fake (the plant manager's Demo inbox) at start;
 * with SMTP_URL set (a real relay) it is marked failed instead, never sent.
 */
import { randomUUID } from 'node:crypto';
import type Stripe from 'stripe';
import { Op } from 'sequelize';
import { Customer, Job, MailMessage, Order, OrderLine, Plant, Quote, User } from '../server/models';
import { addLine, createOrder, reviewLine } from '../server/commands/orders';
import { createQuote, sendQuote } from '../server/commands/quotes';
import { acceptQuote } from '../server/commands/acceptance';
import { openDeposit } from '../server/commands/payments';
import { applyPaymentEvent } from '../server/commands/paymentEvents';
import { setPromisedDate } from '../server/commands/release';
import { recordProgress, signOffDelivery } from '../server/commands/progress';
import type { Payments } from '../server/services/payments';
import type { Stage } from '../shared/api/production';
import { moveOrder, plantToday } from '../server/commands/schedule';

const base = {
  units: 'imperial',
  heelHeight: 0,
  spacing: 24,
  loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
};

/** How far an order goes: each stage includes the ones before it. */
type Reach = 'sent' | 'accepted' | 'paid' | 'released' | 'building' | 'ready' | 'delivered';

interface Line {
  mark: string;
  quantity: number;
  design: Record<string, unknown>;
  /** Floor counts to record (cut, assembled …); `all` counts every truss through loading. */
  floor?: Partial<Record<Stage, number>>;
}

interface Scenario {
  customer: string;
  job: { name: string; address: string; planRevision: string | null };
  lines: Line[];
  stage: Reach;
  /** Who accepts: the builder in the portal (their e-mail), or the desk on a call or on paper. */
  acceptedBy?: { builder: string; name: string } | { method: 'phone' | 'paper'; name: string };
  /** Promised delivery, in working days from today. */
  promisedIn?: number;
  delivery?: { receivedBy: string; hoursAgo: number; note: string };
  /** The foreman moves the order on the board: this table, this many working days from today. */
  pin?: { tableId: number; inDays: number };
}

/** The scenario's truss designs (every one passes its checks; the test says so). */
const TRUSS = {
  fink26: { profile: 'fink', span: 312, pitch: 6, overhang: 18 },
  fink24: { profile: 'fink', span: 288, pitch: 8, overhang: 12 },
  mono12: { profile: 'mono', span: 144, pitch: 4, overhang: 12 },
  mono8: { profile: 'mono', span: 96, pitch: 3, overhang: 0 },
  queen22: { profile: 'queenPost', span: 264, pitch: 5, overhang: 12 },
  howe28: { profile: 'howe', span: 336, pitch: 6, overhang: 18 },
  howe32: { profile: 'howe', span: 384, pitch: 5, overhang: 12 },
  fan28: { profile: 'fan', span: 336, pitch: 7, overhang: 18 },
  doubleFink36: { profile: 'doubleFink', span: 432, pitch: 6, overhang: 24 },
  scissor24: { profile: 'scissor', span: 288, pitch: 6, bottomPitch: 2, overhang: 18 },
  // King posts stay short: a 14 ft one with an overhang fails its overhang-tip deflection.
  kingPost12: { profile: 'kingPost', span: 144, pitch: 6, overhang: 0 },
  kingPost10: { profile: 'kingPost', span: 120, pitch: 6, overhang: 12 },
};

/** Lines T1, T2 … of the given designs and quantities. */
const lines = (...rows: [keyof typeof TRUSS, number, Line['floor']?][]): Line[] =>
  rows.map(([truss, quantity, floor], i) => ({
    mark: `T${i + 1}`,
    quantity,
    design: { ...base, ...TRUSS[truss] },
    ...(floor && { floor }),
  }));

const job = (name: string, address: string, planRevision: string | null = null) => ({
  name,
  address,
  planRevision,
});

/** The scenario, in the order it is played (later releases plan after earlier ones). */
export const SCENARIO: Scenario[] = [
  {
    // builder1's portal: a quote waiting for an answer.
    customer: 'Whitaker Homes',
    job: job('Lot 15 — Orchard View', '15 Orchard View Court, Millbrook', 'Rev B'),
    stage: 'sent',
    lines: lines(['fink26', 16], ['queen22', 4], ['mono12', 6]),
  },
  {
    // builder2's portal: accepted, the deposit still due.
    customer: 'Castillo & Reed Builders',
    job: job('Birchwood ranch', '5 Birchwood Loop, Fenwick Falls', 'Rev D'),
    stage: 'accepted',
    acceptedBy: { builder: 'builder2@spanwise.test', name: 'Lena Castillo' },
    promisedIn: 18,
    lines: lines(['howe28', 18], ['kingPost12', 2]),
  },
  {
    // Card deposit paid → released, on the floor today: T1 all cut, 6 of 14 assembled.
    customer: 'Castillo & Reed Builders',
    job: job('Quarry Hill fourplex', '8 Quarry Hill Road, Fenwick Falls', 'Rev A'),
    stage: 'building',
    acceptedBy: { builder: 'builder2@spanwise.test', name: 'Lena Castillo' },
    promisedIn: 5,
    lines: lines(['fink26', 14, { cut: 14, assembled: 6 }], ['scissor24', 4]),
  },
  {
    // Account terms: released at acceptance, the first days of the plan.
    customer: 'Stonebrook Residential',
    job: job('Ledger Lane townhomes, block 2', '20–28 Ledger Lane, Millbrook', 'Rev B'),
    stage: 'released',
    acceptedBy: { method: 'phone', name: 'Aaron Stonebrook' },
    promisedIn: 10,
    lines: lines(['howe32', 40], ['fan28', 24], ['doubleFink36', 16], ['mono12', 12]),
  },
  {
    // Account terms; the site is not ready before next week, so the foreman moved it there.
    customer: 'Stonebrook Residential',
    job: job('Ledger Lane townhomes, block 3', '30–38 Ledger Lane, Millbrook', 'Rev B'),
    stage: 'released',
    acceptedBy: { method: 'paper', name: 'Aaron Stonebrook' },
    promisedIn: 9,
    pin: { tableId: 2, inDays: 5 },
    lines: lines(['howe32', 36], ['mono12', 10]),
  },
  {
    // builder1's portal: accepted on account, released, planned for the week after next.
    customer: 'Whitaker Homes',
    job: job('Lot 16 — Orchard View', '16 Orchard View Court, Millbrook', 'Rev C'),
    stage: 'released',
    acceptedBy: { builder: 'builder1@spanwise.test', name: 'Sam Whitaker' },
    promisedIn: 12,
    pin: { tableId: 1, inDays: 8 },
    lines: lines(['fink26', 18], ['queen22', 6], ['kingPost12', 2]),
  },
  {
    // builder1's portal: an account order built, banded and loaded — ready to deliver.
    customer: 'Whitaker Homes',
    job: job('Kessler garage addition', '2210 Old Ferry Road, Millbrook'),
    stage: 'ready',
    acceptedBy: { builder: 'builder1@spanwise.test', name: 'Sam Whitaker' },
    promisedIn: 2,
    lines: lines(['kingPost10', 8], ['mono8', 6]),
  },
  {
    // Delivered, the ticket signed on site.
    customer: 'Stonebrook Residential',
    job: job('Clubhouse pavilion', '1 Commons Green, Millbrook', 'Rev A'),
    stage: 'delivered',
    acceptedBy: { method: 'paper', name: 'Aaron Stonebrook' },
    promisedIn: 1,
    delivery: {
      receivedBy: 'Ray Dunmore (site lead)',
      hoursAgo: 3,
      note: 'Set on the slab at the east gable, two bundles; no damage.',
    },
    lines: lines(['scissor24', 10], ['fink24', 4]),
  },
];

const ORDER_OF: Reach[] = [
  'sent',
  'accepted',
  'paid',
  'released',
  'building',
  'ready',
  'delivered',
];
const reaches = (s: Scenario, stage: Reach) => ORDER_OF.indexOf(s.stage) >= ORDER_OF.indexOf(stage);

/** Today plus n working days (Monday to Friday), as an ISO date. */
export function workingDaysAhead(n: number, from = plantToday()) {
  const d = new Date(`${from}T00:00:00Z`);
  let left = n;
  while (left > 0) {
    d.setUTCDate(d.getUTCDate() + 1);
    if (d.getUTCDay() !== 0 && d.getUTCDay() !== 6) left--;
  }
  return d.toISOString().slice(0, 10);
}

/**
 * The demo's stand-in for the hosted checkout page: the seed runs with no payment service, so the
 * session is named here and the deposit command records it as it would any opened session.
 */
const demoCheckout = (order: Order): Payments =>
  ({
    mode: 'fake',
    webhookSecret: '',
    api: 'demo seed',
    stripe: {
      checkout: {
        sessions: {
          create: async () => ({
            id: `cs_demo_${order.number}`,
            url: `http://127.0.0.1:3000/portal/orders/${order.id}`,
          }),
        },
      },
    },
  }) as unknown as Payments;

/** The payment service's "checkout completed" event for the demo session, as its webhook sends it. */
const paidEvent = (order: Order, sessionId: string) =>
  ({
    id: `evt_demo_${order.number}`,
    object: 'event',
    type: 'checkout.session.completed',
    data: {
      object: {
        id: sessionId,
        object: 'checkout.session',
        payment_status: 'paid',
        payment_intent: `pi_demo_${order.number}`,
        metadata: { orderId: String(order.id) },
      },
    },
  }) as unknown as Stripe.Event;

const fresh = async (order: Order) => (await Order.findByPk(order.id))!;

/** Record floor counts on one line, a stage at a time (the floor tablet's taps, batched). */
async function recordFloor(foreman: User, line: OrderLine, counts: Partial<Record<Stage, number>>) {
  for (const stage of ['cut', 'assembled', 'banded', 'loaded'] as const) {
    const n = counts[stage] ?? 0;
    if (n > 0)
      await recordProgress(foreman, { clientId: randomUUID(), lineId: line.id, stage, delta: n });
  }
}

type People = Record<string, User>;

/** Sales adds the lines, the engineer approves each design, sales quotes and sends it. */
async function designAndQuote(s: Scenario, order: Order, { sales, engineer }: People) {
  const lines: OrderLine[] = [];
  for (const l of s.lines)
    lines.push(
      await addLine(sales, order, {
        mark: l.mark,
        quantity: l.quantity,
        plies: 1,
        design: l.design,
      }),
    );
  for (const line of lines)
    await reviewLine(engineer, order, line, {
      decision: 'approve',
      comment: '',
      designVersion: line.designVersion,
    });
  const quote = await createQuote(sales, await fresh(order));
  await sendQuote(sales, await fresh(order), quote);
  return { lines, quote };
}

/**
 * The builder accepts (in the portal, or the desk records a call or a signed paper), the desk
 * promises a date, and a deposit builder pays by card — recorded from the payment service's event.
 * Account builders' orders release at acceptance, deposit builders' when the deposit arrives.
 */
async function acceptAndPay(s: Scenario, order: Order, quote: Quote, people: People) {
  const a = s.acceptedBy!;
  const builder = 'builder' in a ? people[a.builder] : null;
  const current = await fresh(order);
  await acceptQuote(
    builder ?? people.sales,
    current,
    quote,
    // The desk sends the version it looked at, as its dialog does.
    builder ? { name: a.name, agree: true } : { ...a, agree: true, version: current.version },
    builder ? '198.51.100.24' : null,
  );
  if (s.promisedIn) {
    const { version } = await fresh(order);
    await setPromisedDate(people.sales, order.id, {
      promisedOn: workingDaysAhead(s.promisedIn),
      reason: '',
      version,
    });
  }
  const accepted = await fresh(order);
  if (builder && accepted.status === 'accepted' && reaches(s, 'paid')) {
    const session = await openDeposit(
      builder,
      accepted,
      demoCheckout(accepted),
      'http://127.0.0.1:3000',
    );
    await applyPaymentEvent(paidEvent(accepted, session.sessionId));
  }
  const released = await fresh(order);
  if (s.pin && released.status === 'released')
    await moveOrder(people.foreman, released, {
      tableId: s.pin.tableId,
      date: workingDaysAhead(s.pin.inDays),
    });
}

/** The floor's counts (every truss through loading once ready), then the delivery sign-off. */
async function buildAndDeliver(s: Scenario, order: Order, lines: OrderLine[], { foreman }: People) {
  const all = reaches(s, 'ready');
  for (const [i, line] of lines.entries()) {
    const q = line.quantity;
    const counts = all ? { cut: q, assembled: q, banded: q, loaded: q } : s.lines[i].floor;
    await recordFloor(foreman, line, counts ?? {});
  }
  const built = await fresh(order);
  if (s.delivery && built.status === 'ready')
    await signOffDelivery(foreman, order.id, {
      receivedBy: s.delivery.receivedBy,
      receivedAt: new Date(Date.now() - s.delivery.hoursAgo * 3_600_000).toISOString(),
      note: s.delivery.note,
      version: built.version,
    });
}

/** Play one scenario order through the commands up to its stage, on its own job; null if done before. */
async function playOrder(plant: Plant, s: Scenario, people: People) {
  const customer = await Customer.findOne({ where: { plantId: plant.id, name: s.customer } });
  if (!customer) return null;
  const [job] = await Job.findOrCreate({
    where: { plantId: plant.id, customerId: customer.id, name: s.job.name },
    defaults: { plantId: plant.id, customerId: customer.id, ...s.job },
  });
  if (await Order.findOne({ where: { jobId: job.id } })) return null;
  const order = await createOrder(people.sales, job);
  const { lines, quote } = await designAndQuote(s, order, people);
  if (reaches(s, 'accepted')) await acceptAndPay(s, order, quote, people);
  if (reaches(s, 'building')) await buildAndDeliver(s, order, lines, people);
  return fresh(order);
}

/** Seeded mail is for the local demo inbox only: with a real relay configured it is not sent. */
async function keepSeededMailLocal(orderIds: number[]) {
  if (!process.env.SMTP_URL || orderIds.length === 0) return;
  await MailMessage.update(
    { status: 'failed', lastError: 'Demo data: not sent through a real mail relay.' },
    { where: { orderId: orderIds, status: { [Op.in]: ['queued', 'retrying'] } } },
  );
}

/** Play the scenario on the demo plant (orders whose jobs have none yet). */
export async function seedScenario(plant: Plant) {
  const users = await User.findAll({ where: { plantId: plant.id } });
  const people: People = {};
  for (const u of users) {
    people[u.email] = u;
    if (u.role !== 'builder') people[u.role] ??= u;
  }
  if (!people.sales || !people.engineer || !people.foreman) return [];
  const made: Order[] = [];
  for (const s of SCENARIO) {
    const order = await playOrder(plant, s, people);
    if (order) made.push(order);
  }
  await keepSeededMailLocal(made.map((o) => o.id));
  return made;
}
