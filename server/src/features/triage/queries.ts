import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import { OPEN_STATUSES } from '../../../../shared/event-day/constants';
import type { DbOrTx } from '../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  itemAssignments,
  itemPhotos,
  shifts,
  triageRuns,
  users,
} from '../../db/schema/index';

/** Items still to be repaired, and those at a bench now (they hold their fixer and bench); walk-ins after the booked. */
export const openItemRows = (db: DbOrTx, eventId: number) =>
  db
    .select({
      id: bookingItems.id,
      status: bookingItems.status,
      bookingId: bookings.id,
      reference: bookings.reference,
      visitorName: bookings.visitorName,
      bookedAt: bookings.createdAt,
      slotId: bookings.slotId,
      categoryName: categories.name,
      categorySlug: categories.slug,
      skill: categories.skill,
      equipment: categories.equipment,
      catMains: categories.mains,
      minutes: categories.repairMinutes,
      brand: bookingItems.brand,
      model: bookingItems.model,
      fault: bookingItems.fault,
      mains: bookingItems.mains,
      position: bookingItems.position,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .where(
      and(
        eq(bookings.eventId, eventId),
        eq(bookings.status, 'confirmed'),
        inArray(bookingItems.status, [...OPEN_STATUSES]),
      ),
    )
    .orderBy(asc(bookings.walkIn), asc(bookings.createdAt), asc(bookingItems.position));

export const photoIdsOf = (db: DbOrTx, itemIds: number[]) =>
  itemIds.length
    ? db
        .select({ id: itemPhotos.publicId, itemId: itemPhotos.itemId })
        .from(itemPhotos)
        .where(inArray(itemPhotos.itemId, itemIds))
    : Promise.resolve([]);

/** The fixers who said they come, by name, with their hours and seat. */
export const comingFixerRows = (db: DbOrTx, eventId: number) =>
  db
    .select({ shift: shifts, name: users.name })
    .from(shifts)
    .innerJoin(users, eq(users.id, shifts.userId))
    .where(and(eq(shifts.eventId, eventId), eq(shifts.coming, true)))
    .orderBy(asc(users.name));

export const placementRows = (db: DbOrTx, eventId: number) =>
  db.select().from(itemAssignments).where(eq(itemAssignments.eventId, eventId));

export type PlacementRow = typeof itemAssignments.$inferSelect;
export type NewPlacement = typeof itemAssignments.$inferInsert;

export async function insertRun(db: DbOrTx, run: typeof triageRuns.$inferInsert) {
  const [{ id }] = await db.insert(triageRuns).values(run).$returningId();
  return id;
}

/** Drops the engine's unlocked placements of these items, so a new run can place them again. */
export const deleteUnlockedPlacements = (db: DbOrTx, eventId: number, itemIds: number[]) =>
  db
    .delete(itemAssignments)
    .where(
      and(
        eq(itemAssignments.eventId, eventId),
        eq(itemAssignments.locked, false),
        inArray(itemAssignments.itemId, itemIds),
      ),
    );

export const insertPlacements = (db: DbOrTx, rows: NewPlacement[]) => db.insert(itemAssignments).values(rows);

export const upsertPlacement = (db: DbOrTx, p: NewPlacement & { startsAt: Date | null }) =>
  db
    .insert(itemAssignments)
    .values(p)
    .onDuplicateKeyUpdate({
      set: {
        userId: p.userId,
        benchId: p.benchId,
        startsAt: p.startsAt,
        locked: p.locked,
        source: p.source,
        runId: p.runId,
        updatedAt: new Date(),
      },
    });

/** Sets the lock of a placement; answers how many placements it touched (0 when the item is not placed). */
export async function lockPlacement(db: DbOrTx, eventId: number, itemId: number, locked: boolean) {
  const res = await db
    .update(itemAssignments)
    .set({ locked })
    .where(and(eq(itemAssignments.itemId, itemId), eq(itemAssignments.eventId, eventId)));
  return (res as unknown as [{ affectedRows: number }])[0]?.affectedRows ?? 0;
}

export const deletePlacement = (db: DbOrTx, eventId: number, itemId: number) =>
  db.delete(itemAssignments).where(and(eq(itemAssignments.itemId, itemId), eq(itemAssignments.eventId, eventId)));

/** The event's latest runs, newest first. */
export const recentRuns = (db: DbOrTx, eventId: number) =>
  db
    .select({
      id: triageRuns.id,
      slotId: triageRuns.slotId,
      createdAt: triageRuns.createdAt,
      result: triageRuns.result,
      lockedKept: triageRuns.lockedKept,
    })
    .from(triageRuns)
    .where(eq(triageRuns.eventId, eventId))
    .orderBy(desc(triageRuns.id))
    .limit(20);

export async function runRow(db: DbOrTx, eventId: number, runId: number) {
  const [r] = await db
    .select()
    .from(triageRuns)
    .where(and(eq(triageRuns.id, runId), eq(triageRuns.eventId, eventId)));
  return r;
}

/** Every item of the event with what names it on screen, for reading back a run (its items may have moved on). */
export const itemNameRows = (db: DbOrTx, eventId: number) =>
  db
    .select({
      id: bookingItems.id,
      reference: bookings.reference,
      categoryName: categories.name,
      categorySlug: categories.slug,
      brand: bookingItems.brand,
      model: bookingItems.model,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .where(eq(bookings.eventId, eventId));
