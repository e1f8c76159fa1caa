import { eq, inArray, sql, type SQL } from 'drizzle-orm';
import { BARRIERS, OUTCOMES, type Barrier, type Outcome } from '../../../../../shared/event-day/constants';
import { DIVERTING_OUTCOME } from '../../../../../shared/impact/visits';
import type { DbOrTx } from '../../../db/client';
import { bookingItems, bookings, impactCells } from '../../../db/schema/index';
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
  await tx.delete(impactCells).where(inArray(impactCells.eventId, eventIds));
  await tx.execute(
    rollupSelect(
      sql`b.event_id IN (${sql.join(
        eventIds.map((id) => sql`${id}`),
        sql`, `,
      )})`,
    ),
  );
}
