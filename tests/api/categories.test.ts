import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { categoryId, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

let db: TestDatabase;
let server: RunningServer;
let admin: Agent;
let kettle: number;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  const a = await makeUser(db.db, { admin: true });
  admin = new Agent(server.url);
  await admin.login(a.email, a.password);
  kettle = await categoryId(db.db, 'kettle');
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

describe('an admin editing a kind of item', () => {
  it('takes a weight and a factor typed with a decimal comma, as the form sends them', async () => {
    const res = await admin.send('PATCH', `/api/categories/${kettle}`, {
      avgWeightKg: '1,95',
      co2ePerKg: '5,5',
      co2eSource: 'A test source',
      repairMinutes: '40',
    });
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({
      avgWeightKg: 1.95,
      co2ePerKg: 5.5,
      co2eSource: 'A test source',
      repairMinutes: 40,
    });
    const list = await new Agent(server.url).get('/api/categories');
    expect(list.json.find((c: { id: number }) => c.id === kettle)).toMatchObject({ avgWeightKg: 1.95, co2ePerKg: 5.5 });
  });

  it('answers a factor without its source, and a weight of nothing, with both fields named, and keeps the old values', async () => {
    const before = (await new Agent(server.url).get('/api/categories')).json.find(
      (c: { id: number }) => c.id === kettle,
    );
    const res = await admin.send('PATCH', `/api/categories/${kettle}`, {
      avgWeightKg: '0',
      co2ePerKg: 2,
      co2eSource: '',
    });
    expect(res.status).toBe(400);
    expect(res.json.error.fields).toMatchObject({
      avgWeightKg: 'Weight must be above zero.',
      co2eSource: 'Name the source of the factor.',
    });
    const after = (await new Agent(server.url).get('/api/categories')).json.find(
      (c: { id: number }) => c.id === kettle,
    );
    expect(after).toEqual(before);
  });

  it('clears a factor with an empty field, which needs no source', async () => {
    const res = await admin.send('PATCH', `/api/categories/${kettle}`, { co2ePerKg: '', co2eSource: '' });
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ co2ePerKg: null, co2eSource: null });
  });

  it('answers 404 for a kind that does not exist', async () => {
    expect((await admin.send('PATCH', '/api/categories/999999', { repairMinutes: 30 })).status).toBe(404);
  });
});
