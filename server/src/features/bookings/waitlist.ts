import type { AppContext } from '../../context';
import type { Tx } from '../../db/client';
import { asLanguage, DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';
import { withDeadlockRetry } from '../../db/retry';
import { newToken } from '../../auth/tokens';
import { HttpError, notFound } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { screenItems } from '../../core/screening';
import { mailAllowance } from '../../mail/allowance';
import { openWaitsFor } from './queries/limits';
import { eventWithContext, slotWithContextById } from './queries/context';
import { holdPlaces, lockSlot, releaseSlotPlaces } from './queries/places';
import {
  insertWaitlistEntry,
  lineLength,
  markClaimed,
  markOffered,
  offerByToken,
  waitingInLine,
} from './queries/waitlist';
import { offerMail, waitlistJoinedMail } from './mails';
import {
  bookabilityOf,
  bookableSlot,
  insertBooking,
  prepareBooking,
  refuse,
  skillsOf,
  type BookingInput,
} from './write';

export const OFFER_HOURS = 12;

/** Frees `places` in a slot, then offers them to the waiting list in order. Runs in the caller's transaction. */
export async function releasePlaces(ctx: AppContext, tx: Tx, slotId: number, places: number) {
  await releaseSlotPlaces(tx, slotId, places);
  await offerFreedPlaces(ctx, tx, slotId);
}

/** Offers free places of a slot to those waiting, first come first served, holding the places meanwhile. */
export async function offerFreedPlaces(ctx: AppContext, tx: Tx, slotId: number) {
  const s = await lockSlot(tx, slotId);
  let free = s.capacity - s.booked - s.held;
  if (free <= 0) return;
  const waiting = await waitingInLine(tx, slotId);
  if (!waiting.length) return;
  const [ctxRow] = await eventWithContext(tx, s.eventId);
  if (ctxRow.event.status !== 'published') return;
  for (const w of waiting) {
    // The first in line is served first: a large request waits rather than being skipped for a smaller one.
    if (w.places > free) break;
    const { token, hash } = newToken();
    const latest = s.startsAt.getTime() - 15 * 60_000;
    const expires = new Date(Math.max(Date.now() + 15 * 60_000, Math.min(Date.now() + OFFER_HOURS * 3600_000, latest)));
    await markOffered(tx, w.id, hash, expires);
    await holdPlaces(tx, slotId, w.places);
    free -= w.places;
    await enqueueMail(
      tx,
      offerMail(
        {
          language: asLanguage(w.request.language, asLanguage(ctxRow.group.defaultLanguage)),
          visitorName: w.visitorName,
          visitorEmail: w.visitorEmail,
          eventTitle: ctxRow.event.title,
          groupName: ctxRow.group.name,
          timeZone: ctxRow.group.timeZone,
          slotStartsAt: s.startsAt,
          slotEndsAt: s.endsAt,
          venue: ctxRow.venue,
          items: [],
        },
        `${ctx.env.publicUrl}/waiting-list/${token}`,
        expires,
      ),
    );
  }
}

/**
 * Joins the waiting list of a full slot; answers the position in line. The shared rule decides as for a booking:
 * a time with room is booked directly, and a kind whose limit is reached refuses the whole request (waiting would
 * not make room for it), so no item of a booking waits while another is refused.
 */
export async function joinWaitlist(
  ctx: AppContext,
  eventId: number,
  input: BookingInput,
  language: Language = DEFAULT_LANGUAGE,
) {
  const allowance = mailAllowance(ctx);
  await allowance.takeOrRefuse(input.visitor.email);
  const position = await joinLine(ctx, eventId, input, language).catch(async (err: unknown) => {
    await allowance.giveBack(input.visitor.email);
    throw err;
  });
  ctx.outbox.kick();
  return { position };
}

async function joinLine(ctx: AppContext, eventId: number, input: BookingInput, language: Language) {
  return ctx.database.db.transaction(async (tx) => {
    const row = await bookableSlot(tx, input.slotId, { lock: true });
    if (row.event.id !== eventId)
      throw new HttpError(400, 'invalid', 'errors.invalid', { slotId: 'Choose a time of this event.' });
    const cats = await screenItems(tx, row.group, input.items);
    const bookability = await bookabilityOf(tx, row, skillsOf(input.items, cats));
    if (bookability.ok) throw new HttpError(409, 'places-free', 'This time still has free places: book it directly.');
    if (bookability.reason !== 'full') refuse(bookability);
    const max = ctx.env.BOOKINGS_PER_SESSION_MAX;
    if ((await openWaitsFor(tx, row.event.id, input.visitor.email)) >= max)
      throw new HttpError(
        409,
        'waitlist-cap',
        `This e-mail address is already waiting for ${max} places in this session. We will write when one comes free.`,
      );
    await insertWaitlistEntry(tx, {
      eventId: row.event.id,
      slotId: row.slot.id,
      visitorName: input.visitor.name,
      visitorEmail: input.visitor.email,
      request: { visitor: input.visitor, items: input.items, language },
      places: input.items.length,
    });
    const n = await lineLength(tx, row.slot.id);
    await enqueueMail(
      tx,
      waitlistJoinedMail(
        {
          language,
          visitorName: input.visitor.name,
          visitorEmail: input.visitor.email,
          eventTitle: row.event.title,
          groupName: row.group.name,
          timeZone: row.group.timeZone,
          slotStartsAt: row.slot.startsAt,
          slotEndsAt: row.slot.endsAt,
          venue: row.venue,
          items: [],
        },
        n,
      ),
    );
    return n;
  });
}

export async function offerView(ctx: AppContext, token: string) {
  return ctx.database.db.transaction(async (tx) => {
    const w = await offerByToken(tx, token, false);
    if (!w) throw notFound('That offer');
    const row = await slotWithContextById(tx, w.slotId);
    const expired = w.status === 'expired' || (w.status === 'offered' && w.offerExpiresAt!.getTime() < Date.now());
    return {
      status: expired ? 'expired' : w.status,
      expiresAt: w.offerExpiresAt,
      places: w.places,
      visitorName: w.visitorName,
      event: { id: row.event.id, title: row.event.title, groupName: row.group.name, timeZone: row.group.timeZone },
      venue: row.venue,
      slot: { startsAt: row.slot.startsAt, endsAt: row.slot.endsAt },
      items: w.request.items.map((i) => ({ categoryId: i.categoryId, fault: i.fault })),
    };
  });
}

/** Turns an offered waiting-list place into a booking, using the places held for it. */
export async function claimOffer(ctx: AppContext, token: string) {
  const result = await withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const w = await offerByToken(tx, token, true);
      if (!w) throw notFound('That offer');
      if (w.status === 'claimed')
        throw new HttpError(
          409,
          'already-claimed',
          'This place has already been taken with this link. Check your mail for the booking.',
        );
      if (w.status !== 'offered' || w.offerExpiresAt!.getTime() < Date.now())
        throw new HttpError(410, 'offer-expired', 'This offer has run out and the place has gone to the next person.');
      const row = await bookableSlot(tx, w.slotId);
      const cats = await screenItems(tx, row.group, (w.request as BookingInput).items);
      // The booking keeps the language the visitor joined the line in.
      const prepared = prepareBooking(ctx, asLanguage(w.request.language, asLanguage(row.group.defaultLanguage)));
      const booking = await insertBooking(ctx, tx, row, w.request as BookingInput, true, prepared, cats);
      await markClaimed(tx, w.id, booking.id);
      return booking;
    }),
  );
  ctx.outbox.kick();
  return {
    reference: result.reference,
    manageToken: result.manageToken,
    eventId: result.eventId,
    slotId: result.slotId,
    itemIds: result.itemIds,
  };
}
