import { Router, type NextFunction, type Request, type Response } from 'express';
import { z } from 'zod';
import { followUpUpdate, impactSettingsSchema, recordsQuery, statsQuery } from '../../../../shared/schemas/impact';
import type { AppContext } from '../../context';
import { hasGroupRole, requireAdmin, requireGroupRole, unauthenticated } from '../../auth/guards';
import { HttpError } from '../../http/errors';
import { languageOf } from '../../i18n';
import { body, params, query, paramId } from '../../http/validate';
import { eventGroupId } from '../../core/events';
import { openRepairDataCsv, recordsCsv } from './exports';
import { importRoutes } from './import-routes';
import { followUpGroupId, listFollowUps, setFollowUpStatus } from './follow-ups';
import {
  assertDateRange,
  eventReport,
  getDisplacement,
  method,
  publicImpact,
  rangeReport,
  records,
  sessionFigures,
  setDisplacement,
  stats,
} from './service';

/** Public figures and the embeddable widget's data: totals only, no person in them. */
export function impactPublicRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/public/impact', async (req, res) => {
    const { groupId } = query(
      req,
      z.object({
        groupId: z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().int().positive().optional()),
      }),
    );
    res.setHeader('Cache-Control', 'public, max-age=300');
    res.vary('Accept-Language');
    res.json(await publicImpact(ctx, languageOf(req, res.locals), groupId));
  });
  return r;
}

/**
 * Statistics for the organisers of a group (or of the event's group); the whole network for admins. The group
 * comes from the query, so the guard reads it the same way the service will.
 */
function statsGuard(ctx: AppContext) {
  return async (req: Request, _res: Response, next: NextFunction) => {
    if (!req.user) return next(unauthenticated());
    const q = statsQuery.safeParse(req.query);
    if (!q.success) return next(q.error);
    const groupId = q.data.eventId
      ? await eventGroupId(ctx.database.db, q.data.eventId).catch(() => 0)
      : q.data.groupId;
    if (q.data.eventId && q.data.groupId && groupId !== q.data.groupId)
      return next(
        new HttpError(400, 'invalid', 'errors.invalid', {
          eventId: 'That event belongs to another group.',
        }),
      );
    if (!groupId)
      return next(
        req.user.admin ? undefined : new HttpError(403, 'forbidden', 'Only platform admins can see the whole network.'),
      );
    next(
      hasGroupRole(req.user, groupId, ['organiser'])
        ? undefined
        : new HttpError(403, 'forbidden', 'Your role in this group does not allow this.'),
    );
  };
}

export function impactRoutes(ctx: AppContext) {
  const r = Router();
  r.use(importRoutes(ctx));
  const guard = statsGuard(ctx);
  const filter = (req: Request) => {
    const q = query(req, statsQuery);
    assertDateRange(q.from, q.to);
    return q;
  };

  r.get('/stats', guard, async (req, res) => res.json(await stats(ctx, filter(req), languageOf(req, res.locals))));
  r.get('/stats/records', guard, async (req, res) => {
    const q = query(req, recordsQuery);
    assertDateRange(q.from, q.to);
    res.json(await records(ctx, q, languageOf(req, res.locals)));
  });
  r.get('/stats/method', async (req, res) => {
    res.vary('Accept-Language');
    res.json(await method(ctx, languageOf(req, res.locals)));
  });
  const csv =
    (name: string, make: (f: ReturnType<typeof filter>) => Promise<string>) => async (req: Request, res: Response) => {
      const f = filter(req);
      res.setHeader('Content-Type', 'text/csv; charset=utf-8');
      res.setHeader(
        'Content-Disposition',
        `attachment; filename="${[name, f.groupId ? `group-${f.groupId}` : 'network', f.eventId ? `session-${f.eventId}` : '', f.from ? `from-${f.from}` : '', f.to ? `to-${f.to}` : '', `made-${new Date().toISOString().slice(0, 10)}`].filter(Boolean).join('-')}.csv"`,
      );
      res.setHeader('Cache-Control', 'private, no-store');
      res.send(await make(f));
    };
  r.get(
    '/exports/open-repair-data.csv',
    guard,
    csv('open-repair-data', (f) => openRepairDataCsv(ctx, f)),
  );
  r.get(
    '/exports/open-repair-data-unpowered.csv',
    guard,
    csv('open-repair-data-unpowered', (f) => openRepairDataCsv(ctx, f, false)),
  );
  r.get(
    '/exports/records.csv',
    guard,
    csv('repair-records', (f) => recordsCsv(ctx, f)),
  );

  r.get(
    '/events/:id/report',
    requireGroupRole(['organiser'], (req) => eventGroupId(ctx.database.db, paramId(req, 'id'))),
    async (req, res) => {
      const { id } = params(req, z.object({ id: z.coerce.number().int().positive() }));
      res.json(await eventReport(ctx, id, languageOf(req, res.locals)));
    },
  );

  r.get(
    '/groups/:groupId/report',
    requireGroupRole(['organiser'], (req) => paramId(req, 'groupId')),
    async (req, res) => {
      const f = filter(req);
      res.json(await rangeReport(ctx, languageOf(req, res.locals), paramId(req, 'groupId'), f.from, f.to));
    },
  );
  r.get(
    '/groups/:groupId/session-figures',
    requireGroupRole(['organiser'], (req) => paramId(req, 'groupId')),
    async (req, res) => {
      const { groupId } = params(req, z.object({ groupId: z.coerce.number().int().positive() }));
      res.json(await sessionFigures(ctx, groupId));
    },
  );
  r.get(
    '/groups/:groupId/follow-ups',
    requireGroupRole(['organiser'], (req) => paramId(req, 'groupId')),
    async (req, res) => res.json(await listFollowUps(ctx, paramId(req, 'groupId'), languageOf(req, res.locals))),
  );
  r.patch(
    '/follow-ups/:itemId',
    requireGroupRole(['organiser'], (req) => followUpGroupId(ctx, paramId(req, 'itemId'))),
    async (req, res) => {
      const b = body(req, followUpUpdate);
      await setFollowUpStatus(ctx, paramId(req, 'itemId'), b.status, b.note);
      res.json({ ok: true });
    },
  );

  r.get('/admin/impact-settings', requireAdmin, async (_req, res) =>
    res.json({ displacement: await getDisplacement(ctx) }),
  );
  r.put('/admin/impact-settings', requireAdmin, async (req, res) => {
    res.json({ displacement: await setDisplacement(ctx, body(req, impactSettingsSchema).displacement) });
  });
  return r;
}
