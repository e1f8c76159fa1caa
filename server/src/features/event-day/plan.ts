import type { ItemStatus } from '../../../../shared/event-day/constants';
import type { IssuedItem } from '../../../../shared/api/event-day';
import type { AppContext } from '../../context';
import { runHooks } from '../../core/hooks';
import { withDeadlockRetry } from '../../db/retry';
import { setStatus } from './items';
import { issuedItems, queuedWithPlacement } from './queries/desk';

/**
 * Keeps the plan current as people arrive: the engine re-plans the slot, then items checked in with a fixer and
 * bench are "waiting", and those left without one go back to "checked in". It runs after the check-in committed,
 * so each step retries deadlocks and a failure is logged, never answered: reception must not enter anyone twice.
 * The next arrival (or the triage board) re-plans again.
 */
export async function replan(ctx: AppContext, eventId: number, slotId: number, userId: number) {
  try {
    await withDeadlockRetry(() => runHooks(ctx.hooks.arrivalsChanged, ctx, { eventId, slotId, userId }));
  } catch (err) {
    ctx.log(`replan after check-in failed: ${(err as Error).message}`);
  }
  try {
    await withDeadlockRetry(() => syncWaiting(ctx, eventId, userId));
  } catch (err) {
    ctx.log(`plan status sync after check-in failed: ${(err as Error).message}`);
  }
}

export async function syncWaiting(ctx: AppContext, eventId: number, userId: number | null) {
  await ctx.database.db.transaction(async (tx) => {
    const rows = await queuedWithPlacement(tx, eventId);
    const changes = rows
      .filter((r) => (r.status === 'checked-in') === (r.placed !== null))
      .map((r) => ({ itemId: r.id, from: r.status, to: (r.placed !== null ? 'waiting' : 'checked-in') as ItemStatus }));
    await setStatus(tx, changes, userId, 'plan updated');
  });
}

/** The items' tags, numbers and status after the plan caught up. */
export const issuedAfterPlan = (ctx: AppContext, ids: number[]): Promise<IssuedItem[]> =>
  issuedItems(ctx.database.db, ids);
