import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { join, resolve } from 'node:path';
import { pino } from 'pino';
import type { Config } from './config';
import type { AppContext } from './context';
import { createDatabase } from './db/client';
import { createProjectionPool } from './projections/pool';
import { createProjectionRunner } from './projections/runner';
import { createSweepWorker } from './sweeps/worker-loop';
import { createReplayLimiter, defaultReplayLimits, type ReplayLimitSettings } from './services/replay-limits';
import { LONG_PROJECTIONS } from '../shared/api/notifications';
import { linkOrigin } from './http/origin';
import { projectionNotifier, type LongWork } from './services/notifications';
import {
  createLinkLimiters,
  createSignInLimiter,
  defaultLinkLimits,
  defaultSignInLimits,
  type LinkLimitSettings,
  type RateLimitSettings,
} from './services/rate-limits';

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
  sweeps?: Partial<Config['sweeps']>;
  replayLimits?: ReplayLimitSettings;
  linkLimits?: LinkLimitSettings;
  /** When a launch of projections counts as long enough for a notice (shared/api/notifications.ts). */
  longProjections?: LongWork;
};

export function createContext(config: Config, options: ContextOptions = {}): AppContext {
  const { db, pool } = createDatabase(config.databaseUrl);
  const logger = pino({ level: config.logLevel });
  const projectionPool = createProjectionPool({
    threads: options.projectionThreads ?? config.projectionThreads,
  });
  const runner = createProjectionRunner(db, projectionPool, logger, {
    maxQueued: options.maxQueuedProjections ?? config.maxQueuedProjections,
    onFinished: projectionNotifier(db, logger, {
      origin: linkOrigin(config),
      long: options.longProjections ?? LONG_PROJECTIONS,
    }),
  });
  const sweepSettings = { ...config.sweeps, ...options.sweeps };
  return {
    config,
    db,
    pool,
    logger,
    projections: { pool: projectionPool, runner },
    sweeps: { settings: sweepSettings, worker: createSweepWorker(db, logger, sweepSettings) },
    signInLimiter: createSignInLimiter(options.signInLimits ?? defaultSignInLimits),
    replayLimiter: createReplayLimiter(options.replayLimits ?? defaultReplayLimits),
    linkLimiters: createLinkLimiters(options.linkLimits ?? defaultLinkLimits),
    sessionSecret: resolveSessionSecret(config),
  };
}
