import { Router, type Request } from 'express';
import { z } from 'zod';
import {
  createEventSchema,
  eventListQuery,
  slotUpdateSchema,
  updateEventSchema,
} from '../../../../shared/schemas/events';
import type { AppContext } from '../../context';
import { groupIdInBody, groupIdParam, hasGroupRole, requireGroupRole } from '../../auth/guards';
import { body, params, query, paramId } from '../../http/validate';
import * as events from './service';
import { eventGroupId } from '../../core/events';

const idParams = z.object({ id: z.coerce.number().int().positive() });
const slotParams = idParams.extend({ slotId: z.coerce.number().int().positive() });

export function eventRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx.database;
  const eventId = (req: Request) => paramId(req, 'id');
  const organiserOfEvent = requireGroupRole(['organiser'], (req) => eventGroupId(db, eventId(req)));

  r.get('/events', async (req, res) => {
    const q = query(req, eventListQuery);
    await ctx.publicCache.send(req, res, () => events.listPublicEvents(ctx, q));
  });

  r.post('/events', requireGroupRole(['organiser'], groupIdInBody), async (req, res) => {
    const input = body(req, createEventSchema);
    res.status(201).json(await events.createEvent(ctx, input));
  });

  /** Published events for everyone; drafts only for the group's organisers. */
  r.get('/events/:id', async (req, res) => {
    const { id } = params(req, idParams);
    // Only a signed-in organiser may see a draft; a visitor's request goes straight to the public answer.
    const includeDrafts = req.user ? hasGroupRole(req.user, await eventGroupId(db, id), ['organiser']) : false;
    // An organiser may see a draft: their answer is theirs alone and never kept.
    if (includeDrafts) {
      res.set('Cache-Control', 'private, no-store');
      return void res.json(await events.getEvent(ctx, id, { includeDrafts }));
    }
    await ctx.publicCache.send(req, res, () => events.getEvent(ctx, id, { includeDrafts }));
  });

  r.patch('/events/:id', organiserOfEvent, async (req, res) => {
    res.json(await events.updateEvent(ctx, params(req, idParams).id, body(req, updateEventSchema)));
  });
  r.patch('/events/:id/slots/:slotId', organiserOfEvent, async (req, res) => {
    const p = params(req, slotParams);
    res.json(await events.updateSlot(ctx, p.id, p.slotId, body(req, slotUpdateSchema).capacity));
  });
  r.delete('/events/:id/slots/:slotId', organiserOfEvent, async (req, res) => {
    const p = params(req, slotParams);
    res.json(await events.deleteSlot(ctx, p.id, p.slotId));
  });
  for (const action of ['publish', 'close', 'cancel'] as const) {
    r.post(`/events/:id/${action}`, organiserOfEvent, async (req, res) => {
      const reason =
        action === 'cancel'
          ? z.object({ reason: z.string().trim().max(500).optional() }).parse(req.body ?? {}).reason
          : undefined;
      res.json(await events.changeStatus(ctx, params(req, idParams).id, action, reason));
    });
  }

  r.get('/groups/:groupId/events', requireGroupRole(['organiser', 'host', 'fixer'], groupIdParam), async (req, res) => {
    res.json(await events.listGroupEvents(ctx, groupIdParam(req)));
  });
  return r;
}
