import { runMigrations } from '../src/db/migrate';

/** `npm run db:migrate`: applies the committed migrations to MIGRATE_DATABASE_URL (a user with DDL rights). */
const url = process.env.MIGRATE_DATABASE_URL ?? process.env.DATABASE_URL;
if (!url) {
  console.error('Set MIGRATE_DATABASE_URL (or DATABASE_URL) to the database to migrate.');
  process.exit(2);
}
await runMigrations(url);
console.log('Migrations applied.');
process.exit(0);
