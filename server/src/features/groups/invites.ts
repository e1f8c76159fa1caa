import type { GroupRole } from '../../../../shared/constants';
import type { AppContext } from '../../context';
import { refuseCommonPassword } from '../../auth/common-passwords';
import { hashPassword } from '../../auth/passwords';
import { newToken, sha256 } from '../../auth/tokens';
import { HttpError, notFound } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { composeMail } from '../../mail/templates';
import { groupById } from './queries/members';
import {
  activeMembershipOf,
  insertConfirmedUser,
  insertInvite,
  joinFromInvite,
  openInviteByHash,
  userByEmail,
  userById,
} from './queries/invites';
import { asLanguage } from '../../../../shared/i18n/languages';
import { translate } from '../../i18n';

const INVITE_DAYS = 14;

export async function invite(
  ctx: AppContext,
  groupId: number,
  input: { email: string; role: GroupRole },
  invitedBy: number,
) {
  const { db } = ctx.database;
  const group = await groupById(db, groupId);
  if (!group) throw notFound('That group');
  const inviter = await userById(db, invitedBy);
  const already = await activeMembershipOf(db, groupId, input.email, input.role);
  if (already)
    throw new HttpError(
      409,
      'already-member',
      'problems.alreadyMember',
      { email: 'Already in the team in this role.' },
      { email: input.email, group: group.name, role: `organise.role.${input.role}` },
    );
  const { token, hash } = newToken();
  await db.transaction(async (tx) => {
    await insertInvite(tx, {
      groupId,
      email: input.email,
      role: input.role,
      tokenHash: hash,
      expiresAt: new Date(Date.now() + INVITE_DAYS * 86400_000),
      invitedBy,
    });
    // Nothing is known of the invitee yet: the group's own language.
    const lang = asLanguage(group.defaultLanguage);
    const t = (key: string, values?: Record<string, unknown>) => translate(lang, `mail.invite.${key}`, values);
    const who = inviter?.name ?? t('anOrganiser');
    await enqueueMail(
      tx,
      composeMail(input.email, t('subject', { who, group: group.name }), {
        paragraphs: [
          t('hello'),
          t('text', { who, group: group.name, role: translate(lang, `mail.roleAs.${input.role}`) }),
          t('follow'),
        ],
        action: { label: t('action'), url: `${ctx.env.publicUrl}/join/${token}` },
        footnote: t('footnote', { days: INVITE_DAYS }),
        language: lang,
      }),
    );
  });
  ctx.outbox.kick();
}

async function openInvite(ctx: AppContext, token: string) {
  const row = await openInviteByHash(ctx.database.db, sha256(token));
  if (!row)
    throw new HttpError(
      404,
      'link-invalid',
      'This invitation was used already or has expired. Ask the organiser for a new one.',
    );
  return row;
}

export async function viewInvite(ctx: AppContext, token: string) {
  const { invite: i, groupName } = await openInvite(ctx, token);
  const existing = await userByEmail(ctx.database.db, i.email);
  return { groupName, role: i.role, email: i.email, hasAccount: Boolean(existing) };
}

async function join(ctx: AppContext, inviteId: number, groupId: number, userId: number, role: GroupRole) {
  await joinFromInvite(ctx.database.db, inviteId, { userId, groupId, role });
}

/** A signed-in person accepts; the invitation is for one address, so it must be theirs. */
export async function acceptInvite(ctx: AppContext, token: string, user: { id: number; email: string }) {
  const { invite: i } = await openInvite(ctx, token);
  if (i.email !== user.email)
    throw new HttpError(
      403,
      'wrong-account',
      `This invitation is for ${i.email}. Sign out and sign in with that address.`,
    );
  await join(ctx, i.id, i.groupId, user.id, i.role);
}

/** No account yet: the link proves the address, so the account starts confirmed. */
export async function signupFromInvite(ctx: AppContext, token: string, input: { name: string; password: string }) {
  const { invite: i } = await openInvite(ctx, token);
  const existing = await userByEmail(ctx.database.db, i.email);
  if (existing) throw new HttpError(409, 'has-account', 'This address already has an account: sign in to accept.');
  refuseCommonPassword(input.password);
  const id = await insertConfirmedUser(ctx.database.db, {
    email: i.email,
    name: input.name,
    passwordHash: await hashPassword(input.password),
  });
  await join(ctx, i.id, i.groupId, id, i.role);
  return id;
}
