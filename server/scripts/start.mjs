// `npm start` (and `npm run dev` with --dev): installs what is missing, starts a private
// MariaDB unless DATABASE_URL is set, migrates, seeds the invented demo, builds the client
// and serves it with the API. Plain Node, so it runs before dependencies are installed.
import { spawn } from 'node:child_process';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureNodeModules } from './lib/deps.mjs';
import { ensureDatabase, ensureMariadbInstalled, startServer, stopServer } from './lib/mariadb.mjs';
import { run, step } from './lib/steps.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const dev = process.argv.includes('--dev');
const port = Number(process.env.PORT ?? 5180);
const dbPort = Number(process.env.SEEDWAKE_DB_PORT ?? 5181);
const dataDir = resolve(root, process.env.SEEDWAKE_DATA_DIR ?? '.data');

const children = [];
let mariadb = null;
let stopping = false;

async function shutdown(code) {
  if (stopping) return;
  stopping = true;
  for (const child of children) if (child.exitCode === null) child.kill('SIGTERM');
  await Promise.all(
    children.map((c) => (c.exitCode === null ? new Promise((r) => c.once('exit', r)) : null)),
  );
  if (mariadb) {
    process.stdout.write('Stopping MariaDB…\n');
    await stopServer(mariadb);
  }
  process.exit(code);
}
process.on('SIGINT', () => shutdown(0));
process.on('SIGTERM', () => shutdown(0));

try {
  await step('npm dependencies', () => ensureNodeModules(root));
  let databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) {
    await step('MariaDB package', () => ensureMariadbInstalled());
    const started = await step(`MariaDB on 127.0.0.1:${dbPort}`, () =>
      startServer({ dir: dataDir, port: dbPort }),
    );
    mariadb = started.child;
    databaseUrl = ensureDatabase({
      dir: dataDir,
      socket: started.socket,
      port: dbPort,
      database: 'seedwake',
    });
  }
  const env = { ...process.env, DATABASE_URL: databaseUrl, PORT: String(port), SEEDWAKE_DATA_DIR: dataDir };
  const tsx = join(root, 'node_modules', '.bin', 'tsx');
  await step('migrations and demo data', () => run(tsx, ['server/scripts/prepare.ts'], { cwd: root, env }));
  // vite build ships React's development build unless NODE_ENV is production.
  if (!dev)
    await step('client build', () =>
      run(join(root, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn'], {
        cwd: root,
        env: { ...env, NODE_ENV: 'production' },
      }),
    );

  const server = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts'], {
    cwd: root,
    env: { ...env, NODE_ENV: dev ? 'development' : (process.env.NODE_ENV ?? 'local') },
    stdio: 'inherit',
  });
  children.push(server);
  server.on('exit', (code) => shutdown(code ?? 1));
  if (dev) {
    const vite = spawn(join(root, 'node_modules', '.bin', 'vite'), [], { cwd: root, env, stdio: 'inherit' });
    children.push(vite);
    vite.on('exit', (code) => shutdown(code ?? 1));
  }
} catch (err) {
  process.stderr.write(`\nSeedwake could not start: ${err.message}\n`);
  await shutdown(1);
}
