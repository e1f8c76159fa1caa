import { and, eq, notInArray } from 'drizzle-orm';
import type { z } from 'zod';
import type { benchesSchema } from '../../../../shared/schemas/benches';
import type { DbOrTx } from '../../db/client';
import { eventBenches, venueBenches, venues } from '../../db/schema/index';

type Bench = z.output<typeof benchesSchema>[number];

/** The group a venue belongs to (0 when there is no such venue, which no one is organiser of). */
export async function venueGroupId(db: DbOrTx, venueId: number) {
  const [v] = await db.select({ g: venues.groupId }).from(venues).where(eq(venues.id, venueId));
  return v?.g ?? 0;
}

export async function replaceVenueBenches(db: DbOrTx, venueId: number, layout: Bench[]) {
  await db.delete(venueBenches).where(eq(venueBenches.venueId, venueId));
  if (layout.length)
    await db
      .insert(venueBenches)
      .values(
        layout.map((b, position) => ({ venueId, name: b.name, seats: b.seats, equipment: b.equipment, position })),
      );
}

/** Removes the event's benches except those whose ids are kept. */
export const deleteEventBenchesExcept = (db: DbOrTx, eventId: number, keep: number[]) =>
  db
    .delete(eventBenches)
    .where(
      keep.length
        ? and(eq(eventBenches.eventId, eventId), notInArray(eventBenches.id, keep))
        : eq(eventBenches.eventId, eventId),
    );

export const updateEventBench = (db: DbOrTx, eventId: number, id: number, b: Bench, position: number) =>
  db
    .update(eventBenches)
    .set({ name: b.name, seats: b.seats, equipment: b.equipment, position })
    .where(and(eq(eventBenches.id, id), eq(eventBenches.eventId, eventId)));

export const insertEventBench = (db: DbOrTx, eventId: number, b: Bench, position: number) =>
  db.insert(eventBenches).values({ eventId, name: b.name, seats: b.seats, equipment: b.equipment, position });
