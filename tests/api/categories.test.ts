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

describe('the kinds of item in the reader’s language', () => {
  type Named = { slug: string; name: string; refusal: { reason: string; suggestion: string } | null };
  const list = async (acceptLanguage: string) =>
    new Agent(server.url, { 'accept-language': acceptLanguage }).get('/api/categories');
  const bySlug = (rows: Named[], slug: string) => rows.find((c) => c.slug === slug)!;

  it('names the seeded kinds and their refusal reasons in German and French, and says the answer varies by language', async () => {
    const de = await list('de-AT,de;q=0.9');
    expect(de.status).toBe(200);
    expect(de.headers.get('vary') ?? '').toMatch(/accept-language/i);
    // Everyday German and French names for the appliance, from memory (no outside table needed for a word).
    expect(bySlug(de.json, 'kettle').name).toBe('Wasserkocher');
    expect(bySlug(de.json, 'microwave').refusal!.reason).toMatch(/Hochspannungskondensator/);
    const fr = await list('fr');
    expect(bySlug(fr.json, 'bicycle').name).toBe('Vélo');
    expect(bySlug(fr.json, 'gas-appliance').refusal!.suggestion).toMatch(/gaz/);
    const en = await list('en-GB');
    expect(bySlug(en.json, 'kettle').name).toBe('Kettle');
  });

  it('shows an admin’s own name for a kind as typed, in every language', async () => {
    const iron = await categoryId(db.db, 'iron');
    expect((await admin.send('PATCH', `/api/categories/${iron}`, { name: 'Steam iron' })).status).toBe(200);
    expect(bySlug((await list('nl')).json, 'iron').name).toBe('Steam iron');
    expect(bySlug((await list('nl')).json, 'vacuum-cleaner').name).toBe('Stofzuiger');
  });
});
