import { Router } from 'express';
import type { AppContext } from '../../context';
import { isDemo, needsSetup } from '../../auth/service';

/** Health and public configuration: answered before the session, so they create none. */
export function platformRoutes(ctx: AppContext) {
  const r = Router();
  r.get('/health', async (_req, res) => {
    const [rows] = await ctx.database.pool.query('SELECT VERSION() AS v');
    res.json({ ok: true, db: (rows as { v: string }[])[0].v });
  });
  r.get('/public/config', async (req, res) => {
    await ctx.publicCache.send(req, res, async () => ({ demo: await isDemo(ctx), needsSetup: await needsSetup(ctx) }));
  });
  return r;
}
