import { and, count, desc, eq, sql } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import {
  events,
  followUps,
  impactCells,
  importJobs,
  knowledgeEntries,
  mailboxMessages,
  memberships,
  outbox,
  repairGroups,
  salvageParts,
  users,
  venues,
} from '../../db/schema/index';

export const mailboxRows = (db: DbOrTx) =>
  db
    .select({
      id: mailboxMessages.id,
      from: mailboxMessages.fromAddress,
      to: mailboxMessages.toAddress,
      subject: mailboxMessages.subject,
      receivedAt: mailboxMessages.receivedAt,
    })
    .from(mailboxMessages)
    .orderBy(desc(mailboxMessages.id))
    .limit(200);

export async function mailboxRow(db: DbOrTx, id: number) {
  const [m] = await db.select().from(mailboxMessages).where(eq(mailboxMessages.id, id));
  return m;
}

export const clearMailbox = (db: DbOrTx) => db.delete(mailboxMessages);

export const outboxTotals = (db: DbOrTx) =>
  db.select({ status: outbox.status, n: count() }).from(outbox).groupBy(outbox.status);

export const recentOutbox = (db: DbOrTx) =>
  db
    .select({
      id: outbox.id,
      to: outbox.toAddress,
      subject: outbox.subject,
      status: outbox.status,
      attempts: outbox.attempts,
      lastError: outbox.lastError,
      createdAt: outbox.createdAt,
      sentAt: outbox.sentAt,
      nextAttemptAt: outbox.nextAttemptAt,
    })
    .from(outbox)
    .orderBy(desc(outbox.id))
    .limit(50);

export const groupRows = (db: DbOrTx) =>
  db
    .select({
      id: repairGroups.id,
      name: repairGroups.name,
      town: repairGroups.town,
      slug: repairGroups.slug,
      historyOnly: repairGroups.historyOnly,
      members: sql<number>`COUNT(${memberships.id})`,
    })
    .from(repairGroups)
    .leftJoin(memberships, eq(memberships.groupId, repairGroups.id))
    .groupBy(repairGroups.id)
    .orderBy(repairGroups.name);

export async function insertGroup(db: DbOrTx, group: typeof repairGroups.$inferInsert) {
  const [{ id }] = await db.insert(repairGroups).values(group).$returningId();
  return id;
}

export const userRows = (db: DbOrTx) =>
  db
    .select({
      id: users.id,
      name: users.name,
      email: users.email,
      admin: users.admin,
      verified: users.emailVerifiedAt,
      createdAt: users.createdAt,
    })
    .from(users)
    .orderBy(users.name)
    .limit(500);

export const groupForMerge = async (db: DbOrTx, id: number) =>
  (
    await db
      .select({ id: repairGroups.id, name: repairGroups.name, historyOnly: repairGroups.historyOnly })
      .from(repairGroups)
      .where(eq(repairGroups.id, id))
      .for('update')
  )[0] ?? null;

/** What would be lost or moved wrongly if a group were merged away: its people, and sessions of its own. */
export async function groupHasOwnLife(db: DbOrTx, id: number) {
  const [people] = await db.select({ n: count() }).from(memberships).where(eq(memberships.groupId, id));
  const [own] = await db
    .select({ n: count() })
    .from(events)
    .where(and(eq(events.groupId, id), eq(events.imported, false)));
  return people.n > 0 || own.n > 0;
}

/**
 * Moves everything a history-only group holds (its past sessions and their venues, the figures' rollup, follow-ups,
 * repair notes, parts and import jobs) to another group, then removes it. Items, bookings and outcomes hang off the
 * sessions, so they move with them; the network's day sums do not name groups and stay as they are.
 */
export async function moveGroupInto(tx: DbOrTx, from: number, into: number) {
  for (const table of [events, venues, impactCells, followUps, knowledgeEntries, salvageParts, importJobs])
    await tx.update(table).set({ groupId: into }).where(eq(table.groupId, from));
  await tx.delete(repairGroups).where(eq(repairGroups.id, from));
}
