import { eq, sql } from 'drizzle-orm';
import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ORDS_PRODUCT_CATEGORIES } from '../../shared/impact/ords-categories';
import { bookingItems, bookings } from '../../server/src/db/schema/index';
import { ORDS_FIELDS } from '../../shared/impact/open-repair-data';
import { type TestDatabase } from '../support/db';
import { Agent } from '../support/http';
import { ORDS_BARRIER_TEXTS as BARRIERS, ORDS_STATUS_TEXTS as STATUSES } from '../support/ords-codelists';
import { startDemoApi, type DemoApi } from '../support/demo-app';

/**
 * The Open Repair Data export checked value by value against the v0.3 columns, codelists and patterns written out in
 * REFERENCE.md §5 (the standard's text and the table schema published with the 2025-07 open data).
 */
let db: TestDatabase;
let app: DemoApi;
let groupId: number;
let as: Agent;

beforeAll(async () => {
  app = await startDemoApi();
  ({ db, groupId } = app);
  as = await app.signIn('organiser');
});
afterAll(() => app.stop());

async function file(kind: string) {
  const r = await as.get(`/api/exports/${kind}.csv?groupId=${groupId}`);
  expect(r.status).toBe(200);
  const header = r.text.split('\n')[0].trim().split(',');
  return { header, rows: parse(r.text, { columns: true }) as Record<string, string>[] };
}

/** The table schema's patterns and the codelists, for every column (REFERENCE.md §5). */
function checkRow(x: Record<string, string>) {
  expect(x.id).toMatch(/^[a-z]+-\d+$/);
  expect(x.data_provider).not.toBe('');
  // ISO 3166-1 alpha-3, from the group's setting (the demo groups are in the United Kingdom).
  expect(x.country).toBe('GBR');
  expect(x.year_of_manufacture).toMatch(/^(\d{4})?$/);
  expect(x.product_age).toMatch(/^(\d+(\.\d)?)?$/);
  expect(STATUSES).toContain(x.repair_status);
  if (x.repair_barrier_if_end_of_life) {
    expect(BARRIERS).toContain(x.repair_barrier_if_end_of_life);
    expect(x.repair_status).toBe('End of life');
  }
  expect(x.group_identifier).toMatch(/^\S+$/);
  expect(x.event_date).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  expect(new Date(`${x.event_date}T00:00:00Z`).toISOString().slice(0, 10)).toBe(x.event_date);
  if (x.year_of_manufacture && x.product_age)
    expect(
      Math.abs(Number(x.event_date.slice(0, 4)) - Number(x.year_of_manufacture) - Number(x.product_age)),
    ).toBeLessThanOrEqual(0.5);
  expect(x.problem).not.toMatch(/[\w.+-]+@[\w-]+\.[\w.-]+/);
}

describe('the Open Repair Data export, v0.3', () => {
  it('writes the columns in the published order, and every value fits the codelists and patterns', async () => {
    const { header, rows } = await file('open-repair-data');
    expect(header).toEqual([
      'id',
      'data_provider',
      'country',
      'partner_product_category',
      'product_category',
      'product_category_id',
      'brand',
      'year_of_manufacture',
      'product_age',
      'repair_status',
      'repair_barrier_if_end_of_life',
      'group_identifier',
      'event_date',
      'problem',
    ]);
    expect(header).toEqual([...ORDS_FIELDS]);
    expect(rows.length).toBeGreaterThan(50);
    for (const x of rows) {
      checkRow(x);
      // One of the 40 powered categories, with its id.
      expect(ORDS_PRODUCT_CATEGORIES as readonly string[]).toContain(x.product_category);
      expect(Number(x.product_category_id)).toBe(ORDS_PRODUCT_CATEGORIES.indexOf(x.product_category as never) + 1);
    }
    // The codelist's words, not Mendery's category names.
    expect(rows.some((x) => x.product_category !== x.partner_product_category)).toBe(true);
    expect(new Set(rows.map((x) => x.repair_status)).size).toBeGreaterThan(2);
  });

  it('puts items without power in a file of their own, and each record in exactly one of the two files', async () => {
    const powered = await file('open-repair-data');
    const unpowered = await file('open-repair-data-unpowered');
    expect(unpowered.header).toEqual([...ORDS_FIELDS]);
    expect(unpowered.rows.length).toBeGreaterThan(0);
    for (const x of unpowered.rows) {
      checkRow(x);
      expect(x.product_category).toMatch(/^Unpowered - [A-Z][a-z]+$/);
      expect(x.product_category_id).toBe('');
    }
    const ids = [...powered.rows, ...unpowered.rows].map((x) => x.id);
    expect(new Set(ids).size).toBe(ids.length);
    const [[{ n }]] = (await db.db.execute(sql`
      SELECT COUNT(*) AS n FROM booking_items bi JOIN bookings b ON b.id = bi.booking_id
      JOIN events e ON e.id = b.event_id WHERE e.group_id = ${groupId} AND e.status <> 'cancelled'`)) as unknown as [
      { n: number }[],
    ];
    expect(ids.length).toBeLessThanOrEqual(Number(n));
    expect(powered.rows.some((x) => /Clothing|Bicycle|Chair/.test(x.partner_product_category))).toBe(false);
    expect(
      (await new Agent(app.server.url).get(`/api/exports/open-repair-data-unpowered.csv?groupId=${groupId}`)).status,
    ).toBe(401);
  });

  it('takes the country from the group’s setting, as an ISO 3166-1 alpha-3 code', async () => {
    // Source: ISO 3166-1 (alpha-3 NLD = Netherlands), through the i18n-iso-countries package's code table.
    const bad = await as.send('PUT', `/api/groups/${groupId}/settings`, { country: 'XYZ' });
    expect(bad.status).toBe(400);
    expect(bad.json.error.fields.country).toMatch(/country/);
    expect((await as.send('PUT', `/api/groups/${groupId}/settings`, { country: 'nld' })).status).toBe(200);
    expect((await as.get(`/api/groups/${groupId}/settings`)).json.country).toBe('NLD');
    const { rows } = await file('open-repair-data');
    expect(new Set(rows.map((x) => x.country))).toEqual(new Set(['NLD']));
    await as.send('PUT', `/api/groups/${groupId}/settings`, { country: 'GBR' });
  });

  it('takes the visitor’s name, e-mail address and phone number out of the problem text', async () => {
    const { rows } = await file('open-repair-data');
    const itemId = Number(rows[0].id.replace('mendery-', ''));
    const [item] = await db.db.select().from(bookingItems).where(eq(bookingItems.id, itemId));
    const [booking] = await db.db.select().from(bookings).where(eq(bookings.id, item.bookingId));
    const first = booking.visitorName.split(' ')[0];
    await db.db
      .update(bookingItems)
      .set({ fault: `${first} says it trips the fuse; ring 07700 900123 or ${first.toLowerCase()}@example.org` })
      .where(eq(bookingItems.id, itemId));
    const again = (await file('open-repair-data')).rows.find((x) => x.id === rows[0].id)!;
    expect(again.problem).toBe('[name] says it trips the fuse; ring [number] or [e-mail]');
    await db.db.update(bookingItems).set({ fault: item.fault }).where(eq(bookingItems.id, itemId));
  });
});
