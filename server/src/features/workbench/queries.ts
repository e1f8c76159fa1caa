import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { OPEN_STATUSES } from '../../../../shared/event-day/constants';
import type { DbOrTx } from '../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  itemAssignments,
  itemPhotos,
  repairGroups,
  slots,
} from '../../db/schema/index';

const startsAt = sql<Date>`COALESCE(${itemAssignments.startsAt}, ${slots.startsAt})`;

/** The items placed with one fixer at upcoming sessions that are still to be repaired, in the order they come. */
export const queueRows = (db: DbOrTx, userId: number) =>
  db
    .select({
      itemId: bookingItems.id,
      status: bookingItems.status,
      tagCode: bookingItems.tagCode,
      queueNumber: bookingItems.queueNumber,
      eventId: events.id,
      eventTitle: events.title,
      timeZone: repairGroups.timeZone,
      slotStartsAt: startsAt,
      reference: bookings.reference,
      visitorName: bookings.visitorName,
      categoryName: categories.name,
      categorySlug: categories.slug,
      minutes: categories.repairMinutes,
      brand: bookingItems.brand,
      model: bookingItems.model,
      fault: bookingItems.fault,
      mains: bookingItems.mains,
      benchId: itemAssignments.benchId,
      locked: itemAssignments.locked,
    })
    .from(itemAssignments)
    .innerJoin(bookingItems, eq(bookingItems.id, itemAssignments.itemId))
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(slots, eq(slots.id, bookings.slotId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .where(
      and(
        eq(itemAssignments.userId, userId),
        eq(bookings.status, 'confirmed'),
        inArray(events.status, ['published', 'closed']),
        inArray(bookingItems.status, [...OPEN_STATUSES]),
      ),
    )
    .orderBy(startsAt, asc(bookings.createdAt));

export const photoIdsOf = (db: DbOrTx, itemIds: number[]) =>
  itemIds.length
    ? db
        .select({ id: itemPhotos.publicId, itemId: itemPhotos.itemId })
        .from(itemPhotos)
        .where(inArray(itemPhotos.itemId, itemIds))
    : Promise.resolve([]);
