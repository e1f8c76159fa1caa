import { and, asc, eq, gte } from 'drizzle-orm';
import type { DbOrTx, Tx } from '../../../db/client';
import { bookings, events } from '../../../db/schema/index';

/** The confirmed bookings of an e-mail address whose session ended at `endedSince` or later (the case is folded). */
export const currentBookingsOf = (db: DbOrTx, email: string, endedSince: Date) =>
  db
    .select({ id: bookings.id })
    .from(bookings)
    .innerJoin(events, eq(events.id, bookings.eventId))
    .where(and(eq(bookings.visitorEmail, email), eq(bookings.status, 'confirmed'), gte(events.endsAt, endedSince)))
    .orderBy(asc(events.startsAt), asc(bookings.id));

/** Stores a booking's new token version and the hash of its token: the links mailed before stop working. */
export async function setManageToken(tx: Tx, bookingId: number, version: number, tokenHash: string) {
  await tx
    .update(bookings)
    .set({ manageTokenVersion: version, manageTokenHash: tokenHash })
    .where(eq(bookings.id, bookingId));
}
