import type { AppContext } from '../../context';
import { enqueueMail } from '../../mail/outbox';
import { asLanguage } from '../../../../shared/i18n/languages';
import type { Job } from '../../core/feature';
import { manageTokenFor, manageUrl } from '../../core/links';
import { offerFreedPlaces } from './waitlist';
import { reminderMail } from './mails';
import { labelsOf } from './write';
import { dropIdempotencyKeysBefore, dueReminders, expiredOffers, expireOffer, markReminded } from './queries/jobs';
import { IDEMPOTENCY_HOURS } from './service';
import { itemsOf } from './queries/bookings';

/** Offers not taken in time release their places and pass them to the next in line. */
export async function expireOffers(ctx: AppContext): Promise<number> {
  return ctx.database.db.transaction(async (tx) => {
    const due = await expiredOffers(tx);
    for (const w of due) await expireOffer(tx, w);
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
    const due = await dueReminders(tx);
    for (const r of due) {
      const items = await itemsOf(tx, r.booking.id);
      await enqueueMail(
        tx,
        reminderMail({
          language: asLanguage(r.booking.language, asLanguage(r.group.defaultLanguage)),
          reference: r.booking.reference,
          visitorName: r.booking.visitorName,
          visitorEmail: r.booking.visitorEmail!,
          eventTitle: r.event.title,
          groupName: r.group.name,
          timeZone: r.group.timeZone,
          slotStartsAt: r.slot.startsAt,
          slotEndsAt: r.slot.endsAt,
          venue: r.venue,
          items: labelsOf(items, r.booking.language),
          manageUrl: manageUrl(
            ctx,
            r.booking.reference,
            manageTokenFor(ctx, r.booking.reference, r.booking.manageTokenVersion),
          ),
        }),
      );
      await markReminded(tx, r.booking.id);
    }
    return due.length;
  });
  if (sent) ctx.outbox.kick();
  return sent;
}

/** Idempotency keys past their lifetime no longer replay; their stored answers hold manage tokens, so they go. */
export const forgetIdempotencyKeys = (ctx: AppContext) =>
  ctx.database.db.transaction((tx) =>
    dropIdempotencyKeysBefore(tx, new Date(Date.now() - IDEMPOTENCY_HOURS * 3600_000)),
  );

export const bookingJobs: Job[] = [
  { name: 'expire waiting-list offers', run: expireOffers },
  { name: 'day-before reminders', run: sendReminders },
  { name: 'forget expired idempotency keys', run: forgetIdempotencyKeys },
];
