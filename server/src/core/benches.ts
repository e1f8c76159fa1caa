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

/**
 * An event's benches; the first look copies the venue's usual layout. It runs on the connection it is given: inside
 * a caller's transaction (which may already hold the event row) the copy is a savepoint of that transaction, so it
 * never waits on its own lock from a second connection.
 */
export async function eventLayout(db: DbOrTx, eventId: number) {
  const existing = await benchesOf(db, eventId);
  if (existing.length) return existing;
  return db.transaction(async (tx) => {
    const [e] = await tx.select({ venueId: events.venueId }).from(events).where(eq(events.id, eventId)).for('update');
    if (!e) throw notFound('That event');
    const again = await benchesOf(tx, eventId);
    if (again.length) return again;
    const layout = await venueLayout(tx, e.venueId);
    if (!layout.length) return [];
    await tx
      .insert(eventBenches)
      .values(
        layout.map((b) => ({ eventId, name: b.name, seats: b.seats, equipment: b.equipment, position: b.position })),
      );
    return benchesOf(tx, eventId);
  });
}
