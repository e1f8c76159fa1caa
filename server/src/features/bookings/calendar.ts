import { bookingEntry } from '../../../../shared/calendar';
import type { AppContext } from '../../context';
import { calendarText } from '../../core/calendar';
import { manageTokenFor, manageUrl } from '../../core/links';
import { HttpError } from '../../http/errors';
import { translate } from '../../i18n';
import { asLanguage } from '../../../../shared/i18n/languages';
import { itemsOf } from './queries/bookings';
import { bookingWithContextById } from './queries/context';
import { labelsOf } from './write';

/**
 * A booked slot as an iCalendar file, for the holder of the manage link only. A cancelled booking (or session)
 * answers 409: a file for a visit that will not happen would only put a wrong date in someone's calendar.
 */
export async function bookingCalendar(ctx: AppContext, bookingId: number) {
  const { db } = ctx.database;
  const row = await bookingWithContextById(db, bookingId);
  const b = row.booking;
  if (b.status === 'cancelled') throw new HttpError(409, 'cancelled', 'This booking is cancelled.');
  if (row.event.status === 'cancelled') throw new HttpError(409, 'cancelled', 'This session has been cancelled.');
  const entry = bookingEntry(
    {
      reference: b.reference,
      eventTitle: row.event.title,
      groupName: row.group.name,
      slotStartsAt: row.slot.startsAt,
      slotEndsAt: row.slot.endsAt,
      venue: row.venue,
      manageUrl: manageUrl(ctx, b.reference, manageTokenFor(ctx, b.reference, b.manageTokenVersion)),
      itemNames: labelsOf(await itemsOf(db, bookingId), b.language),
    },
    ctx.env.publicUrl,
    new Date(),
    // In the language the visitor booked in, like the mails.
    (key, values) => translate(asLanguage(b.language), `mail.ics.${key}`, values),
  );
  return { text: calendarText(row.event.title, [entry]), filename: `mendery-${b.reference}.ics` };
}
