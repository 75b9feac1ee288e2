import { availableParallelism } from 'node:os';
import { z } from 'zod';

// Every setting comes from the environment; the README lists them with these defaults.
const envSchema = z.object({
  DATABASE_URL: z.string().min(1, 'DATABASE_URL is required (npm start sets it for the bundled MariaDB)'),
  PORT: z.coerce.number().int().min(0).max(65535).default(5180),
  HOST: z.string().default('127.0.0.1'),
  NODE_ENV: z.string().default('local'),
  SESSION_SECRET: z.string().min(16).optional(),
  COOKIE_SECURE: z.enum(['true', 'false']).optional(),
  TRUST_PROXY: z.enum(['true', 'false']).default('false'),
  PUBLIC_ORIGIN: z.string().url().optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  SEEDWAKE_DATA_DIR: z.string().default('.data'),
  PROJECTION_THREADS: z.coerce.number().int().min(1).max(64).optional(),
  MAX_QUEUED_PROJECTIONS: z.coerce.number().int().min(1).max(10_000).default(64),
  SMTP_URL: z
    .string()
    .regex(/^smtps?:\/\//, 'SMTP_URL must start with smtp:// or smtps://')
    .optional(),
  MAIL_FROM: z.string().min(3).default('Seedwake <no-reply@seedwake.localhost>'),
  SMTP_FAKE_PORT: z.coerce.number().int().min(0).max(65535).default(5182),
  SWEEP_WORKER: z.enum(['on', 'off']).default('on'),
  SWEEP_LEASE_SECONDS: z.coerce.number().int().min(1).max(3600).default(30),
  SWEEP_THREADS: z.coerce.number().int().min(1).max(64).optional(),
  SWEEP_MAX_REPLICATE_YEARS: z.coerce.number().int().min(1).default(20_000_000),
  SWEEP_MAX_POINTS: z.coerce.number().int().min(1).max(1_000_000).default(50_000),
  SWEEP_CHUNK_REPLICATE_YEARS: z.coerce.number().int().min(1).default(100_000),
});

/** Sensitivity sweeps: the worker loop, its lease, and the per-workspace size limits. */
export type SweepSettings = {
  /** Whether this process runs a worker loop (the web server by default; `npm run worker` always). */
  worker: boolean;
  leaseSeconds: number;
  /** Worker threads of the loop's point pool. */
  threads: number;
  maxReplicateYears: number;
  maxPoints: number;
  /** Work per chunk, in replicate-years. */
  chunkReplicateYears: number;
};

export type Config = {
  databaseUrl: string;
  port: number;
  host: string;
  production: boolean;
  sessionSecret: string | undefined;
  cookieSecure: boolean;
  trustProxy: boolean;
  publicOrigin: string | undefined;
  logLevel: string;
  dataDir: string;
  projectionThreads: number;
  maxQueuedProjections: number;
  /** Where mail goes; unset outside production means the local fake SMTP server. */
  smtpUrl: string | undefined;
  mailFrom: string;
  smtpFakePort: number;
  sweeps: SweepSettings;
};

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n  ${lines.join('\n  ')}`);
  }
  const e = parsed.data;
  const production = e.NODE_ENV === 'production';
  if (production && !e.SESSION_SECRET)
    throw new Error('SESSION_SECRET (16+ characters) is required in production');
  // Links in e-mail must never be built from a request's Host header (an attacker could
  // send a victim a reset link to their own host), so production names its origin.
  if (production && !e.PUBLIC_ORIGIN)
    throw new Error('PUBLIC_ORIGIN is required in production (links in e-mail are built from it)');
  return {
    databaseUrl: e.DATABASE_URL,
    port: e.PORT,
    host: e.HOST,
    production,
    sessionSecret: e.SESSION_SECRET,
    cookieSecure: e.COOKIE_SECURE ? e.COOKIE_SECURE === 'true' : production,
    trustProxy: e.TRUST_PROXY === 'true',
    publicOrigin: e.PUBLIC_ORIGIN,
    logLevel: e.LOG_LEVEL,
    dataDir: e.SEEDWAKE_DATA_DIR,
    // One thread is left for the request thread and MariaDB on small machines.
    projectionThreads: e.PROJECTION_THREADS ?? Math.max(1, availableParallelism() - 1),
    maxQueuedProjections: e.MAX_QUEUED_PROJECTIONS,
    smtpUrl: e.SMTP_URL,
    mailFrom: e.MAIL_FROM,
    smtpFakePort: e.SMTP_FAKE_PORT,
    sweeps: {
      worker: e.SWEEP_WORKER === 'on',
      leaseSeconds: e.SWEEP_LEASE_SECONDS,
      threads: e.SWEEP_THREADS ?? Math.max(1, availableParallelism() - 1),
      maxReplicateYears: e.SWEEP_MAX_REPLICATE_YEARS,
      maxPoints: e.SWEEP_MAX_POINTS,
      chunkReplicateYears: e.SWEEP_CHUNK_REPLICATE_YEARS,
    },
  };
}
