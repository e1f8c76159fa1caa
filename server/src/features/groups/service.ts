import type { AppContext } from '../../context';
import { HttpError, notFound } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { composeMail } from '../../mail/templates';
import {
  activateMembership,
  deleteMembership,
  groupById,
  lockActiveOrganisers,
  membersOf,
  membershipInGroup,
  publicGroups,
} from './queries/members';
import { asLanguage } from '../../../../shared/i18n/languages';
import { translate } from '../../i18n';

/** The public list of groups. */
export const listPublicGroups = (ctx: AppContext) => publicGroups(ctx.database.db);

export async function listMembers(ctx: AppContext, groupId: number) {
  const group = await groupById(ctx.database.db, groupId);
  if (!group) throw notFound('That group');
  const rows = await membersOf(ctx.database.db, groupId);
  return {
    group: { id: group.id, name: group.name, town: group.town },
    members: rows.map((m) => ({ ...m, verified: m.verified !== null })),
  };
}

async function membershipIn(ctx: AppContext, groupId: number, membershipId: number) {
  const m = await membershipInGroup(ctx.database.db, groupId, membershipId);
  if (!m) throw notFound('That volunteer');
  return m;
}

export async function approveMember(ctx: AppContext, groupId: number, membershipId: number) {
  const m = await membershipIn(ctx, groupId, membershipId);
  await ctx.database.db.transaction(async (tx) => {
    await activateMembership(tx, m.id);
    if (m.status === 'pending') {
      // In the volunteer's own language, else the group's.
      const lang = asLanguage(m.language, asLanguage(m.groupLanguage));
      const t = (key: string, values?: Record<string, unknown>) => translate(lang, `mail.welcome.${key}`, values);
      await enqueueMail(
        tx,
        composeMail(m.email, t('subject', { group: m.groupName }), {
          paragraphs: [
            translate(lang, 'mail.hello', { name: m.name }),
            t('text', { group: m.groupName, role: translate(lang, `mail.roleAs.${m.role}`) }),
          ],
          action: { label: t('action'), url: `${ctx.env.publicUrl}/sign-in` },
          language: lang,
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
      const organisers = await lockActiveOrganisers(tx, groupId);
      if (organisers.length <= 1)
        throw new HttpError(
          409,
          'last-organiser',
          'A group needs at least one organiser. Make someone else organiser first.',
        );
    }
    await deleteMembership(tx, m.id);
  });
}
