import { eq } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import { EQUIPMENT, SKILLS } from '../../../../shared/constants';
import type { AppContext } from '../../context';
import { requireAdmin } from '../../auth/guards';
import { categories } from '../../db/schema/index';
import { notFound } from '../../http/errors';
import { body, params } from '../../http/validate';
import { listCategories, toCategoryDto } from './service';

const categoryPatch = z
  .object({
    name: z.string().trim().min(2).max(120),
    weeeCategory: z.number().int().min(1).max(6).nullable(),
    avgWeightKg: z.number().positive('Weight must be above zero.').max(1000),
    weightSource: z.string().trim().min(3, 'Name the source of the weight.').max(255),
    skill: z.enum(SKILLS),
    equipment: z.array(z.enum(EQUIPMENT)).max(EQUIPMENT.length),
    repairMinutes: z.number().int().min(5).max(480),
    mains: z.boolean(),
    co2ePerKg: z.number().min(0, 'A factor cannot be negative.').max(1000).nullable(),
    co2eSource: z.string().trim().min(3, 'Name the source of the factor.').max(255).nullable(),
  })
  .partial()
  .refine((p) => p.co2ePerKg === undefined || p.co2ePerKg === null || (p.co2eSource ?? '').length >= 3, {
    path: ['co2eSource'],
    message: 'Name the source of the factor.',
  });

export function categoryRoutes(ctx: AppContext) {
  const r = Router();
  const { db } = ctx.database;
  r.get('/categories', async (_req, res) => {
    // Admins edit these; a stale copy would hide their edit.
    res.setHeader('Cache-Control', 'no-cache');
    res.json((await listCategories(db)).map(toCategoryDto));
  });
  r.patch('/categories/:id', requireAdmin, async (req, res) => {
    const { id } = params(req, z.object({ id: z.coerce.number().int().positive() }));
    const patch = body(req, categoryPatch);
    const [existing] = await db.select().from(categories).where(eq(categories.id, id));
    if (!existing) throw notFound('That category');
    if (Object.keys(patch).length) await db.update(categories).set(patch).where(eq(categories.id, id));
    const [row] = await db.select().from(categories).where(eq(categories.id, id));
    res.json(toCategoryDto(row));
  });
  return r;
}
