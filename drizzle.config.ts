import { defineConfig } from 'drizzle-kit';

// Only `drizzle-kit generate` and `check` are used: push/pull misbehave on MariaDB.
export default defineConfig({
  dialect: 'mysql',
  schema: './server/src/db/schema/index.ts',
  out: './drizzle',
  dbCredentials: { url: process.env.MIGRATE_DATABASE_URL ?? 'mysql://unused@127.0.0.1:3307/mendery' },
});
