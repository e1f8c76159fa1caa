import { and, eq } from 'drizzle-orm';
import { Router, type Request } from 'express';
import { z } from 'zod';
import { askSchema, myShiftSchema, profileSchema, seatSchema } from '../../../../shared/schemas/volunteers';
import type { AppContext } from '../../context';
import { groupIdParam, requireGroupRole, requireUser } from '../../auth/guards';
import { eventBenches, shifts } from '../../db/schema/index';
import { HttpError, notFound } from '../../http/errors';
import { body, params } from '../../http/validate';
import { eventGroupId } from '../../core/events';
import * as volunteers from './service';

const idParams = z.object({ id: z.coerce.number().int().positive() });

export function volunteerRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx.database;
  const ofEvent = (roles: ('organiser' | 'host' | 'fixer')[]) =>
    requireGroupRole(roles, (req: Request) => eventGroupId(db, Number(req.params.id)));

  r.get('/me/profile', requireUser, async (req, res) => res.json(await volunteers.getProfile(ctx, req.user!.id)));
  r.put('/me/profile', requireUser, async (req, res) =>
    res.json(await volunteers.saveProfile(ctx, req.user!.id, body(req, profileSchema))),
  );
  r.get('/me/events', requireUser, async (req, res) => res.json(await volunteers.myEvents(ctx, req.user!.id)));

  r.get('/groups/:groupId/skills', requireGroupRole(['organiser'], groupIdParam), async (req, res) =>
    res.json(await volunteers.skillsMatrix(ctx, groupIdParam(req))),
  );

  r.put('/events/:id/shifts/me', ofEvent(['organiser', 'host', 'fixer']), async (req, res) => {
    res.json(await volunteers.setMyShift(ctx, params(req, idParams).id, req.user!.id, body(req, myShiftSchema)));
  });
  r.get('/events/:id/rota', ofEvent(['organiser']), async (req, res) =>
    res.json(await volunteers.rota(ctx, params(req, idParams).id)),
  );
  r.post('/events/:id/rota/ask', ofEvent(['organiser']), async (req, res) =>
    res.json(await volunteers.askForSkills(ctx, params(req, idParams).id, body(req, askSchema).skills)),
  );
  /** Seats a coming fixer at one of the event's benches, or lets them move freely (null). */
  r.patch('/events/:id/shifts/:userId', ofEvent(['organiser']), async (req, res) => {
    const { id, userId } = params(req, idParams.extend({ userId: z.coerce.number().int().positive() }));
    const { benchId } = body(req, seatSchema);
    if (benchId !== null) {
      const [b] = await db
        .select()
        .from(eventBenches)
        .where(and(eq(eventBenches.id, benchId), eq(eventBenches.eventId, id)));
      if (!b)
        throw new HttpError(400, 'invalid', 'Some fields need attention.', {
          benchId: 'That bench is not set out at this event.',
        });
    }
    const [s] = await db
      .select()
      .from(shifts)
      .where(and(eq(shifts.eventId, id), eq(shifts.userId, userId)));
    if (!s) throw notFound('That shift');
    await db.update(shifts).set({ benchId }).where(eq(shifts.id, s.id));
    res.json({ ok: true });
  });

  return r;
}
