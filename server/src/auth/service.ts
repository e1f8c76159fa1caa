import { and, count, eq, gt, isNull, sql } from 'drizzle-orm';
import type { LoginInput, SignupInput } from '../../../shared/schemas/auth';
import type { AppContext } from '../context';
import { authTokens, memberships, repairGroups, sessions, settings, users } from '../db/schema/index';
import { HttpError } from '../http/errors';
import { enqueueMail } from '../mail/outbox';
import { composeMail } from '../mail/templates';
import { dummyHash, hashPassword, verifyPassword } from './passwords';
import { newToken, sha256 } from './tokens';

const HOUR = 3600_000;
export const RESET_LINK_MS = HOUR;
export const VERIFY_LINK_MS = 48 * HOUR;

export const invalidCredentials = () =>
  new HttpError(401, 'invalid-credentials', 'That e-mail and password do not match an account.');
const invalidLink = () =>
  new HttpError(
    400,
    'link-invalid',
    'This link is no longer valid: it was used already, has expired, or is incomplete. Ask for a new one.',
  );

/** Returns the user id, or throws the same 401 for an unknown e-mail and a wrong password. */
export async function authenticate(ctx: AppContext, input: LoginInput): Promise<number> {
  const [user] = await ctx.database.db.select().from(users).where(eq(users.email, input.email));
  const ok = await verifyPassword(user?.passwordHash ?? (await dummyHash()), input.password);
  if (!user || !user.passwordHash || !ok) throw invalidCredentials();
  if (!user.emailVerifiedAt) {
    throw new HttpError(
      403,
      'email-unverified',
      'Confirm your e-mail address first: follow the link in the mail we sent when you signed up.',
    );
  }
  return user.id;
}

/** Volunteer sign-up. Answers the same whether or not the e-mail already has an account. */
export async function signup(ctx: AppContext, input: SignupInput): Promise<void> {
  const { db } = ctx.database;
  const [group] = await db.select().from(repairGroups).where(eq(repairGroups.id, input.groupId));
  if (!group)
    throw new HttpError(400, 'invalid', 'Some fields need attention.', { groupId: 'Choose one of the listed groups.' });
  const passwordHash = await hashPassword(input.password);
  await db.transaction(async (tx) => {
    const [existing] = await tx.select().from(users).where(eq(users.email, input.email));
    if (existing) {
      await enqueueMail(
        tx,
        composeMail(input.email, 'You already have a Mendery account', {
          paragraphs: [
            `Someone (probably you) tried to sign up with this address to help ${group.name}.`,
            'This address already has an account. Sign in, or reset your password if you have forgotten it.',
          ],
          action: { label: 'Reset my password', url: `${ctx.env.publicUrl}/forgot-password` },
          footnote: 'If this was not you, you can ignore this mail; nothing has changed.',
        }),
      );
      return;
    }
    const [{ id: userId }] = await tx
      .insert(users)
      .values({ email: input.email, name: input.name, passwordHash })
      .$returningId();
    await tx.insert(memberships).values({ userId, groupId: group.id, role: input.role, status: 'pending' });
    const { token, hash } = newToken();
    await tx
      .insert(authTokens)
      .values({ userId, purpose: 'verify-email', tokenHash: hash, expiresAt: new Date(Date.now() + VERIFY_LINK_MS) });
    await enqueueMail(
      tx,
      composeMail(input.email, 'Confirm your e-mail address for Mendery', {
        paragraphs: [
          `Hello ${input.name},`,
          `thank you for offering to help ${group.name}. Confirm your address to finish signing up; an organiser of the group then confirms your place.`,
        ],
        action: { label: 'Confirm my e-mail address', url: `${ctx.env.publicUrl}/verify-email?token=${token}` },
        footnote: 'The link works for 48 hours. If you did not sign up, ignore this mail.',
      }),
    );
  });
  ctx.outbox.kick();
}

async function consumeToken(
  tx: Parameters<Parameters<AppContext['database']['db']['transaction']>[0]>[0],
  token: string,
  purpose: 'verify-email' | 'reset-password',
) {
  const [row] = await tx
    .select()
    .from(authTokens)
    .where(
      and(
        eq(authTokens.tokenHash, sha256(token)),
        eq(authTokens.purpose, purpose),
        isNull(authTokens.usedAt),
        gt(authTokens.expiresAt, sql`NOW(3)`),
      ),
    )
    .for('update');
  if (!row) throw invalidLink();
  await tx.update(authTokens).set({ usedAt: new Date() }).where(eq(authTokens.id, row.id));
  return row.userId;
}

export async function verifyEmail(ctx: AppContext, token: string): Promise<void> {
  await ctx.database.db.transaction(async (tx) => {
    const userId = await consumeToken(tx, token, 'verify-email');
    await tx.update(users).set({ emailVerifiedAt: new Date() }).where(eq(users.id, userId));
    const [user] = await tx.select().from(users).where(eq(users.id, userId));
    const pending = await tx
      .select({ groupId: memberships.groupId, role: memberships.role, groupName: repairGroups.name })
      .from(memberships)
      .innerJoin(repairGroups, eq(repairGroups.id, memberships.groupId))
      .where(and(eq(memberships.userId, userId), eq(memberships.status, 'pending')));
    for (const p of pending) {
      const organisers = await tx
        .select({ email: users.email, name: users.name })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(
          and(eq(memberships.groupId, p.groupId), eq(memberships.role, 'organiser'), eq(memberships.status, 'active')),
        );
      for (const o of organisers) {
        await enqueueMail(
          tx,
          composeMail(o.email, `${user.name} would like to volunteer with ${p.groupName}`, {
            paragraphs: [
              `Hello ${o.name},`,
              `${user.name} (${user.email}) has signed up to help ${p.groupName} as ${p.role === 'host' ? 'reception' : 'a fixer'}.`,
              'Confirm or decline on the group page.',
            ],
            action: { label: 'Open the group page', url: `${ctx.env.publicUrl}/groups/${p.groupId}/people` },
          }),
        );
      }
    }
  });
  ctx.outbox.kick();
}

/** Always answers the same; mails a single-use link valid for an hour when the account exists. */
export async function requestPasswordReset(ctx: AppContext, email: string): Promise<void> {
  await ctx.database.db.transaction(async (tx) => {
    const [user] = await tx.select().from(users).where(eq(users.email, email));
    if (!user) return;
    // Only the newest link works.
    await tx
      .update(authTokens)
      .set({ usedAt: new Date() })
      .where(and(eq(authTokens.userId, user.id), eq(authTokens.purpose, 'reset-password'), isNull(authTokens.usedAt)));
    const { token, hash } = newToken();
    await tx.insert(authTokens).values({
      userId: user.id,
      purpose: 'reset-password',
      tokenHash: hash,
      expiresAt: new Date(Date.now() + RESET_LINK_MS),
    });
    await enqueueMail(
      tx,
      composeMail(user.email, 'Reset your Mendery password', {
        paragraphs: [
          `Hello ${user.name},`,
          'someone asked to reset the password of your Mendery account. Choose a new one with the button below.',
        ],
        action: { label: 'Choose a new password', url: `${ctx.env.publicUrl}/reset-password?token=${token}` },
        footnote:
          'The link works once, for one hour. If you did not ask for it, ignore this mail; your password stays as it is.',
      }),
    );
  });
  ctx.outbox.kick();
}

export async function confirmPasswordReset(ctx: AppContext, token: string, password: string): Promise<void> {
  const passwordHash = await hashPassword(password);
  await ctx.database.db.transaction(async (tx) => {
    const userId = await consumeToken(tx, token, 'reset-password');
    await tx
      .update(users)
      .set({ passwordHash, emailVerifiedAt: sql`COALESCE(${users.emailVerifiedAt}, NOW(3))` })
      .where(eq(users.id, userId));
    // A new password signs out every existing session of that person.
    await tx.delete(sessions).where(sql`JSON_VALUE(${sessions.data}, '$.userId') = ${userId}`);
  });
}

export async function needsSetup(ctx: AppContext): Promise<boolean> {
  const [{ n }] = await ctx.database.db.select({ n: count() }).from(users);
  return n === 0;
}

export async function isDemo(ctx: AppContext): Promise<boolean> {
  const [row] = await ctx.database.db.select().from(settings).where(eq(settings.key, 'demo'));
  return row?.value === true;
}

/** Creates the first admin of an empty installation; the settings row makes a second attempt fail. */
export async function createFirstAdmin(
  ctx: AppContext,
  input: { name: string; email: string; password: string },
): Promise<number> {
  const passwordHash = await hashPassword(input.password);
  try {
    return await ctx.database.db.transaction(async (tx) => {
      const [{ n }] = await tx.select({ n: count() }).from(users);
      if (n > 0) throw new HttpError(409, 'already-set-up', 'This installation already has an admin. Sign in instead.');
      await tx.insert(settings).values({ key: 'first-admin', value: true });
      const [{ id }] = await tx
        .insert(users)
        .values({ name: input.name, email: input.email, passwordHash, admin: true, emailVerifiedAt: new Date() })
        .$returningId();
      return id;
    });
  } catch (err) {
    if ((err as { code?: string }).code === 'ER_DUP_ENTRY')
      throw new HttpError(409, 'already-set-up', 'This installation already has an admin. Sign in instead.');
    throw err;
  }
}
