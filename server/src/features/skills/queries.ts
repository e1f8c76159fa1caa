import { and, asc, eq, inArray } from 'drizzle-orm';
import type { Equipment } from '../../../../shared/constants';
import type { DbOrTx } from '../../db/client';
import { memberships, users, volunteerProfiles, volunteerSkills } from '../../db/schema/index';

export async function profileRow(db: DbOrTx, userId: number) {
  const [p] = await db.select().from(volunteerProfiles).where(eq(volunteerProfiles.userId, userId));
  return p;
}

export const profileRows = (db: DbOrTx, userIds: number[]) =>
  userIds.length ? db.select().from(volunteerProfiles).where(inArray(volunteerProfiles.userId, userIds)) : [];

/** Replaces a volunteer's skill rows with the given levels. */
export async function replaceSkills(db: DbOrTx, userId: number, levels: { skill: string; level: 1 | 2 | 3 }[]) {
  await db.delete(volunteerSkills).where(eq(volunteerSkills.userId, userId));
  if (levels.length) await db.insert(volunteerSkills).values(levels.map((l) => ({ userId, ...l })));
}

export const upsertProfile = (db: DbOrTx, userId: number, kit: Equipment[], notes: string) =>
  db.insert(volunteerProfiles).values({ userId, kit, notes }).onDuplicateKeyUpdate({ set: { kit, notes } });

/** The group's active members, one row per role, by name. */
export const activeMemberRows = (db: DbOrTx, groupId: number) =>
  db
    .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.groupId, groupId), eq(memberships.status, 'active')))
    .orderBy(asc(users.name));
