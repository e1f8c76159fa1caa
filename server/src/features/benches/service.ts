import type { z } from 'zod';
import type { Bench } from '../../../../shared/api/benches';
import type { benchesSchema } from '../../../../shared/schemas/benches';
import type { AppContext } from '../../context';
import { eventLayout, venueLayout } from '../../core/benches';
import { deleteEventBenchesExcept, insertEventBench, replaceVenueBenches, updateEventBench } from './queries';

type Layout = z.output<typeof benchesSchema>;

export async function saveVenueLayout(ctx: AppContext, venueId: number, layout: Layout): Promise<Bench[]> {
  await ctx.database.db.transaction((tx) => replaceVenueBenches(tx, venueId, layout));
  return venueLayout(ctx.database.db, venueId);
}

/** Replaces the event's benches, keeping the ids of those that stay (so seated fixers and placements stay). */
export async function saveEventLayout(ctx: AppContext, eventId: number, layout: Layout): Promise<Bench[]> {
  await eventLayout(ctx.database.db, eventId);
  await ctx.database.db.transaction(async (tx) => {
    await deleteEventBenchesExcept(
      tx,
      eventId,
      layout.filter((b) => b.id).map((b) => b.id!),
    );
    for (const [position, b] of layout.entries()) {
      if (b.id) await updateEventBench(tx, eventId, b.id, b, position);
      else await insertEventBench(tx, eventId, b, position);
    }
  });
  return eventLayout(ctx.database.db, eventId);
}
