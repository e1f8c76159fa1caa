import { languageOf } from '../../i18n';
import { Router, type NextFunction, type Request, type Response } from 'express';
import { z } from 'zod';
import { PART_TYPES } from '../../../../shared/salvage/constants';
import { GROUP_ROLES_FOR } from '../../../../shared/permissions';
import {
  knowledgeQuery,
  salvagePartSchema,
  salvageUpdateSchema,
  sharingSchema,
  substituteQuery,
  takeSchema,
  writeupSchema,
} from '../../../../shared/schemas/toolkit';
import type { AppContext } from '../../context';
import { requireGroupRole, unauthenticated } from '../../auth/guards';
import { HttpError } from '../../http/errors';
import { body, params, query, paramId } from '../../http/validate';
import { itemGroupId } from '../../core/items';
import {
  addPart,
  getSharing,
  listParts,
  partGroup,
  removePart,
  searchKnowledge,
  setSharing,
  similarRepairs,
  substitutes,
  takePart,
  updatePart,
  writeUp,
} from './service';

const idParam = z.object({ id: z.coerce.number().int().positive() });

/** Anyone who volunteers with a group (or an admin) may search the repair notes. */
const volunteer = (req: Request, _res: Response, next: NextFunction) => {
  if (!req.user) return next(unauthenticated());
  next(
    req.user.admin || req.user.roles.length > 0
      ? undefined
      : new HttpError(403, 'forbidden', 'The repair notes are for the groups’ volunteers.'),
  );
};

export function toolkitRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx.database;
  const groupOf = (req: Request) => paramId(req, 'groupId');
  const partOf = (req: Request) => partGroup(ctx, paramId(req, 'id'));

  r.get('/knowledge', volunteer, async (req, res) =>
    res.json(await searchKnowledge(ctx, req.user!, query(req, knowledgeQuery), languageOf(req, res.locals))),
  );
  r.put('/knowledge/:id/writeup', volunteer, async (req, res) =>
    res.json(
      await writeUp(ctx, params(req, idParam).id, body(req, writeupSchema), req.user!, languageOf(req, res.locals)),
    ),
  );
  r.get(
    '/items/:id/similar',
    requireGroupRole(GROUP_ROLES_FOR.readItem, (req) => itemGroupId(db, paramId(req, 'id'))),
    async (req, res) =>
      res.json(await similarRepairs(ctx, params(req, idParam).id, req.user!, languageOf(req, res.locals))),
  );
  r.get('/groups/:groupId/knowledge-sharing', requireGroupRole(['organiser'], groupOf), async (req, res) =>
    res.json(await getSharing(ctx, groupOf(req))),
  );
  r.put('/groups/:groupId/knowledge-sharing', requireGroupRole(['organiser'], groupOf), async (req, res) =>
    res.json(await setSharing(ctx, groupOf(req), body(req, sharingSchema).share)),
  );

  r.get('/groups/:groupId/salvage', requireGroupRole(GROUP_ROLES_FOR.readItem, groupOf), async (req, res) => {
    const q = query(
      req,
      z.object({
        type: z.enum(PART_TYPES).optional(),
        q: z.string().trim().max(80).optional(),
        inStock: z.enum(['1', '0']).optional(),
      }),
    );
    res.json(await listParts(ctx, groupOf(req), { type: q.type, q: q.q, inStock: q.inStock === '1' }));
  });
  r.post('/groups/:groupId/salvage', requireGroupRole(GROUP_ROLES_FOR.useSalvage, groupOf), async (req, res) =>
    res.status(201).json(await addPart(ctx, groupOf(req), body(req, salvagePartSchema), req.user!)),
  );
  r.get(
    '/groups/:groupId/salvage/substitutes',
    requireGroupRole(GROUP_ROLES_FOR.useSalvage, groupOf),
    async (req, res) => {
      const { type, package: pkg, pinout, ...ratings } = query(req, substituteQuery);
      res.json(await substitutes(ctx, groupOf(req), { type, package: pkg, pinout, ratings }));
    },
  );
  r.patch('/salvage/:id', requireGroupRole(GROUP_ROLES_FOR.useSalvage, partOf), async (req, res) =>
    res.json(await updatePart(ctx, params(req, idParam).id, body(req, salvageUpdateSchema))),
  );
  r.delete('/salvage/:id', requireGroupRole(['organiser'], partOf), async (req, res) => {
    await removePart(ctx, params(req, idParam).id);
    res.status(204).end();
  });
  r.post('/salvage/:id/take', requireGroupRole(GROUP_ROLES_FOR.useSalvage, partOf), async (req, res) => {
    const t = body(req, takeSchema);
    res.json(await takePart(ctx, params(req, idParam).id, t.itemId, t.quantity, req.user!));
  });
  return r;
}
