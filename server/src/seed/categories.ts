import { and, eq, isNull, sql } from 'drizzle-orm';
import { EMISSION_FACTORS, FACTOR_SOURCE, factorKindFor } from '../../../shared/impact/factors';
import { CATEGORY_SEEDS } from '../../../shared/categories/seeds';
import type { Db } from '../db/client';
import { categories } from '../db/schema/index';

/**
 * Adds any seeded category that is missing and gives an emission factor to those that have none yet; never
 * overwrites an admin's edits. Safe to run from every process.
 */
export async function ensureCategories(db: Db): Promise<void> {
  await db
    .insert(categories)
    .values(
      CATEGORY_SEEDS.map((c, i) => ({
        slug: c.slug,
        name: c.name,
        weeeCategory: c.weeeCategory,
        unuKey: c.unuKey,
        avgWeightKg: c.avgWeightKg,
        weightSource: c.weightSource,
        skill: c.skill,
        equipment: c.equipment,
        repairMinutes: c.repairMinutes,
        mains: c.mains,
        refusal: c.refusal ?? null,
        sort: i,
      })),
    )
    .onDuplicateKeyUpdate({ set: { slug: sql`slug` } });
  for (const c of CATEGORY_SEEDS) {
    const kind = factorKindFor(c);
    if (!kind) continue;
    await db
      .update(categories)
      .set({ co2ePerKg: EMISSION_FACTORS[kind].value, co2eSource: `${EMISSION_FACTORS[kind].label}: ${FACTOR_SOURCE}` })
      .where(and(eq(categories.slug, c.slug), isNull(categories.co2eSource)));
  }
}
