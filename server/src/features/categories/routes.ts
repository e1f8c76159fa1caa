import { Router } from 'express';
import { z } from 'zod';
import { categoryPatchSchema } from '../../../../shared/schemas/categories';
import type { AppContext } from '../../context';
import { requireAdmin } from '../../auth/guards';
import { body, params } from '../../http/validate';
import { languageOf } from '../../i18n';
import { listCategories, updateCategory } from './service';

export function categoryRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/categories', async (req, res) => {
    // Admins edit these; a stale copy would hide their edit. The names follow the reader's language.
    res.setHeader('Cache-Control', 'no-cache');
    res.vary('Accept-Language');
    res.json(await listCategories(ctx, languageOf(req, res.locals)));
  });
  r.patch('/categories/:id', requireAdmin, async (req, res) => {
    const { id } = params(req, z.object({ id: z.coerce.number().int().positive() }));
    res.json(await updateCategory(ctx, id, body(req, categoryPatchSchema)));
  });
  return r;
}
