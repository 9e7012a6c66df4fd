/** Builds the Express app and everything it needs (database, mail, sessions) without listening. */
import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import { csrfSync } from 'csrf-sync';
import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import { createLogger, type Logger } from './lib/logger';
import { errorMiddleware, apiNotFound } from './lib/errorMiddleware';
import type { AppContext } from './lib/context';
import { createMailer } from './lib/mailer';
import { startFakeSmtpOrFallback, type FakeSmtp } from './lib/fakeSmtp';
import { openSessionStore } from './lib/sessionStore';
import { resolveSessionSecret } from './lib/sessionSecret';
import { cspDirectives } from './lib/csp';
import { serveClient } from './lib/serveClient';
import { requestLog } from './lib/requestLog';
import { openDatabase } from './db/sequelize';
import { initModels } from './db/models';
import { migrate } from './db/migrate';
import { seedDemoIfEmpty } from './db/seeders/demoSeed';
import { storeReceivedMail } from './api/outbox/outboxRepository';
import { apiRoutes } from './api/routes';
import { closePool, configurePool } from './lib/workerPool';
import { limitBodyDepth } from './lib/bodyDepth';
import { assertWritableDataDir, storageErrors } from './lib/storageErrors';

/** A built app with its resources; `close` releases them (server sockets are the caller's). */
export interface BuiltApp {
  app: Express;
  ctx: AppContext;
  sequelize: Sequelize;
  logger: Logger;
  /** Port of the local fake SMTP server, or null when a real relay is configured. */
  fakeSmtpPort: number | null;
  /** True when this start seeded the demo workspace. */
  seeded: boolean;
  close(): Promise<void>;
}

/** Build the app: migrate the database, start the fake SMTP server if needed, seed the demo when empty. */
export async function createApp(config: Config): Promise<BuiltApp> {
  const logger = createLogger(config.logLevel);
  assertWritableDataDir(config.dataDir);
  const sequelize = await openDatabase(config.dataDir);
  initModels(sequelize);
  const applied = await migrate(sequelize);
  if (applied.length) logger.info(`Applied migrations: ${applied.join(', ')}`);
  const { maxThreads, maxQueue } = config.engine;
  if (maxThreads || maxQueue) await configurePool({ ...(maxThreads ? { maxThreads } : {}), ...(maxQueue ? { maxQueue } : {}) });

  let fake: FakeSmtp | null = null;
  if (!config.smtp) fake = await startFakeSmtpOrFallback(config.smtpFakePort, storeReceivedMail, logger);
  const mailer = createMailer(config, logger, fake?.port ?? null);
  const seeded = config.seedDemo ? await seedDemoIfEmpty(config.argon2) : false;
  if (seeded) logger.info('Seeded the demo workspace "Larkspur Compute (demo)".');

  const sessions = openSessionStore(config.dataDir);
  const { generateToken, csrfSynchronisedProtection } = csrfSync();
  const ctx: AppContext = { config, logger, mailer, generateCsrfToken: generateToken, endOtherSessions: sessions.endOtherSessions };

  const app = express();
  app.set('trust proxy', config.trustProxy);
  app.disable('x-powered-by');
  app.use(helmet({ contentSecurityPolicy: { useDefaults: false, directives: cspDirectives(config.cookieSecure) } }));
  app.use('/api', requestLog(logger));
  app.use('/api', (_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  app.use('/api', express.json({ limit: '2mb' }));
  app.use('/api', limitBodyDepth());
  app.use(
    '/api',
    session({
      name: 'heatloom.sid',
      secret: resolveSessionSecret(config.dataDir, config.sessionSecret),
      store: sessions.store,
      resave: false,
      saveUninitialized: false,
      cookie: { httpOnly: true, sameSite: 'lax', secure: config.cookieSecure, maxAge: 14 * 24 * 3600 * 1000 },
    }),
  );
  app.use('/api', csrfSynchronisedProtection);
  app.use('/api', apiRoutes(ctx));
  app.use('/api', apiNotFound);
  if (config.env !== 'test') serveClient(app, config.clientDistDir);
  app.use(storageErrors(logger));
  app.use(errorMiddleware(logger));

  return {
    app, ctx, sequelize, logger, fakeSmtpPort: fake?.port ?? null, seeded,
    async close() {
      mailer.close();
      if (fake) await fake.close();
      await sessions.close();
      await sequelize.close();
      await closePool();
    },
  };
}
