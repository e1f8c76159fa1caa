import { sql } from 'drizzle-orm';
import { CATEGORY_SEEDS } from '../../../shared/categories';
import type { Db } from '../db/client';
import { categories } from '../db/schema/index';

/** Adds any seeded category that is missing; never overwrites an admin's edits. Safe to run from every process. */
export async function ensureCategories(db: Db): Promise<void> {
  await db
    .insert(categories)
    .values(CATEGORY_SEEDS.map((c, i) => ({ slug: c.slug, name: c.name, weeeCategory: c.weeeCategory, unuKey: c.unuKey, avgWeightKg: c.avgWeightKg, weightSource: c.weightSource, skill: c.skill, equipment: c.equipment, repairMinutes: c.repairMinutes, mains: c.mains, refusal: c.refusal ?? null, sort: i })))
    .onDuplicateKeyUpdate({ set: { slug: sql`slug` } });
}
