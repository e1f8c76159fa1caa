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
import { eq, inArray } from 'drizzle-orm';
import { bookingItems, bookings, categories, impactDays, itemOutcomes } from '../../server/src/db/schema/index';
import { rebuildRollups, refreshCells, refreshEventCells } from '../../server/src/features/impact/queries/cells';
import { readCells } from '../../server/src/features/impact/queries/stats';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { makeEvent, makeGroup } from '../support/factories';

/**
 * Property test: the SQL rollup (impact_cells, filled item by item as the desk and the bench would, then rebuilt
 * whole) equals the pure computation of shared/impact (countedVisits + cellsFromRecords) on the same random
 * records. The pure computation itself is checked against worked examples in tests/unit/impact.test.ts.
 * Random records include what should not count: cancelled bookings, no-shows, withdrawn items, items never
 * checked in, returns that never arrived, and barriers given with an outcome other than end of life.
 * The whole network is read from impact_days (moved by each refresh), so it is checked the same way, also after
 * outcomes change and records are deleted, and against a rebuild from nothing.
 */
let db: TestDatabase;
let categoryIds: number[];
/** Every visit inserted into this database so far, over all groups: the network. */
const network: Visit[] = [];

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

type Visit = RepairRecord & VisitState & { date: string };

/** Inserts the records event by event, refreshing the cells of each event's items as the desk does. */
async function insert(
  specs: Spec[],
  dates = EVENT_DATES,
): Promise<{ groupId: number; eventIds: number[]; visits: Visit[] }> {
  const groupId = await makeGroup(db.db);
  const made = [];
  for (const date of dates)
    made.push(await makeEvent(db.db, groupId, { startsAt: new Date(`${date}T12:00:00Z`), slotCount: 1 }));
  const sorted = [...specs].sort((a, b) => a.event - b.event);
  const visits: Visit[] = [];
  for (let e = 0; e < dates.length; e++) {
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
          checkedInAt: s.checkedIn ? new Date(`${dates[e]}T12:05:00Z`) : null,
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
        date: dates[e],
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
  network.push(...visits);
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
          expect(normal(await readCells(db.db, {}))).toEqual(pureNetwork());
          await refreshEventCells(db.db, eventIds);
          expect(normal(await readCells(db.db, { groupId }))).toEqual(expected);
          expect(normal(await readCells(db.db, {}))).toEqual(pureNetwork());
        }),
        { seed, numRuns: 1, endOnFailure: true },
      );
    }
  });
});

const pureNetwork = (from = '0000', to = '9999') =>
  normal(cellsFromRecords(countedVisits(network).filter((v) => v.date >= from && v.date <= to)));
const dayRows = async () =>
  (await db.db.select().from(impactDays)).sort(
    (a, b) => a.eventDate.localeCompare(b.eventDate) || a.categoryId - b.categoryId,
  );

describe('the network day sums', () => {
  it('still equal the pure computation after outcomes change and bookings are deleted, and equal a rebuild', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.array(spec, { minLength: 100, maxLength: 200 }),
        fc.array(fc.tuple(fc.nat(10_000), fc.option(fc.constantFrom(...OUTCOMES), { freq: 4 })), { maxLength: 40 }),
        fc.array(fc.nat(10_000), { maxLength: 10 }),
        async (specs, changes, deletions) => {
          const { visits, eventIds } = await insert(specs);
          // Outcome changes and removals, each refreshed as the outcome hook does.
          for (const [pick, outcome] of changes) {
            const v = visits[pick % visits.length];
            await db.db.delete(itemOutcomes).where(eq(itemOutcomes.itemId, v.itemId));
            if (outcome) await db.db.insert(itemOutcomes).values({ itemId: v.itemId, outcome, recordedAt: new Date() });
            Object.assign(v, { outcome, barrier: null });
            await refreshCells(db.db, [v.itemId]);
          }
          // Deleting a booking (with its item) that no return visit points at, then refreshing its event.
          for (const pick of deletions) {
            const v = visits[pick % visits.length];
            if (!network.includes(v) || network.some((w) => w.returnOfItemId === v.itemId)) continue;
            const [item] = await db.db.select().from(bookingItems).where(eq(bookingItems.id, v.itemId));
            const [booking] = await db.db.select().from(bookings).where(eq(bookings.id, item.bookingId));
            const earlier = network.find((w) => w.itemId === v.returnOfItemId);
            await db.db.delete(bookings).where(inArray(bookings.id, [booking.id]));
            network.splice(network.indexOf(v), 1);
            const affected = [eventIds[EVENT_DATES.indexOf(v.date)]];
            if (earlier) affected.push(eventIds[EVENT_DATES.indexOf(earlier.date)]);
            await refreshEventCells(db.db, affected);
          }
          expect(normal(await readCells(db.db, {}))).toEqual(pureNetwork());
          expect(normal(await readCells(db.db, { from: '2024-01-20', to: '2024-03-31' }))).toEqual(
            pureNetwork('2024-01-20', '2024-03-31'),
          );
          const kept = await dayRows();
          await rebuildRollups(db.db);
          expect(await dayRows()).toEqual(kept);
        },
      ),
      { seed: 1313, numRuns: 3, endOnFailure: true },
    );
  });
});

describe('a day whose only record goes', () => {
  it('leaves no row in the network day sums', async () => {
    const date = '2025-05-17';
    const specs: Spec[] = [
      {
        event: 0,
        category: 0,
        bookingStatus: 'confirmed',
        itemStatus: 'done',
        checkedIn: true,
        outcome: 'fixed',
        barrier: null,
        grams: 1234,
        returnPick: null,
      },
    ];
    const { visits, eventIds } = await insert(specs, [date]);
    expect((await dayRows()).filter((r) => r.eventDate === date)).toMatchObject([{ items: 1, fixedWeighedKg: 1.234 }]);
    const [item] = await db.db.select().from(bookingItems).where(eq(bookingItems.id, visits[0].itemId));
    await db.db.delete(bookings).where(eq(bookings.id, item.bookingId));
    network.splice(network.indexOf(visits[0]), 1);
    await refreshEventCells(db.db, eventIds);
    expect((await dayRows()).filter((r) => r.eventDate === date)).toEqual([]);
    expect(normal(await readCells(db.db, {}))).toEqual(pureNetwork());
  });
});
