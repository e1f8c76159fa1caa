import { and, asc, eq, inArray, isNotNull, isNull, lte } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import type { FollowUpStatus } from '../../../../../shared/impact/follow-ups';
import type { DbOrTx } from '../../../db/client';
import { affectedRows } from '../../../db/retry';
import {
  bookingItems,
  bookings,
  categories,
  events,
  followUps,
  itemOutcomes,
  repairGroups,
} from '../../../db/schema/index';

export async function findFollowUp(db: DbOrTx, itemId: number) {
  const [f] = await db.select().from(followUps).where(eq(followUps.itemId, itemId));
  return f;
}

export async function openFollowUp(db: DbOrTx, itemId: number, groupId: number) {
  await db.insert(followUps).values({ itemId, groupId, status: 'open' });
}

export async function outcomeOf(db: DbOrTx, itemId: number) {
  const [o] = await db.select().from(itemOutcomes).where(eq(itemOutcomes.itemId, itemId));
  return o;
}

export async function markMailed(db: DbOrTx, itemId: number) {
  await db.update(followUps).set({ mailedAt: new Date() }).where(eq(followUps.itemId, itemId));
}

export async function markReminded(db: DbOrTx, itemId: number) {
  await db.update(followUps).set({ remindedAt: new Date() }).where(eq(followUps.itemId, itemId));
}

/** An outcome that needs no part after all: an open follow-up goes (one that moved on stays). */
export async function dropOpenFollowUp(db: DbOrTx, itemId: number) {
  await db.delete(followUps).where(and(eq(followUps.itemId, itemId), eq(followUps.status, 'open')));
}

/** The earlier item's follow-up moves on: its return visit `returnItemId` came with this result. */
export async function moveOn(db: DbOrTx, earlierItemId: number, status: FollowUpStatus, returnItemId: number) {
  await db
    .update(followUps)
    .set({ status, returnItemId, updatedAt: new Date() })
    .where(eq(followUps.itemId, earlierItemId));
}

/** Of these items, the return visits and the item each returns. */
export const returnsAmong = (db: DbOrTx, itemIds: number[]) =>
  db
    .select({ id: bookingItems.id, returnOf: bookingItems.returnOfItemId })
    .from(bookingItems)
    .where(and(inArray(bookingItems.id, itemIds), isNotNull(bookingItems.returnOfItemId)));

/** A return visit arrived: the earlier item's follow-up, while still waiting, says it came back. */
export async function markCameBackRow(db: DbOrTx, earlierItemId: number, returnItemId: number) {
  await db
    .update(followUps)
    .set({ status: 'came-back', returnItemId, updatedAt: new Date() })
    .where(and(eq(followUps.itemId, earlierItemId), inArray(followUps.status, ['open', 'part-ordered', 'rebooked'])));
}

/** A group's follow-ups, oldest first, with the item, visitor, part and the return visit when there is one. */
export function followUpRows(db: DbOrTx, groupId: number) {
  const ret = alias(bookingItems, 'return_item');
  const retBooking = alias(bookings, 'return_booking');
  const retEvent = alias(events, 'return_event');
  return db
    .select({
      f: followUps,
      categoryName: categories.name,
      categorySlug: categories.slug,
      brand: bookingItems.brand,
      model: bookingItems.model,
      visitorName: bookings.visitorName,
      visitorEmail: bookings.visitorEmail,
      visitorPhone: bookings.visitorPhone,
      reference: bookings.reference,
      eventTitle: events.title,
      eventStartsAt: events.startsAt,
      part: itemOutcomes.partDescription,
      partLink: itemOutcomes.partLink,
      partCostCents: itemOutcomes.partCostCents,
      returnReference: retBooking.reference,
      returnEventTitle: retEvent.title,
      returnStartsAt: retEvent.startsAt,
    })
    .from(followUps)
    .innerJoin(bookingItems, eq(bookingItems.id, followUps.itemId))
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, followUps.itemId))
    .leftJoin(ret, eq(ret.id, followUps.returnItemId))
    .leftJoin(retBooking, eq(retBooking.id, ret.bookingId))
    .leftJoin(retEvent, eq(retEvent.id, retBooking.eventId))
    .where(eq(followUps.groupId, groupId))
    .orderBy(asc(followUps.createdAt));
}

/** Sets the status (and the note when given); false when there is no follow-up for the item. */
export async function updateFollowUpStatus(db: DbOrTx, itemId: number, status: FollowUpStatus, note?: string) {
  const res = await db
    .update(followUps)
    .set({ status, updatedAt: new Date(), ...(note !== undefined ? { note } : {}) })
    .where(eq(followUps.itemId, itemId));
  return affectedRows(res) > 0;
}

export async function followUpGroupId(db: DbOrTx, itemId: number) {
  if (!Number.isInteger(itemId) || itemId <= 0) return 0;
  const [f] = await db.select({ groupId: followUps.groupId }).from(followUps).where(eq(followUps.itemId, itemId));
  return f?.groupId ?? 0;
}

/** Marks the follow-up rebooked unless a return visit is already recorded; false when it was. */
export async function markRebookedRow(db: DbOrTx, earlierItemId: number, returnItemId: number) {
  const res = await db
    .update(followUps)
    .set({ status: 'rebooked', returnItemId, updatedAt: new Date() })
    .where(and(eq(followUps.itemId, earlierItemId), isNull(followUps.returnItemId)));
  return affectedRows(res) === 1;
}

/** Follow-ups still waiting, not yet reminded and created before `cutoff`; locked, 200 at a time. */
export const remindersDue = (tx: DbOrTx, cutoff: Date) =>
  tx
    .select({
      f: followUps,
      booking: bookings,
      categoryName: categories.name,
      categorySlug: categories.slug,
      groupName: repairGroups.name,
      currency: repairGroups.currency,
      o: itemOutcomes,
    })
    .from(followUps)
    .innerJoin(bookingItems, eq(bookingItems.id, followUps.itemId))
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .innerJoin(repairGroups, eq(repairGroups.id, followUps.groupId))
    .innerJoin(itemOutcomes, eq(itemOutcomes.itemId, followUps.itemId))
    .where(
      and(
        inArray(followUps.status, ['open', 'part-ordered']),
        isNull(followUps.remindedAt),
        lte(followUps.createdAt, cutoff),
      ),
    )
    .limit(200)
    .for('update', { skipLocked: true });
