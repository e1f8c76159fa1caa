import { and, asc, eq, gt, like, or, sql } from 'drizzle-orm';
import type { PartType } from '../../../../../shared/salvage/constants';
import type { DbOrTx } from '../../../db/client';
import { affectedRows } from '../../../db/retry';
import { salvageParts, salvageTakes } from '../../../db/schema/index';

export type PartRow = typeof salvageParts.$inferSelect;

/** A group's parts, by kind and value; `q` looks in the value, package, notes and box. At most 500. */
export async function partRows(db: DbOrTx, groupId: number, f: { type?: PartType; q?: string; inStock?: boolean }) {
  const parts = [eq(salvageParts.groupId, groupId)];
  if (f.type) parts.push(eq(salvageParts.type, f.type));
  if (f.inStock) parts.push(gt(salvageParts.quantity, 0));
  if (f.q)
    parts.push(
      or(
        like(salvageParts.value, `%${f.q}%`),
        like(salvageParts.package, `%${f.q}%`),
        like(salvageParts.notes, `%${f.q}%`),
        like(salvageParts.box, `%${f.q}%`),
      )!,
    );
  return db
    .select()
    .from(salvageParts)
    .where(and(...parts))
    .orderBy(asc(salvageParts.type), asc(salvageParts.value))
    .limit(500);
}

/** The parts still in a group's boxes. */
export const stockRows = (db: DbOrTx, groupId: number) =>
  db
    .select()
    .from(salvageParts)
    .where(and(eq(salvageParts.groupId, groupId), gt(salvageParts.quantity, 0)));

export async function findPart(db: DbOrTx, partId: number): Promise<PartRow | undefined> {
  const [p] = await db.select().from(salvageParts).where(eq(salvageParts.id, partId));
  return p;
}

export async function partGroupId(db: DbOrTx, partId: number) {
  if (!Number.isInteger(partId) || partId <= 0) return 0;
  const [p] = await db.select({ groupId: salvageParts.groupId }).from(salvageParts).where(eq(salvageParts.id, partId));
  return p?.groupId ?? 0;
}

export async function insertPart(db: DbOrTx, values: typeof salvageParts.$inferInsert) {
  const [{ id }] = await db.insert(salvageParts).values(values).$returningId();
  return id;
}

export async function updatePartRow(db: DbOrTx, partId: number, patch: { quantity?: number; box?: string }) {
  await db.update(salvageParts).set(patch).where(eq(salvageParts.id, partId));
}

export async function deletePart(db: DbOrTx, partId: number) {
  await db.delete(salvageParts).where(eq(salvageParts.id, partId));
}

/**
 * Takes `quantity` from the box: the conditional UPDATE matches only while enough are left, so two fixers reaching
 * for the last one cannot both have it. False when too few were left.
 */
export async function takeFromStock(db: DbOrTx, partId: number, quantity: number) {
  const res = await db
    .update(salvageParts)
    .set({ quantity: sql`${salvageParts.quantity} - ${quantity}` })
    .where(and(eq(salvageParts.id, partId), sql`${salvageParts.quantity} >= ${quantity}`));
  return affectedRows(res) === 1;
}

export async function recordTake(
  db: DbOrTx,
  take: { partId: number; itemId: number | null; quantity: number; takenBy: number },
) {
  await db.insert(salvageTakes).values(take);
}
