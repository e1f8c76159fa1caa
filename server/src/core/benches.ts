import { asc, eq } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { eventBenches, events, venueBenches } from '../db/schema/index';
import { notFound } from '../http/errors';

export const venueLayout = (db: DbOrTx, venueId: number) =>
  db
    .select()
    .from(venueBenches)
    .where(eq(venueBenches.venueId, venueId))
    .orderBy(asc(venueBenches.position), asc(venueBenches.id));

const benchesOf = (db: DbOrTx, eventId: number) =>
  db
    .select()
    .from(eventBenches)
    .where(eq(eventBenches.eventId, eventId))
    .orderBy(asc(eventBenches.position), asc(eventBenches.id));

/** An event's benches as they stand, without copying the venue's layout: for public reads that must never write. */
export const eventBenchesAsTheyStand = (db: DbOrTx, eventId: number) => benchesOf(db, eventId);

/**
 * An event's benches; the first look copies the venue's usual layout. It runs on the connection it is given: a
 * caller inside a transaction passes its `tx` (which may already hold the event row), and the copy is a savepoint
 * of that transaction, never a second connection waiting on the caller's lock. A venue with no benches has nothing
 * to copy, so the event row is not locked at all.
 */
export async function eventLayout(tx: DbOrTx, eventId: number) {
  const existing = await benchesOf(tx, eventId);
  if (existing.length) return existing;
  const [e] = await tx.select({ venueId: events.venueId }).from(events).where(eq(events.id, eventId));
  if (!e) throw notFound('That event');
  if (!(await venueLayout(tx, e.venueId)).length) return [];
  return tx.transaction(async (sp) => {
    await sp.select({ id: events.id }).from(events).where(eq(events.id, eventId)).for('update');
    const again = await benchesOf(sp, eventId);
    if (again.length) return again;
    const layout = await venueLayout(sp, e.venueId);
    if (!layout.length) return [];
    await sp
      .insert(eventBenches)
      .values(
        layout.map((b) => ({ eventId, name: b.name, seats: b.seats, equipment: b.equipment, position: b.position })),
      );
    return benchesOf(sp, eventId);
  });
}
