import { eq, inArray, sql } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { bookingItems, bookings, impactCells } from '../../db/schema/index';

/**
 * The rollup, as one INSERT … SELECT: items that reached the desk (not no-shows or withdrawals) of confirmed
 * bookings, leaving out a visit that a later, arrived visit of the same item supersedes — the rule of
 * shared/impact `lastVisits`. `where` narrows it to some events; the bench fills the whole table with it.
 */
export function rollupSelect(where: ReturnType<typeof sql> | null) {
  const arrived = (a: string) =>
    sql.raw(`${a}.checked_in_at IS NOT NULL AND ${a}.status NOT IN ('no-show','withdrawn')`);
  const outcome = (o: string) => sql.raw(`SUM(CASE WHEN o.outcome = '${o}' THEN 1 ELSE 0 END)`);
  const barrier = (b: string) => sql.raw(`SUM(CASE WHEN o.barrier = '${b}' THEN 1 ELSE 0 END)`);
  return sql`
    INSERT INTO impact_cells (event_id, category_id, group_id, event_date, items, fixed, parts_needed, advice, end_of_life, fixed_weighed_kg, fixed_unweighed,
      b_spare_parts_not_available, b_spare_parts_too_expensive, b_no_way_to_open, b_repair_information_not_available, b_lack_of_equipment, b_too_worn_out)
    SELECT b.event_id, bi.category_id, e.group_id, DATE(e.starts_at), COUNT(*), ${outcome('fixed')}, ${outcome('parts-needed')}, ${outcome('advice')}, ${outcome('end-of-life')},
      COALESCE(SUM(CASE WHEN o.outcome = 'fixed' THEN bi.weighed_kg END), 0), SUM(CASE WHEN o.outcome = 'fixed' AND bi.weighed_kg IS NULL THEN 1 ELSE 0 END),
      ${barrier('spare-parts-not-available')}, ${barrier('spare-parts-too-expensive')}, ${barrier('no-way-to-open')}, ${barrier('repair-information-not-available')}, ${barrier('lack-of-equipment')}, ${barrier('too-worn-out')}
    FROM booking_items bi
    JOIN bookings b ON b.id = bi.booking_id AND b.status = 'confirmed'
    JOIN events e ON e.id = b.event_id
    LEFT JOIN item_outcomes o ON o.item_id = bi.id
    WHERE ${arrived('bi')} ${where ? sql`AND ${where}` : sql``}
      AND NOT EXISTS (SELECT 1 FROM booking_items r JOIN bookings rb ON rb.id = r.booking_id AND rb.status = 'confirmed' WHERE r.return_of_item_id = bi.id AND ${arrived('r')})
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
