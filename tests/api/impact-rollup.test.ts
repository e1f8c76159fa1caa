import { randomBytes } from 'node:crypto';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BOOKING_STATUSES } from '../../shared/constants';
import {
  BARRIERS,
  ITEM_STATUSES,
  OUTCOMES,
  type Barrier,
  type ItemStatus,
  type Outcome,
} from '../../shared/event-day/constants';
import { cellsFromRecords, type ImpactCell, type RepairRecord } from '../../shared/impact/statistics';
import { countedVisits, type VisitState } from '../../shared/impact/visits';
import { bookingItems, bookings, categories, itemOutcomes } from '../../server/src/db/schema/index';
import { refreshCells, refreshEventCells } from '../../server/src/features/impact/queries/cells';
import { readCells } from '../../server/src/features/impact/queries/stats';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeEvent, makeGroup } from '../support/factories';

/**
 * Property test: the SQL rollup (impact_cells, filled item by item as the desk and the bench would, then rebuilt
 * whole) equals the pure computation of shared/impact (countedVisits + cellsFromRecords) on the same random
 * records. The pure computation itself is checked against worked examples in tests/unit/impact.test.ts.
 * Random records include what should not count: cancelled bookings, no-shows, withdrawn items, items never
 * checked in, returns that never arrived, and barriers given with an outcome other than end of life.
 */
let db: TestDatabase;
let categoryIds: number[];

beforeAll(async () => {
  db = await createTestDatabase();
  categoryIds = (await db.db.select({ id: categories.id }).from(categories)).map((c) => c.id).slice(0, 5);
});
afterAll(async () => {
  await db.drop();
});

const EVENT_DATES = ['2024-01-13', '2024-01-27', '2024-02-10', '2024-03-09', '2024-04-13', '2024-06-08'];

interface Spec {
  event: number;
  category: number;
  bookingStatus: (typeof BOOKING_STATUSES)[number];
  itemStatus: ItemStatus;
  checkedIn: boolean;
  outcome: Outcome | null;
  barrier: Barrier | null;
  grams: number | null;
  returnPick: number | null;
}

const spec: fc.Arbitrary<Spec> = fc.record({
  event: fc.nat(EVENT_DATES.length - 1),
  category: fc.nat(4),
  bookingStatus: fc.oneof(
    { weight: 6, arbitrary: fc.constant('confirmed' as const) },
    { weight: 1, arbitrary: fc.constantFrom(...BOOKING_STATUSES) },
  ),
  itemStatus: fc.constantFrom(...ITEM_STATUSES),
  checkedIn: fc.boolean(),
  outcome: fc.option(fc.constantFrom(...OUTCOMES), { freq: 4 }),
  barrier: fc.option(fc.constantFrom(...BARRIERS), { freq: 2 }),
  grams: fc.option(fc.integer({ min: 50, max: 25_000 }), { freq: 2 }),
  returnPick: fc.option(fc.nat(1000), { freq: 2 }),
});

type Visit = RepairRecord & VisitState;

/** Inserts the records event by event, refreshing the cells of each event's items as the desk does. */
async function insert(specs: Spec[]): Promise<{ groupId: number; eventIds: number[]; visits: Visit[] }> {
  const groupId = await makeGroup(db.db);
  const made = [];
  for (const date of EVENT_DATES)
    made.push(await makeEvent(db.db, groupId, { startsAt: new Date(`${date}T12:00:00Z`), slotCount: 1 }));
  const sorted = [...specs].sort((a, b) => a.event - b.event);
  const visits: Visit[] = [];
  for (let e = 0; e < EVENT_DATES.length; e++) {
    const earlier = visits.slice();
    const ids: number[] = [];
    for (const s of sorted.filter((x) => x.event === e)) {
      const [{ id: bookingId }] = await db.db
        .insert(bookings)
        .values({
          reference: randomBytes(4).toString('hex').slice(0, 7).toUpperCase(),
          eventId: made[e].eventId,
          slotId: made[e].slotIds[0],
          visitorName: 'Visitor Random',
          manageTokenHash: randomBytes(32).toString('hex'),
          status: s.bookingStatus,
          consentAt: new Date(),
        })
        .$returningId();
      const returnOf = s.returnPick !== null && earlier.length ? earlier[s.returnPick % earlier.length].itemId : null;
      const weighedKg = s.grams === null ? null : s.grams / 1000;
      const [{ id: itemId }] = await db.db
        .insert(bookingItems)
        .values({
          bookingId,
          categoryId: categoryIds[s.category],
          fault: 'Random fault',
          mains: false,
          position: 1,
          status: s.itemStatus,
          checkedInAt: s.checkedIn ? new Date(`${EVENT_DATES[e]}T12:05:00Z`) : null,
          weighedKg,
          returnOfItemId: returnOf,
        })
        .$returningId();
      if (s.outcome)
        await db.db
          .insert(itemOutcomes)
          .values({ itemId, outcome: s.outcome, barrier: s.barrier, recordedAt: new Date() });
      ids.push(itemId);
      visits.push({
        itemId,
        categoryId: categoryIds[s.category],
        date: EVENT_DATES[e],
        outcome: s.outcome,
        barrier: s.barrier,
        weighedKg,
        returnOfItemId: returnOf,
        bookingStatus: s.bookingStatus,
        itemStatus: s.itemStatus,
        checkedIn: s.checkedIn,
      });
    }
    await refreshCells(db.db, ids);
  }
  return { groupId, eventIds: made.map((m) => m.eventId), visits };
}

/** Cells in one order, with masses to the gram (the column keeps three decimals). */
const normal = (cells: ImpactCell[]) =>
  cells
    .map((c) => ({ ...c, fixedWeighedKg: Math.round(c.fixedWeighedKg * 1000) }))
    .sort((a, b) => a.month.localeCompare(b.month) || a.categoryId - b.categoryId);

describe('the impact rollup', () => {
  it('equals the pure computation on the same random records (several seeds, a few hundred records each)', async () => {
    for (const seed of [11, 2026, 424242]) {
      await fc.assert(
        fc.asyncProperty(fc.array(spec, { minLength: 150, maxLength: 300 }), async (specs) => {
          const { groupId, eventIds, visits } = await insert(specs);
          const expected = normal(cellsFromRecords(countedVisits(visits)));
          expect(normal(await readCells(db.db, { groupId }))).toEqual(expected);
          await refreshEventCells(db.db, eventIds);
          expect(normal(await readCells(db.db, { groupId }))).toEqual(expected);
        }),
        { seed, numRuns: 1, endOnFailure: true },
      );
    }
  });
});
