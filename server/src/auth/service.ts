import type { ChangePasswordInput, LoginInput, SignupInput } from '../../../shared/schemas/auth';
import type { AppContext } from '../context';
import type { Tx } from '../db/client';
import { HttpError } from '../http/errors';
import { enqueueMail } from '../mail/outbox';
import { composeMail } from '../mail/templates';
import { refuseCommonPassword } from './common-passwords';
import { dummyHash, hashPassword, verifyPassword } from './passwords';
import * as q from './queries';
import { newToken, sha256 } from './tokens';
import { asLanguage, DEFAULT_LANGUAGE, type Language } from '../../../shared/i18n/languages';
import { translate } from '../i18n';

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
  const user = await q.userByEmail(ctx.database.db, input.email);
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

/**
 * Volunteer sign-up. Answers the same whether or not the e-mail already has an account. A sign-up for an address
 * whose account is not yet confirmed mails a link of its own that carries this sign-up's password and name:
 * whichever link the owner of the mailbox follows decides the password, and the other links die with it.
 */
export async function signup(ctx: AppContext, input: SignupInput, lang: Language = DEFAULT_LANGUAGE): Promise<void> {
  const t = (key: string, values?: Record<string, unknown>) => translate(lang, `mail.account.${key}`, values);
  const { db } = ctx.database;
  const group = await q.groupById(db, input.groupId);
  if (!group) throw new HttpError(400, 'invalid', 'errors.invalid', { groupId: 'Choose one of the listed groups.' });
  refuseCommonPassword(input.password);
  const passwordHash = await hashPassword(input.password);
  await db.transaction(async (tx) => {
    const existing = await q.userByEmail(tx, input.email);
    if (existing?.emailVerifiedAt) {
      await enqueueMail(
        tx,
        composeMail(input.email, t('exists.subject'), {
          paragraphs: [t('exists.text', { group: group.name }), t('exists.signIn')],
          action: { label: t('exists.action'), url: `${ctx.env.publicUrl}/forgot-password` },
          footnote: t('exists.footnote'),
          language: lang,
        }),
      );
      return;
    }
    const userId = existing?.id ?? (await q.insertUser(tx, { email: input.email, name: input.name, passwordHash }));
    await q.insertPendingMembership(tx, { userId, groupId: group.id, role: input.role });
    const { token, hash } = newToken();
    await q.insertToken(tx, {
      userId,
      purpose: 'verify-email',
      hash,
      expiresAt: new Date(Date.now() + VERIFY_LINK_MS),
      signup: { passwordHash, name: input.name },
    });
    await enqueueMail(
      tx,
      composeMail(input.email, t('confirm.subject'), {
        paragraphs: [translate(lang, 'mail.hello', { name: input.name }), t('confirm.text', { group: group.name })],
        action: { label: t('confirm.action'), url: `${ctx.env.publicUrl}/verify-email?token=${token}` },
        footnote: t('confirm.footnote', { hours: VERIFY_LINK_MS / HOUR }),
        language: lang,
      }),
    );
  });
  ctx.outbox.kick();
}

async function consumeToken(tx: Tx, token: string, purpose: q.TokenPurpose) {
  const row = await q.consumeToken(tx, sha256(token), purpose);
  if (!row) throw invalidLink();
  return row;
}

export async function verifyEmail(ctx: AppContext, token: string): Promise<void> {
  await ctx.database.db.transaction(async (tx) => {
    const link = await consumeToken(tx, token, 'verify-email');
    const userId = link.userId;
    const before = (await q.userById(tx, userId))!;
    // Only a first confirmation sets the sign-up's password: a stray link must not change a confirmed account's.
    const signup =
      !before.emailVerifiedAt && link.passwordHash && link.name
        ? { passwordHash: link.passwordHash, name: link.name }
        : undefined;
    await q.markEmailVerified(tx, userId, signup);
    await q.spendOpenTokens(tx, userId, 'verify-email');
    const user = (await q.userById(tx, userId))!;
    for (const p of await q.pendingMemberships(tx, userId)) {
      const organisers = await q.activeOrganisers(tx, p.groupId);
      for (const o of organisers) {
        // In the organiser's own language, else the group's.
        const lang = asLanguage(o.language, asLanguage(p.groupLanguage));
        const t = (key: string, values?: Record<string, unknown>) =>
          translate(lang, `mail.account.newVolunteer.${key}`, values);
        await enqueueMail(
          tx,
          composeMail(o.email, t('subject', { name: user.name, group: p.groupName }), {
            paragraphs: [
              translate(lang, 'mail.hello', { name: o.name }),
              t('text', {
                name: user.name,
                email: user.email,
                group: p.groupName,
                role: translate(lang, `mail.roleAs.${p.role}`),
              }),
              t('decide'),
            ],
            action: { label: t('action'), url: `${ctx.env.publicUrl}/groups/${p.groupId}/people` },
            language: lang,
          }),
        );
      }
    }
  });
  ctx.outbox.kick();
}

/** Always answers the same; mails a single-use link valid for an hour when the account exists. */
export async function requestPasswordReset(
  ctx: AppContext,
  email: string,
  requestLanguage: Language = DEFAULT_LANGUAGE,
): Promise<void> {
  await ctx.database.db.transaction(async (tx) => {
    const user = await q.userByEmail(tx, email);
    if (!user) return;
    // The account's own language, else the one the request was made in.
    const lang = asLanguage(user.language, requestLanguage);
    await q.spendOpenTokens(tx, user.id, 'reset-password');
    const { token, hash } = newToken();
    await q.insertToken(tx, {
      userId: user.id,
      purpose: 'reset-password',
      hash,
      expiresAt: new Date(Date.now() + RESET_LINK_MS),
    });
    await enqueueMail(
      tx,
      composeMail(user.email, translate(lang, 'mail.account.reset.subject'), {
        paragraphs: [translate(lang, 'mail.hello', { name: user.name }), translate(lang, 'mail.account.reset.text')],
        action: {
          label: translate(lang, 'mail.account.newPassword'),
          url: `${ctx.env.publicUrl}/reset-password?token=${token}`,
        },
        footnote: translate(lang, 'mail.account.reset.footnote'),
        language: lang,
      }),
    );
  });
  ctx.outbox.kick();
}

export async function confirmPasswordReset(ctx: AppContext, token: string, password: string): Promise<void> {
  // A dead link is refused before the costly hash; the transaction checks again as it spends the link.
  refuseCommonPassword(password);
  if (!(await q.tokenIsLive(ctx.database.db, sha256(token), 'reset-password'))) throw invalidLink();
  const passwordHash = await hashPassword(password);
  await ctx.database.db.transaction(async (tx) => {
    const { userId } = await consumeToken(tx, token, 'reset-password');
    // A new password signs out every existing session of that person, and proves the address: sign-up links die.
    await q.replacePassword(tx, userId, passwordHash);
    await q.spendOpenTokens(tx, userId, 'verify-email');
  });
}

/**
 * A signed-in person changes their password: the current one must be right (403 otherwise), the new one must not be
 * a common one. Every other session of theirs ends, and a notice goes to their address in case it was not them.
 */
export async function changePassword(
  ctx: AppContext,
  userId: number,
  sessionId: string,
  input: ChangePasswordInput,
  lang: Language = DEFAULT_LANGUAGE,
): Promise<void> {
  const { db } = ctx.database;
  refuseCommonPassword(input.password);
  const user = await q.userById(db, userId);
  if (!user?.passwordHash || !(await verifyPassword(user.passwordHash, input.currentPassword))) {
    const message = 'That is not your current password.';
    throw new HttpError(403, 'wrong-password', message, { currentPassword: message });
  }
  if (input.password === input.currentPassword) {
    const message = 'Choose a password that differs from the current one.';
    throw new HttpError(400, 'invalid', message, { password: message });
  }
  const passwordHash = await hashPassword(input.password);
  await db.transaction(async (tx) => {
    await q.changePassword(tx, userId, passwordHash, sessionId);
    await enqueueMail(
      tx,
      composeMail(user.email, translate(lang, 'mail.account.changed.subject'), {
        paragraphs: [
          translate(lang, 'mail.hello', { name: user.name }),
          translate(lang, 'mail.account.changed.text'),
          translate(lang, 'mail.account.changed.ifNot'),
        ],
        action: { label: translate(lang, 'mail.account.newPassword'), url: `${ctx.env.publicUrl}/forgot-password` },
        language: lang,
      }),
    );
  });
  ctx.outbox.kick();
}

export async function needsSetup(ctx: AppContext): Promise<boolean> {
  return (await q.countUsers(ctx.database.db)) === 0;
}

export async function isDemo(ctx: AppContext): Promise<boolean> {
  return (await q.settingValue(ctx.database.db, 'demo')) === true;
}
