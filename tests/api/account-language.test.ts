import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/** A signed-in person's language is kept on the account, so their next device opens in it. */
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

describe('the account’s language', () => {
  it('is none until chosen, is kept once chosen, and refuses a language Mendery does not speak', async () => {
    const u = await makeUser(db.db);
    const a = new Agent(server.url, { 'accept-language': 'de' });
    await a.login(u.email, u.password);
    expect((await a.get('/api/auth/me')).json.user.language).toBeNull();
    const bad = await a.send('PUT', '/api/auth/me/language', { language: 'pt' });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fields.language).toBe('Wählen Sie eine der aufgeführten Sprachen.');
    const ok = await a.send('PUT', '/api/auth/me/language', { language: 'nl' });
    expect(ok.status, ok.text).toBe(200);
    expect((await a.get('/api/auth/me')).json.user.language).toBe('nl');
    // Another device: a new sign-in reads the same choice.
    const other = new Agent(server.url);
    await other.login(u.email, u.password);
    expect((await other.get('/api/auth/me')).json.user.language).toBe('nl');
    expect((await new Agent(server.url).send('PUT', '/api/auth/me/language', { language: 'nl' })).status).toBe(401);
  });
});
