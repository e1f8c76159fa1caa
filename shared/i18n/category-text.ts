import { CATEGORY_SEEDS } from '../categories/seeds';

/** The parts of a kind of item that a reader sees in words. */
export type CategoryTextField = 'name' | 'reason' | 'suggestion';

const seeds = new Map(CATEGORY_SEEDS.map((c) => [c.slug, c]));

/**
 * The catalog key of a kind of item's text, while the text is still the seeded English wording
 * (`categories.kettle`, `categories.microwave.reason`). An admin's own wording has no key: it is shown as typed, in
 * every language, because only the admin knows what it means.
 */
export function categoryTextKey(slug: string, field: CategoryTextField, stored: string): string | null {
  const seed = seeds.get(slug);
  if (!seed) return null;
  const seeded = field === 'name' ? seed.name : seed.refusal?.[field];
  if (seeded === undefined || seeded !== stored) return null;
  return field === 'name' ? `categories.${slug}` : `categories.${slug}.${field}`;
}
