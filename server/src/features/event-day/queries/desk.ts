import { and, asc, eq, gte, inArray, lte } from 'drizzle-orm';
import { QUEUED_STATUSES } from '../../../../../shared/event-day/constants';
import type { DbOrTx, Tx } from '../../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  itemAssignments,
  memberships,
  repairGroups,
} from '../../../db/schema/index';

/* The desk's reads and writes: bookings, their items and the event's slots. */

export async function bookingByReference(db: DbOrTx, reference: string) {
  const [b] = await db
    .select({ id: bookings.id, eventId: bookings.eventId })
    .from(bookings)
    .where(eq(bookings.reference, reference));
  return b;
}

/** The group of a booking, for the role guard (0 when there is no such booking, which the guard refuses). */
export async function groupOfBooking(db: DbOrTx, reference: string): Promise<number> {
  const [b] = await db
    .select({ groupId: events.groupId })
    .from(bookings)
    .innerJoin(events, eq(events.id, bookings.eventId))
    .where(eq(bookings.reference, reference));
  return b?.groupId ?? 0;
}

/** The event's row, locked: check-ins of one event queue behind each other for their numbers. */
export async function lockEvent(tx: Tx, eventId: number) {
  const [e] = await tx.select().from(events).where(eq(events.id, eventId)).for('update');
  return e;
}

export async function lockBooking(tx: Tx, bookingId: number) {
  const [b] = await tx.select().from(bookings).where(eq(bookings.id, bookingId)).for('update');
  return b;
}

export const itemsOfBooking = (db: DbOrTx, bookingId: number) =>
  db.select().from(bookingItems).where(eq(bookingItems.bookingId, bookingId)).orderBy(asc(bookingItems.position));

export async function existingCategoryIds(db: DbOrTx, ids: number[]) {
  if (!ids.length) return [];
  const rows = await db.select({ id: categories.id }).from(categories).where(inArray(categories.id, ids));
  return rows.map((r) => r.id);
}

export async function groupById(db: DbOrTx, groupId: number) {
  const [g] = await db.select().from(repairGroups).where(eq(repairGroups.id, groupId));
  return g;
}

export const updateItem = (tx: Tx, itemId: number, set: Partial<typeof bookingItems.$inferInsert>) =>
  tx.update(bookingItems).set(set).where(eq(bookingItems.id, itemId));

/** A plan's placement of an item that left; a fixer's own (locked) placement stays. */
export const dropUnlockedPlacement = (tx: Tx, itemId: number) =>
  tx.delete(itemAssignments).where(and(eq(itemAssignments.itemId, itemId), eq(itemAssignments.locked, false)));

const issued = {
  id: bookingItems.id,
  tagCode: bookingItems.tagCode,
  queueNumber: bookingItems.queueNumber,
  status: bookingItems.status,
};

export const issuedOfBooking = (db: DbOrTx, bookingId: number) =>
  db.select(issued).from(bookingItems).where(eq(bookingItems.bookingId, bookingId)).orderBy(asc(bookingItems.position));

export async function issuedItems(db: DbOrTx, ids: number[]) {
  if (!ids.length) return [];
  return db.select(issued).from(bookingItems).where(inArray(bookingItems.id, ids)).orderBy(asc(bookingItems.id));
}

export async function insertBooking(tx: Tx, values: typeof bookings.$inferInsert) {
  const [{ id }] = await tx.insert(bookings).values(values).$returningId();
  return id;
}

export async function insertItems(tx: Tx, values: (typeof bookingItems.$inferInsert)[]) {
  const ids = await tx.insert(bookingItems).values(values).$returningId();
  return ids.map((x) => x.id);
}

/** The event's queued items with whether the plan placed them, locked while their status follows the plan. */
export const queuedWithPlacement = (tx: Tx, eventId: number) =>
  tx
    .select({ id: bookingItems.id, status: bookingItems.status, placed: itemAssignments.itemId })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .leftJoin(itemAssignments, eq(itemAssignments.itemId, bookingItems.id))
    .where(and(eq(bookings.eventId, eventId), inArray(bookingItems.status, [...QUEUED_STATUSES])))
    .for('update');

/** Every standing booking of the event with its items, walk-ins last, in booking order. */
export const deskRows = (db: DbOrTx, eventId: number) =>
  db
    .select({ booking: bookings, item: bookingItems, categoryName: categories.name, categorySlug: categories.slug })
    .from(bookings)
    .innerJoin(bookingItems, eq(bookingItems.bookingId, bookings.id))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed')))
    .orderBy(asc(bookings.walkIn), asc(bookings.createdAt), asc(bookingItems.position));

/** Groups where the user runs the desk (reception or organiser, active). */
export async function deskGroupIds(db: DbOrTx, userId: number) {
  const rows = await db
    .select({ groupId: memberships.groupId })
    .from(memberships)
    .where(
      and(
        eq(memberships.userId, userId),
        inArray(memberships.role, ['host', 'organiser']),
        eq(memberships.status, 'active'),
      ),
    );
  return rows.map((m) => m.groupId);
}

/** Published or closed events ending after `since` and starting before `until`, soonest first. */
export const deskEventRows = (db: DbOrTx, since: Date, until: Date, groupIds: number[] | undefined) =>
  db
    .select({
      id: events.id,
      title: events.title,
      startsAt: events.startsAt,
      endsAt: events.endsAt,
      status: events.status,
      groupId: repairGroups.id,
      groupName: repairGroups.name,
      timeZone: repairGroups.timeZone,
    })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(
      and(
        inArray(events.status, ['published', 'closed']),
        gte(events.endsAt, since),
        ...(groupIds ? [inArray(events.groupId, groupIds)] : []),
        lte(events.startsAt, until),
      ),
    )
    .orderBy(asc(events.startsAt))
    .limit(10);
