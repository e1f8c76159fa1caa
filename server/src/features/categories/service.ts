import { asc } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { categories } from '../../db/schema/index';

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
