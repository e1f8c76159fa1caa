import { drizzle, type MySql2Database } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from './schema/index';

export type Db = MySql2Database<typeof schema>;
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type DbOrTx = Db | Tx;

export interface Database {
  pool: mysql.Pool;
  db: Db;
  close(): Promise<void>;
}

export function createDatabase(url: string, poolSize = 10): Database {
  const pool = mysql.createPool({
    uri: url,
    connectionLimit: poolSize,
    waitForConnections: true,
    timezone: 'Z',
    dateStrings: false,
    charset: 'utf8mb4_unicode_ci',
    enableKeepAlive: true,
  });
  // Every connection works in UTC, whatever the server's zone.
  pool.on('connection', (conn) => {
    conn.query("SET time_zone = '+00:00'");
  });
  const db = drizzle(pool, { schema, mode: 'default' });
  return { pool, db, close: () => pool.end() };
}
