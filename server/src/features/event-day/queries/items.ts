import { asc, desc, eq, inArray } from 'drizzle-orm';
import type { ItemStatus } from '../../../../../shared/event-day/constants';
import type { DbOrTx, Tx } from '../../../db/client';
import {
  bookingItems,
  eventBenches,
  events,
  itemAssignments,
  itemOutcomes,
  itemPhotos,
  itemStatusChanges,
  safetyChecks,
  users,
} from '../../../db/schema/index';

export type ItemChanges = Partial<typeof bookingItems.$inferInsert>;

export const updateItemStatus = (tx: Tx, itemId: number, to: ItemStatus, extra: ItemChanges = {}) =>
  tx
    .update(bookingItems)
    .set({ status: to, ...extra })
    .where(eq(bookingItems.id, itemId));

export const insertStatusChanges = (tx: Tx, rows: (typeof itemStatusChanges.$inferInsert)[]) =>
  tx.insert(itemStatusChanges).values(rows);

/** Takes the event's next queue numbers under its row lock (the caller's transaction holds it until commit). */
export async function takeQueueNumbers(tx: Tx, eventId: number, n: number): Promise<number[]> {
  const [e] = await tx
    .select({ counter: events.queueCounter })
    .from(events)
    .where(eq(events.id, eventId))
    .for('update');
  await tx
    .update(events)
    .set({ queueCounter: e.counter + n })
    .where(eq(events.id, eventId));
  return Array.from({ length: n }, (_, i) => e.counter + 1 + i);
}

export async function tagCodesTaken(tx: Tx, codes: string[]) {
  const rows = await tx
    .select({ code: bookingItems.tagCode })
    .from(bookingItems)
    .where(inArray(bookingItems.tagCode, codes));
  return rows.map((r) => r.code);
}

/* The item page's reads. */

export async function placementOf(db: DbOrTx, itemId: number) {
  const [p] = await db
    .select({
      userId: itemAssignments.userId,
      benchId: itemAssignments.benchId,
      fixerName: users.name,
      benchName: eventBenches.name,
      startsAt: itemAssignments.startsAt,
    })
    .from(itemAssignments)
    .innerJoin(users, eq(users.id, itemAssignments.userId))
    .innerJoin(eventBenches, eq(eventBenches.id, itemAssignments.benchId))
    .where(eq(itemAssignments.itemId, itemId));
  return p;
}

export async function outcomeOf(db: DbOrTx, itemId: number) {
  const [o] = await db
    .select({ o: itemOutcomes, byName: users.name })
    .from(itemOutcomes)
    .leftJoin(users, eq(users.id, itemOutcomes.recordedBy))
    .where(eq(itemOutcomes.itemId, itemId));
  return o;
}

export const checksOf = (db: DbOrTx, itemId: number) =>
  db
    .select({ c: safetyChecks, byName: users.name })
    .from(safetyChecks)
    .leftJoin(users, eq(users.id, safetyChecks.checkedBy))
    .where(eq(safetyChecks.itemId, itemId))
    .orderBy(desc(safetyChecks.id));

export const historyOf = (db: DbOrTx, itemId: number) =>
  db
    .select({ h: itemStatusChanges, byName: users.name })
    .from(itemStatusChanges)
    .leftJoin(users, eq(users.id, itemStatusChanges.byUserId))
    .where(eq(itemStatusChanges.itemId, itemId))
    .orderBy(asc(itemStatusChanges.id));

export const photosOf = (db: DbOrTx, itemId: number) =>
  db
    .select({ id: itemPhotos.publicId, kind: itemPhotos.kind, width: itemPhotos.width, height: itemPhotos.height })
    .from(itemPhotos)
    .where(eq(itemPhotos.itemId, itemId));
