import { Router } from 'express';
import { profileSchema } from '../../../../shared/schemas/skills';
import type { AppContext } from '../../context';
import { groupIdParam, requireGroupRole, requireUser } from '../../auth/guards';
import { body } from '../../http/validate';
import * as skills from './service';

/** Each volunteer's own skills, and the group's skills matrix for its organisers. */
export function skillRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/me/profile', requireUser, async (req, res) => res.json(await skills.getProfile(ctx, req.user!.id)));
  r.put('/me/profile', requireUser, async (req, res) =>
    res.json(await skills.saveProfile(ctx, req.user!.id, body(req, profileSchema))),
  );
  r.get('/groups/:groupId/skills', requireGroupRole(['organiser'], groupIdParam), async (req, res) =>
    res.json(await skills.skillsMatrix(ctx, groupIdParam(req))),
  );
  return r;
}
