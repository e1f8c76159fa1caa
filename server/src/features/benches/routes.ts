import { Router, type Request } from 'express';
import { z } from 'zod';
import { layoutSchema } from '../../../../shared/schemas/benches';
import type { AppContext } from '../../context';
import { requireGroupRole } from '../../auth/guards';
import { body, params, paramId } from '../../http/validate';
import { eventLayout, venueLayout } from '../../core/benches';
import { eventGroupId } from '../../core/events';
import { venueGroupId } from './queries';
import { saveEventLayout, saveVenueLayout } from './service';

const idParams = z.object({ id: z.coerce.number().int().positive() });

/** The tables in the hall: a venue's usual layout, and each event's own copy of it. */
export function benchRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx.database;
  const ofEvent = (roles: ('organiser' | 'host' | 'fixer')[]) =>
    requireGroupRole(roles, (req: Request) => eventGroupId(db, paramId(req, 'id')));
  const venueGroup = (req: Request) => venueGroupId(db, paramId(req, 'venueId'));

  r.get('/venues/:venueId/benches', requireGroupRole(['organiser'], venueGroup), async (req, res) =>
    res.json(await venueLayout(db, paramId(req, 'venueId'))),
  );
  r.put('/venues/:venueId/benches', requireGroupRole(['organiser'], venueGroup), async (req, res) =>
    res.json(await saveVenueLayout(ctx, paramId(req, 'venueId'), body(req, layoutSchema).benches)),
  );
  r.get('/events/:id/benches', ofEvent(['organiser', 'host', 'fixer']), async (req, res) =>
    res.json(await eventLayout(db, params(req, idParams).id)),
  );
  r.put('/events/:id/benches', ofEvent(['organiser']), async (req, res) =>
    res.json(await saveEventLayout(ctx, params(req, idParams).id, body(req, layoutSchema).benches)),
  );
  return r;
}
