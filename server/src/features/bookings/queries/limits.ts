import { and, count, eq, inArray } from 'drizzle-orm';
import type { DbOrTx } from '../../../db/client';
import { bookingItems, itemPhotos, waitlistEntries } from '../../../db/schema/index';

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
