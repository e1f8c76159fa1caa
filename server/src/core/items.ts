import { desc, eq } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  repairGroups,
  salvageParts,
  salvageTakes,
  slots,
  users,
} from '../db/schema/index';
import { notFound } from '../http/errors';

/** One item with its booking, slot, event, group and category: what the desk, the bench, the notes and the figures read. */
export function itemWithContext(db: DbOrTx) {
  return db
    .select({
      item: bookingItems,
      booking: bookings,
      slot: slots,
      event: events,
      group: repairGroups,
      category: categories,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(slots, eq(slots.id, bookings.slotId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId));
}

/**
 * With `lock`, only the item's own row is locked. FOR UPDATE on the join would also lock its booking, slot, event,
 * group and category rows, which every other item of the session (and every kettle) shares: a busy desk deadlocked.
 */
export async function loadItem(db: DbOrTx, itemId: number, opts: { lock?: boolean } = {}) {
  if (opts.lock)
    await db.select({ id: bookingItems.id }).from(bookingItems).where(eq(bookingItems.id, itemId)).for('update');
  const [row] = await itemWithContext(db).where(eq(bookingItems.id, itemId));
  if (!row) throw notFound('That item');
  return row;
}
export type ItemRow = Awaited<ReturnType<typeof loadItem>>;

/** The group of an item, for the role guards (0 when there is no such item, which the guards refuse). */
export async function itemGroupId(db: DbOrTx, itemId: number): Promise<number> {
  if (!Number.isInteger(itemId) || itemId <= 0) return 0;
  const [r] = await db
    .select({ groupId: events.groupId })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .where(eq(bookingItems.id, itemId));
  return r?.groupId ?? 0;
}

/** Salvaged parts taken for an item, newest first: shown on the item page and kept by the salvage stock. */
export async function partsUsed(db: DbOrTx, itemId: number) {
  return db
    .select({
      id: salvageTakes.id,
      quantity: salvageTakes.quantity,
      createdAt: salvageTakes.createdAt,
      type: salvageParts.type,
      value: salvageParts.value,
      package: salvageParts.package,
      box: salvageParts.box,
      takenBy: users.name,
    })
    .from(salvageTakes)
    .innerJoin(salvageParts, eq(salvageParts.id, salvageTakes.partId))
    .leftJoin(users, eq(users.id, salvageTakes.takenBy))
    .where(eq(salvageTakes.itemId, itemId))
    .orderBy(desc(salvageTakes.id));
}
