import type { Logger } from 'pino';
import type { Pool } from 'mysql2/promise';
import type { Config } from './config';
import type { Database } from './db/client';
import type { SignInLimiter } from './services/rate-limits';
import type { ProjectionPool } from './projections/pool';
import type { ProjectionRunner } from './projections/runner';

/** What every route needs, built once in main.ts (or by a test) and passed down. */
export type AppContext = {
  config: Config;
  db: Database;
  pool: Pool;
  logger: Logger;
  signInLimiter: SignInLimiter;
  sessionSecret: string;
  projections: { pool: ProjectionPool; runner: ProjectionRunner };
};
