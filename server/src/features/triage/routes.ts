import { Router, type Request } from 'express';
import { z } from 'zod';
import { lockSchema, placementSchema, runSchema } from '../../../../shared/schemas/triage';
import type { AppContext } from '../../context';
import { requireGroupRole } from '../../auth/guards';
import { body, params, paramId } from '../../http/validate';
import { eventGroupId } from '../../core/events';
import { board } from './board';
import * as t from './service';
import { languageOf } from '../../i18n';

const itemParams = z.object({ id: z.coerce.number().int().positive(), itemId: z.coerce.number().int().positive() });
const runParams = z.object({ id: z.coerce.number().int().positive(), runId: z.coerce.number().int().positive() });

/** Only the event's organisers run the engine or move items; a fixer's own queue is the workbench feature's. */
export function triageRoutes(ctx: AppContext) {
  const r = Router();
  const organiser = requireGroupRole(['organiser'], (req: Request) =>
    eventGroupId(ctx.database.db, paramId(req, 'id')),
  );
  const id = (req: Request) => params(req, z.object({ id: z.coerce.number().int().positive() })).id;

  r.post('/events/:id/triage', organiser, async (req, res) => {
    const { slotId } = body(req, runSchema);
    res.status(201).json(await t.runTriage(ctx, id(req), slotId, req.user!.id));
  });
  r.get('/events/:id/board', organiser, async (req, res) =>
    res.json(await board(ctx, id(req), languageOf(req, res.locals))),
  );
  r.get('/events/:id/triage-runs/:runId', organiser, async (req, res) => {
    const p = params(req, runParams);
    res.json(await t.runDetail(ctx, p.id, p.runId, languageOf(req, res.locals)));
  });
  r.put('/events/:id/items/:itemId/placement', organiser, async (req, res) => {
    const p = params(req, itemParams);
    res.json(await t.placeByHand(ctx, p.id, p.itemId, body(req, placementSchema)));
  });
  r.delete('/events/:id/items/:itemId/placement', organiser, async (req, res) => {
    const p = params(req, itemParams);
    await t.unplace(ctx, p.id, p.itemId);
    res.status(204).end();
  });
  r.post('/events/:id/items/:itemId/lock', organiser, async (req, res) => {
    const p = params(req, itemParams);
    await t.setLock(ctx, p.id, p.itemId, body(req, lockSchema).locked);
    res.json({ ok: true });
  });
  return r;
}
