import { eq, inArray, sql, type SQL } from 'drizzle-orm';
import { BARRIERS, OUTCOMES, type Barrier, type Outcome } from '../../../../../shared/event-day/constants';
import { DIVERTING_OUTCOME } from '../../../../../shared/impact/visits';
import type { Db, DbOrTx } from '../../../db/client';
import { bookingItems, bookings, impactCells, impactDays } from '../../../db/schema/index';
import { arrivedAs, countBarrier, countOutcome, notSupersededAs } from './visits';

/** The rollup table's counter for each outcome and each barrier: adding one to shared/ without a column fails here. */
const OUTCOME_COLUMN: Record<Outcome, string> = {
  fixed: 'fixed',
  'parts-needed': 'parts_needed',
  advice: 'advice',
  'end-of-life': 'end_of_life',
};
const BARRIER_COLUMN: Record<Barrier, string> = {
  'spare-parts-not-available': 'b_spare_parts_not_available',
  'spare-parts-too-expensive': 'b_spare_parts_too_expensive',
  'no-way-to-open': 'b_no_way_to_open',
  'repair-information-not-available': 'b_repair_information_not_available',
  'lack-of-equipment': 'b_lack_of_equipment',
  'too-worn-out': 'b_too_worn_out',
};

/**
 * The rollup, as one INSERT … SELECT of the counted visits (shared/impact/visits.ts, through ./visits), summed by
 * event and category. `where` narrows it to some events; the perf script fills the whole table with it.
 */
export function rollupSelect(where: SQL | null) {
  const columns = sql.raw(
    [...OUTCOMES.map((o) => OUTCOME_COLUMN[o]), ...BARRIERS.map((b) => BARRIER_COLUMN[b])].join(', '),
  );
  const sums = sql.join(
    [...OUTCOMES.map((o) => countOutcome('o', o)), ...BARRIERS.map((b) => countBarrier('o', b))],
    sql`, `,
  );
  return sql`
    INSERT INTO impact_cells (event_id, category_id, group_id, event_date, items, fixed_weighed_kg, fixed_unweighed, ${columns})
    SELECT b.event_id, bi.category_id, e.group_id, DATE(e.starts_at), COUNT(*),
      COALESCE(SUM(CASE WHEN o.outcome = ${DIVERTING_OUTCOME} THEN bi.weighed_kg END), 0),
      SUM(CASE WHEN o.outcome = ${DIVERTING_OUTCOME} AND bi.weighed_kg IS NULL THEN 1 ELSE 0 END), ${sums}
    FROM booking_items bi
    JOIN bookings b ON b.id = bi.booking_id
    JOIN events e ON e.id = b.event_id
    LEFT JOIN item_outcomes o ON o.item_id = bi.id
    WHERE ${arrivedAs('bi', 'b')} AND ${notSupersededAs('bi')} ${where ? sql`AND ${where}` : sql``}
    GROUP BY b.event_id, bi.category_id, e.group_id, DATE(e.starts_at)`;
}

/**
 * Rewrites the cells of the events these items belong to, and of the earlier visits they return to (whose item
 * is now superseded). Call it inside the transaction that changed the items.
 */
export async function refreshCells(tx: DbOrTx, itemIds: number[]) {
  if (!itemIds.length) return;
  const rows = await tx
    .select({ eventId: bookings.eventId, returnOf: bookingItems.returnOfItemId })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .where(inArray(bookingItems.id, itemIds));
  const earlier = rows.map((r) => r.returnOf).filter((x): x is number => x !== null);
  const more = earlier.length
    ? await tx
        .select({ eventId: bookings.eventId })
        .from(bookingItems)
        .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
        .where(inArray(bookingItems.id, earlier))
    : [];
  const eventIds = [...new Set([...rows, ...more].map((r) => r.eventId))].sort((a, b) => a - b);
  await refreshEventCells(tx, eventIds);
}

/**
 * After an outcome: the cells of the item's event, and of the earlier visit it returns to, from the row the
 * outcome already loaded (no second load of the item).
 */
export async function refreshItemCells(
  tx: DbOrTx,
  row: { event: { id: number }; item: { returnOfItemId: number | null } },
) {
  const earlier = row.item.returnOfItemId
    ? await tx
        .select({ eventId: bookings.eventId })
        .from(bookingItems)
        .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
        .where(eq(bookingItems.id, row.item.returnOfItemId))
    : [];
  await refreshEventCells(
    tx,
    [...new Set([row.event.id, ...earlier.map((r) => r.eventId)])].sort((a, b) => a - b),
  );
}

export async function refreshEventCells(tx: DbOrTx, eventIds: number[]) {
  if (!eventIds.length) return;
  const events = sql.join(
    eventIds.map((id) => sql`${id}`),
    sql`, `,
  );
  const before = await daySums(tx, events);
  await tx.delete(impactCells).where(inArray(impactCells.eventId, eventIds));
  await tx.execute(rollupSelect(sql`b.event_id IN (${events})`));
  await moveDays(tx, before, await daySums(tx, events));
}

/** Every integer counter of a cell, in one order: the rollup's item count, the unweighed count, outcomes, barriers. */
const COUNTERS = [
  'items',
  'fixed_unweighed',
  ...OUTCOMES.map((o) => OUTCOME_COLUMN[o]),
  ...BARRIERS.map((b) => BARRIER_COLUMN[b]),
];
/** A day-and-category sum: the counters, then the weighed mass of fixed items in grams (exact integers). */
type DaySums = Map<string, number[]>;

/**
 * The cells of these events summed by day and category, as a locking read: the rows as they are now (not this
 * transaction's snapshot), held until commit, so two refreshes of one event cannot both move the days.
 */
async function daySums(tx: DbOrTx, events: SQL): Promise<DaySums> {
  const sums = [...COUNTERS.map((c) => `SUM(${c})`), 'SUM(ROUND(fixed_weighed_kg * 1000))'];
  const [rows] = (await tx.execute(sql`
    SELECT DATE_FORMAT(event_date, '%Y-%m-%d') AS d, category_id AS c, ${sql.raw(sums.map((x, i) => `${x} AS v${i}`).join(', '))}
    FROM impact_cells WHERE event_id IN (${events}) GROUP BY event_date, category_id FOR UPDATE`)) as unknown as [
    Record<string, unknown>[],
  ];
  return new Map(rows.map((r) => [`${String(r.d)}|${String(r.c)}`, sums.map((_, i) => Number(r[`v${i}`]))]));
}

/**
 * Adds after − before to impact_days in one statement, keys in order (so concurrent refreshes lock rows in the
 * same order), then drops the rows left with no items.
 */
async function moveDays(tx: DbOrTx, before: DaySums, after: DaySums) {
  const zero = Array<number>(COUNTERS.length + 1).fill(0);
  const rows = [...new Set([...before.keys(), ...after.keys()])]
    .sort()
    .map((key) => {
      const a = after.get(key) ?? zero;
      const b = before.get(key) ?? zero;
      return { key, delta: a.map((x, i) => x - b[i]) };
    })
    .filter((r) => r.delta.some((x) => x !== 0));
  if (!rows.length) return;
  const columns = sql.raw([...COUNTERS, 'fixed_weighed_kg'].join(', '));
  const values = sql.join(
    rows.map(({ key, delta }) => {
      const [d, c] = key.split('|');
      const grams = delta[COUNTERS.length];
      const counters = delta.slice(0, COUNTERS.length).map((x) => sql`${x}`);
      return sql`(${d}, ${Number(c)}, ${sql.join(counters, sql`, `)}, ${(grams / 1000).toFixed(3)})`;
    }),
    sql`, `,
  );
  const update = sql.raw([...COUNTERS, 'fixed_weighed_kg'].map((c) => `${c} = ${c} + VALUES(${c})`).join(', '));
  await tx.execute(
    sql`INSERT INTO impact_days (event_date, category_id, ${columns}) VALUES ${values} ON DUPLICATE KEY UPDATE ${update}`,
  );
  const emptied = rows.filter((r) => r.delta[0] < 0);
  if (emptied.length)
    await tx.execute(
      sql`DELETE FROM impact_days WHERE items = 0 AND (event_date, category_id) IN (${sql.join(
        emptied.map((r) => {
          const [d, c] = r.key.split('|');
          return sql`(${d}, ${Number(c)})`;
        }),
        sql`, `,
      )})`,
    );
}

/** impact_days as the sum of impact_cells: for the migration's first fill and for a rebuild. */
const daysFromCells = () => {
  const columns = [...COUNTERS, 'fixed_weighed_kg'];
  return sql.raw(
    `INSERT INTO impact_days (event_date, category_id, ${columns.join(', ')})
     SELECT event_date, category_id, ${columns.map((c) => `SUM(${c})`).join(', ')}
     FROM impact_cells GROUP BY event_date, category_id`,
  );
};

/**
 * Rebuilds both rollups from the records in one transaction (`node server/scripts/bootstrap.mjs stats-rebuild`;
 * the perf script fills its generated data with it). Needed only if rows were changed behind the application's back.
 */
export async function rebuildRollups(db: Db) {
  await db.transaction(async (tx) => {
    await tx.delete(impactCells);
    await tx.execute(rollupSelect(null));
    await tx.delete(impactDays);
    await tx.execute(daysFromCells());
  });
}
