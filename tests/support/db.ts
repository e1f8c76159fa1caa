import { randomBytes } from 'node:crypto';
import mysql from 'mysql2/promise';
import { createDatabase, type Database } from '../../server/src/db/client';
import { runMigrations } from '../../server/src/db/migrate';
import { ensureCategories } from '../../server/src/seed/categories';

export const adminUrl = () => {
  const url = process.env.TEST_DB_ADMIN_URL;
  if (!url) throw new Error('TEST_DB_ADMIN_URL is not set: run the tests with `npm test`.');
  return url.replace(/\/$/, '');
};

export async function adminSql(sql: string, values: unknown[] = []) {
  const conn = await mysql.createConnection({ uri: adminUrl(), multipleStatements: true });
  try {
    const [rows] = await conn.query(sql, values);
    return rows;
  } finally {
    await conn.end();
  }
}

export interface TestDatabase extends Database {
  name: string;
  url: string;
  drop(): Promise<void>;
}

/** A fresh database with every migration applied, for one test file. */
export async function createTestDatabase(opts: { migrate?: boolean } = {}): Promise<TestDatabase> {
  const name = `t_${randomBytes(6).toString('hex')}`;
  await adminSql(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  const url = `${adminUrl()}/${name}`;
  if (opts.migrate !== false) await runMigrations(url);
  const database = createDatabase(url, 20);
  if (opts.migrate !== false) await ensureCategories(database.db);
  return {
    ...database,
    name,
    url,
    async drop() {
      await database.close();
      await adminSql(`DROP DATABASE IF EXISTS \`${name}\``);
    },
  };
}
