import { and, eq } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { DbOrTx } from '../db/client';
import { memberships, repairGroups, users } from '../db/schema/index';

/** The user as the API shows it: who they are and their active roles per group. */
export async function loadSessionUser(db: DbOrTx, userId: number): Promise<SessionUser | null> {
  const [user] = await db
    .select({ id: users.id, email: users.email, name: users.name, admin: users.admin })
    .from(users)
    .where(eq(users.id, userId));
  if (!user) return null;
  const roles = await db
    .select({ groupId: memberships.groupId, role: memberships.role, groupName: repairGroups.name })
    .from(memberships)
    .innerJoin(repairGroups, eq(repairGroups.id, memberships.groupId))
    .where(and(eq(memberships.userId, userId), eq(memberships.status, 'active')))
    .orderBy(repairGroups.name, memberships.role);
  return { ...user, admin: Boolean(user.admin), roles };
}
