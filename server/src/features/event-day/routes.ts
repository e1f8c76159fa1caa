import { Router, type NextFunction, type Request, type Response } from 'express';
import { z } from 'zod';
import { languageOf } from '../../i18n';
import { normaliseReference } from '../../../../shared/booking/reference';
import { normaliseTagCode } from '../../../../shared/event-day/tag-code';
import { checkInSchema, outcomeSchema, safetyCheckSchema, walkInSchema } from '../../../../shared/schemas/event-day';
import type { AppContext } from '../../context';
import { requireGroupRole, requireUser } from '../../auth/guards';
import { GROUP_ROLES_FOR } from '../../../../shared/permissions';
import { notFound } from '../../http/errors';
import { body, params, query, paramId } from '../../http/validate';
import { eventGroupId } from '../../core/events';
import { checkIn } from './check-in';
import { deskEvents, deskView } from './desk';
import { groupOfBooking } from './queries/desk';
import { walkIn } from './walk-in';
import { hallQueue, liveView, publicTag, tags } from './hall';
import { itemView } from './items';
import { itemGroupId } from '../../core/items';
import { multerError, photoUpload } from '../../core/photos';
import { recordOutcome, recordSafetyCheck, startRepair } from './outcomes';
import { addRepairPhotos, assertMayAddRepairPhotos } from './repair-photos';

const idParam = z.object({ id: z.coerce.number().int().positive() });
const tagsQuery = z.object({
  slotId: z.coerce.number().int().positive().optional(),
  items: z
    .string()
    .regex(/^\d+(,\d+)*$/, 'List item ids separated by commas.')
    .optional()
    .transform((v) => v?.split(',').map(Number)),
});

/** Read without a session: the hall's TV and a scanned tag show queue numbers and status, never a name. */
export function eventDayPublicRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/public/events/:id/queue', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await hallQueue(ctx, params(req, idParam).id));
  });
  r.get('/public/tags/:code', async (req, res) => {
    const code = normaliseTagCode(String(req.params.code));
    if (!code) throw notFound('That tag');
    res.setHeader('Cache-Control', 'no-store');
    res.json(await publicTag(ctx, code, languageOf(req, res.locals)));
  });
  return r;
}

/** Reception (host) and organisers run the desk; fixers and organisers record at the bench. */
export function eventDayRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx.database;
  const eventStaff = requireGroupRole(['organiser', 'host'], (req: Request) => eventGroupId(db, paramId(req, 'id')));
  const itemStaff = requireGroupRole(GROUP_ROLES_FOR.readItem, (req: Request) => itemGroupId(db, paramId(req, 'id')));
  const bookingGroup = async (req: Request) => {
    const ref = normaliseReference(String(req.params.reference ?? ''));
    return ref ? groupOfBooking(db, ref) : 0;
  };

  r.get('/desk/events', requireUser, async (req, res) => res.json(await deskEvents(ctx, req.user!)));
  r.get('/events/:id/desk', eventStaff, async (req, res) =>
    res.json(await deskView(ctx, params(req, idParam).id, languageOf(req, res.locals))),
  );
  r.post('/bookings/:reference/check-in', requireGroupRole(['organiser', 'host'], bookingGroup), async (req, res) => {
    const ref = normaliseReference(String(req.params.reference))!;
    res.json(await checkIn(ctx, ref, body(req, checkInSchema), req.user!));
  });
  r.post('/events/:id/walk-ins', eventStaff, async (req, res) => {
    res.status(201).json(await walkIn(ctx, params(req, idParam).id, body(req, walkInSchema), req.user!));
  });
  r.get('/events/:id/tags', eventStaff, async (req, res) => {
    const q = query(req, tagsQuery);
    res.json(
      await tags(ctx, params(req, idParam).id, { slotId: q.slotId, itemIds: q.items }, languageOf(req, res.locals)),
    );
  });
  r.get('/events/:id/live', eventStaff, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await liveView(ctx, params(req, idParam).id, languageOf(req, res.locals)));
  });

  r.get('/items/:id', itemStaff, async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await itemView(ctx, params(req, idParam).id, req.user!, languageOf(req, res.locals)));
  });
  r.post('/items/:id/start', itemStaff, async (req, res) => {
    const { id } = params(req, idParam);
    await startRepair(ctx, id, req.user!);
    res.json(await itemView(ctx, id, req.user!, languageOf(req, res.locals)));
  });
  r.post('/items/:id/safety-checks', itemStaff, async (req, res) => {
    res
      .status(201)
      .json(await recordSafetyCheck(ctx, params(req, idParam).id, body(req, safetyCheckSchema), req.user!));
  });
  r.post(
    '/items/:id/photos',
    itemStaff,
    async (req, _res, next) => {
      await assertMayAddRepairPhotos(ctx, params(req, idParam).id, req.user!);
      next();
    },
    (req: Request, res: Response, next: NextFunction) => photoUpload(req, res, (err) => next(multerError(err) ?? err)),
    async (req, res) => {
      const files = (req.files as Express.Multer.File[]) ?? [];
      res.status(201).json(await addRepairPhotos(ctx, params(req, idParam).id, files));
    },
  );
  r.post('/items/:id/outcome', itemStaff, async (req, res) => {
    const { id } = params(req, idParam);
    await recordOutcome(ctx, id, body(req, outcomeSchema), req.user!);
    res.json(await itemView(ctx, id, req.user!, languageOf(req, res.locals)));
  });
  return r;
}
