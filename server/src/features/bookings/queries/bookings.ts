import { and, asc, eq, inArray, lt } from 'drizzle-orm';
import { affectedRows } from '../../../db/retry';
import type { DbOrTx, Tx } from '../../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  idempotencyKeys,
  itemOutcomes,
  itemPhotos,
} from '../../../db/schema/index';

export async function insertBookingRows(
  tx: Tx,
  booking: typeof bookings.$inferInsert,
  items: Omit<typeof bookingItems.$inferInsert, 'bookingId'>[],
) {
  const [{ id }] = await tx.insert(bookings).values(booking).$returningId();
  const itemIds = await tx
    .insert(bookingItems)
    .values(items.map((i) => ({ ...i, bookingId: id })))
    .$returningId();
  return { id, itemIds: itemIds.map((x) => x.id) };
}

export const bookingByReference = async (db: DbOrTx, reference: string) =>
  (await db.select().from(bookings).where(eq(bookings.reference, reference)))[0];

export const lockBooking = async (tx: Tx, bookingId: number) =>
  (await tx.select().from(bookings).where(eq(bookings.id, bookingId)).for('update'))[0];

export async function cancelBookingRow(tx: Tx, bookingId: number) {
  await tx.update(bookings).set({ status: 'cancelled', cancelledAt: new Date() }).where(eq(bookings.id, bookingId));
}

export async function moveBookingRow(tx: Tx, bookingId: number, slotId: number) {
  await tx.update(bookings).set({ slotId, reminderSentAt: null }).where(eq(bookings.id, bookingId));
}

export const itemStatuses = (tx: DbOrTx, bookingId: number) =>
  tx.select({ status: bookingItems.status }).from(bookingItems).where(eq(bookingItems.bookingId, bookingId));

/** Each item's skill and label parts. */
export const itemsOf = (tx: DbOrTx, bookingId: number) =>
  tx
    .select({
      skill: categories.skill,
      slug: categories.slug,
      name: categories.name,
      brand: bookingItems.brand,
      model: bookingItems.model,
    })
    .from(bookingItems)
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .where(eq(bookingItems.bookingId, bookingId));

/** The items of a booking as the visitor's page shows them, with their outcome and photos. */
export async function bookingItemsWithPhotos(db: DbOrTx, bookingId: number) {
  const items = await db
    .select({
      id: bookingItems.id,
      categoryId: bookingItems.categoryId,
      categoryName: categories.name,
      categorySlug: categories.slug,
      skill: categories.skill,
      brand: bookingItems.brand,
      model: bookingItems.model,
      ageYears: bookingItems.ageYears,
      fault: bookingItems.fault,
      mains: bookingItems.mains,
      battery: bookingItems.battery,
      status: bookingItems.status,
      queueNumber: bookingItems.queueNumber,
      outcome: itemOutcomes.outcome,
    })
    .from(bookingItems)
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .where(eq(bookingItems.bookingId, bookingId))
    .orderBy(asc(bookingItems.position));
  const photos = items.length
    ? await db
        .select({
          id: itemPhotos.publicId,
          itemId: itemPhotos.itemId,
          width: itemPhotos.width,
          height: itemPhotos.height,
        })
        .from(itemPhotos)
        .where(
          inArray(
            itemPhotos.itemId,
            items.map((i) => i.id),
          ),
        )
    : [];
  return items.map((i) => ({
    ...i,
    mains: Boolean(i.mains),
    battery: Boolean(i.battery),
    photos: photos.filter((p) => p.itemId === i.id).map((p) => ({ id: p.id, width: p.width, height: p.height })),
  }));
}

/**
 * Writes the key's row; a key older than `expiredBefore` is dropped first, so it books anew. The plain read first
 * means a new key takes no lock before its insert: a DELETE of a key that is not there locks the gap where it would
 * go, and concurrent bookings whose keys share that gap then deadlock on their inserts (on one server, and more on
 * Galera, where 200 of 600 racing bookings failed that way).
 */
/** Writes the key's row; a key already there fails as a duplicate (the caller replays it, or clears it if stale). */
export async function claimIdempotencyKey(tx: Tx, key: string, bodyHash: string) {
  await tx.insert(idempotencyKeys).values({ key, scope: 'booking', bodyHash });
}
/** Removes the key's row if it was written before `expiredBefore`; answers whether it did. */
export async function clearStaleIdempotencyKey(db: DbOrTx, key: string, expiredBefore: Date) {
  const res = await db
    .delete(idempotencyKeys)
    .where(and(eq(idempotencyKeys.key, key), lt(idempotencyKeys.createdAt, expiredBefore)));
  return affectedRows(res) === 1;
}
export async function storeIdempotentAnswer(tx: Tx, key: string, statusCode: number, response: unknown) {
  await tx.update(idempotencyKeys).set({ statusCode, response }).where(eq(idempotencyKeys.key, key));
}
export const storedIdempotentAnswer = async (db: DbOrTx, key: string) =>
  (await db.select().from(idempotencyKeys).where(eq(idempotencyKeys.key, key)))[0];
