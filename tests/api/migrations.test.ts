import { getTableConfig } from 'drizzle-orm/mysql-core';
import { isTable } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import * as schema from '../../server/src/db/schema/index';
import { runMigrations } from '../../server/src/db/migrate';
import { adminSql, createTestDatabase } from '../support/db';

describe('migrations', () => {
  it('apply to an empty database, create every table of the schema, and a second run changes nothing', async () => {
    const db = await createTestDatabase({ migrate: false });
    try {
      const tables = async () =>
        (
          (await adminSql('SELECT table_name AS t FROM information_schema.tables WHERE table_schema = ? ORDER BY 1', [
            db.name,
          ])) as { t: string }[]
        ).map((r) => r.t);
      expect(await tables()).toEqual([]);
      await runMigrations(db.url);
      const expected = Object.values(schema)
        .filter((t) => isTable(t))
        .map((t) => getTableConfig(t as never).name);
      expect((await tables()).sort()).toEqual([...expected, '__drizzle_migrations'].sort());
      const applied = await adminSql(`SELECT COUNT(*) AS n FROM \`${db.name}\`.__drizzle_migrations`);
      await runMigrations(db.url);
      expect(await adminSql(`SELECT COUNT(*) AS n FROM \`${db.name}\`.__drizzle_migrations`)).toEqual(applied);
    } finally {
      await db.drop();
    }
  });

  it('store text as utf8mb4, so names like Łucja Ødegård and an emoji survive', async () => {
    const db = await createTestDatabase();
    try {
      const { repairGroups } = schema;
      await db.db.insert(repairGroups).values({ name: 'Łucja Ødegård 🔧', slug: 'lo', town: 'Ærø', description: '' });
      const [row] = await db.db.select().from(repairGroups);
      expect(row.name).toBe('Łucja Ødegård 🔧');
    } finally {
      await db.drop();
    }
  });
});
