import { MinCostFlow } from './min-cost-flow';
import { EXACT_SEARCH_SIZE, searchMixed } from './mixed-search';
import { waitingDetail, type WaitingWhy } from './waiting';

export type Level = 1 | 2 | 3;
export interface TriageItem {
  id: string;
  skill: string;
  minLevel: Level;
  equipment: string[];
  /** Lower number = served first. */
  priority: number;
}
export interface TriageVolunteer {
  id: string;
  skills: Record<string, Level>;
  /** Seated at this bench: works there only. */
  benchId?: string;
  /** Items at once; default 1. */
  capacity?: number;
  name?: string;
}
export interface TriageBench {
  id: string;
  equipment: string[];
  /** Repairs at once. */
  seats: number;
  name?: string;
}
export interface TriageInput {
  items: TriageItem[];
  volunteers: TriageVolunteer[];
  benches: TriageBench[];
}
/** An item left waiting: why, as a code with its values, and the same in English for the stored record. */
export type Unassigned = { itemId: string; detail: string } & WaitingWhy;
export interface TriageResult {
  assignments: { itemId: string; volunteerId: string; benchId: string }[];
  unassigned: Unassigned[];
}

const byId = <T extends { id: string }>(a: T, b: T) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
const capacityOf = (v: TriageVolunteer) => Math.max(0, Math.floor(v.capacity ?? 1));
const levelOf = (v: TriageVolunteer, skill: string) => v.skills[skill] ?? 0;
const hasAll = (bench: TriageBench, equipment: readonly string[]) =>
  equipment.every((e) => bench.equipment.includes(e));

/** Items that need the same skill, level and kit are interchangeable: the flow runs on these classes. */
interface ItemClass {
  skill: string;
  minLevel: number;
  equipment: string[];
  items: TriageItem[]; // best first
}

interface Plan {
  /** itemId → [volunteerId, benchId] */
  pairs: Map<string, [string, string]>;
  cost: number;
}

/**
 * Matches items to a fixer with the skill at the level needed and a bench with all the kit the item needs.
 *
 * It assigns the largest possible number of items, exactly, whenever all volunteers are seated or none is: each
 * case is a flow network (item → fixer → bench, or fixer → item → bench) solved for minimum-cost maximum flow.
 * The cost of an item is its priority rank times a weight larger than any possible sum of level excesses, plus
 * the fixer's level above the minimum: among maximum assignments, the flow serves the lowest priority numbers
 * first (items that can be served together form a matroid, so the cheapest set is the greedy one) and, among
 * those, keeps experts free. With seated and free fixers mixed, seated fixers and free fixers are matched in two
 * stages, in both orders, and the better plan starts an exact branch and bound (mixed-search.ts) on rounds the size
 * of a slot; docs/decisions/004 says why it is exact.
 */
export function triage(input: TriageInput): TriageResult {
  const items = [...input.items].sort((a, b) => a.priority - b.priority || byId(a, b));
  const allBenches = [...input.benches].sort(byId);
  const allBenchIds = new Set(allBenches.map((b) => b.id));
  // Present: not seated at a bench that is missing from the round. Working: present with room left.
  const present = [...input.volunteers].sort(byId).filter((v) => v.benchId === undefined || allBenchIds.has(v.benchId));
  const benches = allBenches.filter((b) => b.seats > 0);
  const benchIds = new Set(benches.map((b) => b.id));
  const working = present.filter((v) => capacityOf(v) > 0 && (v.benchId === undefined || benchIds.has(v.benchId)));
  const priorities = [...new Set(items.map((i) => i.priority))].sort((a, b) => a - b);
  const rank = new Map(priorities.map((p, i) => [p, i]));
  const weight = 2 * items.length + 1;
  const itemCost = (i: TriageItem) => rank.get(i.priority)! * weight;

  const seated = working.filter((v) => v.benchId !== undefined);
  const free = working.filter((v) => v.benchId === undefined);
  const seats = new Map(benches.map((b) => [b.id, b.seats]));

  let plan: Plan;
  if (free.length === 0) plan = seatedPlan(items, seated, benches, seats, itemCost);
  else if (seated.length === 0) plan = freePlan(items, free, benches, seats, itemCost);
  else {
    // The better of the two staged plans is the search's first incumbent; small rounds are then searched exactly.
    const a = stages(items, seated, free, benches, seats, itemCost, 'seated-first');
    const b = stages(items, seated, free, benches, seats, itemCost, 'free-first');
    plan = a.pairs.size > b.pairs.size || (a.pairs.size === b.pairs.size && a.cost <= b.cost) ? a : b;
    if (items.length * working.length <= EXACT_SEARCH_SIZE)
      plan = mixedPlan(items, working, benches, seats, itemCost, plan);
  }

  const assignments: TriageResult['assignments'] = [];
  const unassigned: TriageResult['unassigned'] = [];
  // Items with the same need and kit wait for the same reason: explain each kind once.
  const reasons = new Map<string, ReturnType<typeof explain>>();
  for (const item of items) {
    const p = plan.pairs.get(item.id);
    if (p) {
      assignments.push({ itemId: item.id, volunteerId: p[0], benchId: p[1] });
      continue;
    }
    const key = `${item.skill}\u0000${item.minLevel}\u0000${item.equipment.join('\u0000')}`;
    let why = reasons.get(key);
    if (!why) reasons.set(key, (why = explain(item, present, allBenches)));
    unassigned.push({ itemId: item.id, ...why, detail: waitingDetail(why) });
  }
  return { assignments, unassigned };
}

/** Items are alike for the flow when they need the same skill and level and fit the same benches. */
function classesOf(items: TriageItem[], benches: TriageBench[]): ItemClass[] {
  const map = new Map<string, ItemClass>();
  const fitsOf = new Map<string, string>();
  for (const item of items) {
    const equipment = [...new Set(item.equipment)].sort();
    const kitKey = equipment.join('\u0000');
    let fits = fitsOf.get(kitKey);
    if (fits === undefined)
      fitsOf.set(kitKey, (fits = benches.map((b) => (hasAll(b, equipment) ? '1' : '0')).join('')));
    const key = `${item.skill}\u0000${item.minLevel}\u0000${fits}`;
    let c = map.get(key);
    if (!c) map.set(key, (c = { skill: item.skill, minLevel: item.minLevel, equipment, items: [] }));
    c.items.push(item);
  }
  return [...map.values()];
}

/** Every fixer is seated: source → item (unit, priority cost) → fixer (excess cost) → their bench → sink. */
function seatedPlan(
  items: TriageItem[],
  volunteers: TriageVolunteer[],
  benches: TriageBench[],
  seats: Map<string, number>,
  itemCost: (i: TriageItem) => number,
): Plan {
  const classes = classesOf(items, benches);
  const benchIndex = new Map(benches.map((b, i) => [b.id, i]));
  const S = 0;
  const C0 = 1;
  const V0 = C0 + classes.length;
  const B0 = V0 + volunteers.length;
  const T = B0 + benches.length;
  const g = new MinCostFlow(T + 1);
  const unitEdges = classes.map((c, k) => c.items.map((item) => g.addEdge(S, C0 + k, 1, itemCost(item))));
  const cv: { j: number; e: number }[][] = classes.map(() => []);
  classes.forEach((c, k) =>
    volunteers.forEach((v, j) => {
      const bench = benches[benchIndex.get(v.benchId!)!];
      const level = levelOf(v, c.skill);
      if (level >= c.minLevel && hasAll(bench, c.equipment))
        cv[k].push({ j, e: g.addEdge(C0 + k, V0 + j, c.items.length, level - c.minLevel) });
    }),
  );
  volunteers.forEach((v, j) => g.addEdge(V0 + j, B0 + benchIndex.get(v.benchId!)!, capacityOf(v), 0));
  benches.forEach((b, i) => g.addEdge(B0 + i, T, seats.get(b.id) ?? 0, 0));
  const { cost } = g.run(S, T);

  const pairs = new Map<string, [string, string]>();
  classes.forEach((c, k) => {
    const chosen = c.items.filter((_, u) => g.flow(unitEdges[k][u]) > 0);
    let next = 0;
    for (const { j, e } of cv[k]) {
      for (let n = g.flow(e); n > 0; n--) {
        const v = volunteers[j];
        pairs.set(chosen[next++].id, [v.id, v.benchId!]);
      }
    }
  });
  return { pairs, cost };
}

/** No fixer is seated: the search's flow (fixer → need → item class → kit pattern → bench), solved at its root. */
function freePlan(
  items: TriageItem[],
  volunteers: TriageVolunteer[],
  benches: TriageBench[],
  seats: Map<string, number>,
  itemCost: (i: TriageItem) => number,
): Plan {
  return mixedPlan(items, volunteers, benches, seats, itemCost, { pairs: new Map(), cost: 0 });
}

/** Mixed rounds: one kind of fixer first, the other on what is left; valid by construction. */
function stages(
  items: TriageItem[],
  seated: TriageVolunteer[],
  free: TriageVolunteer[],
  benches: TriageBench[],
  seats: Map<string, number>,
  itemCost: (i: TriageItem) => number,
  order: 'seated-first' | 'free-first',
): Plan {
  const run = (kind: 'seated' | 'free', pool: TriageItem[], left: Map<string, number>) =>
    kind === 'seated'
      ? seatedPlan(pool, seated, benches, left, itemCost)
      : freePlan(pool, free, benches, left, itemCost);
  const [first, second] = order === 'seated-first' ? (['seated', 'free'] as const) : (['free', 'seated'] as const);
  const a = run(first, items, seats);
  const left = new Map(seats);
  for (const [, [, benchId]] of a.pairs) left.set(benchId, left.get(benchId)! - 1);
  const b = run(
    second,
    items.filter((i) => !a.pairs.has(i.id)),
    left,
  );
  return { pairs: new Map([...a.pairs, ...b.pairs]), cost: a.cost + b.cost };
}

/** Seated and free fixers together: the exact search of mixed-search.ts, on indices. */
function mixedPlan(
  items: TriageItem[],
  volunteers: TriageVolunteer[],
  benches: TriageBench[],
  seats: Map<string, number>,
  itemCost: (i: TriageItem) => number,
  start: Plan,
): Plan {
  const benchIndex = new Map(benches.map((b, i) => [b.id, i]));
  const fixerIndex = new Map(volunteers.map((v, i) => [v.id, i]));
  const needs = new Map<string, number>();
  const needExcess: Int8Array[] = [];
  const patterns = new Map<string, number>();
  const patternFits: Uint8Array[] = [];
  const patternOf = new Map<string, number>();
  const classes = new Map<string, number>();
  const classNeed: number[] = [];
  const classPattern: number[] = [];
  const itemClass = items.map((item) => {
    const needKey = `${item.skill}\u0000${item.minLevel}`;
    let need = needs.get(needKey);
    if (need === undefined) {
      needs.set(needKey, (need = needExcess.length));
      needExcess.push(Int8Array.from(volunteers, (v) => Math.max(-1, levelOf(v, item.skill) - item.minLevel)));
    }
    const kitKey = item.equipment.join('\u0000');
    let pattern = patternOf.get(kitKey);
    if (pattern === undefined) {
      const fits = Uint8Array.from(benches, (b) => (hasAll(b, item.equipment) ? 1 : 0));
      const fitsKey = fits.join('');
      pattern = patterns.get(fitsKey);
      if (pattern === undefined) {
        patterns.set(fitsKey, (pattern = patternFits.length));
        patternFits.push(fits);
      }
      patternOf.set(kitKey, pattern);
    }
    const classKey = `${need}:${pattern}`;
    let cls = classes.get(classKey);
    if (cls === undefined) {
      classes.set(classKey, (cls = classNeed.length));
      classNeed.push(need);
      classPattern.push(pattern);
    }
    return cls;
  });
  const r = searchMixed({
    itemCost: items.map(itemCost),
    itemClass,
    classNeed,
    classPattern,
    patternFits,
    needExcess,
    fixerCap: volunteers.map(capacityOf),
    fixerBench: volunteers.map((v) => (v.benchId === undefined ? -1 : benchIndex.get(v.benchId)!)),
    seats: benches.map((b) => seats.get(b.id) ?? 0),
    start: {
      count: start.pairs.size,
      cost: start.cost,
      fixer: Int32Array.from(items, (i) => (start.pairs.has(i.id) ? fixerIndex.get(start.pairs.get(i.id)![0])! : -1)),
      bench: Int32Array.from(items, (i) => (start.pairs.has(i.id) ? benchIndex.get(start.pairs.get(i.id)![1])! : -1)),
    },
  });
  const pairs = new Map<string, [string, string]>();
  items.forEach((item, i) => {
    if (r.fixer[i] >= 0) pairs.set(item.id, [volunteers[r.fixer[i]].id, benches[r.bench[i]].id]);
  });
  return { pairs, cost: r.cost };
}

/** A round as a stored run keeps it, read loosely: enough to say again why an item waited. */
export interface ExplainInput {
  items: { id: string; skill: string; minLevel: number; equipment: string[] }[];
  volunteers: { id: string; name?: string; skills: Record<string, number>; benchId?: string }[];
  benches: { id: string; equipment: string[] }[];
}

/**
 * Why the item waited, worked out again from a stored round (runs stored before reasons kept their values); null
 * when the item is not in it.
 */
export function explainAgain(input: ExplainInput, itemId: string): WaitingWhy | null {
  const item = input.items.find((i) => i.id === itemId);
  if (!item) return null;
  const benchIds = new Set(input.benches.map((b) => b.id));
  const present = input.volunteers.filter((v) => v.benchId === undefined || benchIds.has(v.benchId));
  return explain(item, present, input.benches);
}

/** Why an item was left out, as a code and the values an organiser needs to act on it. */
function explain(
  item: ExplainInput['items'][number],
  volunteers: ExplainInput['volunteers'],
  benches: ExplainInput['benches'],
): WaitingWhy {
  const skilled = volunteers.filter((v) => (v.skills[item.skill] ?? 0) >= item.minLevel);
  const equipped = benches.filter((b) => item.equipment.every((e) => b.equipment.includes(e)));
  if (!skilled.length) return { reason: 'no-skill', skill: item.skill, level: item.minLevel };
  if (!equipped.length) {
    const missing = item.equipment.filter((e) => !benches.some((b) => b.equipment.includes(e)));
    return { reason: 'no-equipment', missing, kit: [...item.equipment] };
  }
  const equippedIds = new Set(equipped.map((b) => b.id));
  const canPair = skilled.some((v) => v.benchId === undefined || equippedIds.has(v.benchId));
  if (!canPair)
    return {
      reason: 'no-pair',
      skill: item.skill,
      fixers: skilled.map((v) => v.name ?? v.id),
      kit: [...item.equipment],
    };
  return { reason: 'capacity' };
}
