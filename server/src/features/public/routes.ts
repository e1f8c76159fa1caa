import { sql } from 'drizzle-orm';
import { Router } from 'express';
import type { AppContext } from '../../context';
import { isDemo, needsSetup } from '../../auth/service';
import { repairGroups } from '../../db/schema/index';

/** Public reads: no session is created for them. */
export function publicRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/health', async (_req, res) => {
    const [rows] = await ctx.database.pool.query('SELECT VERSION() AS v');
    res.json({ ok: true, db: (rows as { v: string }[])[0].v });
  });
  r.get('/public/config', async (_req, res) => {
    res.json({ demo: await isDemo(ctx), needsSetup: await needsSetup(ctx) });
  });
  r.get('/public/groups', async (_req, res) => {
    const rows = await ctx.database.db
      .select({
        id: repairGroups.id,
        name: repairGroups.name,
        slug: repairGroups.slug,
        town: repairGroups.town,
        description: repairGroups.description,
      })
      .from(repairGroups)
      .orderBy(sql`${repairGroups.name}`);
    res.json(rows);
  });
  return r;
}
