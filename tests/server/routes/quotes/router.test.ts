import { beforeAll, describe, expect, it, vi } from 'vitest';
import { testApp, testMailer, testSequelize } from '../../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
  FINK_24,
} from '../../../support/factories';
import { signedIn } from '../../../support/session';
import {
  AuditEvent,
  MailMessage,
  Order,
  Quote,
  type OrderLine,
  type Plant,
} from '../../../../server/models';
import { quoteSchema } from '../../../../shared/api/pricing';
import { binary, requirePdftotext, pdfText, TEST_BOOK } from './helpers';

type S = Awaited<ReturnType<typeof signedIn>>;
let app: ReturnType<typeof testApp>;
let plant: Plant;
let sales: S;

const cents = (v: number) => Math.round(v * 100) / 100;

beforeAll(async () => {
  app = testApp({}, undefined, await testMailer());
  plant = await createPlant();
  sales = await signedIn(app, (await createUser({ role: 'sales', plant })).email);
  const admin = await signedIn(app, (await createUser({ role: 'admin', plant })).email);
  await admin.agent
    .put('/api/price-book')
    .set('X-CSRF-Token', admin.token)
    .send(TEST_BOOK)
    .expect(200);
});

/** A deposit-terms builder's order with one FINK_24 line × 4 (the factory's quantity). */
async function quotedWorld() {
  const customer = await createCustomer({ plant, terms: 'deposit' });
  const order = await createOrder({ job: await createJob({ customer }) });
  const line = await createLine({ order, mark: 'T1' });
  return { customer, order, line };
}

describe('a quote priced by hand', () => {
  it('equals the arithmetic done here from the stored design', async () => {
    const { order, line } = await quotedWorld();
    const res = await sales.post(`/api/orders/${order.id}/quotes`).expect(201);
    const quote = quoteSchema.parse(res.body);

    // Independently of the server: read the stored pieces and plates and do the arithmetic.
    const r = line.designResult as unknown as {
      pieces: { lumber: string; length: { value: number } }[];
      plates: { widthIn: number; lengthIn: number }[];
      joints: unknown[];
    };
    // Board feet of a piece: nominal t × w (in) × stock length (ft) / 12, stock in 2 ft steps.
    const bf = r.pieces.reduce((sum, p) => {
      const [t, w] = p.lumber.split(' ')[0].split('x').map(Number);
      return sum + (t * w * 2 * Math.ceil(p.length.value / 24 - 1e-9)) / 12;
    }, 0);
    // The 24 ft 4/12 Fink: top chords 13'-8 7/16" → 14 ft (×2), bottom chords 8 and 16 ft, webs
    // 2'-9 15/16" → 4 ft (×2) and 5'-7 7/8" → 6 ft (×2): 72 ft of 2x4 at 2/3 bf/ft = 48 bf.
    expect(bf).toBeCloseTo(48, 9);
    // Lumber at the book's $1.00/bf default: $48.00.
    const lumber = bf * 1;
    // Plates, both faces of every joint, by area at $0.02/in²: at the time of writing 2 × (8x12 ×2,
    // 6x8, 7x10, 5x8 ×3) = 2 × 430 in² = 860 in² → $17.20.
    const plates = r.plates.reduce((s, p) => s + 2 * p.widthIn * p.lengthIn * 0.02, 0);
    // Labour: 10 + 1 × 8 pieces + 2 × 7 joints = 32 min at $60/h = $32.00.
    const minutes = 10 + 1 * r.pieces.length + 2 * r.joints.length;
    expect(minutes).toBe(32);
    // Unit price = cost / (1 − 0.2): (48 + 17.20 + 32) / 0.8 = $121.50; × 4 = $486.00.
    const unitPrice = cents((lumber + plates + (minutes / 60) * 60) / 0.8);
    const lineTotal = cents(unitPrice * 4);
    // + delivery $150 = $636.00; tax 5 % = $31.80; total $667.80; deposit 40 % = $267.12.
    const tax = cents((lineTotal + 150) * 0.05);
    const total = cents(lineTotal + 150 + tax);

    expect(quote.lines).toHaveLength(1);
    expect(quote.lines[0]).toMatchObject({
      mark: 'T1',
      quantity: 4,
      plies: 1,
      boardFeet: 48,
      lumberCost: 48,
      plateCost: cents(plates),
      labourMinutes: 32,
      labourCost: 32,
      unitPrice,
      lineTotal,
    });
    expect(quote).toMatchObject({
      number: 1,
      reference: `${order.number}-Q1`,
      currency: 'USD',
      subtotal: lineTotal,
      delivery: 150,
      tax,
      total,
      depositRate: 0.4,
      depositDue: cents(total * 0.4),
      superseded: false,
      terms: 'Balance due on delivery.',
    });
    expect(quote.cautions.join(' ')).toMatch(/preliminary.*reviewed/);
    // Valid for the book's 30 days from today.
    const days = (Date.parse(quote.validUntil) - Date.parse(quote.createdAt.slice(0, 10))) / 864e5;
    expect(days).toBe(30);
    expect((await Order.findByPk(order.id))!.status).toBe('quoted');
    const event = await AuditEvent.findOne({
      where: { subjectType: 'order', subjectId: order.id, action: 'quote.created' },
    });
    expect(event!.data).toMatchObject({ reference: quote.reference, total });
  });

  it('asks no deposit of a builder on account terms', async () => {
    const customer = await createCustomer({ plant, terms: 'account' });
    const order = await createOrder({ job: await createJob({ customer }) });
    await createLine({ order });
    const res = await sales.post(`/api/orders/${order.id}/quotes`).expect(201);
    expect(res.body).toMatchObject({ depositRate: 0, depositDue: 0 });
    expect(res.body.total).toBeGreaterThan(0);
  });
});

describe('quote revisions', () => {
  it('are immutable: the database refuses an edit, and a line change makes revision 2', async () => {
    const { order, line } = await quotedWorld();
    const first = (await sales.post(`/api/orders/${order.id}/quotes`).expect(201)).body;
    await expect(
      testSequelize().query(`UPDATE quotes SET snapshot = '{}' WHERE id = ${first.id}`),
    ).rejects.toThrow(/immutable/);
    await expect(
      testSequelize().query(`UPDATE quotes SET total = 1 WHERE id = ${first.id}`),
    ).rejects.toThrow(/immutable/);

    // Editing a quoted order's line turns it back to draft and says so in its history.
    await sales.patch(`/api/orders/${order.id}/lines/${line.id}`, { quantity: 10 }).expect(200);
    const page = (await sales.get(`/api/orders/${order.id}`).expect(200)).body;
    expect(page.status).toBe('draft');
    expect(page.history.map((h: { action: string }) => h.action)).toEqual(
      expect.arrayContaining(['quote.created', 'order.reopened']),
    );

    const second = (await sales.post(`/api/orders/${order.id}/quotes`).expect(201)).body;
    expect(second).toMatchObject({ number: 2, reference: `${order.number}-Q2` });
    expect(second.lines[0].quantity).toBe(10);
    expect(second.total).toBeGreaterThan(first.total);

    const list = (await sales.get(`/api/orders/${order.id}/quotes`).expect(200)).body.items;
    expect(
      list.map((q: { number: number; superseded: boolean }) => [q.number, q.superseded]),
    ).toEqual([
      [2, false],
      [1, true],
    ]);
    const again = (await sales.get(`/api/orders/${order.id}/quotes/1`).expect(200)).body;
    expect(again).toEqual({ ...first, superseded: true });
    await sales.get(`/api/orders/${order.id}/quotes/3`).expect(404);
    await sales.get(`/api/orders/${order.id}/quotes/abc`).expect(404);
  });

  it('are refused while a line fails, naming the mark, and for an order without lines', async () => {
    const order = await createOrder({ plant });
    await createLine({ order, mark: 'T1' });
    // A fixed, undersized top chord under heavy load fails its checks (as in the orders tests).
    const failing = await createLine({
      order,
      mark: 'G7',
      design: {
        ...FINK_24,
        span: 480,
        loads: { tcll: 60, tcdl: 15, bcll: 0, bcdl: 10 },
        lumber: { topChord: '2x4 SPF-1/2' },
      },
    });
    expect((failing as OrderLine).designOk).toBe(false);
    const res = await sales.post(`/api/orders/${order.id}/quotes`).expect(409);
    expect(res.body.error.message).toMatch(/G7/);
    expect(res.body.error.message).not.toMatch(/T1/);
    const empty = await createOrder({ plant });
    const none = await sales.post(`/api/orders/${empty.id}/quotes`).expect(409);
    expect(none.body.error.message).toMatch(/no truss lines/);
    expect(await Quote.count({ where: { orderId: [order.id, empty.id] } })).toBe(0);
    expect((await Order.findByPk(order.id))!.status).toBe('draft');
  });
});

describe('the quote PDF and e-mail', () => {
  it('prints a PDF with the reference and totals', async () => {
    const { order } = await quotedWorld();
    const quote = (await sales.post(`/api/orders/${order.id}/quotes`).expect(201)).body;
    const res = await sales.agent
      .get(`/api/orders/${order.id}/quotes/1/pdf`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-type']).toMatch(/^application\/pdf/);
    expect(res.headers['content-disposition']).toBe(`inline; filename="${quote.reference}.pdf"`);
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    requirePdftotext();
    const text = pdfText(pdf);
    const money = (v: number) => `$${v.toFixed(2).replace(/\B(?=(\d{3})+(?!\d))/g, ',')}`;
    expect(text).toContain(quote.reference);
    for (const v of [quote.subtotal, quote.delivery, quote.tax, quote.total, quote.depositDue])
      expect(text).toContain(money(v));
    expect(text).toMatch(/T1\s+Fink \(W\) 24'-0" 4\/12\s+4\s+1\s+48\.0/);
    expect(text).toContain('Local codes govern.');
    expect(text).toMatch(/Page 1 of \d/);
  });

  it('e-mails the builder with the PDF attached and records it', async () => {
    const { order, customer } = await quotedWorld();
    const quote = (await sales.post(`/api/orders/${order.id}/quotes`).expect(201)).body;
    const res = await sales.post(`/api/orders/${order.id}/quotes/1/send`).expect(200);
    expect(res.body).toMatchObject({ sentTo: customer.email, sentAt: expect.any(String) });
    // The message goes out through the mail queue, moments after the answer.
    const mail = await vi.waitFor(
      async () => {
        const m = (await testMailer()).fake!.messages().find((x) => x.to.includes(customer.email));
        if (!m) throw new Error('not delivered yet');
        return m;
      },
      { timeout: 20000, interval: 200 },
    );
    expect(
      (await MailMessage.findOne({ where: { orderId: order.id, kind: 'quote' } }))!.status,
    ).toBe('sent');
    expect(mail!.subject).toContain(quote.reference);
    expect(mail!.attachments).toEqual([
      expect.objectContaining({
        filename: `${quote.reference}.pdf`,
        contentType: 'application/pdf',
      }),
    ]);
    expect(mail!.text).toContain(quote.reference);
    expect(mail!.text).toMatch(/Deposit due on acceptance: \$/);
    expect(mail!.text).toContain('Local codes govern.');
    const stored = await Quote.findByPk(quote.id);
    expect(stored!.sentTo).toBe(customer.email);
    expect(await AuditEvent.count({ where: { subjectId: order.id, action: 'quote.sent' } })).toBe(
      1,
    );
  });

  it('refuses to send a superseded revision; without a mailer the message waits in the outbox', async () => {
    const { order, line } = await quotedWorld();
    await sales.post(`/api/orders/${order.id}/quotes`).expect(201);
    await sales.patch(`/api/orders/${order.id}/lines/${line.id}`, { quantity: 5 }).expect(200);
    const changed = await sales.post(`/api/orders/${order.id}/quotes/1/send`).expect(409);
    expect(changed.body.error.message).toMatch(/changed/);
    await sales.post(`/api/orders/${order.id}/quotes`).expect(201);
    const old = await sales.post(`/api/orders/${order.id}/quotes/1/send`).expect(409);
    expect(old.body.error.message).toMatch(/superseded/);

    const noMail = testApp();
    const s = await signedIn(noMail, (await createUser({ role: 'sales', plant })).email);
    await s.post(`/api/orders/${order.id}/quotes/2/send`).expect(200);
    const waiting = await MailMessage.findOne({ where: { orderId: order.id, kind: 'quote' } });
    expect(waiting).toMatchObject({ status: expect.stringMatching(/queued|sent/) });
  });
});
