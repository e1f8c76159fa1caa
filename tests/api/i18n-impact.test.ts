import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UNU } from '../../shared/categories/seed-type';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/**
 * The impact method and the problems of a file brought in, in the reader's language (issue 16). Our sentences are
 * translated; a publication's title inside them stays as published; English reads as before.
 */
let db: TestDatabase;
let server: RunningServer;
let groupId: number;
const as: Record<string, Agent> = {};

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  groupId = await makeGroup(db.db);
  const organiser = await makeUser(db.db, { roles: [[groupId, 'organiser']] });
  for (const lang of ['en', 'de', 'nl', 'fr']) {
    as[lang] = new Agent(server.url, { 'accept-language': lang });
    expect((await as[lang].login(organiser.email, organiser.password)).status).toBe(200);
  }
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

type Kind = { name: string; weightSource: string; weightSourceForReaders: string; co2eSource: string | null };
const kind = (method: { categories: Kind[] }, name: string) => method.categories.find((c) => c.name === name)!;

describe('the method in the reader’s language', () => {
  it('gives the method’s lines, the displacement note and the sources in German, titles as published', async () => {
    const de = await as.de.get('/api/stats/method');
    expect(de.status).toBe(200);
    expect(de.headers.get('vary')).toMatch(/Accept-Language/i);
    expect(de.json.text[0]).toMatch(/^Gegenstände: jeder Gegenstand, der am Empfang angekommen ist\./);
    expect(de.json.text[2]).toContain('× Ersetzungsfaktor (0,5).');
    expect(de.json.displacementNote).toMatch(/^Der Anteil der Reparaturen.*von 0,5 aus/);
    expect(de.json.displacementSource).toContain('„Circular economy rebound“, Journal of Industrial Ecology, 2017');
    expect(de.json.factorSource).toBe(
      'aus den UK Government GHG conversion factors, „material use“, primary production (Sekundärquelle)',
    );
    const kettle = kind(de.json, 'Wasserkocher');
    expect(kettle.weightSource).toBe(
      'Durchschnittsgewicht für UNU-KEY 0203 aus dem E-Waste-Datensatz von Statistics Netherlands (2020)',
    );
    expect(kettle.co2eSource).toMatch(/^Electrical items, small: aus den UK Government GHG conversion factors/);
    expect(kind(de.json, 'Spielzeug ohne Strom').weightSourceForReaders).toMatch(
      /^Schätzung: ein übliches Gewicht, keine veröffentlichte Zahl; gleichgesetzt mit UNU-KEY 0701/,
    );
  });

  it('reads as before in English', async () => {
    const en = (await as.en.get('/api/stats/method')).json;
    expect(en.text[3]).toBe('Fix rate: items fixed ÷ items with a recorded outcome.');
    expect(kind(en, 'Kettle').weightSource).toBe(UNU('0203'));
    expect(kind(en, 'Clothing').weightSourceForReaders).toMatch(/^Estimate: a typical weight, not a published figure;/);
  });

  it('says the public page’s method in French, and a range report’s title in Dutch', async () => {
    const fr = await as.fr.get(`/api/public/impact?groupId=${groupId}`);
    expect(fr.status).toBe(200);
    expect(fr.json.method.text[3]).toBe('Taux de réparation : objets réparés ÷ objets dont le résultat est noté.');
    const nl = await as.nl.get(`/api/groups/${groupId}/report`);
    expect(nl.json.event.title).toMatch(/: 0 reparatiemomenten$/);
  });
});

describe('a file’s problems in the reader’s language', () => {
  const HEADER = 'id,data_provider,product_category,product_category_id,repair_status,group_identifier,event_date';

  it('refuses a file that is no CSV, and one over 30 MB, in German', async () => {
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
    const a = await as.de.upload('/api/imports', { groupId: String(groupId) }, png);
    expect(a.status).toBe(400);
    expect(a.json.error.message).toBe(
      'Diese Datei ist keine CSV-Datei. Speichern Sie die Tabelle als CSV und versuchen Sie es noch einmal.',
    );
    // The server answers before the whole body is sent, and may close the socket under the sender: try again then.
    const sendBig = () => as.de.upload('/api/imports', { groupId: String(groupId) }, 'x'.repeat(31 * 1024 * 1024));
    const big = await sendBig().catch(sendBig).catch(sendBig);
    expect(big.status).toBe(413);
    expect(big.json.error.message).toBe('Eine Datei darf höchstens 30 MB groß sein.');
  });

  it('names the columns a French file lacks in French, keeping the standard’s column names', async () => {
    const plain = await as.fr.upload('/api/imports', { groupId: String(groupId) }, 'name,when\nx,y\n');
    expect(plain.status).toBe(400);
    expect(plain.json.error.fields.file).toBe(
      'Associez une colonne à chacun de ces champs : id, repair_status, event_date.',
    );
    const empty = await as.fr.upload('/api/imports', { groupId: String(groupId) }, `${HEADER}\n`);
    expect(empty.json.error.message).toBe('Ce fichier a une ligne d’en-tête, mais aucune fiche.');
  });

  it('gives each refused row its code, field, row and value, for the screen to word', async () => {
    const csv = [
      HEADER,
      'de-1,Test,Kettle,14,Mended,g,2024-03-09',
      'de-2,Test,Kettle,14,Fixed,g,09.03.2024',
      'de-3,Test,Kettle,14,Fixed,g,2024-03-09',
    ].join('\n');
    const r = await as.de.upload('/api/imports', { groupId: String(groupId) }, csv);
    expect(r.status).toBe(202);
    let job = (await as.de.get(`/api/imports/${r.json.id}`)).json;
    for (let i = 0; i < 200 && !['done', 'failed'].includes(job.status); i++) {
      await new Promise((res) => setTimeout(res, 50));
      job = (await as.de.get(`/api/imports/${r.json.id}`)).json;
    }
    expect(job.errors).toEqual([
      {
        row: 2,
        field: 'repair_status',
        code: 'unknownStatus',
        value: 'Mended',
        message: '"Mended" is not a repair status we know.',
      },
      {
        row: 3,
        field: 'event_date',
        code: 'notDate',
        value: '09.03.2024',
        message: '"09.03.2024" is not a date written as YYYY-MM-DD.',
      },
    ]);
    // The record brought in, as the records behind a figure show it: its kind and outcome in German.
    const rows = (await as.de.get(`/api/stats/records?groupId=${groupId}`)).json.records;
    expect(rows.map((x: { categoryName: string; outcomeLabel: string }) => [x.categoryName, x.outcomeLabel])).toEqual([
      ['Wasserkocher', 'Repariert'],
    ]);
  });
});
