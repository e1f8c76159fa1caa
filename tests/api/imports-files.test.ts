import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ORDS_PRODUCT_CATEGORIES, ordsCategoryId } from '../../shared/impact/ords-categories';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeGroup, makeUser } from '../support/factories';
import { Agent } from '../support/http';
import { ORDS_BARRIER_TEXTS as BARRIERS } from '../support/ords-codelists';
import { startTestServer } from '../support/server';

/**
 * Files brought in, checked against what they hold. The records are invented for the test and written with the
 * Open Repair Data Standard v0.3 columns and codelists (REFERENCE.md §5): the 40 product categories with their ids,
 * the four repair statuses and the six barriers.
 */
let db: TestDatabase;
let server: RunningServer;
let organiser: Agent;

beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
  const admin = await makeUser(db.db, { admin: true });
  organiser = new Agent(server.url);
  expect((await organiser.login(admin.email, admin.password)).status).toBe(200);
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

const upload = (groupId: number, body: string | Uint8Array<ArrayBuffer>) =>
  organiser.upload('/api/imports', { groupId: String(groupId) }, body);

async function importDone(groupId: number, body: string | Uint8Array<ArrayBuffer>) {
  const r = await upload(groupId, body);
  expect(r.status, JSON.stringify(r.json)).toBe(202);
  for (let i = 0; i < 400; i++) {
    const j = await organiser.get(`/api/imports/${r.json.id}`);
    if (j.json.status === 'done' || j.json.status === 'failed') return j.json;
    await new Promise((res) => setTimeout(res, 50));
  }
  throw new Error('the import did not finish');
}

/** The four statuses, in the order the rows cycle through them. */
const STATUSES = ['Fixed', 'Repairable', 'End of life', 'Unknown'];
const HEADER =
  'id,data_provider,country,partner_product_category,product_category,product_category_id,brand,year_of_manufacture,product_age,repair_status,repair_barrier_if_end_of_life,group_identifier,event_date,problem';
const UNPOWERED = ['Unpowered - Bicycle', 'Unpowered - Clothing', 'Unpowered - Furniture'];

/** 120 invented records: every category, status and barrier, three unpowered kinds, dates over two years. */
function invented(prefix = 't') {
  const rows = Array.from({ length: 120 }, (_, i) => {
    const unpowered = i % 10 === 9;
    const category = unpowered ? UNPOWERED[i % 3] : ORDS_PRODUCT_CATEGORIES[i % ORDS_PRODUCT_CATEGORIES.length];
    const status = STATUSES[i % 4];
    return {
      id: `${prefix}-${i + 1}`,
      category,
      categoryId: unpowered ? '' : String(ordsCategoryId(category as (typeof ORDS_PRODUCT_CATEGORIES)[number])),
      brand: i % 3 ? `Brand${i % 7}` : '',
      status,
      barrier: status === 'End of life' ? BARRIERS[i % BARRIERS.length] : '',
      date: `202${3 + (i % 2)}-${String(1 + (i % 12)).padStart(2, '0')}-${String(1 + (i % 27)).padStart(2, '0')}`,
      problem: `Fault number ${i + 1}: stops after a minute`,
    };
  });
  const csv = [
    HEADER,
    ...rows.map((r) =>
      [
        r.id,
        'Test Data',
        'DEU',
        '',
        r.category,
        r.categoryId,
        r.brand,
        '',
        '',
        r.status,
        r.barrier,
        'g',
        r.date,
        r.problem,
      ].join(','),
    ),
  ].join('\n');
  return { rows, csv };
}

describe('a file brought in and written out again', () => {
  it('gives back category, status, barrier, date, brand and problem for every row, in the right file', async () => {
    const groupId = await makeGroup(db.db);
    const { rows, csv } = invented();
    expect(await importDone(groupId, csv)).toMatchObject({ status: 'done', imported: 120, refused: 0 });
    const out = [
      ...(parse((await organiser.get(`/api/exports/open-repair-data.csv?groupId=${groupId}`)).text, {
        columns: true,
      }) as Record<string, string>[]),
      ...(parse((await organiser.get(`/api/exports/open-repair-data-unpowered.csv?groupId=${groupId}`)).text, {
        columns: true,
      }) as Record<string, string>[]),
    ];
    expect(out).toHaveLength(120);
    const byProblem = new Map(out.map((x) => [x.problem, x]));
    for (const r of rows) {
      const x = byProblem.get(r.problem)!;
      expect(x, r.id).toBeDefined();
      expect(
        [
          x.product_category,
          x.product_category_id,
          x.repair_status,
          x.repair_barrier_if_end_of_life,
          x.event_date,
          x.brand,
        ],
        r.id,
      ).toEqual([r.category, r.categoryId, r.status, r.barrier, r.date, r.brand]);
    }
  });

  it('makes the statistics equal a count of the file’s rows by status', async () => {
    const groupId = await makeGroup(db.db);
    // Other ids: records are keyed on data provider + id across the whole network.
    const { rows, csv } = invented('u');
    await importDone(groupId, csv);
    const count = (s: string) => rows.filter((r) => r.status === s).length;
    const stats = (await organiser.get(`/api/stats?groupId=${groupId}`)).json;
    expect({
      items: stats.items,
      fixed: stats.fixed,
      repairable: stats.partsNeeded + stats.advice,
      endOfLife: stats.endOfLife,
      unknown: stats.unknown,
    }).toEqual({
      items: rows.length,
      fixed: count('Fixed'),
      repairable: count('Repairable'),
      endOfLife: count('End of life'),
      unknown: count('Unknown'),
    });
  });
});

describe('files that are not right', () => {
  const line = (id: string, date: string, status: string, problem: string) =>
    `${id},Test Data,DEU,,Coffee maker,36,,,,${status},,g,${date},${problem}`;

  it('refuses a file that is no CSV, and one over 30 MB, with a clear message, and writes nothing', async () => {
    const groupId = await makeGroup(db.db);
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
    const a = await upload(groupId, png);
    expect(a.status).toBe(400);
    expect(a.json.error.message).toBe('This file is not a CSV file. Save the sheet as CSV and try again.');
    const big = await upload(groupId, `${HEADER}\n${'x'.repeat(31 * 1024 * 1024)}`);
    expect(big.status).toBe(413);
    expect(big.json.error.message).toBe('A file can be at most 30 MB.');
    expect((await organiser.get(`/api/imports?groupId=${groupId}`)).json).toEqual([]);
    expect((await organiser.get(`/api/stats?groupId=${groupId}`)).json.items).toBe(0);
  });

  it('reads Windows-1252 accents, a byte-order mark and semicolons as the sheet meant them', async () => {
    const groupId = await makeGroup(db.db);
    const latin = new Uint8Array(
      Buffer.from(`${HEADER}\n${line('w-1', '2024-05-04', 'Fixed', 'Moulin à café grippé')}`, 'latin1'),
    );
    expect(await importDone(groupId, latin)).toMatchObject({ status: 'done', imported: 1 });
    const bom = `\uFEFF${HEADER}\n${line('b-1', '2024-05-04', 'Fixed', 'Hums')}`;
    expect(await importDone(groupId, bom)).toMatchObject({ status: 'done', kind: 'ords-0.3', imported: 1 });
    const semi = `${HEADER.replaceAll(',', ';')}\n${line('s-1', '2024-05-04', 'Fixed', 'Leaks').replaceAll(',', ';')}`;
    expect(await importDone(groupId, semi)).toMatchObject({ status: 'done', imported: 1 });
    const out = parse((await organiser.get(`/api/exports/open-repair-data.csv?groupId=${groupId}`)).text, {
      columns: true,
    }) as Record<string, string>[];
    expect(out.map((x) => x.problem).sort()).toEqual(['Hums', 'Leaks', 'Moulin à café grippé']);
  });

  it('lists an unknown status and an impossible date by row and field, and keeps the good rows', async () => {
    const groupId = await makeGroup(db.db);
    const csv = [
      HEADER,
      line('d-1', '2024-05-04', 'Fixed', 'Good'),
      line('d-2', '2023-02-30', 'Fixed', 'No such day'),
      line('d-3', '2024-05-04', 'Sorted', 'Unknown word'),
      line('d-4', '2024-05-05', 'End of life', 'Good too'),
    ].join('\n');
    const done = await importDone(groupId, csv);
    expect(done).toMatchObject({ status: 'done', imported: 2, refused: 2 });
    expect(done.errors.map((e: { row: number; field: string }) => [e.row, e.field])).toEqual([
      [3, 'event_date'],
      [4, 'repair_status'],
    ]);
  });
});
