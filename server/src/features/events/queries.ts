import { and, asc, eq, gte, inArray, lte, notInArray, sql, type SQL } from 'drizzle-orm';
import type { DbOrTx, Tx } from '../../db/client';
import {
  bookings,
  events,
  groupExclusions,
  repairGroups,
  slots,
  slotSkillCounts,
  venues,
  waitlistEntries,
} from '../../db/schema/index';

type SlotPlan = Omit<typeof slots.$inferInsert, 'eventId'>;

const eventColumns = {
  id: events.id,
  groupId: events.groupId,
  title: events.title,
  description: events.description,
  status: events.status,
  startsAt: events.startsAt,
  endsAt: events.endsAt,
  slotMinutes: events.slotMinutes,
  slotCapacity: events.slotCapacity,
  skillLimits: events.skillLimits,
  groupName: repairGroups.name,
  timeZone: repairGroups.timeZone,
  groupLanguage: repairGroups.defaultLanguage,
  houseRules: repairGroups.houseRules,
  venue: {
    id: venues.id,
    name: venues.name,
    address: venues.address,
    town: venues.town,
    accessNotes: venues.accessNotes,
  },
};

export const venueById = async (db: DbOrTx, venueId: number) =>
  (await db.select().from(venues).where(eq(venues.id, venueId)))[0];

export async function insertEventWithSlots(db: DbOrTx, event: typeof events.$inferInsert, plans: SlotPlan[]) {
  return db.transaction(async (tx) => {
    const [{ id }] = await tx.insert(events).values(event).$returningId();
    await tx.insert(slots).values(plans.map((p) => ({ eventId: id, ...p })));
    return id;
  });
}

export const lockEvent = async (tx: Tx, eventId: number) =>
  (await tx.select().from(events).where(eq(events.id, eventId)).for('update'))[0];

export async function updateEventRow(tx: Tx, eventId: number, values: Partial<typeof events.$inferInsert>) {
  await tx.update(events).set(values).where(eq(events.id, eventId));
}

/** Throws away an event's slots and writes the new plan (a draft has no bookings to keep). */
export async function replaceSlots(tx: Tx, eventId: number, plans: SlotPlan[]) {
  await tx.delete(slots).where(eq(slots.eventId, eventId));
  await tx.insert(slots).values(plans.map((p) => ({ eventId, ...p })));
}

export const slotOfEvent = async (tx: DbOrTx, eventId: number, slotId: number) =>
  (
    await tx
      .select()
      .from(slots)
      .where(and(eq(slots.id, slotId), eq(slots.eventId, eventId)))
  )[0];

export async function setSlotCapacity(tx: Tx, slotId: number, capacity: number) {
  await tx.update(slots).set({ capacity }).where(eq(slots.id, slotId));
}

export async function deleteSlotRow(tx: Tx, slotId: number) {
  await tx.delete(slots).where(eq(slots.id, slotId));
}

export const groupById = async (tx: DbOrTx, groupId: number) =>
  (await tx.select().from(repairGroups).where(eq(repairGroups.id, groupId)))[0];

export const confirmedBookingsOf = (tx: DbOrTx, eventId: number) =>
  tx
    .select()
    .from(bookings)
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed')));

export async function cancelConfirmedBookings(tx: Tx, eventId: number) {
  await tx
    .update(bookings)
    .set({ status: 'cancelled', cancelledAt: new Date() })
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed')));
}

/** Nothing is booked or held at a cancelled event, and nobody waits for it. */
export async function emptyCancelledEvent(tx: Tx, eventId: number) {
  await tx.update(slots).set({ booked: 0, held: 0 }).where(eq(slots.eventId, eventId));
  await tx
    .update(waitlistEntries)
    .set({ status: 'withdrawn' })
    .where(and(eq(waitlistEntries.eventId, eventId), inArray(waitlistEntries.status, ['waiting', 'offered'])));
}

export const eventWithGroupAndVenue = async (db: DbOrTx, eventId: number) =>
  (
    await db
      .select(eventColumns)
      .from(events)
      .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
      .innerJoin(venues, eq(venues.id, events.venueId))
      .where(eq(events.id, eventId))
  )[0];

/** Items of each skill booked per slot. */
export const skillCountsOf = async (db: DbOrTx, slotIds: number[]) =>
  slotIds.length ? db.select().from(slotSkillCounts).where(inArray(slotSkillCounts.slotId, slotIds)) : [];

export interface EventFilter {
  published?: boolean;
  from?: Date;
  to?: Date;
  groupId?: number;
  /** Leaves out the groups that do not take this kind of item. */
  takesCategoryId?: number;
}

/** Events with their group and venue, and their total and free places, soonest first. */
export async function listEvents(db: DbOrTx, filter: EventFilter) {
  const conditions: SQL[] = [];
  if (filter.published) conditions.push(eq(events.status, 'published'));
  if (filter.from) conditions.push(gte(events.endsAt, filter.from));
  if (filter.to) conditions.push(lte(events.startsAt, filter.to));
  if (filter.groupId) conditions.push(eq(events.groupId, filter.groupId));
  if (filter.takesCategoryId) {
    const excluding = db
      .select({ g: groupExclusions.groupId })
      .from(groupExclusions)
      .where(eq(groupExclusions.categoryId, filter.takesCategoryId));
    conditions.push(notInArray(events.groupId, excluding));
  }
  return db
    .select({
      ...eventColumns,
      totalPlaces: sql<number>`(SELECT COALESCE(SUM(s.capacity), 0) FROM ${slots} s WHERE s.event_id = ${events.id})`,
      freePlaces: sql<number>`(SELECT COALESCE(SUM(GREATEST(s.capacity - s.booked - s.held, 0)), 0) FROM ${slots} s WHERE s.event_id = ${events.id})`,
    })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId))
    .where(and(...conditions))
    .orderBy(asc(events.startsAt))
    .limit(500);
}
