import { and, count, eq, inArray } from 'drizzle-orm';
import type { DbOrTx } from '../../../db/client';
import { bookingItems, bookings, itemPhotos, waitlistEntries } from '../../../db/schema/index';

/** Confirmed bookings made under one e-mail address for one session (the column's collation ignores case). */
export async function activeBookingsFor(db: DbOrTx, eventId: number, email: string) {
  const [{ n }] = await db
    .select({ n: count() })
    .from(bookings)
    .where(and(eq(bookings.eventId, eventId), eq(bookings.visitorEmail, email), eq(bookings.status, 'confirmed')));
  return n;
}

/** Places waited for, or offered, under one e-mail address in one session. */
export async function openWaitsFor(db: DbOrTx, eventId: number, email: string) {
  const [{ n }] = await db
    .select({ n: count() })
    .from(waitlistEntries)
    .where(
      and(
        eq(waitlistEntries.eventId, eventId),
        eq(waitlistEntries.visitorEmail, email),
        inArray(waitlistEntries.status, ['waiting', 'offered']),
      ),
    );
  return n;
}

/** The visitor's own photos over all the items of a booking. */
export async function intakePhotosOf(db: DbOrTx, bookingId: number) {
  const [{ n }] = await db
    .select({ n: count() })
    .from(itemPhotos)
    .innerJoin(bookingItems, eq(bookingItems.id, itemPhotos.itemId))
    .where(and(eq(bookingItems.bookingId, bookingId), eq(itemPhotos.kind, 'intake')));
  return n;
}
