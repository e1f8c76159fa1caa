import { eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '../../../db/client';
import {
  bookings,
  events,
  groupExclusions,
  repairGroups,
  slots,
  slotSkillCounts,
  venues,
} from '../../../db/schema/index';

/** A slot with the event, group and venue it belongs to: what every booking mail and check needs. */
export const slotWithContext = (db: DbOrTx) =>
  db
    .select({ slot: slots, event: events, group: repairGroups, venue: venues })
    .from(slots)
    .innerJoin(events, eq(events.id, slots.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId));

/** One slot with its context; `lock` takes the slot's row for update. */
export async function slotWithContextById(db: DbOrTx, slotId: number, opts: { lock?: boolean } = {}) {
  const q = slotWithContext(db).where(eq(slots.id, slotId));
  const [row] = opts.lock ? await q.for('update') : await q;
  return row;
}

/** A booking with its slot, event, group and venue. */
export const bookingWithContext = (db: DbOrTx) =>
  db
    .select({ booking: bookings, slot: slots, event: events, group: repairGroups, venue: venues })
    .from(bookings)
    .innerJoin(slots, eq(slots.id, bookings.slotId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId));

export async function bookingWithContextById(db: DbOrTx, bookingId: number) {
  const [row] = await bookingWithContext(db).where(eq(bookings.id, bookingId));
  return row;
}

/** Items of each skill already booked in a slot (the counts the per-skill limits are held against). */
export async function skillTakenOf(db: DbOrTx, slotId: number): Promise<Record<string, number>> {
  const rows = await db.select().from(slotSkillCounts).where(eq(slotSkillCounts.slotId, slotId));
  return Object.fromEntries(rows.map((r) => [r.skill, r.booked]));
}

/** An event with its group and venue (for the waiting list's offer mails). */
export const eventWithContext = (db: DbOrTx, eventId: number) =>
  db
    .select({ event: events, group: repairGroups, venue: venues })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId))
    .where(eq(events.id, eventId));

/** A JSON aggregate as the driver hands it: text, or already parsed when the server marks the column as JSON. */
const fromJson = <T>(value: unknown, empty: T): T =>
  value == null ? empty : typeof value === 'string' ? (JSON.parse(value) as T) : (value as T);

/**
 * One slot with its context and, in the same statement, what a new booking's checks read beside it: the per-skill
 * counts, the address's confirmed bookings for the session, and the kinds of item the group does not take. None of
 * these reads locks anything; the conditional UPDATE that takes the places is what holds the capacity.
 */
export async function slotForBooking(db: DbOrTx, slotId: number, email: string) {
  const [row] = await db
    .select({
      slot: slots,
      event: events,
      group: repairGroups,
      venue: venues,
      skillTaken: sql<unknown>`(SELECT JSON_OBJECTAGG(${slotSkillCounts.skill}, ${slotSkillCounts.booked})
        FROM ${slotSkillCounts} WHERE ${slotSkillCounts.slotId} = ${slots.id})`,
      active: sql<number>`(SELECT COUNT(*) FROM ${bookings} WHERE ${bookings.eventId} = ${events.id}
        AND ${bookings.visitorEmail} = ${email} AND ${bookings.status} = 'confirmed')`,
      excluded: sql<unknown>`(SELECT JSON_ARRAYAGG(${groupExclusions.categoryId}) FROM ${groupExclusions}
        WHERE ${groupExclusions.groupId} = ${events.groupId})`,
    })
    .from(slots)
    .innerJoin(events, eq(events.id, slots.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId))
    .where(eq(slots.id, slotId));
  if (!row) return undefined;
  const { skillTaken, active, excluded, ...context } = row;
  return {
    row: context,
    skillTaken: fromJson<Record<string, number>>(skillTaken, {}),
    active: Number(active),
    excluded: fromJson<number[]>(excluded, []),
  };
}
