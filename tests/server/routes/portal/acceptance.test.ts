import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { testApp } from '../../../support/db';
import { createPlant, createUser } from '../../../support/factories';
import { signedIn } from '../../../support/session';
import {
  AuditEvent,
  MailMessage,
  Order,
  OrderLine,
  QuoteAcceptance,
  type Plant,
} from '../../../../server/models';
import { createQuote, sendQuote } from '../../../../server/commands/quotes';
import { builderQuoteSchema } from '../../../../shared/api/portal';
import { orderSchema } from '../../../../shared/api/orders';
import { sentQuoteWorld, useTestBook } from './helpers';

const app = testApp();
let plant: Plant;
const agree = (name = 'Dana Whitaker') => ({ name, agree: true });

beforeAll(async () => {
  plant = await createPlant();
  await useTestBook(plant);
});
afterEach(() => vi.useRealTimers());
afterAll(() => app.locals.close());

describe('accepting a quote', () => {
  it("records the builder's acceptance: who, when, from where, which revision; audit; mail", async () => {
    const { builder, order, quote } = await sentQuoteWorld(plant);
    const s = await signedIn(app, builder.email);
    const res = await s.post(`/api/orders/${order.id}/quotes/1/accept`, agree()).expect(200);
    const body = orderSchema.parse(res.body);
    expect(body.status).toBe('accepted');
    expect(body.acceptance).toMatchObject({
      quoteNumber: 1,
      name: 'Dana Whitaker',
      onBehalf: false,
    });
    const a = await QuoteAcceptance.findOne({ where: { orderId: order.id } });
    expect(a).toMatchObject({ quoteId: quote.id, userId: builder.id, method: 'portal' });
    expect(a!.ip).toMatch(/127\.0\.0\.1|::1|::ffff:127\.0\.0\.1/);
    const events = await AuditEvent.findAll({
      where: { subjectId: order.id, action: 'quote.accepted' },
    });
    expect(events).toHaveLength(1);
    const kinds = (await MailMessage.findAll({ where: { orderId: order.id } })).map((m) => m.kind);
    expect(kinds).toEqual(expect.arrayContaining(['acceptance.builder', 'acceptance.desk']));
    const copy = await MailMessage.findOne({
      where: { orderId: order.id, kind: 'acceptance.builder' },
    });
    expect(copy!.subject).toMatch(/^You accepted /);
  });

  it('twice is once: the second answer is the same and nothing changes', async () => {
    const { builder, order } = await sentQuoteWorld(plant);
    const s = await signedIn(app, builder.email);
    await s.post(`/api/orders/${order.id}/quotes/1/accept`, agree()).expect(200);
    const again = await s.post(`/api/orders/${order.id}/quotes/1/accept`, agree('Someone Else'));
    expect(again.status).toBe(200);
    expect(again.body.acceptance.name).toBe('Dana Whitaker');
    expect(await QuoteAcceptance.count({ where: { orderId: order.id } })).toBe(1);
    expect(
      await AuditEvent.count({ where: { subjectId: order.id, action: 'quote.accepted' } }),
    ).toBe(1);
    expect(
      await MailMessage.count({ where: { orderId: order.id, kind: 'acceptance.builder' } }),
    ).toBe(1);
  });

  it("another company's builder gets 404; other staff roles 403; bad bodies 400", async () => {
    const { order } = await sentQuoteWorld(plant);
    const stranger = (await sentQuoteWorld(plant)).builder;
    const s = await signedIn(app, stranger.email);
    await s.post(`/api/orders/${order.id}/quotes/1/accept`, agree()).expect(404);
    const engineer = await signedIn(app, (await createUser({ role: 'engineer', plant })).email);
    await engineer.post(`/api/orders/${order.id}/quotes/1/accept`, agree()).expect(403);
    const { builder, order: mine } = await sentQuoteWorld(plant);
    const own = await signedIn(app, builder.email);
    const noTick = await own.post(`/api/orders/${mine.id}/quotes/1/accept`, { name: 'Dana' });
    expect(noTick.status).toBe(400);
    expect(noTick.body.error.fields.agree).toMatch(/Tick the box/);
    expect((await Order.findByPk(mine.id))!.status).toBe('quoted');
  });

  it('a superseded revision answers 409 and the latest can be accepted', async () => {
    const { builder, sales, order } = await sentQuoteWorld(plant);
    // A changed order (an identical revision would be refused: the existing one is offered).
    await OrderLine.increment('quantity', { where: { orderId: order.id } });
    const q2 = await createQuote(sales, order);
    await sendQuote(sales, await order.reload(), q2);
    const s = await signedIn(app, builder.email);
    const old = await s.post(`/api/orders/${order.id}/quotes/1/accept`, agree()).expect(409);
    expect(old.body.error.message).toMatch(/superseded by revision 2/);
    const view = builderQuoteSchema.parse(
      (await s.get(`/api/orders/${order.id}/quotes/1`).expect(200)).body,
    );
    expect(view).toMatchObject({ superseded: true, refusal: expect.stringMatching(/superseded/) });
    await s.post(`/api/orders/${order.id}/quotes/2/accept`, agree()).expect(200);
  });

  it('an expired revision answers 409 and changes nothing', async () => {
    const { builder, order, quote } = await sentQuoteWorld(plant);
    // A day past the valid-until date (TEST_BOOK: 30 days).
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date(`${quote.validUntil}T12:00:00Z`).getTime() + 86_400_000);
    const s = await signedIn(app, builder.email);
    const res = await s.post(`/api/orders/${order.id}/quotes/1/accept`, agree()).expect(409);
    expect(res.body.error.message).toMatch(/expired/);
    const view = (await s.get(`/api/orders/${order.id}/quotes/1`).expect(200)).body;
    expect(view.expired).toBe(true);
    expect(await QuoteAcceptance.count({ where: { orderId: order.id } })).toBe(0);
  });

  it('a builder cannot see or accept a revision the plant has not sent', async () => {
    const { builder, order } = await sentQuoteWorld(plant, { send: false });
    const s = await signedIn(app, builder.email);
    await s.get(`/api/orders/${order.id}/quotes/1`).expect(404);
    expect((await s.get(`/api/orders/${order.id}/quotes`).expect(200)).body.items).toEqual([]);
    await s.post(`/api/orders/${order.id}/quotes/1/accept`, agree()).expect(404);
  });

  it("the desk records an acceptance on the builder's behalf, saying how, with the version it saw", async () => {
    const { sales, order } = await sentQuoteWorld(plant);
    const s = await signedIn(app, sales.email);
    const { version } = (await s.get(`/api/orders/${order.id}`).expect(200)).body;
    const bare = await s
      .post(`/api/orders/${order.id}/quotes/1/accept`, { ...agree(), version })
      .expect(400);
    expect(bare.body.error.message).toMatch(/phone, paper or e-mail/);
    const unseen = await s
      .post(`/api/orders/${order.id}/quotes/1/accept`, { ...agree(), method: 'phone' })
      .expect(400);
    expect(unseen.body.error.fields.version).toMatch(/Reload the order/);
    // The order changed since the desk opened it: nothing is recorded.
    const stale = await s
      .post(`/api/orders/${order.id}/quotes/1/accept`, {
        ...agree(),
        method: 'phone',
        version: version - 1 || version + 1,
      })
      .expect(409);
    expect(stale.body.error.code).toBe('stale');
    expect(await QuoteAcceptance.count({ where: { orderId: order.id } })).toBe(0);
    const res = await s
      .post(`/api/orders/${order.id}/quotes/1/accept`, {
        ...agree(),
        method: 'email',
        note: 'Signed copy attached to their e-mail of Tuesday',
        version,
      })
      .expect(200);
    expect(res.body.acceptance).toMatchObject({ onBehalf: true, method: 'email' });
    const summary = res.body.history.find((h: { action: string }) => h.action === 'quote.accepted');
    expect(summary.summary).toBe(
      "Accepted Q as “Dana Whitaker” on the builder's behalf (by e-mail): Signed copy attached to their e-mail of Tuesday".replace(
        'Q',
        res.body.acceptance.reference,
      ),
    );
    // The builder's copy says the plant recorded it, not that they clicked anything.
    const copy = await MailMessage.findOne({
      where: { orderId: order.id, kind: 'acceptance.builder' },
    });
    expect(copy!.subject).toMatch(/^Your acceptance of .+ is recorded/);
    // A second click with the page as it was changes nothing and answers the same.
    await s
      .post(`/api/orders/${order.id}/quotes/1/accept`, { ...agree(), method: 'email', version })
      .expect(200);
    expect(await QuoteAcceptance.count({ where: { orderId: order.id } })).toBe(1);
  });
});

describe('what a builder reads', () => {
  it('quotes without costs or the desk’s name; a history without staff edits or reviewer comments', async () => {
    const { builder, sales, order } = await sentQuoteWorld(plant);
    await AuditEvent.create({
      plantId: plant.id,
      actorId: sales.id,
      action: 'line.returned',
      subjectType: 'order',
      subjectId: order.id,
      data: { mark: 'T1', comment: 'Internal: web BF overstressed' },
    });
    const s = await signedIn(app, builder.email);
    const q = builderQuoteSchema.parse(
      (await s.get(`/api/orders/${order.id}/quotes/1`).expect(200)).body,
    );
    expect(q.createdBy).toBeNull();
    expect(q.lines[0]).not.toHaveProperty('unitCost');
    expect(q.lines[0]).not.toHaveProperty('lumberCost');
    expect(q.designs[0].joints.length).toBeGreaterThan(3);
    expect(q.cautions.join(' ')).toMatch(/Local codes govern/);
    expect(q.refusal).toBeNull();

    const page = (await s.get(`/api/orders/${order.id}`).expect(200)).body;
    const text = JSON.stringify(page.history);
    expect(text).not.toMatch(/Internal|Added T1|Quoted/);
    expect(page.history.map((h: { action: string }) => h.action)).toEqual(['quote.sent']);
    const desk = await signedIn(app, sales.email);
    const deskPage = (await desk.get(`/api/orders/${order.id}`).expect(200)).body;
    expect(JSON.stringify(deskPage.history)).toMatch(/Internal: web BF overstressed/);
  });

  it('asking for changes reaches the desk and stays in the history', async () => {
    const { builder, order } = await sentQuoteWorld(plant);
    const s = await signedIn(app, builder.email);
    const res = await s
      .post(`/api/orders/${order.id}/quotes/1/changes`, {
        message: 'Make the garage trusses 26 ft.',
      })
      .expect(201);
    expect(res.body.history[0].summary).toMatch(/26 ft/);
    const mail = await MailMessage.findOne({ where: { orderId: order.id, kind: 'changes.desk' } });
    expect(mail!.body).toMatch(/26 ft/);
    await s.post(`/api/orders/${order.id}/quotes/1/changes`, { message: '' }).expect(400);
  });
});
