import { randomBytes, timingSafeEqual } from 'node:crypto';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import type { z } from 'zod';
import { formatReference } from '../../../../shared/booking/reference';
import { itemLabel } from '../../../../shared/item-label';
import type { createBookingSchema } from '../../../../shared/schemas/bookings';
import type { AppContext } from '../../context';
import type { DbOrTx, Tx } from '../../db/client';
import { affectedRows, isDuplicate, withDeadlockRetry } from '../../db/retry';
import {
  bookingItems,
  bookings,
  categories,
  events,
  idempotencyKeys,
  itemOutcomes,
  itemPhotos,
  repairGroups,
  slots,
  slotSkillCounts,
  venues,
  waitlistEntries,
} from '../../db/schema/index';
import { newToken, sha256 } from '../../auth/tokens';
import { HttpError, notFound } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { manageTokenFor, manageUrl } from '../../core/links';
import { screenItems } from '../../core/screening';
import { bookingWithContext, slotWithContext } from './queries';
import {
  bookingQrText,
  cancelledMail,
  confirmationMail,
  movedMail,
  offerMail,
  qrDataUrl,
  waitlistJoinedMail,
  type BookingMailFacts,
} from './mails';

export type BookingInput = z.output<typeof createBookingSchema>;
type Item = BookingInput['items'][number];

const full = () =>
  new HttpError(409, 'slot-full', 'That time is fully booked. Choose another time, or join its waiting list.');

/** Loads the slot with its event, group and venue, and checks that it can take bookings now. */
async function bookableSlot(tx: DbOrTx, slotId: number, opts: { lock?: boolean } = {}) {
  const q = slotWithContext(tx).where(eq(slots.id, slotId));
  const [row] = opts.lock ? await q.for('update') : await q;
  if (!row) throw new HttpError(400, 'invalid', 'Some fields need attention.', { slotId: 'That time does not exist.' });
  if (row.event.status !== 'published')
    throw new HttpError(
      409,
      'not-bookable',
      row.event.status === 'cancelled' ? 'This event has been cancelled.' : 'This event is not taking bookings.',
    );
  if (row.slot.endsAt.getTime() <= Date.now())
    throw new HttpError(409, 'not-bookable', 'That time has already passed.');
  return row;
}

/** Takes `n` places atomically: the UPDATE matches only while booked + held + n fits the capacity. */
async function takePlaces(tx: Tx, slotId: number, n: number, fromHeld: boolean, priority = false) {
  // A return visit (the part bought) may take one place over the capacity: the group keeps room for its returns.
  const spare = priority ? 1 : 0;
  const res = fromHeld
    ? await tx
        .update(slots)
        .set({ booked: sql`${slots.booked} + ${n}`, held: sql`${slots.held} - ${n}` })
        .where(and(eq(slots.id, slotId), sql`${slots.held} >= ${n}`))
    : await tx
        .update(slots)
        .set({ booked: sql`${slots.booked} + ${n}` })
        .where(and(eq(slots.id, slotId), sql`${slots.booked} + ${slots.held} + ${n} <= ${slots.capacity} + ${spare}`));
  if (affectedRows(res) !== 1) throw full();
}

/** Per-skill limits (e.g. at most 3 textile items per slot), taken the same conditional way. */
async function takeSkillPlaces(
  tx: Tx,
  slotId: number,
  limits: Record<string, number | undefined>,
  perSkill: Map<string, number>,
  spare = 0,
) {
  for (const [skill, n] of perSkill) {
    const limit = limits[skill] === undefined ? undefined : limits[skill]! + spare;
    if (limit === undefined) continue;
    await tx
      .insert(slotSkillCounts)
      .values({ slotId, skill, booked: 0 })
      .onDuplicateKeyUpdate({ set: { booked: sql`${slotSkillCounts.booked}` } });
    const res = await tx
      .update(slotSkillCounts)
      .set({ booked: sql`${slotSkillCounts.booked} + ${n}` })
      .where(
        and(
          eq(slotSkillCounts.slotId, slotId),
          eq(slotSkillCounts.skill, skill),
          sql`${slotSkillCounts.booked} + ${n} <= ${limit}`,
        ),
      );
    if (affectedRows(res) !== 1) {
      const [row] = await tx
        .select()
        .from(slotSkillCounts)
        .where(and(eq(slotSkillCounts.slotId, slotId), eq(slotSkillCounts.skill, skill)));
      const left = Math.max(0, limit - (row?.booked ?? 0));
      throw new HttpError(
        409,
        'skill-full',
        `At this time the fixers can take ${limit} ${skill} item${limit === 1 ? '' : 's'}; ${left === 0 ? 'none is left' : `only ${left} ${left === 1 ? 'is' : 'are'} left`} and you are booking ${n}. Choose another time${n > 1 ? ', or book fewer of them here' : ''}.`,
      );
    }
  }
}

async function releaseSkillPlaces(tx: Tx, slotId: number, perSkill: Map<string, number>) {
  for (const [skill, n] of perSkill) {
    await tx
      .update(slotSkillCounts)
      .set({ booked: sql`GREATEST(${slotSkillCounts.booked} - ${n}, 0)` })
      .where(and(eq(slotSkillCounts.slotId, slotId), eq(slotSkillCounts.skill, skill)));
  }
}

const countBySkill = (skills: string[]) =>
  skills.reduce((m, s) => m.set(s, (m.get(s) ?? 0) + 1), new Map<string, number>());

function facts(
  ctx: AppContext,
  row: Awaited<ReturnType<typeof bookableSlot>>,
  b: { reference: string; visitorName: string; visitorEmail: string },
  items: string[],
  manageToken: string | null,
): BookingMailFacts {
  return {
    reference: b.reference,
    visitorName: b.visitorName,
    visitorEmail: b.visitorEmail,
    eventTitle: row.event.title,
    groupName: row.group.name,
    timeZone: row.group.timeZone,
    slotStartsAt: row.slot.startsAt,
    slotEndsAt: row.slot.endsAt,
    venue: row.venue,
    items,
    manageUrl: manageToken ? manageUrl(ctx, b.reference, manageToken) : `${ctx.env.publicUrl}/events/${row.event.id}`,
  };
}

const labelOf = (cat: { name: string } | undefined, i: Item) =>
  itemLabel({ categoryName: cat?.name ?? 'Item', brand: i.brand, model: i.model });

interface Prepared {
  reference: string;
  token: string;
}

function prepareBooking(ctx: AppContext): Prepared {
  const reference = formatReference(randomBytes(6));
  return { reference, token: manageTokenFor(ctx, reference) };
}

/**
 * Writes the booking inside `tx`. The slot's row is locked first, by the conditional UPDATE that takes the places:
 * every later insert refers to the slot, and taking the exclusive lock before those shared ones avoids deadlocks.
 * Everything that can be done before the transaction (checking the items, the QR image) already was.
 */
async function insertBooking(
  ctx: AppContext,
  tx: Tx,
  row: Awaited<ReturnType<typeof bookableSlot>>,
  input: Pick<BookingInput, 'visitor' | 'items'>,
  fromHeld: boolean,
  prepared: Prepared,
  cats: Awaited<ReturnType<typeof screenItems>>,
  returnOfItemId?: number,
) {
  await takePlaces(tx, row.slot.id, input.items.length, fromHeld, returnOfItemId !== undefined);
  await takeSkillPlaces(
    tx,
    row.slot.id,
    row.event.skillLimits,
    countBySkill(input.items.map((i) => cats.get(i.categoryId)!.skill)),
    returnOfItemId !== undefined ? 1 : 0,
  );
  const { reference, token } = prepared;
  const [{ id }] = await tx
    .insert(bookings)
    .values({
      reference,
      eventId: row.event.id,
      slotId: row.slot.id,
      visitorName: input.visitor.name,
      visitorEmail: input.visitor.email,
      visitorPhone: input.visitor.phone ?? null,
      manageTokenHash: sha256(token),
      consentAt: new Date(),
    })
    .$returningId();
  const itemIds = await tx
    .insert(bookingItems)
    .values(
      input.items.map((i, position) => ({
        bookingId: id,
        categoryId: i.categoryId,
        brand: i.brand ?? null,
        model: i.model ?? null,
        ageYears: i.ageYears ?? null,
        fault: i.fault,
        mains: i.mains ?? Boolean(cats.get(i.categoryId)!.mains),
        battery: i.battery ?? false,
        position,
        returnOfItemId: returnOfItemId ?? null,
      })),
    )
    .$returningId();
  const f = facts(
    ctx,
    row,
    { reference, visitorName: input.visitor.name, visitorEmail: input.visitor.email },
    input.items.map((i) => labelOf(cats.get(i.categoryId), i)),
    token,
  );
  await enqueueMail(tx, confirmationMail(f, bookingQrText(ctx.env.publicUrl, reference)));
  return {
    id,
    reference,
    manageToken: token,
    eventId: row.event.id,
    slotId: row.slot.id,
    itemIds: itemIds.map((x) => x.id),
  };
}

export type BookingResult = Awaited<ReturnType<typeof insertBooking>>;

/**
 * Books a slot. The place is taken with a conditional UPDATE in the same transaction as the booking, so the
 * capacity holds under any number of simultaneous requests. With an idempotency key the first answer is stored
 * and replayed for the same key, so a form sent twice books once.
 */
/**
 * A return visit booked through a follow-up's priority link: one item, continuing the earlier visit, allowed one
 * place over the slot's capacity. `inTx` runs in the same transaction (the follow-up's status).
 */
export async function createReturnBooking(
  ctx: AppContext,
  input: BookingInput,
  returnOfItemId: number,
  inTx: (tx: Tx, result: BookingResult) => Promise<void>,
) {
  const row = await bookableSlot(ctx.database.db, input.slotId);
  const cats = await screenItems(ctx.database.db, row.group, input.items);
  for (let attempt = 0; ; attempt++) {
    const prepared = prepareBooking(ctx);
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

export async function createBooking(
  ctx: AppContext,
  input: BookingInput,
  idempotencyKey?: string,
): Promise<{ status: number; body: unknown; replayed: boolean }> {
  const key = idempotencyKey ? `booking:${idempotencyKey}` : null;
  const row = await bookableSlot(ctx.database.db, input.slotId);
  const cats = await screenItems(ctx.database.db, row.group, input.items);
  for (let attempt = 0; ; attempt++) {
    const prepared = prepareBooking(ctx);
    try {
      const body = await withDeadlockRetry(() =>
        ctx.database.db.transaction(async (tx) => {
          // The key's row is written first: a second request with the same key waits here on the row lock,
          // then fails as a duplicate once the first has committed.
          if (key) await tx.insert(idempotencyKeys).values({ key, scope: 'booking' });
          const result = await insertBooking(ctx, tx, row, input, false, prepared, cats);
          const body = {
            reference: result.reference,
            manageToken: result.manageToken,
            eventId: result.eventId,
            slotId: result.slotId,
            itemIds: result.itemIds,
          };
          if (key)
            await tx
              .update(idempotencyKeys)
              .set({ statusCode: 201, response: body })
              .where(eq(idempotencyKeys.key, key));
          return body;
        }),
      );
      ctx.outbox.kick();
      return { status: 201, body, replayed: false };
    } catch (err) {
      if (!isDuplicate(err)) throw err;
      if (key) {
        const [stored] = await ctx.database.db.select().from(idempotencyKeys).where(eq(idempotencyKeys.key, key));
        if (stored?.response) return { status: stored.statusCode ?? 201, body: stored.response, replayed: true };
      }
      // A reference drawn twice (one in a billion): draw again.
      if (attempt >= 3) throw err;
    }
  }
}

/** Finds a booking by reference and its secret token; anything else is "not found", so references leak nothing. */
export async function bookingByToken(ctx: AppContext, reference: string, token: string | undefined) {
  const [b] = await ctx.database.db.select().from(bookings).where(eq(bookings.reference, reference));
  if (!b || !token) throw notFound('That booking');
  const a = Buffer.from(b.manageTokenHash, 'hex');
  const c = Buffer.from(sha256(token), 'hex');
  if (a.length !== c.length || !timingSafeEqual(a, c)) throw notFound('That booking');
  return b;
}

export async function bookingView(ctx: AppContext, bookingId: number) {
  const { db } = ctx.database;
  const [row] = await bookingWithContext(db).where(eq(bookings.id, bookingId));
  const items = await db
    .select({
      id: bookingItems.id,
      categoryId: bookingItems.categoryId,
      categoryName: categories.name,
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
        .select({ id: itemPhotos.id, itemId: itemPhotos.itemId, width: itemPhotos.width, height: itemPhotos.height })
        .from(itemPhotos)
        .where(
          inArray(
            itemPhotos.itemId,
            items.map((i) => i.id),
          ),
        )
    : [];
  const b = row.booking;
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
    items: items.map((i) => ({
      ...i,
      mains: Boolean(i.mains),
      battery: Boolean(i.battery),
      photos: photos.filter((p) => p.itemId === i.id).map((p) => ({ id: p.id, width: p.width, height: p.height })),
    })),
    qr: await qrDataUrl(bookingQrText(ctx.env.publicUrl, b.reference)),
  };
}

async function itemsOf(tx: Tx, bookingId: number) {
  return tx
    .select({ skill: categories.skill, name: categories.name, brand: bookingItems.brand, model: bookingItems.model })
    .from(bookingItems)
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .where(eq(bookingItems.bookingId, bookingId));
}
const labelsOf = (items: { name: string; brand: string | null; model: string | null }[]) =>
  items.map((i) => itemLabel({ categoryName: i.name, brand: i.brand, model: i.model }));

/** Frees `places` in a slot, then offers them to the waiting list in order. Runs in the caller's transaction. */
async function releasePlaces(ctx: AppContext, tx: Tx, slotId: number, places: number) {
  await tx
    .update(slots)
    .set({ booked: sql`GREATEST(${slots.booked} - ${places}, 0)` })
    .where(eq(slots.id, slotId));
  await offerFreedPlaces(ctx, tx, slotId);
}

export const OFFER_HOURS = 12;

/** Offers free places of a slot to those waiting, first come first served, holding the places meanwhile. */
export async function offerFreedPlaces(ctx: AppContext, tx: Tx, slotId: number) {
  const [s] = await tx.select().from(slots).where(eq(slots.id, slotId)).for('update');
  let free = s.capacity - s.booked - s.held;
  if (free <= 0) return;
  const waiting = await tx
    .select()
    .from(waitlistEntries)
    .where(and(eq(waitlistEntries.slotId, slotId), eq(waitlistEntries.status, 'waiting')))
    .orderBy(asc(waitlistEntries.id))
    .for('update');
  if (!waiting.length) return;
  const [ctxRow] = await tx
    .select({ event: events, group: repairGroups, venue: venues })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId))
    .where(eq(events.id, s.eventId));
  if (ctxRow.event.status !== 'published') return;
  for (const w of waiting) {
    // The first in line is served first: a large request waits rather than being skipped for a smaller one.
    if (w.places > free) break;
    const { token, hash } = newToken();
    const latest = s.startsAt.getTime() - 15 * 60_000;
    const expires = new Date(Math.max(Date.now() + 15 * 60_000, Math.min(Date.now() + OFFER_HOURS * 3600_000, latest)));
    await tx
      .update(waitlistEntries)
      .set({ status: 'offered', claimTokenHash: hash, offeredAt: new Date(), offerExpiresAt: expires })
      .where(eq(waitlistEntries.id, w.id));
    await tx
      .update(slots)
      .set({ held: sql`${slots.held} + ${w.places}` })
      .where(eq(slots.id, slotId));
    free -= w.places;
    await enqueueMail(
      tx,
      offerMail(
        {
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

export async function cancelBooking(ctx: AppContext, bookingId: number) {
  await withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const [b] = await tx.select().from(bookings).where(eq(bookings.id, bookingId)).for('update');
      if (b.status === 'cancelled') return;
      await assertNotArrived(tx, b.id);
      const row = await bookableSlotUnchecked(tx, b.slotId);
      const items = await itemsOf(tx, b.id);
      await tx.update(bookings).set({ status: 'cancelled', cancelledAt: new Date() }).where(eq(bookings.id, b.id));
      await releaseSkillPlaces(tx, b.slotId, countBySkill(items.map((i) => i.skill)));
      await releasePlaces(ctx, tx, b.slotId, items.length);
      if (b.visitorEmail)
        await enqueueMail(
          tx,
          cancelledMail(facts(ctx, row, { ...b, visitorEmail: b.visitorEmail }, labelsOf(items), null)),
        );
    }),
  );
  ctx.outbox.kick();
}

/** Once reception has checked an item in, the booking is the desk's to change, not the visitor's link. */
async function assertNotArrived(tx: Tx, bookingId: number) {
  const items = await tx
    .select({ status: bookingItems.status })
    .from(bookingItems)
    .where(eq(bookingItems.bookingId, bookingId));
  if (items.some((i) => i.status !== 'booked'))
    throw new HttpError(
      409,
      'checked-in',
      'You have already checked in at reception. Ask at the desk to change anything.',
    );
}

async function bookableSlotUnchecked(tx: Tx, slotId: number) {
  const [row] = await slotWithContext(tx).where(eq(slots.id, slotId));
  return row;
}

/** Moves a booking to another slot of the same event: the new places are taken before the old ones are freed. */
export async function moveBooking(ctx: AppContext, bookingId: number, slotId: number, manageToken: string) {
  await withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const [b] = await tx.select().from(bookings).where(eq(bookings.id, bookingId)).for('update');
      if (b.status !== 'confirmed') throw new HttpError(409, 'cancelled', 'This booking is cancelled.');
      if (b.slotId === slotId) return;
      await assertNotArrived(tx, b.id);
      const row = await bookableSlot(tx, slotId);
      if (row.event.id !== b.eventId)
        throw new HttpError(400, 'invalid', 'Some fields need attention.', {
          slotId: 'Choose a time of the same event.',
        });
      const items = await itemsOf(tx, b.id);
      const perSkill = countBySkill(items.map((i) => i.skill));
      await takePlaces(tx, slotId, items.length, false);
      await takeSkillPlaces(tx, slotId, row.event.skillLimits, perSkill);
      await tx.update(bookings).set({ slotId, reminderSentAt: null }).where(eq(bookings.id, b.id));
      await releaseSkillPlaces(tx, b.slotId, perSkill);
      await releasePlaces(ctx, tx, b.slotId, items.length);
      if (b.visitorEmail)
        await enqueueMail(
          tx,
          movedMail(facts(ctx, row, { ...b, visitorEmail: b.visitorEmail }, labelsOf(items), manageToken)),
        );
    }),
  );
  ctx.outbox.kick();
}

/** Joins the waiting list of a full slot; answers the position in line. */
export async function joinWaitlist(ctx: AppContext, eventId: number, input: BookingInput) {
  const position = await ctx.database.db.transaction(async (tx) => {
    const row = await bookableSlot(tx, input.slotId, { lock: true });
    if (row.event.id !== eventId)
      throw new HttpError(400, 'invalid', 'Some fields need attention.', { slotId: 'Choose a time of this event.' });
    await screenItems(tx, row.group, input.items);
    if (row.slot.capacity - row.slot.booked - row.slot.held >= input.items.length)
      throw new HttpError(409, 'places-free', 'This time still has free places: book it directly.');
    await tx.insert(waitlistEntries).values({
      eventId: row.event.id,
      slotId: row.slot.id,
      visitorName: input.visitor.name,
      visitorEmail: input.visitor.email,
      request: { visitor: input.visitor, items: input.items },
      places: input.items.length,
    });
    const [{ n }] = await tx
      .select({ n: sql<number>`COUNT(*)` })
      .from(waitlistEntries)
      .where(and(eq(waitlistEntries.slotId, row.slot.id), inArray(waitlistEntries.status, ['waiting', 'offered'])));
    await enqueueMail(
      tx,
      waitlistJoinedMail(
        {
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
        Number(n),
      ),
    );
    return Number(n);
  });
  ctx.outbox.kick();
  return { position };
}

async function offerByToken(tx: Tx, token: string, lock: boolean) {
  const q = tx
    .select()
    .from(waitlistEntries)
    .where(eq(waitlistEntries.claimTokenHash, sha256(token)));
  const [w] = lock ? await q.for('update') : await q;
  if (!w) throw notFound('That offer');
  return w;
}

export async function offerView(ctx: AppContext, token: string) {
  return ctx.database.db.transaction(async (tx) => {
    const w = await offerByToken(tx, token, false);
    const row = await bookableSlotUnchecked(tx, w.slotId);
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
  const prepared = prepareBooking(ctx);
  const result = await withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const w = await offerByToken(tx, token, true);
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
      const booking = await insertBooking(ctx, tx, row, w.request as BookingInput, true, prepared, cats);
      await tx
        .update(waitlistEntries)
        .set({ status: 'claimed', bookingId: booking.id })
        .where(eq(waitlistEntries.id, w.id));
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
