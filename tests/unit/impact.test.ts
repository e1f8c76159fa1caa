import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CATEGORY_SEEDS } from '../../shared/categories/seeds';
import { OUTCOMES, BARRIERS } from '../../shared/event-day/constants';
import { EMISSION_FACTORS, factorFor } from '../../shared/impact/factors';
import { impact, type ImpactCategory, type RepairRecord } from '../../shared/impact/statistics';
import { lastVisits } from '../../shared/impact/visits';

/** The shipped taxonomy: weights from Statistics Netherlands' UNU-KEY table (2020), factors from shared/impact/factors. */
const categories: ImpactCategory[] = CATEGORY_SEEDS.map((c, i) => ({
  id: i + 1,
  name: c.name,
  skill: c.skill,
  avgWeightKg: c.avgWeightKg,
  co2ePerKg: factorFor(c),
}));
const idOf = (slug: string) => CATEGORY_SEEDS.findIndex((c) => c.slug === slug) + 1;
const TEN = [
  'laptop',
  'phone',
  'desktop-pc',
  'kettle',
  'toaster',
  'vacuum-cleaner',
  'hair-dryer',
  'television',
  'microwave',
  'power-tool',
];
/** REFERENCE.md §2 gives the worked figures to 4 decimals with a tolerance of 1e-4. */
const near = (actual: number, expected: number) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(1e-4 + 1e-12);
const fixedAll = (): RepairRecord[] =>
  TEN.map((slug, i) => ({ itemId: i + 1, categoryId: idOf(slug), date: '2026-03-14', outcome: 'fixed' }));

describe('the worked example of REFERENCE.md §2 (weights: Statistics Netherlands 2020; factors: UK Government GHG conversion factors, material use)', () => {
  it('takes the IT factor for 03xx keys and the small-electrical factor for the rest', () => {
    expect(factorFor(CATEGORY_SEEDS[idOf('laptop') - 1])).toBe(EMISSION_FACTORS.it.value);
    expect(factorFor(CATEGORY_SEEDS[idOf('microwave') - 1])).toBe(EMISSION_FACTORS.small.value);
    expect(factorFor(CATEGORY_SEEDS[idOf('television') - 1])).toBe(5.64795);
    expect(factorFor(CATEGORY_SEEDS[idOf('clothing') - 1])).toBe(22.31);
    expect(factorFor(CATEGORY_SEEDS[idOf('bicycle') - 1])).toBeNull();
  });

  it('gives 56.89 kg diverted and 507.9141 kg CO2e for the ten fixed items, d = 1', () => {
    const t = impact(fixedAll(), categories, 1);
    expect(t.items).toBe(10);
    expect(t.fixed).toBe(10);
    near(t.kgDiverted, 56.89);
    near(t.co2eKg, 507.9141);
    expect(t.fixRate).toBe(1);
  });

  it('gives 25.22 kg and 160.5057 kg CO2e when the desktop and the microwave are end of life', () => {
    const records = fixedAll().map((r) =>
      r.categoryId === idOf('desktop-pc') || r.categoryId === idOf('microwave')
        ? { ...r, outcome: 'end-of-life' as const, barrier: 'spare-parts-not-available' as const }
        : r,
    );
    const t = impact(records, categories, 1);
    near(t.kgDiverted, 25.22);
    near(t.co2eKg, 160.5057);
    expect(t.endOfLife).toBe(2);
    expect(t.fixRate).toBe(0.8);
    expect(t.barriers).toEqual([{ barrier: 'spare-parts-not-available', count: 2 }]);
  });

  it('scales emissions by the displacement factor and uses a weighed mass over the average', () => {
    near(impact(fixedAll(), categories, 0.5).co2eKg, 507.9141 / 2);
    const weighed = fixedAll().map((r) => (r.categoryId === idOf('kettle') ? { ...r, weighedKg: 1.2 } : r));
    // 56.89 − 1.89 (kettle average) + 1.2 (weighed) = 56.2 kg
    near(impact(weighed, categories, 1).kgDiverted, 56.2);
    expect(() => impact(fixedAll(), categories, 1.5)).toThrow(RangeError);
  });
});

const recordArb = fc.record({
  categoryId: fc.integer({ min: 1, max: categories.length }),
  month: fc.integer({ min: 0, max: 23 }),
  outcome: fc.constantFrom(...OUTCOMES, null),
  barrier: fc.constantFrom(...BARRIERS),
  weighed: fc.option(fc.double({ min: 0.05, max: 40, noNaN: true }), { nil: null }),
  returns: fc.integer({ min: 0, max: 2 }),
});

/** Random records where some items come back once or twice (each return points at the visit before). */
function build(
  specs: {
    categoryId: number;
    month: number;
    outcome: (typeof OUTCOMES)[number] | null;
    barrier: (typeof BARRIERS)[number];
    weighed: number | null;
    returns: number;
  }[],
): RepairRecord[] {
  const out: RepairRecord[] = [];
  let id = 1;
  for (const s of specs) {
    let prev: number | null = null;
    for (let v = 0; v <= s.returns; v++) {
      const last = v === s.returns;
      const month = Math.min(23, s.month + v);
      out.push({
        itemId: id,
        categoryId: s.categoryId,
        date: `${2025 + Math.floor(month / 12)}-${String((month % 12) + 1).padStart(2, '0')}-10`,
        outcome: last ? s.outcome : 'parts-needed',
        barrier: last && s.outcome === 'end-of-life' ? s.barrier : null,
        weighedKg: s.weighed,
        returnOfItemId: prev,
      });
      prev = id++;
    }
  }
  return out;
}

describe('properties of the impact engine', () => {
  it('totals equal the sum of their parts, by category, by month and by skill', () => {
    fc.assert(
      fc.property(fc.array(recordArb, { maxLength: 60 }), (specs) => {
        const t = impact(build(specs), categories, 0.7);
        for (const parts of [t.byCategory, t.byMonth, t.bySkill]) {
          for (const k of ['items', 'fixed', 'partsNeeded', 'advice', 'endOfLife'] as const)
            expect(parts.reduce((n, p) => n + p[k], 0)).toBe(t[k]);
          expect(parts.reduce((n, p) => n + p.kgDiverted, 0)).toBeCloseTo(t.kgDiverted, 2);
          expect(parts.reduce((n, p) => n + p.co2eKg, 0)).toBeCloseTo(t.co2eKg, 2);
        }
        expect(t.unknown + t.fixed + t.partsNeeded + t.advice + t.endOfLife).toBe(t.items);
        expect(t.barriers.reduce((n, b) => n + b.count, 0)).toBe(t.endOfLife);
      }),
    );
  });

  it('counts an item that came back once, with the outcome of its last visit', () => {
    fc.assert(
      fc.property(fc.array(recordArb, { maxLength: 60 }), (specs) => {
        const records = build(specs);
        const t = impact(records, categories, 1);
        expect(t.items).toBe(specs.length);
        expect(lastVisits(records)).toHaveLength(specs.length);
        expect(t.fixed).toBe(specs.filter((s) => s.outcome === 'fixed').length);
      }),
    );
  });
});
