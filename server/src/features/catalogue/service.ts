import { asc, eq } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { categories, groupExclusions } from '../../db/schema/index';

export type Category = typeof categories.$inferSelect;

export const listCategories = (db: DbOrTx) =>
  db.select().from(categories).orderBy(asc(categories.sort), asc(categories.name));

export function toCategoryDto(c: Category) {
  return {
    id: c.id,
    slug: c.slug,
    name: c.name,
    weeeCategory: c.weeeCategory,
    unuKey: c.unuKey,
    avgWeightKg: Number(c.avgWeightKg),
    weightSource: c.weightSource,
    skill: c.skill,
    equipment: c.equipment,
    repairMinutes: c.repairMinutes,
    mains: Boolean(c.mains),
    refusal: c.refusal ?? null,
    co2ePerKg: c.co2ePerKg === null ? null : Number(c.co2ePerKg),
    co2eSource: c.co2eSource,
  };
}
export type CategoryDto = ReturnType<typeof toCategoryDto>;

export async function excludedCategoryIds(db: DbOrTx, groupId: number): Promise<number[]> {
  const rows = await db
    .select({ id: groupExclusions.categoryId })
    .from(groupExclusions)
    .where(eq(groupExclusions.groupId, groupId));
  return rows.map((r) => r.id);
}

/** A new group starts by refusing what common practice refuses (microwave ovens, refrigerant circuits, gas). */
export async function applyDefaultExclusions(db: DbOrTx, groupId: number) {
  const refused = (await db.select().from(categories)).filter((c) => c.refusal);
  if (refused.length) await db.insert(groupExclusions).values(refused.map((c) => ({ groupId, categoryId: c.id })));
}
