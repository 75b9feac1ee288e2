// `npm run worker`: a process that only computes sweep chunks, against the DATABASE_URL it is
// given, on this machine or any other. Start as many as there are machines (or cores) to
// spare; they share the work through the database's chunk leases. Ctrl-C (or SIGTERM) hands
// the chunk in progress back, so another worker takes it at once rather than at lease expiry.
import { pino } from 'pino';
import { loadConfig } from './config';
import { createDatabase } from './db/client';
import { createSweepWorker } from './sweeps/worker-loop';

const config = loadConfig();
const logger = pino({ level: config.logLevel });
const { db, pool } = createDatabase(config.databaseUrl);
const worker = createSweepWorker(db, logger, config.sweeps);
worker.start();
logger.info(
  { worker: worker.workerId, threads: config.sweeps.threads, leaseSeconds: config.sweeps.leaseSeconds },
  'sweep worker started',
);

let closing = false;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  logger.info({ signal }, 'sweep worker stopping');
  await worker.stop();
  await pool.end();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
