import { asc, eq, inArray } from 'drizzle-orm';
import type { DbOrTx, Tx } from '../../../db/client';
import { groupExclusions, repairGroups, venues } from '../../../db/schema/index';

/** Venues of one group, of these groups, or (null) of every group; by name. */
export const venuesOf = (db: DbOrTx, groupIds: number[] | null) =>
  db
    .select()
    .from(venues)
    .where(groupIds === null ? undefined : inArray(venues.groupId, groupIds))
    .orderBy(asc(venues.name));

export async function insertVenue(db: DbOrTx, venue: typeof venues.$inferInsert) {
  const [{ id }] = await db.insert(venues).values(venue).$returningId();
  return id;
}

export const lockGroup = async (tx: Tx, groupId: number) =>
  (await tx.select().from(repairGroups).where(eq(repairGroups.id, groupId)).for('update'))[0];

export async function setHouseRules(tx: Tx, groupId: number, houseRules: string) {
  await tx.update(repairGroups).set({ houseRules }).where(eq(repairGroups.id, groupId));
}

export async function setDefaultLanguage(tx: Tx, groupId: number, defaultLanguage: string) {
  await tx.update(repairGroups).set({ defaultLanguage }).where(eq(repairGroups.id, groupId));
}

export async function setCurrency(tx: Tx, groupId: number, currency: string) {
  await tx.update(repairGroups).set({ currency }).where(eq(repairGroups.id, groupId));
}

/** How long visitors' details are kept and where they write about them; an empty address is none. */
export async function setPrivacy(tx: Tx, groupId: number, p: { retentionMonths?: number; contactEmail?: string }) {
  await tx
    .update(repairGroups)
    .set({
      ...(p.retentionMonths !== undefined ? { retentionMonths: p.retentionMonths } : {}),
      ...(p.contactEmail !== undefined ? { contactEmail: p.contactEmail || null } : {}),
    })
    .where(eq(repairGroups.id, groupId));
}

export async function setCountry(tx: Tx, groupId: number, country: string) {
  await tx.update(repairGroups).set({ country }).where(eq(repairGroups.id, groupId));
}

/** Replaces the kinds the group does not take; false when a category does not exist. */
export async function replaceExclusions(tx: Tx, groupId: number, categoryIds: number[]) {
  await tx.delete(groupExclusions).where(eq(groupExclusions.groupId, groupId));
  if (!categoryIds.length) return true;
  try {
    await tx.insert(groupExclusions).values(categoryIds.map((categoryId) => ({ groupId, categoryId })));
    return true;
  } catch {
    return false;
  }
}
