import { asc, eq, inArray, notInArray, and } from 'drizzle-orm';
import type { z } from 'zod';
import type { benchesSchema } from '../../../../shared/schemas/volunteers';
import type { AppContext } from '../../context';
import type { DbOrTx } from '../../db/client';
import { eventBenches, events, venueBenches } from '../../db/schema/index';
import { notFound } from '../../http/errors';

type Layout = z.output<typeof benchesSchema>;

export const venueLayout = (db: DbOrTx, venueId: number) =>
  db
    .select()
    .from(venueBenches)
    .where(eq(venueBenches.venueId, venueId))
    .orderBy(asc(venueBenches.position), asc(venueBenches.id));

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

/** An event's benches; the first look copies the venue's usual layout. */
export async function eventLayout(ctx: AppContext, eventId: number) {
  const { db } = ctx.database;
  const existing = await db
    .select()
    .from(eventBenches)
    .where(eq(eventBenches.eventId, eventId))
    .orderBy(asc(eventBenches.position), asc(eventBenches.id));
  if (existing.length) return existing;
  return db.transaction(async (tx) => {
    const [e] = await tx.select().from(events).where(eq(events.id, eventId)).for('update');
    if (!e) throw notFound('That event');
    const again = await tx.select().from(eventBenches).where(eq(eventBenches.eventId, eventId));
    if (again.length) return again;
    const layout = await venueLayout(tx, e.venueId);
    if (layout.length)
      await tx
        .insert(eventBenches)
        .values(
          layout.map((b) => ({ eventId, name: b.name, seats: b.seats, equipment: b.equipment, position: b.position })),
        );
    return tx
      .select()
      .from(eventBenches)
      .where(eq(eventBenches.eventId, eventId))
      .orderBy(asc(eventBenches.position), asc(eventBenches.id));
  });
}

/** Replaces the event's benches, keeping the ids of those that stay (so seated fixers and placements stay). */
export async function saveEventLayout(ctx: AppContext, eventId: number, layout: Layout) {
  await eventLayout(ctx, eventId);
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
  return eventLayout(ctx, eventId);
}

export const benchesByIds = (db: DbOrTx, ids: number[]) =>
  ids.length ? db.select().from(eventBenches).where(inArray(eventBenches.id, ids)) : Promise.resolve([]);
