import { and, asc, eq, gt, inArray } from 'drizzle-orm';
import type { DbOrTx } from '../../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  followUps,
  itemOutcomes,
  repairGroups,
  slots,
} from '../../../db/schema/index';

/** An item's follow-up with the item, its booking, kind, group and the part the fixer named. */
export async function followUpWithItem(db: DbOrTx, itemId: number) {
  const [r] = await db
    .select({
      f: followUps,
      item: bookingItems,
      booking: bookings,
      category: categories,
      group: repairGroups,
      part: itemOutcomes.partDescription,
    })
    .from(followUps)
    .innerJoin(bookingItems, eq(bookingItems.id, followUps.itemId))
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .innerJoin(repairGroups, eq(repairGroups.id, followUps.groupId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, followUps.itemId))
    .where(eq(followUps.itemId, itemId));
  return r;
}

/** The group's next published sessions that have not started yet. */
export const nextSessions = (db: DbOrTx, groupId: number, limit: number) =>
  db
    .select()
    .from(events)
    .where(and(eq(events.groupId, groupId), eq(events.status, 'published'), gt(events.startsAt, new Date())))
    .orderBy(asc(events.startsAt))
    .limit(limit);

/** The slots of these events that have not ended yet. */
export const slotsStillAhead = async (db: DbOrTx, eventIds: number[]) =>
  eventIds.length
    ? db
        .select()
        .from(slots)
        .where(and(inArray(slots.eventId, eventIds), gt(slots.endsAt, new Date())))
        .orderBy(asc(slots.startsAt))
    : [];
