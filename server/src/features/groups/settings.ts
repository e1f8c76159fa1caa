import type { z } from 'zod';
import type { groupSettingsSchema, venueSchema } from '../../../../shared/schemas/events';
import type { AppContext } from '../../context';
import type { SessionUser } from '../../../../shared/schemas/auth';
import { hasGroupRole } from '../../auth/guards';
import { forbidden, HttpError, notFound } from '../../http/errors';
import { excludedCategoryIds } from '../../core/screening';
import { asLanguage } from '../../../../shared/i18n/languages';
import { groupById } from './queries/members';
import {
  insertVenue,
  lockGroup,
  replaceExclusions,
  setCurrency,
  setDefaultLanguage,
  setCountry,
  setHouseRules,
  setPrivacy,
  venuesOf,
} from './queries/settings';

/** Venues of one group the user organises, or of all the groups they organise (every venue for an admin). */
export async function listVenues(ctx: AppContext, user: SessionUser, groupId: number | undefined) {
  const organised = user.admin ? null : user.roles.filter((x) => x.role === 'organiser').map((x) => x.groupId);
  if (groupId !== undefined && !hasGroupRole(user, groupId, ['organiser'])) throw forbidden();
  if (groupId === undefined && organised?.length === 0) throw forbidden();
  return venuesOf(ctx.database.db, groupId !== undefined ? [groupId] : organised);
}

export async function createVenue(ctx: AppContext, input: z.output<typeof venueSchema>) {
  const id = await insertVenue(ctx.database.db, input);
  return { id, ...input };
}

/** The group's own rules: what it takes and what visitors agree to. */
export async function groupSettings(ctx: AppContext, groupId: number) {
  const { db } = ctx.database;
  const g = await groupById(db, groupId);
  if (!g) throw notFound('That group');
  return {
    id: g.id,
    name: g.name,
    town: g.town,
    timeZone: g.timeZone,
    currency: g.currency,
    defaultLanguage: asLanguage(g.defaultLanguage),
    country: g.country ?? '',
    houseRules: g.houseRules ?? '',
    contactEmail: g.contactEmail ?? '',
    retention: { months: g.retentionMonths, lastRunAt: g.retentionRanAt, lastRunAnonymised: g.retentionAnonymised },
    excludedCategoryIds: await excludedCategoryIds(db, groupId),
  };
}

export async function saveGroupSettings(ctx: AppContext, groupId: number, input: z.output<typeof groupSettingsSchema>) {
  await ctx.database.db.transaction(async (tx) => {
    if (!(await lockGroup(tx, groupId))) throw notFound('That group');
    if (input.houseRules !== undefined) await setHouseRules(tx, groupId, input.houseRules);
    if (input.currency !== undefined) await setCurrency(tx, groupId, input.currency);
    if (input.defaultLanguage !== undefined) await setDefaultLanguage(tx, groupId, input.defaultLanguage);
    if (input.country !== undefined) await setCountry(tx, groupId, input.country);
    if (input.retentionMonths !== undefined || input.contactEmail !== undefined)
      await setPrivacy(tx, groupId, { retentionMonths: input.retentionMonths, contactEmail: input.contactEmail });
    if (
      input.excludedCategoryIds !== undefined &&
      !(await replaceExclusions(tx, groupId, [...new Set(input.excludedCategoryIds)]))
    )
      throw new HttpError(400, 'invalid', 'errors.invalid', {
        excludedCategoryIds: 'One of the categories does not exist.',
      });
  });
}
