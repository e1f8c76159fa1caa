import type { EventEmitter } from 'node:events';
import type { Socket } from 'node:net';
import type { Pool } from 'mysql2/promise';

/**
 * Bounds on how long a request may wait for the database, so a frozen or unreachable server gives a quick 503
 * instead of a hung request.
 *
 * - `connectMs`: mysql2's connectTimeout, for a new connection's handshake.
 * - `acquireMs`: how long a caller waits for a free pooled connection (mysql2 has no such bound of its own).
 * - `queryMs`: a statement's deadline, kept on both sides. MariaDB's `max_statement_time` ends a slow statement on
 *   the server and leaves the connection usable; it cannot help when the server is frozen or the network is gone,
 *   so a client-side watchdog closes the connection a moment later (mysql2's own per-query `timeout` leaves the
 *   connection busy with the unanswered statement, and Drizzle cannot pass it anyway).
 */
export interface DbTimeouts {
  connectMs: number;
  acquireMs: number;
  queryMs: number;
}

/** The error code a caller sees when no pooled connection became free in time. */
export const ACQUIRE_TIMEOUT = 'POOL_ACQUIRE_TIMEOUT';
/** The error code a statement gets when the client-side watchdog closed its connection. */
export const QUERY_TIMEOUT = 'PROTOCOL_SEQUENCE_TIMEOUT';

/** Client-side slack over the server's own statement timer, so the server's clean error normally comes first. */
const WATCHDOG_SLACK_MS = 1000;

interface CoreConnection extends EventEmitter {
  stream: Socket;
  query: (...args: unknown[]) => EventEmitter;
  execute: (...args: unknown[]) => EventEmitter;
  release(): void;
}
type ConnectionCallback = (err: Error | null, conn?: CoreConnection) => void;
interface CorePool {
  getConnection(cb: ConnectionCallback): void;
}

function timeoutError(message: string, code: string): Error {
  return Object.assign(new Error(message), { code, fatal: true });
}

/** Wraps one pooled connection's query and execute with the watchdog. */
function watchConnection(conn: CoreConnection, ms: number) {
  for (const method of ['query', 'execute'] as const) {
    const original = conn[method].bind(conn);
    conn[method] = (...args: unknown[]) => {
      const timer = setTimeout(() => {
        // Destroying the socket with an error fails the waiting statement and drops the connection from the pool.
        conn.stream.destroy(timeoutError(`The database did not answer within ${ms} ms.`, QUERY_TIMEOUT));
      }, ms);
      timer.unref();
      const command = original(...args);
      // 'end' follows every answer, errors included; after a lost connection the timer meets a closed socket.
      command.once('end', () => clearTimeout(timer));
      return command;
    };
  }
}

/** Adds the acquire bound to a pool; call once, right after creating it. Returns the per-connection setup. */
export function guardPool(pool: Pool, t: DbTimeouts): { onConnection(conn: unknown): string | null } {
  const core = (pool as unknown as { pool: CorePool }).pool;
  const getConnection = core.getConnection.bind(core);
  core.getConnection = (cb: ConnectionCallback) => {
    let settled = false;
    const timer = setTimeout(() => {
      settled = true;
      cb(timeoutError(`No database connection became free within ${t.acquireMs} ms.`, ACQUIRE_TIMEOUT));
    }, t.acquireMs);
    timer.unref();
    getConnection((err, conn) => {
      if (settled) {
        // The caller has given up: hand a late connection straight back.
        if (!err && conn) conn.release();
        return;
      }
      settled = true;
      clearTimeout(timer);
      cb(err, conn);
    });
  };
  return {
    onConnection(conn: unknown) {
      watchConnection(conn as CoreConnection, t.queryMs + WATCHDOG_SLACK_MS);
      return `max_statement_time = ${(t.queryMs / 1000).toFixed(3)}`;
    },
  };
}

/** Rejects with a timeout error when `work` has not settled within `ms`; a later failure of `work` is ignored. */
export function withDeadline<T>(work: Promise<T>, ms: number): Promise<T> {
  work.catch(() => {});
  let timer: NodeJS.Timeout | undefined;
  const deadline = new Promise<never>((_resolve, reject) => {
    timer = setTimeout(() => reject(timeoutError(`The database did not answer within ${ms} ms.`, QUERY_TIMEOUT)), ms);
  });
  return Promise.race([work, deadline]).finally(() => clearTimeout(timer));
}
