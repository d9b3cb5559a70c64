/**
 * A local fake of the part of the hosted payment API the app uses, spoken in its wire format so
 * the official SDK is what the app calls: form-encoded requests, a Bearer secret key, the API's
 * JSON objects and error bodies, Idempotency-Key replays, and signed webhooks.
 */
import express, { type Request, type Response } from 'express';
import { apiError, newEvent, newId, now, type Store } from './store';
import { paymentPage } from './page';

type Obj = Record<string, unknown> & { id: string };
type Send = (event: Obj) => void;

const PAYS = '4242424242424242';
const DECLINED = '4000000000000002';

interface LineItem {
  quantity?: string;
  price_data?: { currency?: string; unit_amount?: string; product_data?: { name?: string } };
}

export function fakeApp(opts: {
  secretKey: string;
  store: Store;
  send: Send;
  baseUrl: () => string;
}) {
  const { store } = opts;
  const app = express();
  app.disable('x-powered-by');
  app.use(express.urlencoded({ extended: true, limit: '200kb' }));

  const emit = (type: string, object: Obj) => {
    const event = newEvent(type, object);
    store.events.unshift(event);
    opts.send(event);
  };

  // The API: a Bearer secret key on every call.
  app.use('/v1', (req, res, next) => {
    const key = (req.get('authorization') ?? '').replace(/^Bearer\s+/i, '');
    if (key !== opts.secretKey)
      return res
        .status(401)
        .json(apiError('invalid_request_error', `Invalid API Key provided: ${key.slice(0, 8)}***`));
    next();
  });

  /** A POST honouring Idempotency-Key: the first reply is replayed for every retry. */
  const idempotent =
    (fn: (req: Request) => { status: number; body: unknown }) => (req: Request, res: Response) => {
      const key = req.get('idempotency-key');
      const slot = key ? `${req.path}|${key}` : null;
      const kept = slot ? store.replies.get(slot) : undefined;
      if (kept) return res.status(kept.status).set('Idempotent-Replayed', 'true').json(kept.body);
      const reply = fn(req);
      if (slot && reply.status < 500) store.replies.set(slot, reply);
      res.status(reply.status).json(reply.body);
    };

  const missing = (what: string, id: string) => ({
    status: 404,
    body: apiError('invalid_request_error', `No such ${what}: '${id}'`, {
      code: 'resource_missing',
      param: 'id',
    }),
  });

  app.post(
    '/v1/checkout/sessions',
    idempotent((req) => {
      const b = req.body as Record<string, unknown>;
      for (const param of ['success_url', 'line_items'])
        if (!b[param])
          return {
            status: 400,
            body: apiError('invalid_request_error', `Missing required param: ${param}.`, {
              code: 'parameter_missing',
              param,
            }),
          };
      const items = Object.values(b.line_items as Record<string, LineItem>);
      let amount = 0;
      let currency = '';
      for (const item of items) {
        const unit = Number(item.price_data?.unit_amount);
        const qty = Number(item.quantity ?? 1);
        if (!Number.isInteger(unit) || unit < 1 || !Number.isInteger(qty) || qty < 1)
          return {
            status: 400,
            body: apiError('invalid_request_error', 'Invalid integer: unit_amount.', {
              code: 'parameter_invalid_integer',
              param: 'line_items[0][price_data][unit_amount]',
            }),
          };
        amount += unit * qty;
        currency = String(item.price_data?.currency ?? '').toLowerCase();
      }
      const id = newId('cs_test');
      const session: Obj = {
        id,
        object: 'checkout.session',
        amount_subtotal: amount,
        amount_total: amount,
        cancel_url: b.cancel_url ?? null,
        client_reference_id: b.client_reference_id ?? null,
        created: now(),
        currency,
        customer_email: b.customer_email ?? null,
        expires_at: now() + 24 * 3600,
        livemode: false,
        metadata: b.metadata ?? {},
        mode: b.mode ?? 'payment',
        payment_intent: null,
        payment_status: 'unpaid',
        status: 'open',
        success_url: b.success_url,
        url: `${opts.baseUrl()}/pay/${id}`,
        line_items_description: items.map((i) => i.price_data?.product_data?.name ?? '').join(', '),
        payment_intent_metadata:
          (b.payment_intent_data as { metadata?: unknown } | undefined)?.metadata ?? {},
      };
      store.sessions.set(id, session);
      return { status: 200, body: publicSession(session) };
    }),
  );

  app.get('/v1/checkout/sessions/:id', (req, res) => {
    const s = store.sessions.get(String(req.params.id));
    if (!s) {
      const m = missing('checkout.session', String(req.params.id));
      return res.status(m.status).json(m.body);
    }
    res.json(publicSession(s));
  });

  app.get('/v1/payment_intents/:id', (req, res) => {
    const pi = store.intents.get(String(req.params.id));
    if (!pi) {
      const m = missing('payment_intent', String(req.params.id));
      return res.status(m.status).json(m.body);
    }
    res.json(pi);
  });

  app.post(
    '/v1/refunds',
    idempotent((req) => {
      const b = req.body as Record<string, unknown>;
      const pi = store.intents.get(String(b.payment_intent ?? ''));
      if (!pi) return missing('payment_intent', String(b.payment_intent ?? ''));
      const left = (pi.amount_received as number) - (pi.amount_refunded as number);
      const amount = b.amount === undefined ? left : Number(b.amount);
      if (!Number.isInteger(amount) || amount < 1 || amount > left)
        return {
          status: 400,
          body: apiError(
            'invalid_request_error',
            `Refund amount (${amount}) is greater than unrefunded amount on charge (${left})`,
            { code: 'amount_too_large', param: 'amount' },
          ),
        };
      pi.amount_refunded = (pi.amount_refunded as number) + amount;
      const refund: Obj = {
        id: newId('re'),
        object: 'refund',
        amount,
        charge: pi.latest_charge,
        created: now(),
        currency: pi.currency,
        metadata: b.metadata ?? {},
        payment_intent: pi.id,
        reason: b.reason ?? null,
        status: 'succeeded',
      };
      store.refunds.set(refund.id, refund);
      emit('refund.created', refund);
      return { status: 200, body: refund };
    }),
  );

  app.get('/v1/events', (req, res) => {
    const limit = Math.min(100, Math.max(1, Number(req.query.limit ?? 10) || 10));
    const type = typeof req.query.type === 'string' ? req.query.type : null;
    const list = store.events.filter((e) => !type || e.type === type);
    res.json({
      object: 'list',
      data: list.slice(0, limit),
      has_more: list.length > limit,
      url: '/v1/events',
    });
  });

  app.use('/v1', (req, res) => {
    res
      .status(404)
      .json(
        apiError(
          'invalid_request_error',
          `Unrecognized request URL (${req.method}: ${req.originalUrl}).`,
        ),
      );
  });

  // The hosted payment page at the session's url.
  const page = (s: Obj, message?: { kind: 'error' | 'info'; text: string }) =>
    paymentPage({
      action: `/pay/${s.id}`,
      amount: s.amount_total as number,
      currency: s.currency as string,
      description: (s.line_items_description as string) || 'Payment',
      cancelUrl: s.cancel_url as string | null,
      message,
    });

  app.get('/pay/:id', (req, res) => {
    const s = store.sessions.get(String(req.params.id));
    if (!s) return res.status(404).type('text/plain').send('No such payment page.');
    if (s.status === 'complete') return res.redirect(303, successUrl(s));
    res.type('html').send(page(s));
  });

  app.post('/pay/:id', (req, res) => {
    const s = store.sessions.get(String(req.params.id));
    if (!s) return res.status(404).type('text/plain').send('No such payment page.');
    if (s.status === 'complete') return res.redirect(303, successUrl(s));
    const card = String((req.body as { card?: string }).card ?? '').replace(/[\s-]/g, '');
    if (card === DECLINED)
      return res
        .status(402)
        .type('html')
        .send(page(s, { kind: 'error', text: 'Your card was declined. Try another card.' }));
    if (card !== PAYS)
      return res
        .status(400)
        .type('html')
        .send(page(s, { kind: 'error', text: 'Use a test card: 4242 4242 4242 4242.' }));
    const pi: Obj = {
      id: newId('pi'),
      object: 'payment_intent',
      amount: s.amount_total,
      amount_received: s.amount_total,
      amount_refunded: 0,
      created: now(),
      currency: s.currency,
      latest_charge: newId('ch'),
      livemode: false,
      metadata: s.payment_intent_metadata,
      status: 'succeeded',
    };
    store.intents.set(pi.id, pi);
    Object.assign(s, { status: 'complete', payment_status: 'paid', payment_intent: pi.id });
    emit('checkout.session.completed', publicSession(s));
    emit('payment_intent.succeeded', pi);
    res.redirect(303, successUrl(s));
  });

  return app;
}

const successUrl = (s: Obj) => String(s.success_url).replace('{CHECKOUT_SESSION_ID}', s.id);

/** A session without the fake's own bookkeeping fields. */
function publicSession(s: Obj) {
  const { line_items_description: _d, payment_intent_metadata: _m, ...rest } = s;
  return rest;
}
