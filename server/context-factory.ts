import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { join, resolve } from 'node:path';
import { pino } from 'pino';
import type { Config } from './config';
import type { AppContext } from './context';
import { createDatabase } from './db/client';
import { createProjectionPool } from './projections/pool';
import { createProjectionRunner } from './projections/runner';
import { createSignInLimiter, defaultSignInLimits, type RateLimitSettings } from './services/rate-limits';

/** A session secret that survives restarts: from the environment, or kept in the data folder. */
function resolveSessionSecret(config: Config) {
  if (config.sessionSecret) return config.sessionSecret;
  const dir = resolve(config.dataDir);
  const file = join(dir, 'session-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dir, { recursive: true });
  const secret = randomBytes(32).toString('base64url');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}

export type ContextOptions = {
  signInLimits?: RateLimitSettings;
  projectionThreads?: number;
  maxQueuedProjections?: number;
};

export function createContext(config: Config, options: ContextOptions = {}): AppContext {
  const { db, pool } = createDatabase(config.databaseUrl);
  const logger = pino({ level: config.logLevel });
  const projectionPool = createProjectionPool({
    threads: options.projectionThreads ?? config.projectionThreads,
  });
  const runner = createProjectionRunner(db, projectionPool, logger, {
    maxQueued: options.maxQueuedProjections ?? config.maxQueuedProjections,
  });
  return {
    config,
    db,
    pool,
    logger,
    projections: { pool: projectionPool, runner },
    signInLimiter: createSignInLimiter(options.signInLimits ?? defaultSignInLimits),
    sessionSecret: resolveSessionSecret(config),
  };
}
