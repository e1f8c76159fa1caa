// The engine as it was before the exact mixed search and the typed-array flow: the benchmark's same-run baseline only.
import { MinCostFlow } from './min-cost-flow';

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
export type UnassignedReason = 'no-skill' | 'no-equipment' | 'no-pair' | 'capacity';
export interface TriageResult {
  assignments: { itemId: string; volunteerId: string; benchId: string }[];
  unassigned: { itemId: string; reason: UnassignedReason; detail: string }[];
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
 * stages, in both orders, and the better result is kept: always valid, usually maximal.
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
    const a = stages(items, seated, free, benches, seats, itemCost, 'seated-first');
    const b = stages(items, seated, free, benches, seats, itemCost, 'free-first');
    plan = a.pairs.size > b.pairs.size || (a.pairs.size === b.pairs.size && a.cost <= b.cost) ? a : b;
  }

  const assignments: TriageResult['assignments'] = [];
  const unassigned: TriageResult['unassigned'] = [];
  for (const item of items) {
    const p = plan.pairs.get(item.id);
    if (p) assignments.push({ itemId: item.id, volunteerId: p[0], benchId: p[1] });
    else unassigned.push({ itemId: item.id, ...explain(item, present, allBenches) });
  }
  return { assignments, unassigned };
}

/** Items are alike for the flow when they need the same skill and level and fit the same benches. */
function classesOf(items: TriageItem[], benches: TriageBench[]): ItemClass[] {
  const map = new Map<string, ItemClass>();
  for (const item of items) {
    const equipment = [...new Set(item.equipment)].sort();
    const fits = benches.map((b) => (hasAll(b, equipment) ? '1' : '0')).join('');
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

/** No fixer is seated: source → fixer → item (unit, priority cost) → bench with the kit → sink. */
function freePlan(
  items: TriageItem[],
  volunteers: TriageVolunteer[],
  benches: TriageBench[],
  seats: Map<string, number>,
  itemCost: (i: TriageItem) => number,
): Plan {
  const classes = classesOf(items, benches);
  const S = 0;
  const V0 = 1;
  const Cin = V0 + volunteers.length;
  const Cout = Cin + classes.length;
  const B0 = Cout + classes.length;
  const T = B0 + benches.length;
  const g = new MinCostFlow(T + 1);
  volunteers.forEach((v, j) => g.addEdge(S, V0 + j, capacityOf(v), 0));
  const vc: { j: number; e: number }[][] = classes.map(() => []);
  classes.forEach((c, k) =>
    volunteers.forEach((v, j) => {
      const level = levelOf(v, c.skill);
      if (level >= c.minLevel) vc[k].push({ j, e: g.addEdge(V0 + j, Cin + k, c.items.length, level - c.minLevel) });
    }),
  );
  const unitEdges = classes.map((c, k) => c.items.map((item) => g.addEdge(Cin + k, Cout + k, 1, itemCost(item))));
  const cb: { i: number; e: number }[][] = classes.map(() => []);
  classes.forEach((c, k) =>
    benches.forEach(
      (b, i) => hasAll(b, c.equipment) && cb[k].push({ i, e: g.addEdge(Cout + k, B0 + i, c.items.length, 0) }),
    ),
  );
  benches.forEach((b, i) => g.addEdge(B0 + i, T, seats.get(b.id) ?? 0, 0));
  const { cost } = g.run(S, T);

  const pairs = new Map<string, [string, string]>();
  classes.forEach((c, k) => {
    const chosen = c.items.filter((_, u) => g.flow(unitEdges[k][u]) > 0);
    const fixers = vc[k].flatMap((x) => Array<string>(g.flow(x.e)).fill(volunteers[x.j].id));
    const places = cb[k].flatMap((x) => Array<string>(g.flow(x.e)).fill(benches[x.i].id));
    chosen.forEach((item, n) => pairs.set(item.id, [fixers[n], places[n]]));
  });
  return { pairs, cost };
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

const list = (words: string[]) =>
  words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`;
const kit = (e: string) => e.replace(/-/g, ' ');
const levelWord = (n: number) => (n >= 3 ? 'expert' : n === 2 ? 'capable' : 'learning');

/** Why an item was left out, in words an organiser can act on. */
function explain(
  item: TriageItem,
  volunteers: TriageVolunteer[],
  benches: TriageBench[],
): { reason: UnassignedReason; detail: string } {
  const skilled = volunteers.filter((v) => levelOf(v, item.skill) >= item.minLevel);
  const equipped = benches.filter((b) => hasAll(b, item.equipment));
  if (!skilled.length) {
    return {
      reason: 'no-skill',
      detail: `Nobody here has ${item.skill} at level ${item.minLevel} (${levelWord(item.minLevel)}) or above.`,
    };
  }
  if (!equipped.length) {
    const missing = item.equipment.filter((e) => !benches.some((b) => b.equipment.includes(e)));
    return {
      reason: 'no-equipment',
      detail: missing.length
        ? `No bench has a ${list(missing.map(kit))}.`
        : `No single bench has all of: ${list(item.equipment.map(kit))}.`,
    };
  }
  const canPair = skilled.some((v) => v.benchId === undefined || equipped.some((b) => b.id === v.benchId));
  if (!canPair) {
    const who = skilled.map((v) => v.name ?? v.id);
    return {
      reason: 'no-pair',
      detail: `${list(who)} ${who.length > 1 ? 'have' : 'has'} the ${item.skill} skill but ${who.length > 1 ? 'are' : 'is'} seated at a bench without ${list(item.equipment.map(kit))}; move a fixer or the kit.`,
    };
  }
  return {
    reason: 'capacity',
    detail: `A fixer and a bench for it exist, but they are busy with other items (served first, or locked there); it waits for the next round.`,
  };
}
