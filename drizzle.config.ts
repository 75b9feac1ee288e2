import { defineConfig } from 'drizzle-kit';

// `npm run db:generate` writes SQL migrations into drizzle/ from the schema files.
export default defineConfig({
  dialect: 'mysql',
  schema: './server/db/schema*.ts',
  out: './drizzle',
  dbCredentials: { url: process.env.DATABASE_URL ?? 'mysql://seedwake@127.0.0.1:5181/seedwake' },
});
