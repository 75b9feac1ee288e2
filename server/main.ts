import { createApp } from './app';
import { loadConfig } from './config';
import { createContext } from './context-factory';
import { startMail } from './mail/start';

const config = loadConfig();
const ctx = createContext(config);
const app = createApp(ctx);

await ctx.projections.runner.recover();
const mail = await startMail(ctx.db, ctx.logger, config);
// One sweep worker loop in the web server unless SWEEP_WORKER=off (then `npm run worker` does the work).
if (ctx.sweeps.settings.worker) ctx.sweeps.worker.start();

const server = app.listen(config.port, config.host, () => {
  ctx.logger.info({ url: `http://${config.host}:${config.port}` }, 'Seedwake is serving');
  process.stdout.write(`\nSeedwake is ready at http://${config.host}:${config.port}\n`);
  if (mail.fake) {
    process.stdout.write(
      `Mail goes to a local fake SMTP server (port ${mail.fake.port}); read it at http://${config.host}:${config.port}/dev/outbox\n`,
    );
  }
});

let closing = false;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  ctx.logger.info({ signal }, 'shutting down');
  server.close();
  server.closeIdleConnections();
  const force = setTimeout(() => server.closeAllConnections(), 5_000);
  await new Promise((r) => server.once('close', r));
  clearTimeout(force);
  await ctx.projections.runner.stop();
  await ctx.sweeps.worker.stop();
  await mail.stop();
  await ctx.pool.end();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
