import { bigint, datetime } from 'drizzle-orm/mysql-core';
import { sql } from 'drizzle-orm';

/** `serial()` emits SQL MariaDB rejects; this is the id column every table uses. */
export const id = () => bigint('id', { mode: 'number', unsigned: true }).autoincrement().primaryKey();
export const ref = (name: string) => bigint(name, { mode: 'number', unsigned: true });
export const createdAt = () =>
  datetime('created_at', { mode: 'date', fsp: 3 })
    .notNull()
    .default(sql`CURRENT_TIMESTAMP(3)`);
export const timestamp3 = (name: string) => datetime(name, { mode: 'date', fsp: 3 });
