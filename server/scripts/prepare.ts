// Run by `npm start` before serving: apply migrations, then seed the invented demo.
import { loadConfig } from '../config';
import { createDatabase } from '../db/client';
import { applyMigrations } from '../db/migrate';
import { seedDemo } from '../db/seed/demo';

const config = loadConfig();
const { db, pool } = createDatabase(config.databaseUrl);
try {
  await applyMigrations(db);
  const report = await seedDemo(db);
  process.stdout.write(`  demo: ${report}\n`);
} finally {
  await pool.end();
}
