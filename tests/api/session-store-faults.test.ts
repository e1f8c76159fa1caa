import http from 'node:http';
import type { AddressInfo } from 'node:net';
import express from 'express';
import mysql from 'mysql2/promise';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sessionMiddleware } from '../../server/src/auth/session';
import { loadEnv } from '../../server/src/config/env';
import { errorHandler } from '../../server/src/http/errors';
import { TEST_SECRET } from '../support/server';

/**
 * The session store fails because the database is away. Nothing listens on port 1, so every query is refused at once.
 */
const env = loadEnv({ NODE_ENV: 'test', DATABASE_URL: 'mysql://u:p@127.0.0.1:1/none', SESSION_SECRET: TEST_SECRET });
const refused = () => Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:1'), { code: 'ECONNREFUSED' });
let pool: mysql.Pool;

beforeAll(() => {
  pool = mysql.createPool({ uri: env.dbUrl, connectTimeout: 1000 });
});
afterAll(async () => {
  await pool.end();
});

describe('the session store while the database is away', () => {
  it("does not reject its timer's clearing of expired sessions (a rejection there would end the process)", async () => {
    const { store } = sessionMiddleware(env, pool);
    try {
      const timed = store as unknown as { clearExpiredSessions(): Promise<void> };
      await expect(timed.clearExpiredSessions()).resolves.toBeUndefined();
    } finally {
      await store.close();
    }
  });

  it('keeps the connection alive when the session cannot be touched after a 503 has been sent', async () => {
    const lines: string[] = [];
    const { middleware, store } = sessionMiddleware(env, pool, (l) => lines.push(l));
    // The session itself is read and written in memory; only touching it (as every answer does) fails.
    const rows = new Map<string, unknown>();
    const s = store as unknown as Record<string, (...a: any[]) => void>;
    s.get = (sid: string, cb: (e: unknown, v?: unknown) => void) => cb(null, rows.get(sid));
    s.set = (sid: string, sess: unknown, cb: (e?: unknown) => void) => (rows.set(sid, sess), cb());
    s.touch = (_sid: string, _sess: unknown, cb: (e?: unknown) => void) => setImmediate(() => cb(refused()));
    const app = express();
    const api = express.Router();
    api.use(middleware);
    api.post('/start', (req, res) => {
      req.session.userId = 1;
      res.json({ ok: true });
    });
    api.get('/busy', () => {
      throw Object.assign(new Error('Failed query: select 1'), { cause: refused() });
    });
    app.use('/api', api);
    app.use(errorHandler(() => {}));
    const server = app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    let connections = 0;
    server.on('connection', () => connections++);
    const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
    const port = (server.address() as AddressInfo).port;
    const request = (method: string, path: string, cookie = '') =>
      new Promise<{ status: number; body: string; cookie: string }>((resolve, reject) => {
        const req = http.request({ port, host: '127.0.0.1', method, path, agent, headers: { cookie } }, (res) => {
          let body = '';
          res.on('data', (c) => (body += c));
          res.on('end', () =>
            resolve({ status: res.statusCode!, body, cookie: (res.headers['set-cookie'] ?? [''])[0].split(';')[0] }),
          );
          res.on('error', reject);
        });
        req.on('error', reject);
        req.end();
      });
    try {
      const { cookie } = await request('POST', '/api/start');
      expect(cookie).toMatch(/^mendery\.sid=/);
      const answers: string[] = [];
      for (let i = 0; i < 5; i++) {
        const r = await request('GET', '/api/busy', cookie).catch((e: Error) => ({ status: 0, body: e.message }));
        answers.push(`${r.status} ${r.body.slice(0, 40)}`);
        await new Promise((r) => setTimeout(r, 20));
      }
      expect(
        answers.every((a) => a.startsWith('503 {"error":{"code":"unavailable"')),
        answers.join('\n'),
      ).toBe(true);
      // One keep-alive connection served the sign-in and all five answers: none was cut.
      expect(connections).toBe(1);
      expect(lines.filter((l) => l.startsWith('session store failed after the answer to GET /api/busy'))).toHaveLength(
        5,
      );
    } finally {
      agent.destroy();
      server.close();
      await store.close();
    }
  });
});
