import { isLanguage } from '../../../shared/i18n/languages';
import { and, count, eq, gt, isNull, ne, sql } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { DbOrTx, Tx } from '../db/client';
import { authTokens, memberships, repairGroups, sessions, settings, users } from '../db/schema/index';

/** The SQL of signing in, signing up and the mailed links; the rules are in service.ts. */
export type TokenPurpose = 'verify-email' | 'reset-password';

export async function userByEmail(db: DbOrTx, email: string) {
  const [user] = await db.select().from(users).where(eq(users.email, email));
  return user;
}

export async function userById(db: DbOrTx, id: number) {
  const [user] = await db.select().from(users).where(eq(users.id, id));
  return user;
}

export async function groupById(db: DbOrTx, id: number) {
  const [group] = await db.select().from(repairGroups).where(eq(repairGroups.id, id));
  return group;
}

export async function insertUser(
  tx: Tx,
  values: { email: string; name: string; passwordHash: string; admin?: boolean; emailVerifiedAt?: Date },
): Promise<number> {
  const [{ id }] = await tx.insert(users).values(values).$returningId();
  return id;
}

/** Asks to join; asking again for the same group and role changes nothing. */
export async function insertPendingMembership(
  tx: Tx,
  row: { userId: number; groupId: number; role: 'fixer' | 'host' | 'organiser' },
) {
  await tx
    .insert(memberships)
    .values({ ...row, status: 'pending' })
    .onDuplicateKeyUpdate({ set: { userId: sql`${memberships.userId}` } });
}

export async function insertToken(
  tx: Tx,
  row: {
    userId: number;
    purpose: TokenPurpose;
    hash: string;
    expiresAt: Date;
    signup?: { passwordHash: string; name: string };
  },
) {
  await tx.insert(authTokens).values({
    userId: row.userId,
    purpose: row.purpose,
    tokenHash: row.hash,
    expiresAt: row.expiresAt,
    passwordHash: row.signup?.passwordHash ?? null,
    name: row.signup?.name ?? null,
  });
}

const liveToken = (hash: string, purpose: TokenPurpose) =>
  and(
    eq(authTokens.tokenHash, hash),
    eq(authTokens.purpose, purpose),
    isNull(authTokens.usedAt),
    gt(authTokens.expiresAt, sql`NOW(3)`),
  );

/** Whether a link is unused and unexpired, without spending it: checked before any costly work. */
export async function tokenIsLive(db: DbOrTx, hash: string, purpose: TokenPurpose): Promise<boolean> {
  const [row] = await db.select({ id: authTokens.id }).from(authTokens).where(liveToken(hash, purpose));
  return Boolean(row);
}

/** Only the newest link works: earlier unused ones of this purpose are spent. */
export async function spendOpenTokens(tx: Tx, userId: number, purpose: TokenPurpose) {
  await tx
    .update(authTokens)
    .set({ usedAt: new Date() })
    .where(and(eq(authTokens.userId, userId), eq(authTokens.purpose, purpose), isNull(authTokens.usedAt)));
}

/** Locks an unused, unexpired token with this hash and marks it used; its row, or null when there is none. */
export async function consumeToken(tx: Tx, hash: string, purpose: TokenPurpose) {
  const [row] = await tx.select().from(authTokens).where(liveToken(hash, purpose)).for('update');
  if (!row) return null;
  await tx.update(authTokens).set({ usedAt: new Date() }).where(eq(authTokens.id, row.id));
  return row;
}

/** Confirms the address; a sign-up's own password and name replace those of any earlier sign-up. */
export async function markEmailVerified(tx: Tx, userId: number, signup?: { passwordHash: string; name: string }) {
  await tx
    .update(users)
    .set({ emailVerifiedAt: new Date(), ...(signup ?? {}) })
    .where(eq(users.id, userId));
}

/** The groups this person asked to join and is not yet confirmed in. */
export const pendingMemberships = (tx: Tx, userId: number) =>
  tx
    .select({
      groupId: memberships.groupId,
      role: memberships.role,
      groupName: repairGroups.name,
      groupLanguage: repairGroups.defaultLanguage,
    })
    .from(memberships)
    .innerJoin(repairGroups, eq(repairGroups.id, memberships.groupId))
    .where(and(eq(memberships.userId, userId), eq(memberships.status, 'pending')));

export const activeOrganisers = (tx: Tx, groupId: number) =>
  tx
    .select({ email: users.email, name: users.name, language: users.language })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.groupId, groupId), eq(memberships.role, 'organiser'), eq(memberships.status, 'active')));

/** Sets the new password (which also proves the address) and signs out every session of that person. */
export async function replacePassword(tx: Tx, userId: number, passwordHash: string) {
  await tx
    .update(users)
    .set({ passwordHash, emailVerifiedAt: sql`COALESCE(${users.emailVerifiedAt}, NOW(3))` })
    .where(eq(users.id, userId));
  await tx.delete(sessions).where(sql`JSON_VALUE(${sessions.data}, '$.userId') = ${userId}`);
}

/** A new password chosen while signed in: every other session of that person ends, the one in use stays. */
export async function changePassword(tx: Tx, userId: number, passwordHash: string, keepSessionId: string) {
  await tx.update(users).set({ passwordHash }).where(eq(users.id, userId));
  await tx
    .delete(sessions)
    .where(and(sql`JSON_VALUE(${sessions.data}, '$.userId') = ${userId}`, ne(sessions.sessionId, keepSessionId)));
}

export async function countUsers(db: DbOrTx): Promise<number> {
  const [{ n }] = await db.select({ n: count() }).from(users);
  return n;
}

export async function settingValue(db: DbOrTx, key: string): Promise<unknown> {
  const [row] = await db.select().from(settings).where(eq(settings.key, key));
  return row?.value;
}

export async function insertSetting(tx: Tx, key: string, value: unknown) {
  await tx.insert(settings).values({ key, value });
}

/** The user as the API shows it: who they are and their active roles per group. */
export async function loadSessionUser(db: DbOrTx, userId: number): Promise<SessionUser | null> {
  const [user] = await db
    .select({ id: users.id, email: users.email, name: users.name, admin: users.admin, language: users.language })
    .from(users)
    .where(eq(users.id, userId));
  if (!user) return null;
  const roles = await db
    .select({ groupId: memberships.groupId, role: memberships.role, groupName: repairGroups.name })
    .from(memberships)
    .innerJoin(repairGroups, eq(repairGroups.id, memberships.groupId))
    .where(and(eq(memberships.userId, userId), eq(memberships.status, 'active')))
    .orderBy(repairGroups.name, memberships.role);
  return { ...user, admin: Boolean(user.admin), roles, language: isLanguage(user.language) ? user.language : null };
}

/** Keeps a person's choice of language on their account. */
export async function setAccountLanguage(db: DbOrTx, userId: number, language: string) {
  await db.update(users).set({ language }).where(eq(users.id, userId));
}

/** The two-factor columns of one person. */
export async function twoFactorOf(db: DbOrTx, userId: number) {
  const [row] = await db
    .select({
      email: users.email,
      name: users.name,
      admin: users.admin,
      passwordHash: users.passwordHash,
      totpSecret: users.totpSecret,
      totpPending: users.totpPending,
      totpLastStep: users.totpLastStep,
    })
    .from(users)
    .where(eq(users.id, userId));
  return row;
}

export async function setTotpPending(db: DbOrTx, userId: number, sealed: string | null) {
  await db.update(users).set({ totpPending: sealed }).where(eq(users.id, userId));
}

/** Turns two-factor sign-in on with the pending secret, the step of its first code counting as used. */
export async function enableTotp(db: DbOrTx, userId: number, sealed: string, step: number) {
  await db.update(users).set({ totpSecret: sealed, totpPending: null, totpLastStep: step }).where(eq(users.id, userId));
}

export async function disableTotp(db: DbOrTx, userId: number) {
  await db.update(users).set({ totpSecret: null, totpPending: null, totpLastStep: null }).where(eq(users.id, userId));
}

/** Spends a code's time step; false when a code of this step or a later one was taken already (a replay or a race). */
export async function spendTotpStep(db: DbOrTx, userId: number, step: number): Promise<boolean> {
  const [result] = await db
    .update(users)
    .set({ totpLastStep: step })
    .where(and(eq(users.id, userId), sql`(${users.totpLastStep} IS NULL OR ${users.totpLastStep} < ${step})`));
  return (result as { affectedRows: number }).affectedRows === 1;
}
