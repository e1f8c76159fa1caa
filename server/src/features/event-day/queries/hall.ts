import { and, asc, eq, gt, inArray, isNotNull, lte } from 'drizzle-orm';
import type { DbOrTx } from '../../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  eventBenches,
  events,
  itemAssignments,
  itemOutcomes,
  repairGroups,
  shifts,
  slots,
  users,
} from '../../../db/schema/index';

/** Every item of the event that reached the desk, with its slot, plan and outcome: what the hall views are made of. */
export const hallItems = (db: DbOrTx, eventId: number) =>
  db
    .select({
      id: bookingItems.id,
      status: bookingItems.status,
      queueNumber: bookingItems.queueNumber,
      tagCode: bookingItems.tagCode,
      checkedInAt: bookingItems.checkedInAt,
      startedAt: bookingItems.startedAt,
      doneAt: bookingItems.doneAt,
      walkIn: bookings.walkIn,
      visitorName: bookings.visitorName,
      slotStartsAt: slots.startsAt,
      categoryName: categories.name,
      categorySlug: categories.slug,
      minutes: categories.repairMinutes,
      brand: bookingItems.brand,
      model: bookingItems.model,
      fixerId: itemAssignments.userId,
      benchId: itemAssignments.benchId,
      outcome: itemOutcomes.outcome,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(slots, eq(slots.id, bookings.slotId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemAssignments, eq(itemAssignments.itemId, bookingItems.id))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed'), isNotNull(bookingItems.checkedInAt)));
export type HallItem = Awaited<ReturnType<typeof hallItems>>[number];

/** Fixers whose shift covers this moment. */
export const fixersNow = (db: DbOrTx, eventId: number, now: Date) =>
  db
    .select({ userId: shifts.userId, name: users.name, benchId: shifts.benchId })
    .from(shifts)
    .innerJoin(users, eq(users.id, shifts.userId))
    .where(and(eq(shifts.eventId, eventId), eq(shifts.coming, true), lte(shifts.startsAt, now), gt(shifts.endsAt, now)))
    .orderBy(asc(users.name));

/** The status of every item of the event's standing bookings, arrived or not. */
export const bookedStatuses = (db: DbOrTx, eventId: number) =>
  db
    .select({ status: bookingItems.status })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed')));

export async function userNames(db: DbOrTx, ids: number[]) {
  if (!ids.length) return new Map<number, string>();
  const rows = await db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, ids));
  return new Map(rows.map((u) => [u.id, u.name]));
}

export async function tagRow(db: DbOrTx, code: string) {
  const [r] = await db
    .select({
      id: bookingItems.id,
      status: bookingItems.status,
      queueNumber: bookingItems.queueNumber,
      tagCode: bookingItems.tagCode,
      categoryName: categories.name,
      categorySlug: categories.slug,
      eventId: events.id,
      eventTitle: events.title,
      eventStatus: events.status,
      groupId: repairGroups.id,
      groupName: repairGroups.name,
      outcome: itemOutcomes.outcome,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .where(eq(bookingItems.tagCode, code));
  return r;
}

/** Tagged items of the event, one item, a slot's or all, in queue order. */
export const tagSheetRows = (db: DbOrTx, eventId: number, filter: { slotId?: number; itemIds?: number[] }) =>
  db
    .select({
      id: bookingItems.id,
      tagCode: bookingItems.tagCode,
      queueNumber: bookingItems.queueNumber,
      categoryName: categories.name,
      categorySlug: categories.slug,
      mains: bookingItems.mains,
      visitorName: bookings.visitorName,
      slotId: bookings.slotId,
      slotStartsAt: slots.startsAt,
      benchName: eventBenches.name,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(slots, eq(slots.id, bookings.slotId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemAssignments, eq(itemAssignments.itemId, bookingItems.id))
    .leftJoin(eventBenches, eq(eventBenches.id, itemAssignments.benchId))
    .where(
      and(
        eq(bookings.eventId, eventId),
        isNotNull(bookingItems.tagCode),
        ...(filter.slotId ? [eq(bookings.slotId, filter.slotId)] : []),
        ...(filter.itemIds?.length ? [inArray(bookingItems.id, filter.itemIds)] : []),
      ),
    )
    .orderBy(asc(bookingItems.queueNumber));
