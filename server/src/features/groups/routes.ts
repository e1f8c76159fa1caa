import { Router } from 'express';
import { z } from 'zod';
import type { AppContext } from '../../context';
import { groupIdParam, requireGroupRole } from '../../auth/guards';
import { params } from '../../http/validate';
import * as groups from './service';

const memberParams = z.object({ groupId: z.coerce.number().int().positive(), membershipId: z.coerce.number().int().positive() });

export function groupRoutes(ctx: AppContext) {
  const r = Router();
  const organiser = requireGroupRole(['organiser'], groupIdParam);
  r.get('/groups/:groupId/members', organiser, async (req, res) => {
    res.json(await groups.listMembers(ctx, groupIdParam(req)));
  });
  r.post('/groups/:groupId/members/:membershipId/approve', organiser, async (req, res) => {
    const p = params(req, memberParams);
    await groups.approveMember(ctx, p.groupId, p.membershipId);
    res.json({ ok: true });
  });
  r.delete('/groups/:groupId/members/:membershipId', organiser, async (req, res) => {
    const p = params(req, memberParams);
    await groups.removeMember(ctx, p.groupId, p.membershipId);
    res.status(204).end();
  });
  return r;
}
