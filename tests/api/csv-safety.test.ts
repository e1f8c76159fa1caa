import { and, eq, isNotNull } from 'drizzle-orm';
import { parse } from 'csv-parse/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bookingItems, bookings, events, itemOutcomes, users } from '../../server/src/db/schema/index';
import { type TestDatabase } from '../support/db';
import { Agent } from '../support/http';
import { startDemoApi, type DemoApi } from '../support/demo-app';

/**
 * Formula injection (issue 14, finding 4). Source for the rule: OWASP "CSV Injection": a cell that starts with
 * = + - @, tab or CR is a formula to a spreadsheet. A walk-in's brand and model, the fixer's name and notes all
 * reach the files, so each is planted here and must come out as text.
 */
let db: TestDatabase;
let app: DemoApi;
let groupId: number;
let itemId: number;
let as: Agent;

const PLANTED = {
  brand: "+cmd|' /C calc'!A0",
  model: '=HYPERLINK("http://example.org/x","Open")',
  notes: '@SUM(1+1) was the trick',
  fault: '\t=1+1 in the fault',
  fixer: '-2+3 Fixer',
};

beforeAll(async () => {
  app = await startDemoApi();
  ({ db, groupId } = app);
  const [row] = await db.db
    .select({ id: bookingItems.id, fixer: itemOutcomes.recordedBy })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .where(and(eq(events.groupId, groupId), eq(itemOutcomes.outcome, 'fixed'), isNotNull(itemOutcomes.recordedBy)))
    .limit(1);
  itemId = row.id;
  await db.db
    .update(bookingItems)
    .set({ brand: PLANTED.brand, model: PLANTED.model, fault: PLANTED.fault })
    .where(eq(bookingItems.id, itemId));
  await db.db.update(itemOutcomes).set({ notes: PLANTED.notes }).where(eq(itemOutcomes.itemId, itemId));
  await db.db.update(users).set({ name: PLANTED.fixer }).where(eq(users.id, row.fixer!));
  as = await app.signIn('organiser');
});
afterAll(() => app.stop());

const starts = /^[=+\-@\t\r]/;

describe('CSV files never hand a spreadsheet a formula', () => {
  it('the records file writes planted brand, model, fault, notes and fixer as text', async () => {
    const r = await as.get(`/api/exports/records.csv?groupId=${groupId}`);
    expect(r.status).toBe(200);
    const rows = parse(r.text, { columns: true }) as Record<string, string>[];
    const row = rows.find((x) => x.item_id === String(itemId))!;
    expect(row.brand).toBe(`'${PLANTED.brand}`);
    expect(row.model).toBe(`'${PLANTED.model}`);
    expect(row.fixer).toBe(`'${PLANTED.fixer}`);
    expect(row.notes).toBe(`'${PLANTED.notes}`);
    // The fault is scrubbed (white space folded) before it is written; what is left must not start a formula.
    expect(row.fault).not.toMatch(starts);
    for (const x of rows) for (const [k, v] of Object.entries(x)) expect(v, `${k}: ${v}`).not.toMatch(starts);
  });

  it('the open data file does the same', async () => {
    const r = await as.get(`/api/exports/open-repair-data.csv?groupId=${groupId}`);
    expect(r.status).toBe(200);
    const rows = parse(r.text, { columns: true }) as Record<string, string>[];
    expect(rows.some((x) => x.brand === `'${PLANTED.brand}`)).toBe(true);
    for (const x of rows) for (const [k, v] of Object.entries(x)) expect(v, `${k}: ${v}`).not.toMatch(starts);
  });
});
