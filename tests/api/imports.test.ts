import { eq } from 'drizzle-orm';
import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { events, importJobs, memberships, repairGroups } from '../../server/src/db/schema/index';
import { runImports } from '../../server/src/features/impact/imports';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { startTestServer } from '../support/server';

/**
 * Bringing in earlier records (issue 15). The files below are written in the Open Repair Data Standard v0.3 and v0.2
 * columns, with its codelist texts (REFERENCE.md §5: repair_status "Fixed", "Repairable", "End of life"; barrier
 * "Spare parts not available"; product categories "Hi-Fi separates", "Kettle", "Sewing machine" and the published
 * open data's "Unpowered - Bicycle").
 */
let db: TestDatabase;
let server: RunningServer;
let groupId: number;
let otherGroup: number;
const as: Record<string, Agent> = {};

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  groupId = await makeGroup(db.db);
  otherGroup = await makeGroup(db.db);
  const people = {
    organiser: await makeUser(db.db, { roles: [[groupId, 'organiser']] }),
    fixer: await makeUser(db.db, { roles: [[groupId, 'fixer']] }),
    otherOrganiser: await makeUser(db.db, { roles: [[otherGroup, 'organiser']] }),
    admin: await makeUser(db.db, { admin: true }),
  };
  for (const [who, p] of Object.entries(people)) {
    as[who] = new Agent(server.url);
    expect((await as[who].login(p.email, p.password)).status).toBe(200);
  }
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const upload = (agent: Agent, path: string, fields: Record<string, string>, csv: string | Uint8Array<ArrayBuffer>) =>
  agent.upload(path, fields, csv);

async function finished(agent: Agent, id: number) {
  for (let i = 0; i < 200; i++) {
    const r = await agent.get(`/api/imports/${id}`);
    expect(r.status).toBe(200);
    if (r.json.status === 'done' || r.json.status === 'failed') return r.json;
    await new Promise((res) => setTimeout(res, 50));
  }
  throw new Error('the import did not finish');
}

const V03 = [
  'id,data_provider,country,partner_product_category,product_category,product_category_id,brand,year_of_manufacture,product_age,repair_status,repair_barrier_if_end_of_life,group_identifier,event_date,problem',
  'rc-101,Orrin Data,GBR,Amplifier,Hi-Fi separates,13,Lowther,1998,,Fixed,,orrin,2024-03-09,Hums on the left channel',
  'rc-102,Orrin Data,GBR,Kettle,Kettle,14,,,,End of life,Spare parts not available,orrin,2024-03-09,Element gone; ring 07700 900123',
  'rc-103,Orrin Data,GBR,Kettle,Kettle,14,,,,Mended,,orrin,2024-03-09,Lid',
  'rc-104,Orrin Data,GBR,Bike,Unpowered - Bicycle,,,,4,Repairable,,orrin,2024-04-13,Brake cable frayed',
  'rc-105,Orrin Data,GBR,Sewing machine,Sewing machine,27,,,,Fixed,,orrin,tomorrow,Skips stitches',
].join('\n');

describe('bringing in earlier records', () => {
  it('answers 202 with an id, then reports progress, the refused rows with row, field and reason, and the counts', async () => {
    const r = await upload(as.organiser, '/api/imports', { groupId: String(groupId) }, V03);
    expect(r.status).toBe(202);
    expect(r.json.id).toBeGreaterThan(0);
    const done = await finished(as.organiser, r.json.id);
    expect(done).toMatchObject({ status: 'done', kind: 'ords-0.3', total: 5, imported: 3, skipped: 0, refused: 2 });
    expect(done.errors).toEqual([
      {
        row: 4,
        field: 'repair_status',
        code: 'unknownStatus',
        value: 'Mended',
        message: '"Mended" is not a repair status we know.',
      },
      {
        row: 6,
        field: 'event_date',
        code: 'notDate',
        value: 'tomorrow',
        message: '"tomorrow" is not a date written as YYYY-MM-DD.',
      },
    ]);
    // One past session per date, closed, its thank-you marked sent (no job mails anyone about it).
    const made = await db.db.select().from(events).where(eq(events.groupId, groupId));
    expect(made.map((e) => [e.startsAt.toISOString().slice(0, 10), e.status, e.imported, !!e.thankYouSentAt])).toEqual([
      ['2024-03-09', 'closed', true, true],
      ['2024-04-13', 'closed', true, true],
    ]);
  });

  it('counts the records in the group’s figures, and gives back each record’s category on export', async () => {
    const stats = await as.organiser.get(`/api/stats?groupId=${groupId}`);
    expect(stats.status).toBe(200);
    expect(stats.json.items).toBe(3);
    expect(stats.json).toMatchObject({ fixed: 1, endOfLife: 1, partsNeeded: 1 });
    const powered = await as.organiser.get(`/api/exports/open-repair-data.csv?groupId=${groupId}`);
    const rows = parse(powered.text, { columns: true }) as Record<string, string>[];
    // "Hi-Fi separates" has no kind of its own in Mendery; the file's category comes back, with its codelist id 13.
    expect(
      rows.map((x) => [x.product_category, x.product_category_id, x.repair_status, x.repair_barrier_if_end_of_life]),
    ).toEqual([
      ['Hi-Fi separates', '13', 'Fixed', ''],
      ['Kettle', '14', 'End of life', 'Spare parts not available'],
    ]);
    expect(rows[1].problem).toBe('Element gone; ring [number]');
    const unpowered = await as.organiser.get(`/api/exports/open-repair-data-unpowered.csv?groupId=${groupId}`);
    const u = parse(unpowered.text, { columns: true }) as Record<string, string>[];
    expect(u.map((x) => [x.product_category, x.repair_status, x.product_age])).toEqual([
      ['Unpowered - Bicycle', 'Repairable', '4'],
    ]);
  });

  it('adds nothing when the same file comes again: each record is keyed on its data provider and id', async () => {
    const r = await upload(as.organiser, '/api/imports', { groupId: String(groupId) }, V03);
    const done = await finished(as.organiser, r.json.id);
    expect(done).toMatchObject({ status: 'done', imported: 0, skipped: 3, refused: 2 });
    expect((await as.organiser.get(`/api/stats?groupId=${groupId}`)).json.items).toBe(3);
  });

  it('reads a plain spreadsheet with semicolons through the columns the organiser matched, and shows a preview first', async () => {
    const sheet = 'Nummer;Datum;Ding;Ergebnis\n7;2023-11-04;Kettle;Fixed\n8;2023-11-04;Toaster;End of life\n';
    const p = await upload(as.organiser, '/api/imports/preview', {}, sheet);
    expect(p.status).toBe(200);
    expect(p.json).toMatchObject({ kind: 'plain', delimiter: ';', header: ['Nummer', 'Datum', 'Ding', 'Ergebnis'] });
    expect(p.json.rows[0]).toEqual(['7', '2023-11-04', 'Kettle', 'Fixed']);
    const unmatched = await upload(as.organiser, '/api/imports', { groupId: String(groupId) }, sheet);
    expect(unmatched.status).toBe(400);
    expect(unmatched.json.error.fields.file).toMatch(/Match a column to each of: id, repair_status, event_date/);
    const mapping = JSON.stringify({
      id: 'Nummer',
      event_date: 'Datum',
      product_category: 'Ding',
      repair_status: 'Ergebnis',
    });
    const r = await upload(as.organiser, '/api/imports', { groupId: String(groupId), mapping }, sheet);
    expect(r.status).toBe(202);
    expect(await finished(as.organiser, r.json.id)).toMatchObject({ status: 'done', kind: 'plain', imported: 2 });
    expect((await as.organiser.get(`/api/stats?groupId=${groupId}`)).json.items).toBe(5);
  });

  it('lets an admin bring in a network file, one group per group_identifier, making history-only groups', async () => {
    const [own] = await db.db.select().from(repairGroups).where(eq(repairGroups.id, otherGroup));
    const v02 = [
      'id,data_provider,country,partner_product_category,product_category,brand,year_of_manufacture,product_age,repair_status,repair_barrier_if_end_of_life,group_identifier,event_date,problem',
      `n-1,Net,NLD,,Kettle,,,,Fixed,,${own.slug},2022-05-07,`,
      'n-2,Net,NLD,,Toaster,,,,Fixed,,Repair Hub Zandvoort,2022-05-07,',
      'n-3,Net,NLD,,Toaster,,,,Fixed,,,2022-05-07,',
    ].join('\n');
    expect((await upload(as.organiser, '/api/imports', { scope: 'network' }, v02)).status).toBe(403);
    const r = await upload(as.admin, '/api/imports', { scope: 'network' }, v02);
    expect(r.status).toBe(202);
    const done = await finished(as.admin, r.json.id);
    expect(done).toMatchObject({ status: 'done', kind: 'ords-0.2', imported: 2, refused: 1 });
    expect(done.errors).toEqual([
      { row: 4, field: 'group_identifier', code: 'noGroup', message: 'The record names no group.' },
    ]);
    const [made] = await db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'repair-hub-zandvoort'));
    expect(made).toMatchObject({ name: 'Repair Hub Zandvoort', historyOnly: true, country: 'NLD' });
    expect((await as.admin.get(`/api/stats?groupId=${otherGroup}`)).json.items).toBe(1);
  });

  it('lets an admin merge a history-only group into the group its records belong to, and nothing else', async () => {
    const [made] = await db.db.select().from(repairGroups).where(eq(repairGroups.slug, 'repair-hub-zandvoort'));
    const before = (await as.admin.get(`/api/stats?groupId=${otherGroup}`)).json.items;
    expect((await as.organiser.post(`/api/admin/groups/${made.id}/merge`, { into: otherGroup })).status).toBe(403);
    const real = await as.admin.post(`/api/admin/groups/${groupId}/merge`, { into: otherGroup });
    expect(real.status).toBe(409);
    expect((await as.admin.post(`/api/admin/groups/${made.id}/merge`, { into: made.id })).status).toBe(400);
    // Once someone organises it, it is a group of its own and is never merged away.
    const [m] = await db.db
      .insert(memberships)
      .values({ userId: (await makeUser(db.db)).id, groupId: made.id, role: 'organiser', status: 'active' })
      .$returningId();
    expect((await as.admin.post(`/api/admin/groups/${made.id}/merge`, { into: otherGroup })).status).toBe(409);
    await db.db.delete(memberships).where(eq(memberships.id, m.id));
    expect((await as.admin.post(`/api/admin/groups/${made.id}/merge`, { into: otherGroup })).status).toBe(204);
    expect((await as.admin.get(`/api/stats?groupId=${otherGroup}`)).json.items).toBe(before + 1);
    const groups = (await as.admin.get('/api/admin/groups')).json as { id: number }[];
    expect(groups.some((g) => g.id === made.id)).toBe(false);
    expect((await as.admin.get(`/api/stats?groupId=${made.id}`)).json.items).toBe(0);
  });

  it('lets only the group’s organisers and admins bring records in or read an import', async () => {
    const r = await upload(as.fixer, '/api/imports', { groupId: String(groupId) }, V03);
    expect(r.status).toBe(403);
    expect((await upload(as.otherOrganiser, '/api/imports', { groupId: String(groupId) }, V03)).status).toBe(403);
    const mine = await upload(as.organiser, '/api/imports', { groupId: String(groupId) }, V03);
    expect((await as.otherOrganiser.get(`/api/imports/${mine.json.id}`)).status).toBe(404);
    expect((await as.admin.get(`/api/imports/${mine.json.id}`)).status).toBe(200);
    const list = await as.organiser.get(`/api/imports?groupId=${groupId}`);
    expect(list.json.length).toBeGreaterThanOrEqual(3);
    expect(
      (await upload(as.organiser, '/api/imports', { groupId: String(groupId) }, new Uint8Array([0, 1, 2]))).status,
    ).toBe(400);
  });

  it('takes up a job whose process stopped, from where it stood, and leaves alone one another process holds', async () => {
    const stopped = await db.db
      .insert(importJobs)
      .values({
        groupId,
        scope: 'group',
        fileName: 'left.csv',
        content: V03.replace(/rc-1/g, 'rs-1'),
        mapping: {},
        kind: 'ords-0.3',
        status: 'running',
        leaseUntil: new Date(Date.now() - 1000),
        refusals: [],
      })
      .$returningId();
    const held = await db.db
      .insert(importJobs)
      .values({
        groupId,
        scope: 'group',
        fileName: 'held.csv',
        content: V03.replace(/rc-1/g, 'rh-1'),
        mapping: {},
        kind: 'ords-0.3',
        status: 'running',
        leaseUntil: new Date(Date.now() + 60_000),
        refusals: [],
      })
      .$returningId();
    expect(await runImports(server.ctx)).toBeGreaterThanOrEqual(1);
    expect(await finished(as.organiser, stopped[0].id)).toMatchObject({ status: 'done', imported: 3 });
    expect((await as.organiser.get(`/api/imports/${held[0].id}`)).json).toMatchObject({
      status: 'running',
      imported: 0,
    });
  });
});

describe('a broken upload', () => {
  it('is refused with 400, not a server error', async () => {
    const token = await as.organiser.token();
    const res = await fetch(server.url + '/api/imports', {
      method: 'POST',
      headers: {
        cookie: as.organiser.cookieHeader(),
        'x-csrf-token': token,
        'content-type': 'multipart/form-data; boundary=XX',
      },
      body: '--XX\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\n\r\nid,event_date',
    });
    expect(res.status).toBe(400);
  });
});
