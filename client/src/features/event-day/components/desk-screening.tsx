import type { Category } from '../../../../../shared/api/categories';
import { screenItem, type ScreenResult } from '../../../../../shared/booking/screening';
import type { Hazard } from '../../../../../shared/constants';
import { useT } from '../../../lib/i18n';
import { refusalWords } from '../../../lib/refusal-words';

/** What the desk needs to screen an item as a booking does: the kinds of item and the group's excluded ones. */
export interface DeskScreening {
  categories: Category[];
  groupName: string;
  excludedCategoryIds: number[];
}

/** The booking's screening (shared/booking/screening) for a kind chosen or corrected at the desk. */
export function screenAtDesk(
  s: DeskScreening,
  categoryId: number | undefined,
  hazards: readonly Hazard[],
): ScreenResult {
  const category = s.categories.find((c) => c.id === Number(categoryId));
  if (!category && hazards.length === 0) return { ok: true };
  return screenItem(category ?? { id: 0, name: '' }, hazards, {
    name: s.groupName,
    excludedCategoryIds: s.excludedCategoryIds,
  });
}

/** The kinds of item as options; the ones the group does not take say so. */
export function CategoryOptions({ screening }: { screening: DeskScreening }) {
  const t = useT();
  const excluded = new Set(screening.excludedCategoryIds);
  return screening.categories.map((c) => (
    <option key={c.id} value={c.id}>
      {excluded.has(c.id) ? t('booking.categoryNotTaken', { name: c.name }) : c.name}
    </option>
  ));
}

/** Why the item is refused, and what the visitor can do instead. */
export function Refusal({ result }: { result: ScreenResult }) {
  if (result.ok) return null;
  return (
    <p role="alert" className="rounded-lg bg-alert-light px-3 py-2 text-sm font-semibold text-alert">
      {refusalWords(result)}
    </p>
  );
}
