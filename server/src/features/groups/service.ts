import { and, asc, eq } from 'drizzle-orm';
import type { AppContext } from '../../context';
import { memberships, repairGroups, users } from '../../db/schema/index';
import { HttpError, notFound } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { composeMail } from '../../mail/templates';

export async function listMembers(ctx: AppContext, groupId: number) {
  const [group] = await ctx.database.db.select().from(repairGroups).where(eq(repairGroups.id, groupId));
  if (!group) throw notFound('That group');
  const rows = await ctx.database.db
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
  return {
    group: { id: group.id, name: group.name, town: group.town },
    members: rows.map((m) => ({ ...m, verified: m.verified !== null })),
  };
}

async function membershipIn(ctx: AppContext, groupId: number, membershipId: number) {
  const [m] = await ctx.database.db
    .select({
      id: memberships.id,
      status: memberships.status,
      role: memberships.role,
      email: users.email,
      name: users.name,
      groupName: repairGroups.name,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(repairGroups, eq(repairGroups.id, memberships.groupId))
    .where(and(eq(memberships.id, membershipId), eq(memberships.groupId, groupId)));
  if (!m) throw notFound('That volunteer');
  return m;
}

export async function approveMember(ctx: AppContext, groupId: number, membershipId: number) {
  const m = await membershipIn(ctx, groupId, membershipId);
  await ctx.database.db.transaction(async (tx) => {
    await tx.update(memberships).set({ status: 'active' }).where(eq(memberships.id, m.id));
    if (m.status === 'pending') {
      await enqueueMail(
        tx,
        composeMail(m.email, `Welcome to ${m.groupName}`, {
          paragraphs: [
            `Hello ${m.name},`,
            `an organiser of ${m.groupName} has confirmed you as ${m.role === 'host' ? 'reception' : 'a fixer'}. Sign in to see the group's events.`,
          ],
          action: { label: 'Sign in to Mendery', url: `${ctx.env.publicUrl}/sign-in` },
        }),
      );
    }
  });
  ctx.outbox.kick();
}

export async function removeMember(ctx: AppContext, groupId: number, membershipId: number) {
  const m = await membershipIn(ctx, groupId, membershipId);
  await ctx.database.db.transaction(async (tx) => {
    if (m.role === 'organiser' && m.status === 'active') {
      const organisers = await tx
        .select({ id: memberships.id })
        .from(memberships)
        .where(
          and(eq(memberships.groupId, groupId), eq(memberships.role, 'organiser'), eq(memberships.status, 'active')),
        )
        .for('update');
      if (organisers.length <= 1)
        throw new HttpError(
          409,
          'last-organiser',
          'A group needs at least one organiser. Make someone else organiser first.',
        );
    }
    await tx.delete(memberships).where(eq(memberships.id, m.id));
  });
}
