import { and, asc, count, eq, inArray, sql } from 'drizzle-orm';
import type { DbOrTx, Tx } from '../../../db/client';
import {
  authTokens,
  bookingItems,
  categories,
  events,
  invites,
  itemAssignments,
  itemOutcomes,
  itemPhotos,
  knowledgeEntries,
  memberships,
  outbox,
  rateLimits,
  repairGroups,
  sessions,
  shifts,
  users,
  volunteerProfiles,
  volunteerSkills,
  waitlistEntries,
} from '../../../db/schema/index';

export const eventWithGroup = async (db: DbOrTx, eventId: number) =>
  (
    await db
      .select({ title: events.title, startsAt: events.startsAt, endsAt: events.endsAt, group: repairGroups.name })
      .from(events)
      .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
      .where(eq(events.id, eventId))
  )[0];

export const itemsWithDetail = (db: DbOrTx, bookingId: number) =>
  db
    .select({
      id: bookingItems.id,
      kind: categories.name,
      brand: bookingItems.brand,
      model: bookingItems.model,
      ageYears: bookingItems.ageYears,
      fault: bookingItems.fault,
      status: bookingItems.status,
      outcome: itemOutcomes.outcome,
      repairNotes: itemOutcomes.notes,
    })
    .from(bookingItems)
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .where(eq(bookingItems.bookingId, bookingId))
    .orderBy(asc(bookingItems.position));

export const photosOfItems = (db: DbOrTx, itemIds: number[]) =>
  itemIds.length
    ? db
        .select({
          id: itemPhotos.publicId,
          itemId: itemPhotos.itemId,
          kind: itemPhotos.kind,
          createdAt: itemPhotos.createdAt,
        })
        .from(itemPhotos)
        .where(inArray(itemPhotos.itemId, itemIds))
    : Promise.resolve([]);

export const waitlistOfBooking = (db: DbOrTx, bookingId: number) =>
  db
    .select({ createdAt: waitlistEntries.createdAt, status: waitlistEntries.status, request: waitlistEntries.request })
    .from(waitlistEntries)
    .where(eq(waitlistEntries.bookingId, bookingId));

/** Mail to the address that names the reference (the booking's own mails). */
export const mailAbout = (db: DbOrTx, email: string, reference: string) =>
  db
    .select({ subject: outbox.subject, status: outbox.status, createdAt: outbox.createdAt, sentAt: outbox.sentAt })
    .from(outbox)
    .where(and(eq(outbox.toAddress, email), sql`LOCATE(${reference}, ${outbox.text}) > 0`));

export const userById = async (db: DbOrTx, userId: number) =>
  (await db.select().from(users).where(eq(users.id, userId)))[0];

/** What an account holds: memberships, skills, profile, shifts and the repairs the person recorded or took. */
export async function accountRecords(db: DbOrTx, userId: number) {
  const [roles, skills, profile, shiftRows, assigned, written] = await Promise.all([
    db
      .select({
        group: repairGroups.name,
        role: memberships.role,
        status: memberships.status,
        since: memberships.createdAt,
      })
      .from(memberships)
      .innerJoin(repairGroups, eq(repairGroups.id, memberships.groupId))
      .where(eq(memberships.userId, userId)),
    db
      .select({ skill: volunteerSkills.skill, level: volunteerSkills.level })
      .from(volunteerSkills)
      .where(eq(volunteerSkills.userId, userId)),
    db
      .select({ kit: volunteerProfiles.kit, notes: volunteerProfiles.notes })
      .from(volunteerProfiles)
      .where(eq(volunteerProfiles.userId, userId)),
    db
      .select({ session: events.title, coming: shifts.coming, startsAt: shifts.startsAt, endsAt: shifts.endsAt })
      .from(shifts)
      .innerJoin(events, eq(events.id, shifts.eventId))
      .where(eq(shifts.userId, userId)),
    db
      .select({ itemId: itemAssignments.itemId, session: events.title, startsAt: itemAssignments.startsAt })
      .from(itemAssignments)
      .innerJoin(events, eq(events.id, itemAssignments.eventId))
      .where(eq(itemAssignments.userId, userId)),
    db
      .select({ itemId: knowledgeEntries.itemId, fix: knowledgeEntries.fix, updatedAt: knowledgeEntries.updatedAt })
      .from(knowledgeEntries)
      .where(eq(knowledgeEntries.authorId, userId)),
  ]);
  return { roles, skills, profile: profile[0] ?? null, shifts: shiftRows, assigned, written };
}

/**
 * Closes an account: the person's name and address go, and so do their password, links, skills, profile, future
 * shifts, memberships and sign-in sessions. Repairs they recorded or were placed on stay, without their name.
 */
export async function closeAccountRows(tx: Tx, userId: number) {
  const [u] = await tx.select().from(users).where(eq(users.id, userId)).for('update');
  if (!u) return false;
  await tx.delete(authTokens).where(eq(authTokens.userId, userId));
  await tx.delete(volunteerSkills).where(eq(volunteerSkills.userId, userId));
  await tx.delete(volunteerProfiles).where(eq(volunteerProfiles.userId, userId));
  await tx.delete(shifts).where(and(eq(shifts.userId, userId), sql`${shifts.startsAt} > CURRENT_TIMESTAMP(3)`));
  await tx.delete(memberships).where(eq(memberships.userId, userId));
  await tx.delete(invites).where(eq(invites.email, u.email));
  await tx.delete(outbox).where(eq(outbox.toAddress, u.email));
  await tx.delete(rateLimits).where(sql`LOCATE(${u.email.toLowerCase()}, LOWER(${rateLimits.key})) > 0`);
  await tx
    .update(users)
    .set({
      name: 'Closed account',
      email: `closed-${userId}@accounts.invalid`,
      passwordHash: null,
      calendarFeedHash: null,
      totpSecret: null,
      totpPending: null,
      admin: false,
      emailVerifiedAt: null,
    })
    .where(eq(users.id, userId));
  // express-mysql-session keeps the session as JSON text; every sign-in of this person ends.
  await tx.delete(sessions).where(sql`JSON_VALUE(${sessions.data}, '$.userId') = ${userId}`);
  return true;
}

export const adminCount = async (db: DbOrTx) =>
  (await db.select({ n: count() }).from(users).where(eq(users.admin, true)))[0].n;
