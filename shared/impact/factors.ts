/**
 * Production emission factors, kg CO2e per kg of product (REFERENCE.md §2): UK Government GHG conversion factors,
 * "material use", primary production (a secondary source; the edition is to be pinned). Which factor a category
 * takes follows its UN University key: 03xx IT, 0108 fridges and freezers, 0101–0104 large household appliances,
 * any other key small electrical; textiles the clothing factor. Categories with none of these have no sourced factor
 * and count 0 kg CO2e until an admin sets one.
 */
export const EMISSION_FACTORS = {
  it: { value: 24.86548, label: 'Electrical items, IT' },
  small: { value: 5.64795, label: 'Electrical items, small' },
  large: { value: 3.267, label: 'Electrical items, large' },
  fridges: { value: 4.36333, label: 'Fridges and freezers' },
  clothing: { value: 22.31, label: 'Clothing' },
} as const;
export type FactorKind = keyof typeof EMISSION_FACTORS;

export const FACTOR_SOURCE =
  'UK Government GHG conversion factors, “material use”, primary production (secondary source)';

/** The displacement factor shipped until an admin sets another: an assumption, not a sourced figure. */
export const DEFAULT_DISPLACEMENT = 0.5;
/**
 * The English of the method's displacement note and its source; the API says them in the reader's language from
 * figures.method.displacementNote and figures.method.displacementSource (tests/unit/method-words.test.ts keeps them
 * the same).
 */
export const DISPLACEMENT_NOTE =
  'The share of repairs that really save a new purchase. Mendery ships 0.5 as its assumption (half of the repaired items would otherwise have been replaced), and the network’s admins set the value in use. It is an estimate: nobody can count the purchases that did not happen.';
/** Where the idea comes from; shown in the dashboard's method section only, with its mark. */
export const DISPLACEMENT_SOURCE =
  'The idea of displacement is from Zink & Geyer, “Circular economy rebound”, Journal of Industrial Ecology, 2017 (from memory, not checked).';

const TEXTILE_SLUGS = ['clothing', 'bag-textile'];

export function factorKindFor(c: { slug: string; unuKey: string | null }): FactorKind | null {
  if (TEXTILE_SLUGS.includes(c.slug)) return 'clothing';
  if (!c.unuKey) return null;
  if (c.unuKey.startsWith('03')) return 'it';
  if (c.unuKey === '0108') return 'fridges';
  if (['0101', '0102', '0103', '0104'].includes(c.unuKey)) return 'large';
  return 'small';
}

export const factorFor = (c: { slug: string; unuKey: string | null }) => {
  const kind = factorKindFor(c);
  return kind ? EMISSION_FACTORS[kind].value : null;
};
