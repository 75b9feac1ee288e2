import type { Logger } from 'pino';
import type { Pool } from 'mysql2/promise';
import type { Config } from './config';
import type { Database } from './db/client';
import type { LinkLimiters, SignInLimiter } from './services/rate-limits';
import type { ProjectionPool } from './projections/pool';
import type { ProjectionRunner } from './projections/runner';
import type { SweepWorker } from './sweeps/worker-loop';
import type { SweepSettings } from './config';
import type { ReplayLimiter } from './services/replay-limits';

/** What every route needs, built once in main.ts (or by a test) and passed down. */
export type AppContext = {
  config: Config;
  db: Database;
  pool: Pool;
  logger: Logger;
  signInLimiter: SignInLimiter;
  /** Limits on the endpoints that send mail or take an e-mailed link's secret. */
  linkLimiters: LinkLimiters;
  sessionSecret: string;
  projections: { pool: ProjectionPool; runner: ProjectionRunner };
  /** The sweep worker loop is built here but started by main.ts when SWEEP_WORKER is on. */
  sweeps: { settings: SweepSettings; worker: SweepWorker };
  /** Limits on lessons' "replay with chance" (class links and signed-in). */
  replayLimiter: ReplayLimiter;
};
