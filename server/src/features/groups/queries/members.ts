import { and, asc, eq, sql } from 'drizzle-orm';
import type { DbOrTx, Tx } from '../../../db/client';
import { memberships, repairGroups, users } from '../../../db/schema/index';

export const groupById = async (db: DbOrTx, groupId: number) =>
  (await db.select().from(repairGroups).where(eq(repairGroups.id, groupId)))[0];

/** Every group by name, with what the public list shows. */
export const publicGroups = (db: DbOrTx) =>
  db
    .select({
      id: repairGroups.id,
      name: repairGroups.name,
      slug: repairGroups.slug,
      town: repairGroups.town,
      description: repairGroups.description,
    })
    .from(repairGroups)
    .orderBy(sql`${repairGroups.name}`);

/** The group's team, pending first, then by name. */
export const membersOf = (db: DbOrTx, groupId: number) =>
  db
    .select({
      membershipId: memberships.id,
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      status: memberships.status,
      since: memberships.createdAt,
      verified: users.emailVerifiedAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.groupId, groupId))
    .orderBy(asc(memberships.status), asc(users.name));

/** One membership of this group with the person's name and address and the group's name. */
export const membershipInGroup = async (db: DbOrTx, groupId: number, membershipId: number) =>
  (
    await db
      .select({
        id: memberships.id,
        status: memberships.status,
        role: memberships.role,
        email: users.email,
        name: users.name,
        language: users.language,
        groupName: repairGroups.name,
        groupLanguage: repairGroups.defaultLanguage,
      })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .innerJoin(repairGroups, eq(repairGroups.id, memberships.groupId))
      .where(and(eq(memberships.id, membershipId), eq(memberships.groupId, groupId)))
  )[0];

export async function activateMembership(tx: Tx, membershipId: number) {
  await tx.update(memberships).set({ status: 'active' }).where(eq(memberships.id, membershipId));
}

export async function deleteMembership(tx: Tx, membershipId: number) {
  await tx.delete(memberships).where(eq(memberships.id, membershipId));
}

/** The group's active organisers, locked so two removals cannot leave it with none. */
export const lockActiveOrganisers = (tx: Tx, groupId: number) =>
  tx
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.groupId, groupId), eq(memberships.role, 'organiser'), eq(memberships.status, 'active')))
    .for('update');
