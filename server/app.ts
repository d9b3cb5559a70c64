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
import { ordersRouter } from './routes/orders/router';
import { reviewsRouter } from './routes/reviews/router';
import { designsRouter } from './routes/designs/router';
import { devRouter } from './routes/dev/router';
import { priceBookRouter } from './routes/priceBook/router';
import { quotesRouter } from './routes/quotes/router';
import { filesRouter } from './routes/files/router';
import type { Mailer } from './services/mail';
import { survivePoolErrors } from './db/resilience';
import { sweepPartialUploads } from './services/storage';
import { logger } from './logger';
import { healthReport, type HealthProbe } from './health';
import { requestLog } from './middleware/requestLog';

export interface AppOptions {
  sequelize: Sequelize;
  databaseUrl: string;
  config?: Partial<Config>;
  /** Folder of the built client (served with an SPA fallback) — omitted in API-only tests. */
  clientDir?: string;
  /** Outgoing mail (SMTP_URL or the local fake); without it, sending answers 503. */
  mailer?: Mailer;
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
  app.locals.close = async () => {
    store.close();
    await pool.end().catch(() => undefined);
  };

  app.locals.healthProbes = new Map<string, HealthProbe>(Object.entries(opts.healthProbes ?? {}));
  app.get('/api/health', async (req, res) => {
    const { ok, checks } = await healthReport(
      opts.sequelize,
      req.app.locals.healthProbes as Map<string, HealthProbe>,
    );
    res
      .status(ok ? 200 : 503)
      .json({ status: ok ? 'ok' : 'degraded', ...checks, demo: config.demo });
  });

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
  app.use('/api/plant', plantRouter());
  app.use('/api/orders/:id/quotes', quotesRouter());
  app.use('/api/orders', ordersRouter());
  app.use('/api/price-book', priceBookRouter());
  app.use('/api/reviews', reviewsRouter());
  app.use('/api/designs', designsRouter());
  app.use('/api/dev', devRouter(opts.mailer ?? null));
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
