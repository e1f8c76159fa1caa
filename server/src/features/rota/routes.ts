import { Router, type Request } from 'express';
import { z } from 'zod';
import { askSchema, myShiftSchema, seatSchema } from '../../../../shared/schemas/rota';
import type { AppContext } from '../../context';
import { requireGroupRole, requireUser } from '../../auth/guards';
import { body, params, paramId } from '../../http/validate';
import { eventGroupId } from '../../core/events';
import * as rota from './service';
import { calendarLinkStatus, feedOwner, makeCalendarLink, shiftsCalendar, stopCalendarLink } from './calendar';
import { sendCalendar } from '../../core/calendar';
import { publicReadLimiter } from '../../http/rate-limit';
import { languageOf } from '../../i18n';

const idParams = z.object({ id: z.coerce.number().int().positive() });

/** Shifts: a volunteer's answer per session, the organisers' rota with its gaps, and seating at benches. */
export function rotaRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx.database;
  const ofEvent = (roles: ('organiser' | 'host' | 'fixer')[]) =>
    requireGroupRole(roles, (req: Request) => eventGroupId(db, paramId(req, 'id')));

  r.get('/me/events', requireUser, async (req, res) => res.json(await rota.myEvents(ctx, req.user!.id)));
  r.get('/me/shifts/calendar', requireUser, async (req, res) => {
    sendCalendar(
      res,
      await shiftsCalendar(ctx, req.user!.id, languageOf(req, res.locals)),
      'mendery-shifts.ics',
      'attachment',
    );
  });
  r.get('/me/calendar-link', requireUser, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await calendarLinkStatus(ctx, req.user!.id));
  });
  r.post('/me/calendar-link', requireUser, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.status(201).json(await makeCalendarLink(ctx, req.user!.id));
  });
  r.delete('/me/calendar-link', requireUser, async (req, res) => {
    await stopCalendarLink(ctx, req.user!.id);
    res.status(204).end();
  });
  r.put('/events/:id/shifts/me', ofEvent(['organiser', 'host', 'fixer']), async (req, res) => {
    res.json(await rota.setMyShift(ctx, params(req, idParams).id, req.user!.id, body(req, myShiftSchema)));
  });
  r.get('/events/:id/rota', ofEvent(['organiser']), async (req, res) =>
    res.json(await rota.rota(ctx, params(req, idParams).id)),
  );
  r.post('/events/:id/rota/ask', ofEvent(['organiser']), async (req, res) =>
    res.json(await rota.askForSkills(ctx, params(req, idParams).id, body(req, askSchema).skills)),
  );
  r.patch('/events/:id/shifts/:userId', ofEvent(['organiser']), async (req, res) => {
    const { id, userId } = params(req, idParams.extend({ userId: z.coerce.number().int().positive() }));
    res.json(await rota.seat(ctx, id, userId, body(req, seatSchema).benchId));
  });
  return r;
}

/** The shift feed a calendar app subscribes to: no session, only the secret in the URL. */
export function rotaPublicRoutes(ctx: AppContext) {
  const r = Router();
  const limit = publicReadLimiter(ctx, 'shift-feed', ctx.env.FEED_RATE_MAX);
  r.get('/public/shift-calendars/:file', limit, async (req, res) => {
    const secret = String(req.params.file).replace(/\.ics$/, '');
    const userId = await feedOwner(ctx, secret);
    sendCalendar(res, await shiftsCalendar(ctx, userId, languageOf(req, res.locals)), 'mendery-shifts.ics', 'inline');
  });
  return r;
}
