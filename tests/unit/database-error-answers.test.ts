import express from 'express';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorHandler } from '../../server/src/http/errors';

/**
 * What the error handler answers for the database's own failures, as Drizzle hands them on (the driver's error as the
 * cause). Error numbers are MariaDB's (ER_LOCK_DEADLOCK 1213, ER_LOCK_WAIT_TIMEOUT 1205, ER_UNKNOWN_COM_ERROR 1047,
 * which a Galera node that is not ready answers, ER_ERROR_DURING_COMMIT 1180); the closed-connection message is mysql2's.
 */
const wrapped = (cause: object) => Object.assign(new Error('Failed query: …'), { cause });
const cases: [string, Error, number, string][] = [
  ['a deadlock left after the retries', wrapped({ code: 'ER_LOCK_DEADLOCK', errno: 1213 }), 503, 'busy'],
  ['a lock-wait timeout', wrapped({ code: 'ER_LOCK_WAIT_TIMEOUT', errno: 1205 }), 503, 'busy'],
  ['a Galera node not ready for queries', wrapped({ code: 'ER_UNKNOWN_COM_ERROR', errno: 1047 }), 503, 'unavailable'],
  [
    'a commit a Galera node could not replicate (seen in npm run test:cluster when the writing node was killed)',
    wrapped({ code: 'ER_ERROR_DURING_COMMIT', errno: 1180 }),
    503,
    'unavailable',
  ],
  [
    'a rollback on a connection that closed under the transaction',
    wrapped(new Error("Can't add new command when connection is in closed state")),
    503,
    'unavailable',
  ],
  ['a lost connection', wrapped({ code: 'PROTOCOL_CONNECTION_LOST' }), 503, 'unavailable'],
  ['anything else', new Error('boom'), 500, 'internal'],
];

let url = '';
let close = () => {};
beforeAll(async () => {
  const app = express();
  cases.forEach(([, err], i) =>
    app.get(`/${i}`, () => {
      throw err;
    }),
  );
  app.use(errorHandler(() => {}));
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  close = () => server.close();
});
afterAll(() => close());

describe('database failures answer 503 with Retry-After, never 500', () => {
  cases.forEach(([name, , status, code], i) =>
    it(`${name}: ${status} ${code}`, async () => {
      const r = await fetch(`${url}/${i}`);
      expect(r.status).toBe(status);
      expect(((await r.json()) as { error: { code: string } }).error.code).toBe(code);
      if (status === 503) expect(Number(r.headers.get('retry-after'))).toBeGreaterThan(0);
    }),
  );
});
