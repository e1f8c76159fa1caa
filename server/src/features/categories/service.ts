import type { Category } from '../../../../shared/api/categories';
import type { CategoryPatch } from '../../../../shared/schemas/categories';
import type { AppContext } from '../../context';
import { notFound } from '../../http/errors';
import { categoryText } from '../../i18n';
import { DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';
import { categoryRow, listCategoryRows, updateCategoryRow, type CategoryRow } from './queries';

/** A row as the API answers it; the seeded names and refusal texts in `lang` (an admin's own wording as typed). */
const toCategory = (c: CategoryRow, lang: Language = DEFAULT_LANGUAGE): Category => ({
  id: c.id,
  slug: c.slug,
  name: categoryText(lang, c.slug, 'name', c.name),
  weeeCategory: c.weeeCategory,
  unuKey: c.unuKey,
  avgWeightKg: Number(c.avgWeightKg),
  weightSource: c.weightSource,
  skill: c.skill,
  equipment: c.equipment,
  repairMinutes: c.repairMinutes,
  mains: Boolean(c.mains),
  refusal: c.refusal
    ? {
        reason: categoryText(lang, c.slug, 'reason', c.refusal.reason),
        suggestion: categoryText(lang, c.slug, 'suggestion', c.refusal.suggestion),
      }
    : null,
  co2ePerKg: c.co2ePerKg === null ? null : Number(c.co2ePerKg),
  co2eSource: c.co2eSource,
});

export async function listCategories(ctx: AppContext, lang: Language = DEFAULT_LANGUAGE): Promise<Category[]> {
  return (await listCategoryRows(ctx.database.db)).map((c) => toCategory(c, lang));
}

/** An admin's edit; the weights and factors feed the statistics from the next figure on. */
export async function updateCategory(ctx: AppContext, id: number, patch: CategoryPatch): Promise<Category> {
  const { db } = ctx.database;
  if (!(await categoryRow(db, id))) throw notFound('That category');
  if (Object.keys(patch).length) await updateCategoryRow(db, id, patch);
  return toCategory((await categoryRow(db, id))!);
}
