import express from 'express';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { errorHandler } from '../../server/src/http/errors';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

describe('HTTP basics', () => {
  it('reports health once the database answers, without naming its version', async () => {
    const r = await new Agent(server.url).get('/api/health');
    expect(r.status).toBe(200);
    expect(r.json).toEqual({ ok: true });
  });

  it('answers errors in one shape: unknown route, bad JSON, too large, invalid fields', async () => {
    const a = new Agent(server.url);
    const missing = await a.get('/api/no-such-thing');
    expect(missing.status).toBe(404);
    expect(missing.json).toEqual({ error: { code: 'not-found', message: expect.any(String) } });

    const token = await a.token();
    const bad = await a.raw('POST', '/api/auth/login', { rawBody: '{"email":', headers: { 'x-csrf-token': token } });
    expect(bad.status).toBe(400);
    expect(bad.json.error.code).toBe('bad-json');

    const big = await a.raw('POST', '/api/auth/login', {
      rawBody: JSON.stringify({ email: 'a@b.c', password: 'x'.repeat(200_000) }),
      headers: { 'x-csrf-token': token },
    });
    expect(big.status).toBe(413);
    expect(big.json.error.code).toBe('too-large');

    const invalid = await a.post('/api/auth/login', { email: 'not-an-address' });
    expect(invalid.status).toBe(400);
    expect(invalid.json.error).toEqual({
      code: 'invalid',
      message: expect.any(String),
      fields: { email: expect.any(String), password: expect.any(String) },
    });
  });

  it('sends security headers and no X-Powered-By', async () => {
    const r = await new Agent(server.url).get('/api/health');
    expect(r.headers.get('content-security-policy')).toContain("default-src 'self'");
    expect(r.headers.get('x-content-type-options')).toBe('nosniff');
    expect(r.headers.get('x-frame-options')).toBe('SAMEORIGIN');
    expect(r.headers.get('x-powered-by')).toBeNull();
  });

  it('creates no session for public reads', async () => {
    const a = new Agent(server.url);
    await a.get('/api/public/groups');
    await a.get('/api/health');
    expect(a.cookies.size).toBe(0);
  });

  it('answers an unexpected failure with a generic 500, and logs the detail', async () => {
    const logged: string[] = [];
    const app = express();
    app.get('/boom', () => {
      throw new Error('secret table name leaked');
    });
    app.use(errorHandler((msg, err) => logged.push(`${msg}: ${(err as Error).message}`)));
    const s = app.listen(0, '127.0.0.1');
    await new Promise((r) => s.once('listening', r));
    try {
      const r = await new Agent(`http://127.0.0.1:${(s.address() as AddressInfo).port}`).get('/boom');
      expect(r.status).toBe(500);
      expect(r.json).toEqual({
        error: { code: 'internal', message: 'Something went wrong on our side. It has been logged.' },
      });
      expect(r.text).not.toContain('secret');
      expect(logged).toEqual(['unhandled error on GET /boom: secret table name leaked']);
    } finally {
      s.close();
    }
  });
});
