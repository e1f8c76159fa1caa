import { asc, eq } from 'drizzle-orm';
import type { CategoryPatch } from '../../../../shared/schemas/categories';
import type { DbOrTx } from '../../db/client';
import { categories } from '../../db/schema/index';

export type CategoryRow = typeof categories.$inferSelect;

export const listCategoryRows = (db: DbOrTx) =>
  db.select().from(categories).orderBy(asc(categories.sort), asc(categories.name));

export async function categoryRow(db: DbOrTx, id: number): Promise<CategoryRow | undefined> {
  const [row] = await db.select().from(categories).where(eq(categories.id, id));
  return row;
}

export const updateCategoryRow = (db: DbOrTx, id: number, patch: CategoryPatch) =>
  db.update(categories).set(patch).where(eq(categories.id, id));
