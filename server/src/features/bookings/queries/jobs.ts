import { and, eq, isNotNull, isNull, lt, lte, sql } from 'drizzle-orm';
import type { Tx } from '../../../db/client';
import { bookings, events, idempotencyKeys, slots, waitlistEntries } from '../../../db/schema/index';
import { bookingWithContext } from './context';

/** Offers whose time ran out, locked; rows another process is handling are skipped. */
export const expiredOffers = (tx: Tx) =>
  tx
    .select()
    .from(waitlistEntries)
    .where(and(eq(waitlistEntries.status, 'offered'), lte(waitlistEntries.offerExpiresAt, sql`NOW(3)`)))
    .limit(50)
    .for('update', { skipLocked: true });

/** Marks the offer expired and gives its held places back to the slot. */
export async function expireOffer(tx: Tx, entry: { id: number; slotId: number; places: number }) {
  await tx.update(waitlistEntries).set({ status: 'expired' }).where(eq(waitlistEntries.id, entry.id));
  await tx
    .update(slots)
    .set({ held: sql`GREATEST(${slots.held} - ${entry.places}, 0)` })
    .where(eq(slots.id, entry.slotId));
}

/**
 * Confirmed bookings whose slot starts within 24 hours, not yet reminded, made before that window opened; locked,
 * skipping rows another process is handling.
 */
export const dueReminders = (tx: Tx) =>
  bookingWithContext(tx)
    .where(
      and(
        eq(bookings.status, 'confirmed'),
        isNull(bookings.reminderSentAt),
        isNotNull(bookings.visitorEmail),
        eq(events.status, 'published'),
        sql`${slots.startsAt} > NOW(3)`,
        sql`${slots.startsAt} <= NOW(3) + INTERVAL 24 HOUR`,
        sql`${bookings.createdAt} < ${slots.startsAt} - INTERVAL 24 HOUR`,
      ),
    )
    .limit(200)
    .for('update', { skipLocked: true });

export async function markReminded(tx: Tx, bookingId: number) {
  await tx.update(bookings).set({ reminderSentAt: new Date() }).where(eq(bookings.id, bookingId));
}

/** Drops stored answers (manage tokens in them) whose key no longer replays. */
export async function dropIdempotencyKeysBefore(tx: Tx, before: Date) {
  const [r] = await tx.delete(idempotencyKeys).where(lt(idempotencyKeys.createdAt, before));
  return r.affectedRows;
}
