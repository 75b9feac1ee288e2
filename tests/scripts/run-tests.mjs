// `npm test`: the same bootstrap as `npm start` for a throwaway MariaDB (own folder, own
// port), then typecheck, lint, client build, and every vitest project. The test MariaDB
// is stopped afterwards even when something fails. Plain Node: runs before npm ci.
import { existsSync, readFileSync, mkdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { ensureNodeModules } from '../../server/scripts/lib/deps.mjs';
import {
  ensureDatabase,
  ensureMariadbInstalled,
  startServer,
  stopServer,
  wipe,
} from '../../server/scripts/lib/mariadb.mjs';
import { ensureDebianPackage, run, step } from '../../server/scripts/lib/steps.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const dir = resolve(root, process.env.SEEDWAKE_TEST_DIR ?? '.test-data');
const outDir = join(root, 'test-output');
const dbPort = Number(process.env.SEEDWAKE_TEST_DB_PORT ?? 5191);
const bin = (name) => join(root, 'node_modules', '.bin', name);
const only = process.argv.slice(2); // e.g. `npm test -- tests/server/api` passes paths to vitest

let mariadb = null;
let code = 0;
try {
  await step('npm dependencies', () => ensureNodeModules(root));
  await step('MariaDB, Chromium and poppler packages', () => {
    ensureMariadbInstalled();
    ensureDebianPackage('chromium', 'chromium');
    ensureDebianPackage('pdftoppm', 'poppler-utils');
  });
  wipe(dir);
  mkdirSync(outDir, { recursive: true });
  const started = await step(`test MariaDB on 127.0.0.1:${dbPort}`, () => startServer({ dir, port: dbPort }));
  mariadb = started.child;
  const databaseUrl = ensureDatabase({
    dir,
    socket: started.socket,
    port: dbPort,
    database: 'seedwake_test',
  });
  const env = {
    ...process.env,
    DATABASE_URL: databaseUrl,
    SEEDWAKE_DATA_DIR: dir,
    SESSION_SECRET: 'test-secret-not-for-production-use',
    LOG_LEVEL: 'silent',
    NODE_ENV: 'test',
  };
  await step('migrations and demo data', () =>
    run(bin('tsx'), ['server/scripts/prepare.ts'], { cwd: root, env }),
  );
  if (!only.length) {
    await step('typecheck', () => run(bin('tsc'), ['-p', 'tsconfig.json', '--noEmit'], { cwd: root }));
    await step('lint', () => run(bin('eslint'), ['-c', 'tests/lint/eslint.config.js', '.'], { cwd: root }));
  }
  // vite build ships React's development build unless NODE_ENV is production.
  if (!only.length || only.some((p) => p.includes('browser')))
    await step('client build', () =>
      run(bin('vite'), ['build', '--logLevel', 'warn'], {
        cwd: root,
        env: { ...env, NODE_ENV: 'production' },
      }),
    );
  const report = join(outDir, 'vitest.json');
  await step('vitest (unit, api, browser)', () =>
    run(
      bin('vitest'),
      ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...only],
      { cwd: root, env },
    ),
  ).catch((err) => {
    code = 1;
    process.stderr.write(`${err.message}\n`);
  });
  if (existsSync(report)) {
    const r = JSON.parse(readFileSync(report, 'utf8'));
    process.stdout.write(`\ntests: ${r.numPassedTests} passed, ${r.numFailedTests} failed\n`);
    if (r.numFailedTests > 0 || r.numTotalTests === 0) code = 1;
  } else code = 1;
} catch (err) {
  process.stderr.write(`\nnpm test stopped: ${err.message}\n`);
  code = 1;
} finally {
  if (mariadb) await stopServer(mariadb);
}
process.exit(code);
