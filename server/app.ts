// createApp builds the Express application without listening, so tests can
// drive it with supertest and several processes can share one database.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express from 'express';
import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import helmet from 'helmet';
// Recipe quantities may arrive as strings with units (API, imports).
import '../shared/schemas/unit-reader';
import { rateLimit } from 'express-rate-limit';
import type { Database } from './db/index';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { loadUser } from './middleware/load-user';
import { authRoutes } from './routes/auth.routes';
import type { RouteEntry, RouteModule } from './routes/define-routes';
import { healthRoutes } from './routes/health.routes';
import { tubesRoutes } from './routes/tubes.routes';
import { usersRoutes } from './routes/users.routes';
import { computeRoutes } from './routes/compute.routes';
import { recipesRoutes } from './routes/recipes.routes';
import { versionsRoutes } from './routes/versions.routes';
import { auditRoutes } from './routes/audit.routes';
import { outboxRoutes } from './routes/outbox.routes';
import { signoffRoutes } from './routes/signoff.routes';
import { lotsRoutes } from './routes/lots.routes';
import { measurementsRoutes } from './routes/measurements.routes';
import { deliverOutbox, type Mailer } from './services/mail/outbox.service';

export interface AppConfig {
  sessionSecret: string;
  sessionMaxAgeHours: number;
  cookieSecure: boolean;
  trustProxy?: string;
  signInLimit: { max: number; windowMs: number };
  /** Stack traces in 500 answers: development only. */
  exposeStack: boolean;
  /** Serve the built client (dist/client) and its SPA fallback. */
  clientDir?: string;
}

export interface AppDeps {
  /** Where e-mail goes; without one, messages stay queued in the outbox. */
  mailer?: Mailer;
  log?: (err: unknown) => void;
}

export interface CreatedApp {
  app: express.Express;
  routes: RouteEntry[];
  /** Delivers queued e-mail now (tests await it; the server also runs it after each transition). */
  flushMail(): Promise<void>;
  close(): Promise<void>;
}

export const SESSION_COOKIE = 'tw.sid';

export function createApp(database: Database, config: AppConfig, deps: AppDeps = {}): CreatedApp {
  const { db, pool } = database;
  const log = deps.log ?? ((e: unknown) => console.error(e));
  const app = express();
  app.disable('x-powered-by');
  if (config.trustProxy) app.set('trust proxy', /^\d+$/.test(config.trustProxy) ? Number(config.trustProxy) : config.trustProxy);

  app.use(helmet());
  app.use('/api', express.json({ limit: '1mb' }));

  const MySQLStore = MySQLStoreFactory(session as never);
  const store = new MySQLStore(
    { createDatabaseTable: false, clearExpired: true, checkExpirationInterval: 15 * 60_000 },
    pool as never,
  );
  app.use(
    '/api',
    session({
      name: SESSION_COOKIE,
      secret: config.sessionSecret,
      store,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: config.cookieSecure,
        maxAge: config.sessionMaxAgeHours * 3600_000,
      },
    }),
  );
  app.use('/api', loadUser(db));

  const signInLimiter = rateLimit({
    windowMs: config.signInLimit.windowMs,
    limit: config.signInLimit.max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'rate_limited', message: 'Too many sign-in attempts; wait a few minutes' } });
    },
  });

  const modules: RouteModule[] = [
    authRoutes(db, signInLimiter),
    healthRoutes(db),
    usersRoutes(db),
    tubesRoutes(db),
    computeRoutes(db),
    recipesRoutes(db),
    versionsRoutes(db),
    signoffRoutes(db, deps.mailer, log),
    auditRoutes(db),
    outboxRoutes(db, deps.mailer),
    lotsRoutes(db),
    measurementsRoutes(db),
  ];
  for (const m of modules) app.use(m.base, m.router);
  app.use('/api', apiNotFound);

  if (config.clientDir && existsSync(config.clientDir)) {
    app.use(express.static(config.clientDir, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => res.sendFile(join(config.clientDir!, 'index.html')));
  }

  app.use(errorHandler({ exposeStack: config.exposeStack, log }));

  return {
    app,
    routes: modules.flatMap((m) => m.entries),
    flushMail: () => deliverOutbox(db, deps.mailer),
    async close() {
      // Let a delivery under way finish its writes before the pool goes.
      await deliverOutbox(db, deps.mailer).catch(log);
      await store.close();
    },
  };
}
