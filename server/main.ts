import { createApp } from './app';
import { loadConfig } from './config';
import { createContext } from './context-factory';

const config = loadConfig();
const ctx = createContext(config);
const app = createApp(ctx);

await ctx.projections.runner.recover();

const server = app.listen(config.port, config.host, () => {
  ctx.logger.info({ url: `http://${config.host}:${config.port}` }, 'Seedwake is serving');
  process.stdout.write(`\nSeedwake is ready at http://${config.host}:${config.port}\n`);
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
  await ctx.pool.end();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
