import { Router } from 'express';
import type { AppContext } from '../../context';
import { requireUser } from '../../auth/guards';
import { myQueue } from './service';
import { languageOf } from '../../i18n';

/** The fixer's own page ("My bench"): the items coming to them. */
export function workbenchRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/me/queue', requireUser, async (req, res) =>
    res.json(await myQueue(ctx, req.user!.id, languageOf(req, res.locals))),
  );
  return r;
}
