import { randomBytes } from 'node:crypto';
import type { z } from 'zod';
import { categoryText } from '../../i18n';
import { asLanguage, DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';
import { countSkills, skillFullMessage, slotBookability, slotHasPassed } from '../../../../shared/booking/bookability';
import { formatReference } from '../../../../shared/booking/reference';
import type { Skill } from '../../../../shared/constants';
import { itemLabel } from '../../../../shared/item-label';
import type { createBookingSchema } from '../../../../shared/schemas/bookings';
import type { AppContext } from '../../context';
import type { DbOrTx, Tx } from '../../db/client';
import { sha256 } from '../../auth/tokens';
import { HttpError } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { manageTokenFor, manageUrl } from '../../core/links';
import type { screenItems } from '../../core/screening';
import { skillTakenOf, slotForBooking, slotWithContextById } from './queries/context';
import { insertBookingRows } from './queries/bookings';
import { takePlaces, takeSkillPlaces } from './queries/places';
import { bookingQrText, confirmationMail, type BookingMailFacts } from './mails';

export type BookingInput = z.output<typeof createBookingSchema>;
type Item = BookingInput['items'][number];
export type SlotRow = Awaited<ReturnType<typeof bookableSlot>>;
type Screened = Awaited<ReturnType<typeof screenItems>>;

export const full = () =>
  new HttpError(409, 'slot-full', 'That time is fully booked. Choose another time, or join its waiting list.');

type SlotContext = Awaited<ReturnType<typeof slotWithContextById>>;

/** Checks that a slot exists and can take bookings now; answers it. */
function bookableNow(row: SlotContext | undefined): SlotContext {
  if (!row) throw new HttpError(400, 'invalid', 'errors.invalid', { slotId: 'That time does not exist.' });
  if (row.event.status !== 'published')
    throw new HttpError(
      409,
      'not-bookable',
      row.event.status === 'cancelled' ? 'This event has been cancelled.' : 'This event is not taking bookings.',
    );
  if (slotHasPassed(row.slot, new Date())) throw new HttpError(409, 'not-bookable', 'That time has already passed.');
  return row;
}

/** Loads the slot with its event, group and venue, and checks that it can take bookings now. */
export async function bookableSlot(tx: DbOrTx, slotId: number, opts: { lock?: boolean } = {}) {
  return bookableNow(await slotWithContextById(tx, slotId, opts));
}

/**
 * As `bookableSlot`, with what a new booking's checks need read in the same statement: the per-skill counts, the
 * address's bookings for the session and the group's refused kinds (queries/context.ts, slotForBooking).
 */
export async function bookableSlotFor(db: DbOrTx, slotId: number, email: string) {
  const found = await slotForBooking(db, slotId, email);
  return { ...found!, row: bookableNow(found?.row) };
}

/** What the shared rule (shared/booking/bookability.ts) says of this slot for these items, given its skill counts. */
export function bookabilityWith(row: SlotRow, skillTaken: Record<string, number>, skills: Skill[], spare = 0) {
  return slotBookability(
    { ...row.slot, skillLimits: row.event.skillLimits as Partial<Record<Skill, number>>, skillTaken },
    skills,
    new Date(),
    { spare },
  );
}

/**
 * What the shared rule says of this slot for these items, with the per-skill counts as they are now: the same
 * answer the booking page showed on the time tile.
 */
export async function bookabilityOf(db: DbOrTx, row: SlotRow, skills: Skill[], spare = 0) {
  return bookabilityWith(row, await skillTakenOf(db, row.slot.id), skills, spare);
}

/** Refuses a booking the shared rule refuses: a passed time, a kind's limit reached (for all the items), no room. */
export function refuse(b: ReturnType<typeof bookabilityWith>): void {
  if (b.ok) return;
  if (b.reason === 'past') throw new HttpError(409, 'not-bookable', b.message);
  if (b.reason === 'skill-full') throw new HttpError(409, 'skill-full', b.message);
  throw full();
}

export const skillsOf = (items: { categoryId: number }[], cats: Screened) =>
  items.map((i) => cats.get(i.categoryId)!.skill as Skill);

export function facts(
  ctx: AppContext,
  row: SlotRow,
  b: { reference: string; visitorName: string; visitorEmail: string; language: string },
  items: string[],
  manageToken: string | null,
): BookingMailFacts {
  return {
    language: asLanguage(b.language, asLanguage(row.group.defaultLanguage)),
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

const labelOf = (cat: { slug: string; name: string } | undefined, i: Item, lang: Language) =>
  itemLabel({
    categoryName: cat ? categoryText(lang, cat.slug, 'name', cat.name) : 'Item',
    brand: i.brand,
    model: i.model,
  });
/** Each item as a mail names it: the kind in the reader's language (an admin's own name as typed), brand, model. */
export const labelsOf = (
  items: { slug: string; name: string; brand: string | null; model: string | null }[],
  lang: string = DEFAULT_LANGUAGE,
) =>
  items.map((i) =>
    itemLabel({ categoryName: categoryText(asLanguage(lang), i.slug, 'name', i.name), brand: i.brand, model: i.model }),
  );

export interface Prepared {
  reference: string;
  token: string;
  /** The visitor's language: the booking keeps it for every mail about it. */
  language: Language;
}

export function prepareBooking(ctx: AppContext, language: Language = DEFAULT_LANGUAGE): Prepared {
  const reference = formatReference(randomBytes(6));
  return { reference, token: manageTokenFor(ctx, reference, 1), language };
}

/** Takes the places and the per-skill places of these items in the slot, or throws what the visitor must hear. */
export async function takeAllPlaces(
  tx: Tx,
  row: SlotRow,
  skills: Skill[],
  opts: { fromHeld?: boolean; spare?: number } = {},
) {
  const spare = opts.spare ?? 0;
  if (!(await takePlaces(tx, row.slot.id, skills.length, opts.fromHeld ?? false, spare))) throw full();
  const limits = row.event.skillLimits as Partial<Record<Skill, number>>;
  for (const [skill, n] of countSkills(skills)) {
    if (limits[skill] === undefined) continue;
    const limit = limits[skill] + spare;
    const took = await takeSkillPlaces(tx, row.slot.id, skill, n, limit);
    if (!took.ok)
      throw new HttpError(409, 'skill-full', skillFullMessage(skill, limit, Math.max(0, limit - took.booked), n));
  }
}

/**
 * Writes the booking inside `tx`. The slot's row is locked first, by the conditional UPDATE that takes the places:
 * every later insert refers to the slot, and taking the exclusive lock before those shared ones avoids deadlocks.
 * Everything that can be done before the transaction (checking the items, the QR image) already was.
 */
export async function insertBooking(
  ctx: AppContext,
  tx: Tx,
  row: SlotRow,
  input: Pick<BookingInput, 'visitor' | 'items'>,
  fromHeld: boolean,
  prepared: Prepared,
  cats: Screened,
  returnOfItemId?: number,
) {
  const { reference, token } = prepared;
  // Everything that needs no lock is ready before the first one is taken: the confirmation mail (its render is the
  // costly part), the token's hash and the rows. While the slot's row is locked only the booking's own inserts run.
  const f = facts(
    ctx,
    row,
    { reference, visitorName: input.visitor.name, visitorEmail: input.visitor.email, language: prepared.language },
    input.items.map((i) => labelOf(cats.get(i.categoryId), i, prepared.language)),
    token,
  );
  const mail = confirmationMail(f, bookingQrText(ctx.env.publicUrl, reference));
  const manageTokenHash = sha256(token);
  // The mail is queued before the slot's row is locked: it needs no lock, and its row is the largest write (the
  // QR code's picture). If the places are refused, the transaction rolls it back with everything else.
  await enqueueMail(tx, mail);
  // A return visit (the part bought) may take one place over the capacity: the group keeps room for its returns.
  await takeAllPlaces(tx, row, skillsOf(input.items, cats), {
    fromHeld,
    spare: returnOfItemId !== undefined ? 1 : 0,
  });
  const { id, itemIds } = await insertBookingRows(
    tx,
    {
      reference,
      eventId: row.event.id,
      slotId: row.slot.id,
      visitorName: input.visitor.name,
      visitorEmail: input.visitor.email,
      visitorPhone: input.visitor.phone ?? null,
      manageTokenHash,
      language: prepared.language,
      consentAt: new Date(),
    },
    input.items.map((i, position) => ({
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
  );
  return { id, reference, manageToken: token, eventId: row.event.id, slotId: row.slot.id, itemIds };
}

export type BookingResult = Awaited<ReturnType<typeof insertBooking>>;
