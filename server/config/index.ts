/** Environment configuration, parsed once with zod; every setting has a documented default. */
import path from 'node:path';
import { z } from 'zod';

const bool = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');
const port = z.coerce.number().int().min(0).max(65535);

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  /** HTTP port; 3000 by default. */
  PORT: port.default(3000),
  /** Interface to listen on; loopback by default (set 0.0.0.0 to serve a network). */
  HOST: z.string().min(1).default('127.0.0.1'),
  /** Folder for the SQLite files and the generated session secret. */
  HEATLOOM_DATA_DIR: z.string().min(1).default('./data'),
  /** Session signing secret; generated on first start and kept in the data folder when unset. */
  SESSION_SECRET: z.string().min(16).optional(),
  /** Real SMTP relay; when unset the app runs its own local SMTP server and keeps an outbox. */
  SMTP_HOST: z.string().min(1).optional(),
  SMTP_PORT: port.default(587),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  SMTP_SECURE: bool.default(false),
  /** Port of the local fake SMTP server (0 = any free port). */
  SMTP_FAKE_PORT: port.default(2525),
  MAIL_FROM: z.string().min(3).default('Heatloom <no-reply@heatloom.example>'),
  /** Base URL used in links inside e-mails; http://localhost:PORT by default. */
  PUBLIC_URL: z.url().optional(),
  /** Mark session cookies Secure (set when served over https). */
  COOKIE_SECURE: bool.default(false),
  /** Express "trust proxy" hop count (0 = no proxy in front). */
  TRUST_PROXY: z.coerce.number().int().min(0).max(10).default(0),
  /** Failed sign-ins allowed per client address per 15 minutes. */
  LOGIN_RATE_LIMIT: z.coerce.number().int().min(1).max(10000).default(10),
  /** Seed the invented demo workspace when the database is empty. */
  SEED_DEMO: bool.default(true),
  /** Built client folder served in production. */
  CLIENT_DIST_DIR: z.string().min(1).default('dist'),
  LOG_LEVEL: z.enum(['debug', 'info', 'warn', 'error', 'silent']).optional(),
  /** Engine worker threads; the machine's cores (at most 4) when unset. */
  ENGINE_THREADS: z.coerce.number().int().min(1).max(64).optional(),
  /** Engine tasks allowed to wait for a thread before new ones get 503 solver_busy. */
  ENGINE_QUEUE: z.coerce.number().int().min(1).max(100000).optional(),
});

/** Parsed, resolved configuration of one server instance. */
export interface Config {
  env: 'development' | 'production' | 'test';
  port: number;
  host: string;
  dataDir: string;
  sessionSecret?: string;
  smtp: { host: string; port: number; user?: string; pass?: string; secure: boolean } | null;
  smtpFakePort: number;
  mailFrom: string;
  publicUrl: string;
  cookieSecure: boolean;
  trustProxy: number;
  loginRateLimit: number;
  seedDemo: boolean;
  clientDistDir: string;
  logLevel: 'debug' | 'info' | 'warn' | 'error' | 'silent';
  /** Engine pool overrides (defaults in server/lib/workerPool.ts). */
  engine: { maxThreads?: number; maxQueue?: number };
  /** argon2id cost; lowered only under NODE_ENV=test. */
  argon2: { memoryCost: number; timeCost: number; parallelism: number };
}

/** Parse an environment (process.env by default) into a Config; throws a readable error on bad values. */
export function loadConfig(env: Record<string, string | undefined> = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment configuration:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  const isTest = e.NODE_ENV === 'test';
  return {
    env: e.NODE_ENV,
    port: e.PORT,
    host: e.HOST,
    dataDir: path.resolve(e.HEATLOOM_DATA_DIR),
    sessionSecret: e.SESSION_SECRET,
    smtp: e.SMTP_HOST
      ? { host: e.SMTP_HOST, port: e.SMTP_PORT, user: e.SMTP_USER, pass: e.SMTP_PASS, secure: e.SMTP_SECURE }
      : null,
    smtpFakePort: e.SMTP_FAKE_PORT,
    mailFrom: e.MAIL_FROM,
    publicUrl: (e.PUBLIC_URL ?? `http://localhost:${e.PORT}`).replace(/\/+$/, ''),
    cookieSecure: e.COOKIE_SECURE,
    trustProxy: e.TRUST_PROXY,
    loginRateLimit: e.LOGIN_RATE_LIMIT,
    seedDemo: e.SEED_DEMO,
    clientDistDir: path.resolve(e.CLIENT_DIST_DIR),
    logLevel: e.LOG_LEVEL ?? (isTest ? 'silent' : 'info'),
    engine: { maxThreads: e.ENGINE_THREADS, maxQueue: e.ENGINE_QUEUE },
    // argon2 library defaults (RFC 9106 second recommended option is stronger; these match the package's).
    argon2: isTest ? { memoryCost: 1024, timeCost: 1, parallelism: 1 } : { memoryCost: 65536, timeCost: 3, parallelism: 4 },
  };
}
