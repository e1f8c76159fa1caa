import { eq, notInArray, and } from 'drizzle-orm';
import type { z } from 'zod';
import type { benchesSchema } from '../../../../shared/schemas/volunteers';
import type { AppContext } from '../../context';
import { eventBenches, venueBenches } from '../../db/schema/index';
import { eventLayout, venueLayout } from '../../core/benches';

type Layout = z.output<typeof benchesSchema>;

export async function saveVenueLayout(ctx: AppContext, venueId: number, layout: Layout) {
  await ctx.database.db.transaction(async (tx) => {
    await tx.delete(venueBenches).where(eq(venueBenches.venueId, venueId));
    if (layout.length)
      await tx
        .insert(venueBenches)
        .values(
          layout.map((b, position) => ({ venueId, name: b.name, seats: b.seats, equipment: b.equipment, position })),
        );
  });
  return venueLayout(ctx.database.db, venueId);
}

/** Replaces the event's benches, keeping the ids of those that stay (so seated fixers and placements stay). */
export async function saveEventLayout(ctx: AppContext, eventId: number, layout: Layout) {
  await eventLayout(ctx.database.db, eventId);
  await ctx.database.db.transaction(async (tx) => {
    const keep = layout.filter((b) => b.id).map((b) => b.id!);
    await tx
      .delete(eventBenches)
      .where(
        keep.length
          ? and(eq(eventBenches.eventId, eventId), notInArray(eventBenches.id, keep))
          : eq(eventBenches.eventId, eventId),
      );
    for (const [position, b] of layout.entries()) {
      if (b.id)
        await tx
          .update(eventBenches)
          .set({ name: b.name, seats: b.seats, equipment: b.equipment, position })
          .where(and(eq(eventBenches.id, b.id), eq(eventBenches.eventId, eventId)));
      else
        await tx
          .insert(eventBenches)
          .values({ eventId, name: b.name, seats: b.seats, equipment: b.equipment, position });
    }
  });
  return eventLayout(ctx.database.db, eventId);
}
