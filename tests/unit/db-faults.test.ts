import { describe, expect, it } from 'vitest';
import { restartDelayMs } from '../../server/src/infra/mariadb';
import { logReason } from '../../server/src/db/log-reason';
import { databaseUnavailable } from '../../server/src/http/errors';

describe('restart waits of the supervised MariaDB', () => {
  it('double from 0.5 s and stop at 30 s', () => {
    // Capped exponential backoff, sleep = min(cap, base * 2^attempt): AWS Architecture Blog, "Exponential Backoff
    // And Jitter" (M. Brooker, 2015), with base 0.5 s and cap 30 s as issue 14 asks.
    expect([0, 1, 2, 3, 4, 5, 6, 7].map(restartDelayMs)).toEqual([500, 1000, 2000, 4000, 8000, 16_000, 30_000, 30_000]);
    // Same source: the cap holds however many attempts came before.
    expect(restartDelayMs(1000)).toBe(30_000);
  });
});

describe('which errors mean the database is unavailable', () => {
  // mysql2's own error codes and messages (node_modules/mysql2/lib), as Drizzle wraps them in `cause`.
  const wrapped = (cause: object) => Object.assign(new Error('Failed query: select 1'), { cause });
  it('reads the code or message through wrapped causes', () => {
    expect(databaseUnavailable(wrapped({ code: 'ECONNREFUSED' }))).toBe(true);
    expect(databaseUnavailable(wrapped(wrapped({ code: 'PROTOCOL_CONNECTION_LOST' })))).toBe(true);
    expect(databaseUnavailable(wrapped({ code: 'POOL_ACQUIRE_TIMEOUT' }))).toBe(true);
    // MariaDB knowledge base, "Aborting Statements that Exceed a Certain Time to Execute": error 1969, which mysql2
    // gives without a code (seen in tests/api/db-supervision.test.ts).
    expect(
      databaseUnavailable(
        wrapped({ errno: 1969, message: 'Query execution was interrupted (max_statement_time exceeded)' }),
      ),
    ).toBe(true);
    expect(databaseUnavailable(new Error('Pool is closed.'))).toBe(true);
    expect(databaseUnavailable(wrapped(new Error("Can't add new command when connection is in closed state")))).toBe(
      true,
    );
    expect(databaseUnavailable(wrapped({ code: 'EPIPE', fatal: true }))).toBe(true);
  });
  it('leaves statement errors and other failures alone', () => {
    expect(databaseUnavailable(wrapped({ code: 'ER_DUP_ENTRY', fatal: false }))).toBe(false);
    expect(databaseUnavailable(wrapped({ code: 'ER_PARSE_ERROR' }))).toBe(false);
    expect(databaseUnavailable(new TypeError('x is not a function'))).toBe(false);
    expect(databaseUnavailable(null)).toBe(false);
  });
  it('logs the innermost reason on one line, without the statement and its values', () => {
    const driver = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:3307'), { code: 'ECONNREFUSED' });
    const orm = Object.assign(new Error('Failed query: insert into `bookings` ...\nparams: visitor@example.org'), {
      cause: driver,
    });
    expect(logReason(orm)).toBe('connect ECONNREFUSED 127.0.0.1:3307');
    const timeout = Object.assign(new Error('Query execution was interrupted (max_statement_time exceeded)'), {
      errno: 1969,
    });
    expect(logReason(wrapped(timeout))).toBe('Query execution was interrupted (max_statement_time exceeded)');
    expect(
      logReason(
        wrapped({ code: 'POOL_ACQUIRE_TIMEOUT', message: 'No database connection became free within 10000 ms.' }),
      ),
    ).toBe('No database connection became free within 10000 ms. (POOL_ACQUIRE_TIMEOUT)');
  });
});

describe('logs of background work', () => {
  it('name a failed job and its reason, never the statement’s values', async () => {
    const { Scheduler } = await import('../../server/src/jobs/scheduler');
    const lines: string[] = [];
    const failing = Object.assign(
      new Error('Failed query: update `bookings` set `email` = ? where `id` = ?\nparams: visitor@example.org,7'),
      {
        cause: Object.assign(new Error('Connection lost: The server closed the connection.'), {
          code: 'PROTOCOL_CONNECTION_LOST',
        }),
      },
    );
    const ctx = { log: (line: string) => lines.push(line) } as never;
    await new Scheduler(ctx, [
      { name: 'day-before reminders', run: async () => Promise.reject(failing) } as never,
    ]).tick();
    expect(lines).toEqual([
      'scheduled job "day-before reminders" failed: Connection lost: The server closed the connection. (PROTOCOL_CONNECTION_LOST)',
    ]);
    expect(lines.join('')).not.toContain('example.org');
  });
});
