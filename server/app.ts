import express from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import helmet from 'helmet';
import passport from 'passport';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Sequelize } from 'sequelize';
import pg from 'pg';
import { readConfig, type Config } from './config';
import { configurePassport } from './middleware/auth';
import { requireCsrf } from './middleware/csrf';
import { requireStorableText } from './middleware/storableText';
import { apiNotFound, errorHandler } from './middleware/errors';
import { authRouter } from './routes/auth/router';
import { usersRouter } from './routes/users/router';
import { customersRouter } from './routes/customers/router';
import { jobsRouter } from './routes/jobs/router';
import { plantRouter } from './routes/plant/router';
import { designRulesRouter } from './routes/plant/designRules';
import { designDrawingRouter } from './routes/designDrawing/router';
import { ordersRouter } from './routes/orders/router';
import { reviewsRouter } from './routes/reviews/router';
import { tasksRouter } from './routes/tasks/router';
import { designsRouter } from './routes/designs/router';
import { devRouter } from './routes/dev/router';
import { priceBookRouter } from './routes/priceBook/router';
import { quotesRouter } from './routes/quotes/router';
import { filesRouter } from './routes/files/router';
import { shopRouter } from './routes/shop/router';
import { shopPaperRouter } from './routes/shopPaper/router';
import type { Mailer } from './services/mail';
import { survivePoolErrors } from './db/resilience';
import { sweepPartialUploads } from './services/storage';
import { logger } from './logger';
import { startMailQueue, type MailQueue } from './services/mailQueue';
import { renderAttachment } from './services/mailAttachments';
import { acceptanceRouter } from './routes/portal/router';
import { portalHomeRouter } from './routes/portal/home';
import { orderPaymentsRouter } from './routes/payments/router';
import { paymentsWebhookRouter } from './routes/payments/webhook';
import { mailProbe } from './services/mailQueue';
import { paymentsProbe, type Payments } from './services/payments';
import { stockRouter } from './routes/stock/router';
import { lumberPlanRouter } from './routes/lumberPlan/router';
import { productionRouter } from './routes/production/router';
import { orderProductionRouter } from './routes/orderProduction/router';
import { floorRouter } from './routes/floor/router';
import { healthReport, type HealthProbe } from './health';
import { requestLog } from './middleware/requestLog';
import { startShopPlanner } from './services/shopPlan/queue';

export interface AppOptions {
  sequelize: Sequelize;
  databaseUrl: string;
  config?: Partial<Config>;
  /** Folder of the built client (served with an SPA fallback) — omitted in API-only tests. */
  clientDir?: string;
  /** Outgoing mail (SMTP_URL or the local fake); without it, sending answers 503. */
  mailer?: Mailer;
  /** The mail job queue (pg-boss); without it, mail waits in the outbox for a worker. */
  mailQueue?: MailQueue | null;
  /** The payment service through the SDK (the local fake or the hosted one); null: none. */
  payments?: Payments | null;
  /** Named checks for `GET /api/health` besides the database (e.g. `mail`, `payments`). */
  healthProbes?: Record<string, HealthProbe>;
}

/** The whole HTTP app, without a listener, so tests drive it with supertest. */
export function createApp(opts: AppOptions) {
  const config = { ...readConfig(), ...opts.config };
  configurePassport();
  const app = express();
  // Per app, not per process: tests run apps in and out of demo mode side by side.
  app.locals.demo = config.demo;
  app.set('trust proxy', config.trustProxy > 0 ? config.trustProxy : false);
  app.disable('x-powered-by');
  app.use(requestLog);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': config.production ? [] : null,
        },
      },
    }),
  );

  const pool = survivePoolErrors(
    new pg.Pool({ connectionString: opts.databaseUrl, max: 5, connectionTimeoutMillis: 5000 }),
    'session',
  );
  const PgStore = connectPgSimple(session);
  const store = new PgStore({
    pool,
    tableName: 'session',
    pruneSessionInterval: 15 * 60,
    errorLog: (...args: unknown[]) => logger.warn({ detail: args.map(String) }, 'session store'),
  });
  app.locals.mailer = opts.mailer ?? null;
  // Start-up: half-written uploads of a killed process go (in the background; logged if it fails).
  void sweepPartialUploads()
    .then((swept) => swept.length && logger.info({ swept }, 'removed partial uploads'))
    .catch((err: unknown) => logger.warn({ err }, 'could not sweep partial uploads'));
  app.locals.mailQueue = opts.mailQueue ?? null;
  app.locals.payments = opts.payments ?? null;
  // Given a mailer but no queue (tests), the app runs its own queue worker.
  const ownQueue =
    opts.mailer && opts.mailQueue === undefined
      ? startMailQueue({
          databaseUrl: opts.databaseUrl,
          mailer: opts.mailer,
          render: renderAttachment,
          pollingIntervalSeconds: 0.5,
        })
          .then((q) => (app.locals.mailQueue = q))
          .catch((e: Error) => {
            console.error(`Mail queue did not start: ${e.message}`);
            return null;
          })
      : null;
  // Shop plans run on the same job queue as mail, wherever this app has one.
  const planner = Promise.resolve(opts.mailQueue ?? ownQueue).then((q) =>
    q
      ? startShopPlanner(q.boss, { pollingIntervalSeconds: ownQueue ? 0.5 : 2 }).catch(
          (e: Error) => {
            console.error(`Shop planner did not start: ${e.message}`);
            return null;
          },
        )
      : null,
  );
  app.locals.close = async () => {
    await (await planner)?.stop();
    await (await ownQueue)?.stop();
    store.close();
    await pool.end().catch(() => undefined);
  };

  app.locals.healthProbes = new Map<string, HealthProbe>(Object.entries(opts.healthProbes ?? {}));
  // The mail queue and the payment service report when this app has them.
  const probes = app.locals.healthProbes as Map<string, HealthProbe>;
  if (!probes.has('mail') && (opts.mailQueue || opts.mailer))
    probes.set('mail', async () => {
      const r = await mailProbe((app.locals.mailQueue as MailQueue | null) ?? null);
      if (r.status !== 'ok') throw new Error(`mail queue ${r.status}`);
    });
  if (!probes.has('payments') && opts.payments)
    probes.set('payments', async () => {
      const r = paymentsProbe(opts.payments ?? null);
      if (r.status !== 'ok') throw new Error(`payments ${r.status}`);
    });
  app.get('/api/health', async (req, res) => {
    const { ok, checks } = await healthReport(
      opts.sequelize,
      req.app.locals.healthProbes as Map<string, HealthProbe>,
    );
    res
      .status(ok ? 200 : 503)
      .json({ status: ok ? 'ok' : 'degraded', ...checks, demo: config.demo });
  });

  // Verified over the raw body, so mounted before the JSON parser (and outside session and CSRF).
  app.use('/api/payments/webhook', paymentsWebhookRouter());
  app.use('/api', express.json({ limit: '1mb' }));
  app.use('/api', requireStorableText);
  app.use(
    '/api',
    session({
      name: 'spanwise.sid',
      secret: config.sessionSecret,
      store,
      resave: false,
      saveUninitialized: false,
      rolling: true, // the idle timeout restarts with every request
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: config.production,
        maxAge: config.sessionIdleMinutes * 60 * 1000,
      },
    }),
  );
  app.use('/api', passport.session());
  app.use('/api', requireCsrf);

  app.use('/api/auth', authRouter(config));
  app.use('/api/users', usersRouter());
  app.use('/api/customers', customersRouter());
  app.use('/api/jobs', jobsRouter());
  app.use('/api/plant/design-rules', designRulesRouter());
  app.use('/api/plant', plantRouter());
  app.use('/api/orders/:id/quotes', acceptanceRouter());
  app.use('/api/orders/:id/quotes', quotesRouter());
  app.use('/api/orders', orderPaymentsRouter());
  app.use('/api/orders/:id/shop-paper', shopPaperRouter(config));
  app.use('/api/orders', designDrawingRouter());
  app.use('/api/orders', ordersRouter());
  app.use('/api/portal', portalHomeRouter());
  app.use('/api/price-book', priceBookRouter());
  app.use('/api/reviews', reviewsRouter());
  app.use('/api/tasks', tasksRouter());
  app.use('/api/designs', designsRouter());
  app.use('/api/stock', stockRouter());
  app.use('/api/shop/orders', lumberPlanRouter());
  app.use('/api/orders', orderProductionRouter());
  app.use('/api', productionRouter());
  app.use('/api/floor', floorRouter());
  app.use('/api/dev', devRouter(opts.mailer ?? null));
  app.use('/api/shop', shopRouter());
  app.use('/api', filesRouter());
  app.use('/api', apiNotFound);

  const clientDir = opts.clientDir ? resolve(opts.clientDir) : null;
  if (clientDir && existsSync(join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    app.get(/^(?!\/api\/).*/, (_req, res) => res.sendFile(join(clientDir, 'index.html')));
  }
  app.use(errorHandler);
  return app;
}
