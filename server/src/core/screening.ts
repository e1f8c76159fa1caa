import { eq, inArray } from 'drizzle-orm';
import { screenItem, type ScreenRefusal } from '../../../shared/booking/screening';
import type { Hazard } from '../../../shared/constants';
import type { Language } from '../../../shared/i18n/languages';
import type { DbOrTx } from '../db/client';
import { categories, groupExclusions } from '../db/schema/index';
import { HttpError, type FieldMessage } from '../http/errors';
import { categoryText, translate } from '../i18n';

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

/** A refusal of the screening in the request's language (problems.hazard.*, problems.notTaken, the kind's own words). */
export const refusalIn =
  (r: ScreenRefusal, slug: string) =>
  (lang: Language): string => {
    if (r.code === 'hazard') return translate(lang, `problems.hazard.${r.hazard}`);
    if (r.code === 'category')
      return `${categoryText(lang, slug, 'reason', r.reason)} ${categoryText(lang, slug, 'suggestion', r.suggestion)}`;
    const name = categoryText(lang, slug, 'name', r.category);
    // German writes its nouns with a capital; the others name the kind in lower case inside a sentence.
    return translate(lang, 'problems.notTaken', {
      group: r.group,
      category: lang === 'de' ? name : name.toLowerCase(),
    });
  };

/**
 * The one screening of items coming in, whether booked, walked in or corrected at the desk: refuses the whole lot
 * when any item is one the group does not take, saying why next to each. Answers the categories by id.
 * `excluded` is the group's refused kinds when the caller has read them already.
 */
export async function screenItems(
  tx: DbOrTx,
  group: { id: number; name: string },
  items: { categoryId: number; hazards?: Hazard[] }[],
  excluded?: number[],
) {
  const ids = [...new Set(items.map((i) => i.categoryId))];
  const cats = ids.length ? await tx.select().from(categories).where(inArray(categories.id, ids)) : [];
  const byId = new Map(cats.map((c) => [c.id, c]));
  const refused = excluded ?? (await excludedCategoryIds(tx, group.id));
  const fields: Record<string, FieldMessage> = {};
  items.forEach((item, i) => {
    const c = byId.get(item.categoryId);
    if (!c) {
      fields[`items.${i}.categoryId`] = 'Choose one of the listed kinds of item.';
      return;
    }
    const r = screenItem(c, item.hazards ?? [], { name: group.name, excludedCategoryIds: refused });
    if (!r.ok) fields[`items.${i}.${item.hazards?.length ? 'hazards' : 'categoryId'}`] = refusalIn(r, c.slug);
  });
  if (Object.keys(fields).length)
    throw new HttpError(
      422,
      'item-refused',
      'We cannot take one of the items. The reason is shown next to it.',
      fields,
    );
  return byId;
}
