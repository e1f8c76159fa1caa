import { and, asc, eq, inArray } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import { groupSettingsSchema, venueSchema } from '../../../../shared/schemas/events';
import type { AppContext } from '../../context';
import { groupIdInBody, groupIdParam, hasGroupRole, requireGroupRole, requireUser } from '../../auth/guards';
import { groupExclusions, repairGroups, venues } from '../../db/schema/index';
import { forbidden, HttpError, notFound } from '../../http/errors';
import { body, query } from '../../http/validate';
import { excludedCategoryIds } from '../../core/screening';

/** Venues and the group's own rules: what it takes and what visitors agree to. */
export function venueRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx.database;

  r.get('/venues', requireUser, async (req, res) => {
    const { groupId } = query(req, z.object({ groupId: z.coerce.number().int().positive().optional() }));
    const user = req.user!;
    const organised = user.admin ? null : user.roles.filter((x) => x.role === 'organiser').map((x) => x.groupId);
    if (groupId !== undefined && !hasGroupRole(user, groupId, ['organiser'])) throw forbidden();
    if (groupId === undefined && organised?.length === 0) throw forbidden();
    const where =
      groupId !== undefined ? eq(venues.groupId, groupId) : organised ? inArray(venues.groupId, organised) : undefined;
    res.json(await db.select().from(venues).where(where).orderBy(asc(venues.name)));
  });

  r.post('/venues', requireGroupRole(['organiser'], groupIdInBody), async (req, res) => {
    const input = body(req, venueSchema);
    const [{ id }] = await db.insert(venues).values(input).$returningId();
    res.status(201).json({ id, ...input });
  });

  r.get('/groups/:groupId/settings', async (req, res) => {
    const groupId = groupIdParam(req);
    const [g] = await db.select().from(repairGroups).where(eq(repairGroups.id, groupId));
    if (!g) throw notFound('That group');
    res.json({
      id: g.id,
      name: g.name,
      town: g.town,
      timeZone: g.timeZone,
      houseRules: g.houseRules ?? '',
      excludedCategoryIds: await excludedCategoryIds(db, groupId),
    });
  });

  r.put('/groups/:groupId/settings', requireGroupRole(['organiser'], groupIdParam), async (req, res) => {
    const groupId = groupIdParam(req);
    const input = body(req, groupSettingsSchema);
    await db.transaction(async (tx) => {
      const [g] = await tx.select().from(repairGroups).where(eq(repairGroups.id, groupId)).for('update');
      if (!g) throw notFound('That group');
      await tx.update(repairGroups).set({ houseRules: input.houseRules }).where(eq(repairGroups.id, groupId));
      await tx.delete(groupExclusions).where(and(eq(groupExclusions.groupId, groupId)));
      const ids = [...new Set(input.excludedCategoryIds)];
      if (ids.length) {
        try {
          await tx.insert(groupExclusions).values(ids.map((categoryId) => ({ groupId, categoryId })));
        } catch {
          throw new HttpError(400, 'invalid', 'Some fields need attention.', {
            excludedCategoryIds: 'One of the categories does not exist.',
          });
        }
      }
    });
    res.json({ ok: true });
  });
  return r;
}
