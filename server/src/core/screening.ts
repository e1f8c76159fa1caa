import { eq, inArray } from 'drizzle-orm';
import { screenItem } from '../../../shared/booking/screening';
import type { Hazard } from '../../../shared/constants';
import type { DbOrTx } from '../db/client';
import { categories, groupExclusions } from '../db/schema/index';
import { HttpError } from '../http/errors';

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

/**
 * The one screening of items coming in, whether booked, walked in or corrected at the desk: refuses the whole lot
 * when any item is one the group does not take, saying why next to each. Answers the categories by id.
 */
export async function screenItems(
  tx: DbOrTx,
  group: { id: number; name: string },
  items: { categoryId: number; hazards?: Hazard[] }[],
) {
  const ids = [...new Set(items.map((i) => i.categoryId))];
  const cats = ids.length ? await tx.select().from(categories).where(inArray(categories.id, ids)) : [];
  const byId = new Map(cats.map((c) => [c.id, c]));
  const excluded = await excludedCategoryIds(tx, group.id);
  const fields: Record<string, string> = {};
  items.forEach((item, i) => {
    const c = byId.get(item.categoryId);
    if (!c) {
      fields[`items.${i}.categoryId`] = 'Choose one of the listed kinds of item.';
      return;
    }
    const r = screenItem(c, item.hazards ?? [], { name: group.name, excludedCategoryIds: excluded });
    if (!r.ok) fields[`items.${i}.${item.hazards?.length ? 'hazards' : 'categoryId'}`] = `${r.reason} ${r.suggestion}`;
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
