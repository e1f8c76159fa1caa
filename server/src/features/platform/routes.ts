import { Router } from 'express';
import type { AppContext } from '../../context';
import { isDemo, needsSetup } from '../../auth/service';
import { withDeadline } from '../../db/timeouts';

/** Health answers within this long even when every pooled connection is stuck: 503 when the database is away. */
const HEALTH_DEADLINE_MS = 2000;

/** Health and public configuration: answered before the session, so they create none. */
export function platformRoutes(ctx: AppContext) {
  const r = Router();
  // The process answers, whatever the database does: what a proxy asks before it sends a request here (while the
  // database fails over every process answers 503 itself, and none should be taken out of the rotation).
  r.get('/live', (_req, res) => {
    res.json({ ok: true });
  });
  r.get('/health', async (_req, res) => {
    // The database answers, and nothing more: its version would tell a caller which flaws to try.
    await withDeadline(ctx.database.pool.query('SELECT 1'), HEALTH_DEADLINE_MS);
    res.json({ ok: true });
  });
  r.get('/public/config', async (req, res) => {
    await ctx.publicCache.send(req, res, async () => ({ demo: await isDemo(ctx), needsSetup: await needsSetup(ctx) }));
  });
  return r;
}
