import type { AppContext } from '../../context';
import type { BookingCodeStatus } from '../../../../shared/api/bookings';
import { DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';
import type { Tx } from '../../db/client';
import { isDuplicate, withDeadlockRetry } from '../../db/retry';
import { sha256 } from '../../auth/tokens';
import { HttpError, notFound } from '../../http/errors';
import { checkManageToken } from '../../core/links';
import { signPath, signingKey } from '../../http/signed-url';
import { screenItems } from '../../core/screening';
import { mailAllowance } from '../../mail/allowance';
import type { CountedMail } from '../../http/visitor-limits';
import { bookingWithContextById } from './queries/context';
import {
  bookingByReference,
  bookingItemsWithPhotos,
  claimIdempotencyKey,
  clearStaleIdempotencyKey,
  storedIdempotentAnswer,
  storeIdempotentAnswer,
} from './queries/bookings';
import { bookingQrText, qrDataUrl } from './mails';
import {
  bookabilityOf,
  bookabilityWith,
  bookableSlot,
  bookableSlotFor,
  insertBooking,
  prepareBooking,
  refuse,
  skillsOf,
  type BookingInput,
  type BookingResult,
} from './write';
import { categoryText } from '../../i18n';

export type { BookingInput, BookingResult } from './write';

/**
 * A return visit booked through a follow-up's priority link: one item, continuing the earlier visit, allowed one
 * place over the slot's capacity. `inTx` runs in the same transaction (the follow-up's status).
 */
export async function createReturnBooking(
  ctx: AppContext,
  input: BookingInput,
  returnOfItemId: number,
  language: Language,
  inTx: (tx: Tx, result: BookingResult) => Promise<void>,
) {
  const row = await bookableSlot(ctx.database.db, input.slotId);
  const cats = await screenItems(ctx.database.db, row.group, input.items);
  refuse(await bookabilityOf(ctx.database.db, row, skillsOf(input.items, cats), 1));
  for (let attempt = 0; ; attempt++) {
    const prepared = prepareBooking(ctx, language);
    try {
      const result = await withDeadlockRetry(() =>
        ctx.database.db.transaction(async (tx) => {
          const r = await insertBooking(ctx, tx, row, input, false, prepared, cats, returnOfItemId);
          await inTx(tx, r);
          return r;
        }),
      );
      ctx.outbox.kick();
      return result;
    } catch (err) {
      if (!isDuplicate(err) || attempt >= 3) throw err;
    }
  }
}

/** How long an Idempotency-Key replays its first answer; after that the key books anew. */
export const IDEMPOTENCY_HOURS = 24;

/**
 * Books a slot. The shared rule decides first (a passed time, a kind's limit, places); then the places are taken
 * with a conditional UPDATE in the same transaction as the booking, so the capacity holds under any number of
 * simultaneous requests. With an idempotency key the first answer is stored and replayed for the same key and the
 * same form within IDEMPOTENCY_HOURS, so a form sent twice books once; the key with another form is refused.
 */
export async function createBooking(
  ctx: AppContext,
  input: BookingInput,
  idempotencyKey?: string,
  language: Language = DEFAULT_LANGUAGE,
  countedMail?: CountedMail,
): Promise<{ status: number; body: unknown; replayed: boolean }> {
  const key = idempotencyKey ? `booking:${idempotencyKey}` : null;
  const bodyHash = sha256(JSON.stringify(input));
  const email = input.visitor.email;
  // The confirmation mail is counted before the booking (by the route's limits, or here); it is given back if no
  // booking (so no mail) comes of the request, whatever refuses it.
  const allowance = mailAllowance(ctx);
  let countedHere = false;
  let mailed = false;
  try {
    const checks = await bookableSlotFor(ctx.database.db, input.slotId, email);
    const cats = await screenItems(ctx.database.db, checks.row.group, input.items, checks.excluded);
    if (!countedMail) {
      countedHere = true;
      if (!(await allowance.take(email))) throw allowance.refusal();
    } else if (!countedMail.within) throw allowance.refusal();
    const result = await bookOnce(ctx, input, key, bodyHash, checks, cats, language);
    mailed = !result.replayed;
    return result;
  } finally {
    if (!mailed) {
      if (countedMail) await countedMail.giveBack();
      else if (countedHere) await allowance.giveBack(email);
    }
  }
}

async function bookOnce(
  ctx: AppContext,
  input: BookingInput,
  key: string | null,
  bodyHash: string,
  checks: Awaited<ReturnType<typeof bookableSlotFor>>,
  cats: Awaited<ReturnType<typeof screenItems>>,
  language: Language,
): Promise<{ status: number; body: unknown; replayed: boolean }> {
  const { row } = checks;
  // The shared rule's answer and the address's bookings for the session, as read before the transaction (reads that
  // lock nothing, in or out of it): the conditional UPDATE of the places is what holds the capacity.
  const bookability = bookabilityWith(row, checks.skillTaken, skillsOf(input.items, cats));
  const max = ctx.env.BOOKINGS_PER_SESSION_MAX;
  for (let attempt = 0; ; attempt++) {
    const prepared = prepareBooking(ctx, language);
    try {
      const body = await withDeadlockRetry(() =>
        ctx.database.db.transaction(async (tx) => {
          // The key's row is written first: a second request with the same key waits here on the row lock,
          // then fails as a duplicate once the first has committed (and replays the first answer below).
          if (key) await claimIdempotencyKey(tx, key, bodyHash);
          refuse(bookability);
          if (checks.active >= max)
            throw new HttpError(
              409,
              'booking-cap',
              `This e-mail address already has ${max} bookings for this session. Cancel one from its link to book another time, or ask the organisers.`,
            );
          const result = await insertBooking(ctx, tx, row, input, false, prepared, cats);
          const body = {
            reference: result.reference,
            manageToken: result.manageToken,
            eventId: result.eventId,
            slotId: result.slotId,
            itemIds: result.itemIds,
          };
          if (key) await storeIdempotentAnswer(tx, key, 201, body);
          return body;
        }),
      );
      ctx.outbox.kick();
      return { status: 201, body, replayed: false };
    } catch (err) {
      if (!isDuplicate(err)) throw err;
      if (key) {
        // A key older than IDEMPOTENCY_HOURS books anew: its row goes, and the booking is tried again.
        const expiredBefore = new Date(Date.now() - IDEMPOTENCY_HOURS * 3600_000);
        if (attempt < 3 && (await clearStaleIdempotencyKey(ctx.database.db, key, expiredBefore))) continue;
        const stored = await storedIdempotentAnswer(ctx.database.db, key);
        if (stored && stored.bodyHash !== bodyHash)
          throw new HttpError(
            422,
            'idempotency-key-reused',
            'This Idempotency-Key was sent with another booking form. Send the new form with a new key.',
          );
        if (stored?.response) return { status: stored.statusCode ?? 201, body: stored.response, replayed: true };
      }
      // A reference drawn twice (one in a billion): draw again.
      if (attempt >= 3) throw err;
    }
  }
}

/**
 * Finds a booking by reference and its secret token; anything else is "not found", so references leak nothing. A link
 * past its lifetime answers 410.
 */
export async function bookingByToken(ctx: AppContext, reference: string, token: string | undefined) {
  const b = await bookingByReference(ctx.database.db, reference);
  if (!b) throw notFound('That booking');
  await checkManageToken(ctx, b, token);
  return b;
}

/** The booking a signed address names (the route has checked the signature for this very path). */
export async function bookingOfSignedPath(ctx: AppContext, reference: string) {
  const b = await bookingByReference(ctx.database.db, reference);
  if (!b) throw notFound('That booking');
  return b;
}

/** What the page behind a booking's QR code may say to anyone holding it: the reference and whether it stands. */
export async function bookingCodeStatus(ctx: AppContext, reference: string): Promise<BookingCodeStatus> {
  const b = await bookingByReference(ctx.database.db, reference);
  if (!b) throw notFound('That booking');
  return { reference: b.reference, status: b.status };
}

export async function bookingView(ctx: AppContext, bookingId: number, lang: Language = DEFAULT_LANGUAGE) {
  const { db } = ctx.database;
  const row = await bookingWithContextById(db, bookingId);
  const b = row.booking;
  // The page loads photos and the calendar file as plain links: short-lived signed addresses, never the token.
  const key = signingKey(ctx.env.SESSION_SECRET);
  const now = Date.now();
  const items = (await bookingItemsWithPhotos(db, bookingId)).map(({ categorySlug, ...i }) => ({
    ...i,
    // A seeded kind of item in the reader's language; a group's own wording as typed.
    categoryName: categoryText(lang, categorySlug, 'name', i.categoryName),
    photos: i.photos.map((p) => ({ ...p, url: signPath(key, `/api/photos/${p.id}`, now) })),
  }));
  return {
    reference: b.reference,
    status: b.status,
    createdAt: b.createdAt,
    cancelledAt: b.cancelledAt,
    visitor: { name: b.visitorName, email: b.visitorEmail, phone: b.visitorPhone },
    event: {
      id: row.event.id,
      title: row.event.title,
      status: row.event.status,
      startsAt: row.event.startsAt,
      endsAt: row.event.endsAt,
      groupName: row.group.name,
      timeZone: row.group.timeZone,
      houseRules: row.group.houseRules ?? '',
    },
    venue: {
      name: row.venue.name,
      address: row.venue.address,
      town: row.venue.town,
      accessNotes: row.venue.accessNotes,
    },
    slot: { id: row.slot.id, startsAt: row.slot.startsAt, endsAt: row.slot.endsAt },
    items,
    calendarUrl: signPath(key, `/api/bookings/${b.reference}/calendar`, now),
    qr: await qrDataUrl(bookingQrText(ctx.env.publicUrl, b.reference)),
  };
}
