import { BARRIER_CHOICES, type Barrier, type Outcome } from '../event-day/constants';
import { countedBarrier, DIVERTING_OUTCOME, lastVisits } from './visits';

/**
 * The impact engine: from repair records and the category table to items seen, outcomes, kilograms diverted
 * from landfill and emissions avoided. Pure; the server feeds it rolled-up cells, the tests worked examples.
 *
 * Method (REFERENCE.md §2): kg diverted = Σ mass of items fixed (weighed at the desk where they were, else the
 * category's average); kg CO2e avoided = Σ factor × mass × d, where the factor is the category's production
 * emission factor (kg CO2e per kg) and d the displacement factor in [0, 1], the share of repairs that really
 * prevent a purchase. An item that came back for a second visit counts once, with the outcome and date of its
 * last visit.
 */
export interface ImpactCategory {
  id: number;
  name: string;
  skill: string;
  avgWeightKg: number;
  /** Production emission factor, kg CO2e per kg; null where no sourced factor is known (counted as 0). */
  co2ePerKg: number | null;
}

export interface RepairRecord {
  itemId: number;
  categoryId: number;
  /** The event's date (ISO 8601 or a Date): statistics count at the date of the visit. */
  date: string | Date;
  outcome: Outcome | null;
  barrier?: Barrier | null;
  weighedKg?: number | null;
  /** The earlier visit of the same item, for an item that came back (e.g. with its part). */
  returnOfItemId?: number | null;
}

/** What a month and category add up to: the unit both the engine and the server's rollup table keep. */
export interface ImpactCell {
  month: string;
  categoryId: number;
  items: number;
  fixed: number;
  partsNeeded: number;
  advice: number;
  endOfLife: number;
  /** Sum of the weighed masses of fixed items, and how many fixed items were not weighed. */
  fixedWeighedKg: number;
  fixedUnweighed: number;
  barriers: Partial<Record<Barrier, number>>;
}

export interface Counts {
  items: number;
  fixed: number;
  partsNeeded: number;
  advice: number;
  endOfLife: number;
  /** fixed ÷ items with a recorded outcome; null when none has one. */
  fixRate: number | null;
  kgDiverted: number;
  co2eKg: number;
}

export interface ImpactTotals extends Counts {
  unknown: number;
  byCategory: (Counts & { categoryId: number; name: string })[];
  bySkill: (Counts & { skill: string })[];
  byMonth: (Counts & { month: string })[];
  barriers: { barrier: Barrier; count: number }[];
}

export const monthOf = (d: string | Date) => (typeof d === 'string' ? d : d.toISOString()).slice(0, 7);

const emptyCell = (month: string, categoryId: number): ImpactCell => ({
  month,
  categoryId,
  items: 0,
  fixed: 0,
  partsNeeded: 0,
  advice: 0,
  endOfLife: 0,
  fixedWeighedKg: 0,
  fixedUnweighed: 0,
  barriers: {},
});

/** Adds one record (already de-duplicated) to its cell. */
export function addToCell(cell: ImpactCell, r: RepairRecord) {
  cell.items++;
  if (r.outcome === DIVERTING_OUTCOME) {
    cell.fixed++;
    if (r.weighedKg != null) cell.fixedWeighedKg += r.weighedKg;
    else cell.fixedUnweighed++;
  } else if (r.outcome === 'parts-needed') cell.partsNeeded++;
  else if (r.outcome === 'advice') cell.advice++;
  else if (r.outcome === 'end-of-life') cell.endOfLife++;
  const barrier = countedBarrier(r.outcome, r.barrier);
  if (barrier) cell.barriers[barrier] = (cell.barriers[barrier] ?? 0) + 1;
}

/** The cells of records that all happened (see visits.ts `countedVisits`); a superseded visit is left out here. */
export function cellsFromRecords(records: readonly RepairRecord[]): ImpactCell[] {
  const cells = new Map<string, ImpactCell>();
  for (const r of lastVisits(records)) {
    const month = monthOf(r.date);
    const key = `${month}|${r.categoryId}`;
    const cell = cells.get(key) ?? emptyCell(month, r.categoryId);
    addToCell(cell, r);
    cells.set(key, cell);
  }
  return [...cells.values()];
}

const round = (x: number, dp: number) => Math.round(x * 10 ** dp) / 10 ** dp;

function counts(cells: readonly ImpactCell[], cats: Map<number, ImpactCategory>, d: number): Counts {
  let items = 0,
    fixed = 0,
    partsNeeded = 0,
    advice = 0,
    endOfLife = 0,
    kg = 0,
    co2e = 0;
  for (const c of cells) {
    const cat = cats.get(c.categoryId);
    const mass = c.fixedWeighedKg + c.fixedUnweighed * (cat?.avgWeightKg ?? 0);
    items += c.items;
    fixed += c.fixed;
    partsNeeded += c.partsNeeded;
    advice += c.advice;
    endOfLife += c.endOfLife;
    kg += mass;
    co2e += mass * (cat?.co2ePerKg ?? 0) * d;
  }
  const known = fixed + partsNeeded + advice + endOfLife;
  return {
    items,
    fixed,
    partsNeeded,
    advice,
    endOfLife,
    fixRate: known ? round(fixed / known, 4) : null,
    kgDiverted: round(kg, 6),
    co2eKg: round(co2e, 6),
  };
}

function groupBy<K>(cells: readonly ImpactCell[], key: (c: ImpactCell) => K): Map<K, ImpactCell[]> {
  const m = new Map<K, ImpactCell[]>();
  for (const c of cells) m.set(key(c), [...(m.get(key(c)) ?? []), c]);
  return m;
}

/** Totals, by category, by skill, by month and the barriers to repair, from cells. */
export function totalsFromCells(
  cells: readonly ImpactCell[],
  categories: readonly ImpactCategory[],
  displacement: number,
): ImpactTotals {
  if (!(displacement >= 0 && displacement <= 1)) throw new RangeError('The displacement factor is between 0 and 1.');
  const cats = new Map(categories.map((c) => [c.id, c]));
  const all = counts(cells, cats, displacement);
  const barriers = BARRIER_CHOICES.map((b) => ({
    barrier: b,
    count: cells.reduce((n, c) => n + (c.barriers[b] ?? 0), 0),
  })).filter((b) => b.count > 0);
  return {
    ...all,
    unknown: all.items - all.fixed - all.partsNeeded - all.advice - all.endOfLife,
    byCategory: [...groupBy(cells, (c) => c.categoryId)]
      .map(([categoryId, cs]) => ({
        categoryId,
        name: cats.get(categoryId)?.name ?? `Category ${categoryId}`,
        ...counts(cs, cats, displacement),
      }))
      .sort((a, b) => b.items - a.items || a.categoryId - b.categoryId),
    bySkill: [...groupBy(cells, (c) => cats.get(c.categoryId)?.skill ?? 'other')]
      .map(([skill, cs]) => ({ skill, ...counts(cs, cats, displacement) }))
      .sort((a, b) => b.items - a.items || a.skill.localeCompare(b.skill)),
    byMonth: [...groupBy(cells, (c) => c.month)]
      .map(([month, cs]) => ({ month, ...counts(cs, cats, displacement) }))
      .sort((a, b) => a.month.localeCompare(b.month)),
    barriers,
  };
}

export const impact = (records: readonly RepairRecord[], categories: readonly ImpactCategory[], displacement: number) =>
  totalsFromCells(cellsFromRecords(records), categories, displacement);
