import { drizzle, type MySql2Database } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from './schema/index';
import { guardPool, type DbTimeouts } from './timeouts';

export type Db = MySql2Database<typeof schema>;
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type DbOrTx = Db | Tx;

export interface Database {
  pool: mysql.Pool;
  db: Db;
  close(): Promise<void>;
}

/** A pool and its Drizzle handle. The app passes timeouts (db/timeouts.ts); scripts that run long statements do not. */
export function createDatabase(url: string, poolSize = 10, timeouts?: DbTimeouts): Database {
  const pool = mysql.createPool({
    uri: url,
    connectionLimit: poolSize,
    waitForConnections: true,
    timezone: 'Z',
    dateStrings: false,
    charset: 'utf8mb4_unicode_ci',
    enableKeepAlive: true,
    // The app's pool does not capture a stack trace at every statement (mysql2's `trace`): on a busy booking it was
    // a twentieth of the CPU. A failed statement's error still names the statement and the server's message.
    ...(timeouts ? { trace: false } : {}),
    ...(timeouts ? { connectTimeout: timeouts.connectMs } : {}),
  });
  const guard = timeouts ? guardPool(pool, timeouts) : null;
  // Every connection works in UTC, whatever the server's zone.
  pool.on('connection', (conn) => {
    const limit = guard?.onConnection(conn);
    conn.query(`SET time_zone = '+00:00'${limit ? `, ${limit}` : ''}`);
  });
  const db = drizzle(pool, { schema, mode: 'default' });
  return { pool, db, close: () => pool.end() };
}
