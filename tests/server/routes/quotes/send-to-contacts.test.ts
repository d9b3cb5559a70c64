import { beforeAll, describe, expect, it, vi } from 'vitest';
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
import { AuditEvent, MailMessage, Quote, type Plant } from '../../../../server/models';
import { greetingName, quoteRecipients } from '../../../../shared/api/quoteSend';
import { TEST_BOOK } from './helpers';

type S = Awaited<ReturnType<typeof signedIn>>;
let app: ReturnType<typeof testApp>;
let plant: Plant;
let sales: S;

beforeAll(async () => {
  app = testApp({}, undefined, await testMailer());
  plant = await createPlant();
  sales = await signedIn(app, (await createUser({ role: 'sales', plant })).email);
  const admin = await signedIn(app, (await createUser({ role: 'admin', plant })).email);
  await admin.put('/api/price-book', TEST_BOOK).expect(200);
});

/** A builder with two people who have addresses and one who has none; its order quoted. */
async function quoted() {
  const customer = await createCustomer({ plant, name: 'Castillo Contacts Co' });
  const n = customer.id;
  await customer.update({
    contacts: [
      { name: 'Ana Castillo', title: 'Owner', email: `ana-${n}@castillo.test`, phone: null },
      { name: 'Ben Reed', title: 'Site lead', email: `ben-${n}@castillo.test`, phone: null },
      { name: 'Cal Ortiz', title: null, email: null, phone: '555-0100' },
    ],
  });
  const order = await createOrder({ job: await createJob({ customer }) });
  await createLine({ order, mark: 'T1' });
  await sales.post(`/api/orders/${order.id}/quotes`).expect(201);
  return { customer, order, ana: `ana-${n}@castillo.test`, ben: `ben-${n}@castillo.test` };
}

describe('sending a quote to the builder’s chosen contacts', () => {
  it('one e-mail per chosen contact through the queue, each greeting the person by name', async () => {
    const { order, ana, ben } = await quoted();
    const res = await sales
      .post(`/api/orders/${order.id}/quotes/1/send`, { recipients: [ana, ben.toUpperCase()] })
      .expect(200);
    expect(res.body.sentTo).toBe(`${ana}, ${ben}`);
    const queued = await MailMessage.findAll({
      where: { orderId: order.id, kind: 'quote' },
      order: [['id', 'ASC']],
    });
    expect(queued.map((m) => m.toAddress)).toEqual([ana, ben]);
    const fake = (await testMailer()).fake!;
    const delivered = await vi.waitFor(
      () => {
        const ms = fake.messages().filter((m) => m.to.includes(ana) || m.to.includes(ben));
        if (ms.length < 2) throw new Error('not delivered yet');
        return ms;
      },
      { timeout: 20000, interval: 200 },
    );
    const toAna = delivered.find((m) => m.to.includes(ana))!;
    const toBen = delivered.find((m) => m.to.includes(ben))!;
    expect(toAna.text).toMatch(/^Hello Ana,/);
    expect(toBen.text).toMatch(/^Hello Ben,/);
    expect(toAna.attachments).toHaveLength(1);
    const event = await AuditEvent.findOne({
      where: { subjectId: order.id, action: 'quote.sent' },
    });
    expect(event!.data.to).toBe(`${ana}, ${ben}`);
  });

  it('refuses an empty choice and an address that is not the builder’s, sending nothing', async () => {
    const { order } = await quoted();
    const none = await sales
      .post(`/api/orders/${order.id}/quotes/1/send`, { recipients: [] })
      .expect(400);
    expect(none.body.error.message).toBe('Choose at least one person to send the quote to');
    const stranger = await sales
      .post(`/api/orders/${order.id}/quotes/1/send`, { recipients: ['someone@else.test'] })
      .expect(400);
    expect(stranger.body.error.message).toMatch(
      /someone@else\.test is not an address of Castillo Contacts Co/,
    );
    expect(await MailMessage.count({ where: { orderId: order.id } })).toBe(0);
    expect((await Quote.findOne({ where: { orderId: order.id } }))!.sentAt).toBeNull();
  });

  it('without a choice the company’s own address gets it, greeted by the company name', async () => {
    const { order, customer } = await quoted();
    await sales.post(`/api/orders/${order.id}/quotes/1/send`).expect(200);
    const m = await MailMessage.findOne({ where: { orderId: order.id, kind: 'quote' } });
    expect(m!.toAddress).toBe(customer.email);
    expect(m!.body).toMatch(/^Hello Castillo Contacts Co,/);
  });
});

describe('quoteRecipients and greetingName', () => {
  it('lists contacts with an address once, then the company address unless a contact has it', () => {
    const list = quoteRecipients({
      name: 'Acme',
      email: 'Office@acme.test',
      contacts: [
        { name: 'Ana Castillo', email: 'ana@acme.test' },
        { name: 'No Mail', email: null },
        { name: 'Ana again', email: 'ANA@acme.test' },
      ],
    });
    expect(list).toEqual([
      { email: 'ana@acme.test', name: 'Ana Castillo', company: false },
      { email: 'office@acme.test', name: 'Acme', company: true },
    ]);
    expect(greetingName(list[0]!)).toBe('Ana');
    expect(greetingName(list[1]!)).toBe('Acme');
    expect(greetingName({ name: 'Dr. Lee Park', company: false })).toBe('Dr. Lee Park');
  });
});
