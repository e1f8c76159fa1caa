import { and, eq, isNotNull, isNull, lte, sql } from 'drizzle-orm';
import type { AppContext } from '../../context';
import { bookingItems, bookings, categories, events, slots, waitlistEntries } from '../../db/schema/index';
import { enqueueMail } from '../../mail/outbox';
import type { Job } from '../../core/feature';
import { manageTokenFor, manageUrl } from '../../core/links';
import { offerFreedPlaces } from './waitlist';
import { reminderMail } from './mails';
import { bookingWithContext } from './queries/context';
import { itemLabel } from '../../../../shared/item-label';

/** Offers not taken in time release their places and pass them to the next in line. */
export async function expireOffers(ctx: AppContext): Promise<number> {
  return ctx.database.db.transaction(async (tx) => {
    const due = await tx
      .select()
      .from(waitlistEntries)
      .where(and(eq(waitlistEntries.status, 'offered'), lte(waitlistEntries.offerExpiresAt, sql`NOW(3)`)))
      .limit(50)
      .for('update', { skipLocked: true });
    for (const w of due) {
      await tx.update(waitlistEntries).set({ status: 'expired' }).where(eq(waitlistEntries.id, w.id));
      await tx
        .update(slots)
        .set({ held: sql`GREATEST(${slots.held} - ${w.places}, 0)` })
        .where(eq(slots.id, w.slotId));
    }
    for (const slotId of new Set(due.map((w) => w.slotId))) await offerFreedPlaces(ctx, tx, slotId);
    if (due.length) ctx.outbox.kick();
    return due.length;
  });
}

/**
 * The reminder goes out within the 24 hours before the booked slot, once, and only to bookings made before that
 * window opened (someone who booked this morning just had the confirmation).
 */
export async function sendReminders(ctx: AppContext): Promise<number> {
  const sent = await ctx.database.db.transaction(async (tx) => {
    const due = await bookingWithContext(tx)
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
    for (const r of due) {
      const items = await tx
        .select({ name: categories.name, brand: bookingItems.brand, model: bookingItems.model })
        .from(bookingItems)
        .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
        .where(eq(bookingItems.bookingId, r.booking.id));
      await enqueueMail(
        tx,
        reminderMail({
          reference: r.booking.reference,
          visitorName: r.booking.visitorName,
          visitorEmail: r.booking.visitorEmail!,
          eventTitle: r.event.title,
          groupName: r.group.name,
          timeZone: r.group.timeZone,
          slotStartsAt: r.slot.startsAt,
          slotEndsAt: r.slot.endsAt,
          venue: r.venue,
          items: items.map((i) => itemLabel({ categoryName: i.name, brand: i.brand, model: i.model })),
          manageUrl: manageUrl(ctx, r.booking.reference, manageTokenFor(ctx, r.booking.reference)),
        }),
      );
      await tx.update(bookings).set({ reminderSentAt: new Date() }).where(eq(bookings.id, r.booking.id));
    }
    return due.length;
  });
  if (sent) ctx.outbox.kick();
  return sent;
}

export const bookingJobs: Job[] = [
  { name: 'expire waiting-list offers', run: expireOffers },
  { name: 'day-before reminders', run: sendReminders },
];
