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
});

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
  };
}
