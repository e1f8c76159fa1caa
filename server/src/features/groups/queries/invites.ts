import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import type { GroupRole } from '../../../../../shared/constants';
import type { DbOrTx, Tx } from '../../../db/client';
import { invites, memberships, repairGroups, users } from '../../../db/schema/index';

export const userById = async (db: DbOrTx, userId: number) =>
  (await db.select().from(users).where(eq(users.id, userId)))[0];

export const userByEmail = async (db: DbOrTx, email: string) =>
  (await db.select().from(users).where(eq(users.email, email)))[0];

/** An active membership of this address in this role, if there is one. */
export const activeMembershipOf = async (db: DbOrTx, groupId: number, email: string, role: GroupRole) =>
  (
    await db
      .select({ id: memberships.id })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(
        and(
          eq(memberships.groupId, groupId),
          eq(users.email, email),
          eq(memberships.role, role),
          eq(memberships.status, 'active'),
        ),
      )
  )[0];

export async function insertInvite(tx: Tx, invite: typeof invites.$inferInsert) {
  await tx.insert(invites).values(invite);
}

/** An invitation not yet accepted and not expired, by the hash of its token, with the group's name. */
export const openInviteByHash = async (db: DbOrTx, tokenHash: string) =>
  (
    await db
      .select({ invite: invites, groupName: repairGroups.name })
      .from(invites)
      .innerJoin(repairGroups, eq(repairGroups.id, invites.groupId))
      .where(and(eq(invites.tokenHash, tokenHash), isNull(invites.acceptedAt), gt(invites.expiresAt, sql`NOW(3)`)))
  )[0];

/** Makes (or re-activates) the membership and marks the invitation used, together. */
export async function joinFromInvite(
  db: DbOrTx,
  inviteId: number,
  m: { userId: number; groupId: number; role: GroupRole },
) {
  await db.transaction(async (tx) => {
    await tx
      .insert(memberships)
      .values({ ...m, status: 'active' })
      .onDuplicateKeyUpdate({ set: { status: 'active' } });
    await tx.update(invites).set({ acceptedAt: new Date() }).where(eq(invites.id, inviteId));
  });
}

export async function insertConfirmedUser(db: DbOrTx, user: { email: string; name: string; passwordHash: string }) {
  const [{ id }] = await db
    .insert(users)
    .values({ ...user, emailVerifiedAt: new Date() })
    .$returningId();
  return id;
}
