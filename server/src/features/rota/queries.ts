import { and, asc, eq, gte, inArray } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  eventBenches,
  events,
  memberships,
  repairGroups,
  shifts,
  users,
  venues,
} from '../../db/schema/index';

export async function eventRow(db: DbOrTx, eventId: number) {
  const [e] = await db.select().from(events).where(eq(events.id, eventId));
  return e;
}

export const upsertShift = (
  db: DbOrTx,
  s: { eventId: number; userId: number; coming: boolean; startsAt: Date; endsAt: Date },
) =>
  db
    .insert(shifts)
    .values(s)
    .onDuplicateKeyUpdate({ set: { coming: s.coming, startsAt: s.startsAt, endsAt: s.endsAt, updatedAt: new Date() } });

export async function activeGroupIds(db: DbOrTx, userId: number) {
  const rows = await db
    .select({ g: memberships.groupId })
    .from(memberships)
    .where(and(eq(memberships.userId, userId), eq(memberships.status, 'active')));
  return rows.map((r) => r.g);
}

/** Published or closed events of these groups that have not ended yet, soonest first. */
export const upcomingEventRows = (db: DbOrTx, groupIds: number[]) =>
  db
    .select({
      id: events.id,
      title: events.title,
      startsAt: events.startsAt,
      endsAt: events.endsAt,
      status: events.status,
      groupName: repairGroups.name,
      timeZone: repairGroups.timeZone,
    })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(
      and(
        inArray(events.groupId, groupIds),
        inArray(events.status, ['published', 'closed']),
        gte(events.endsAt, new Date()),
      ),
    )
    .orderBy(asc(events.startsAt));

export const shiftsOfUser = (db: DbOrTx, userId: number, eventIds: number[]) =>
  eventIds.length
    ? db
        .select()
        .from(shifts)
        .where(and(eq(shifts.userId, userId), inArray(shifts.eventId, eventIds)))
    : [];

/** Everyone who answered for the event (coming or not), by name. */
export const shiftRowsOfEvent = (db: DbOrTx, eventId: number) =>
  db
    .select({ shift: shifts, name: users.name })
    .from(shifts)
    .innerJoin(users, eq(users.id, shifts.userId))
    .where(eq(shifts.eventId, eventId))
    .orderBy(asc(users.name));

/** One row per confirmed booked item: its slot and the skill its kind needs. */
export const demandRows = (db: DbOrTx, eventId: number) =>
  db
    .select({ slotId: bookings.slotId, skill: categories.skill })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed')));

export const activeFixers = (db: DbOrTx, groupId: number) =>
  db
    .select({ userId: users.id, name: users.name, email: users.email, language: users.language })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.groupId, groupId), eq(memberships.role, 'fixer'), eq(memberships.status, 'active')));

export async function comingUserIds(db: DbOrTx, eventId: number) {
  const rows = await db
    .select({ userId: shifts.userId })
    .from(shifts)
    .where(and(eq(shifts.eventId, eventId), eq(shifts.coming, true)));
  return new Set(rows.map((s) => s.userId));
}

export async function eventBenchRow(db: DbOrTx, eventId: number, benchId: number) {
  const [b] = await db
    .select()
    .from(eventBenches)
    .where(and(eq(eventBenches.id, benchId), eq(eventBenches.eventId, eventId)));
  return b;
}

export async function shiftRow(db: DbOrTx, eventId: number, userId: number) {
  const [s] = await db
    .select()
    .from(shifts)
    .where(and(eq(shifts.eventId, eventId), eq(shifts.userId, userId)));
  return s;
}

export const setShiftBench = (db: DbOrTx, shiftId: number, benchId: number | null) =>
  db.update(shifts).set({ benchId }).where(eq(shifts.id, shiftId));

export const setCalendarFeedHash = (db: DbOrTx, userId: number, hash: string | null) =>
  db.update(users).set({ calendarFeedHash: hash }).where(eq(users.id, userId));

export async function calendarFeedHashOf(db: DbOrTx, userId: number) {
  const [u] = await db.select({ hash: users.calendarFeedHash }).from(users).where(eq(users.id, userId));
  return u?.hash ?? null;
}

export async function userOfCalendarFeedHash(db: DbOrTx, hash: string) {
  const [u] = await db.select({ id: users.id }).from(users).where(eq(users.calendarFeedHash, hash));
  return u?.id ?? null;
}

export const activeRolesOf = (db: DbOrTx, userId: number) =>
  db
    .select({ groupId: memberships.groupId, role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.userId, userId), eq(memberships.status, 'active')));

/** The shifts a person said they come to that end after `since`, of published or closed sessions, soonest first. */
export const comingShiftsOf = (db: DbOrTx, userId: number, since: Date) =>
  db
    .select({
      shiftId: shifts.id,
      eventId: events.id,
      groupId: events.groupId,
      eventTitle: events.title,
      groupName: repairGroups.name,
      startsAt: shifts.startsAt,
      endsAt: shifts.endsAt,
      venueName: venues.name,
      venueAddress: venues.address,
      venueTown: venues.town,
      bench: eventBenches.name,
    })
    .from(shifts)
    .innerJoin(events, eq(events.id, shifts.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId))
    .leftJoin(eventBenches, eq(eventBenches.id, shifts.benchId))
    .where(
      and(
        eq(shifts.userId, userId),
        eq(shifts.coming, true),
        inArray(events.status, ['published', 'closed']),
        gte(shifts.endsAt, since),
      ),
    )
    .orderBy(asc(shifts.startsAt));

/** The language a person chose for the app, or null. */
export async function languageOfUser(db: DbOrTx, userId: number) {
  const [row] = await db.select({ language: users.language }).from(users).where(eq(users.id, userId));
  return row?.language ?? null;
}
