import { MinCostFlow } from './min-cost-flow';

/**
 * The exact search for rounds where some fixers are seated at a bench and others are free (see
 * docs/decisions/004). Everything is by index: items best first, each in a class (same need, same benches).
 */
export interface SearchInput {
  /** Items best first: the cost of serving each (priority rank times a weight) and its class. */
  itemCost: number[];
  itemClass: number[];
  /** Per class: its need (skill and level) and the benches it fits (a pattern index and one flag per bench). */
  classNeed: number[];
  classPattern: number[];
  patternFits: Uint8Array[];
  /** Per need: each fixer's level above the minimum, or -1 when the fixer may not take it. */
  needExcess: Int8Array[];
  fixerCap: number[];
  /** The bench a fixer is seated at, or -1 for a free fixer. */
  fixerBench: number[];
  seats: number[];
  /** A valid plan to start from (the incumbent); the search only ever replaces it with a strictly better one. */
  start?: { count: number; cost: number; fixer: Int32Array; bench: Int32Array };
}
export interface SearchResult {
  count: number;
  cost: number;
  /** Per item: fixer and bench index, or -1 when it waits. */
  fixer: Int32Array;
  bench: Int32Array;
  /** Nodes of the search tree; whether the search finished (it always does below the node limit). */
  nodes: number;
  complete: boolean;
}

const UNTYPED = -1;
const FREE = -2;
/** A guard: most rounds finish in one node, a few take hundreds (see the benchmark); the staged plan stays the floor. */
export const NODE_LIMIT = 2_000;
/** Rounds up to this many items times fixers are searched exactly; above it the engine keeps the staged plan. */
export const EXACT_SEARCH_SIZE = 1_000;

interface Unit {
  item: number;
  fixer: number;
}
interface Relaxed {
  count: number;
  cost: number;
  units: Unit[];
}

/** The flow relaxation of one search node: seated fixers may send untyped items to any bench that fits them. */
function relax(input: SearchInput, typing: Int32Array): Relaxed {
  const { itemCost, itemClass, classNeed, classPattern, patternFits, needExcess, fixerCap, fixerBench, seats } = input;
  const F = fixerCap.length;
  const B = seats.length;
  const groups: { cls: number; typ: number; items: number[] }[] = [];
  const open = new Map<number, number>();
  for (let i = 0; i < itemCost.length; i++) {
    const typ = typing[i];
    if (typ === UNTYPED) {
      const g = open.get(itemClass[i]);
      if (g !== undefined) groups[g].items.push(i);
      else open.set(itemClass[i], groups.push({ cls: itemClass[i], typ, items: [i] }) - 1);
    } else groups.push({ cls: itemClass[i], typ, items: [i] });
  }
  const S = 0;
  const T = 1;
  const V0 = 2;
  const N0 = V0 + F;
  const P0 = N0 + needExcess.length;
  const G0 = P0 + patternFits.length;
  const B0 = G0 + 2 * groups.length;
  const H0 = B0 + B;
  const g = new MinCostFlow(H0 + B, 4 * (F + groups.length + itemCost.length));
  // Seated fixers draw on their bench's seats, so together they take at most that many items.
  for (let b = 0; b < B; b++) g.addEdge(S, H0 + b, seats[b], 0);
  for (let v = 0; v < F; v++) g.addEdge(fixerBench[v] < 0 ? S : H0 + fixerBench[v], V0 + v, fixerCap[v], 0);
  const freeEdges: { v: number; need: number; e: number }[] = [];
  for (let n = 0; n < needExcess.length; n++)
    for (let v = 0; v < F; v++)
      if (fixerBench[v] < 0 && needExcess[n][v] >= 0)
        freeEdges.push({ v, need: n, e: g.addEdge(V0 + v, N0 + n, fixerCap[v], needExcess[n][v]) });
  const usedPattern = new Uint8Array(patternFits.length);
  const inEdges: { v: number; e: number }[][] = [];
  const unitEdges: number[][] = [];
  groups.forEach((gr, k) => {
    const { cls, typ, items } = gr;
    const need = classNeed[cls];
    const fits = patternFits[classPattern[cls]];
    const ins: { v: number; e: number }[] = [];
    if (typ !== FREE) {
      for (let v = 0; v < F; v++) {
        const bv = fixerBench[v];
        if (bv < 0 || needExcess[need][v] < 0 || !fits[bv] || (typ >= 0 && bv !== typ)) continue;
        ins.push({ v, e: g.addEdge(V0 + v, G0 + 2 * k, items.length, needExcess[need][v]) });
      }
    }
    if (typ < 0) ins.push({ v: -1 - need, e: g.addEdge(N0 + need, G0 + 2 * k, items.length, 0) });
    inEdges.push(ins);
    unitEdges.push(items.map((i) => g.addEdge(G0 + 2 * k, G0 + 2 * k + 1, 1, itemCost[i])));
    if (typ >= 0) g.addEdge(G0 + 2 * k + 1, B0 + typ, 1, 0);
    else {
      g.addEdge(G0 + 2 * k + 1, P0 + classPattern[cls], items.length, 0);
      usedPattern[classPattern[cls]] = 1;
    }
  });
  for (let p = 0; p < patternFits.length; p++)
    if (usedPattern[p]) for (let b = 0; b < B; b++) if (patternFits[p][b]) g.addEdge(P0 + p, B0 + b, seats[b], 0);
  for (let b = 0; b < B; b++) g.addEdge(B0 + b, T, seats[b], 0);
  const { flow, cost } = g.run(S, T);

  // Free fixers reach a class through its need: hand their units out in order.
  const pool: number[][] = needExcess.map(() => []);
  for (const { v, need, e } of freeEdges) for (let u = g.flow(e); u > 0; u--) pool[need].push(v);
  const units: Unit[] = [];
  groups.forEach((gr, k) => {
    const chosen = gr.items.filter((_, u) => g.flow(unitEdges[k][u]) > 0);
    let next = 0;
    for (const { v, e } of inEdges[k])
      for (let u = g.flow(e); u > 0; u--)
        units.push({ item: chosen[next++], fixer: v >= 0 ? v : pool[-1 - v].shift()! });
  });
  return { count: flow, cost, units };
}

/**
 * Seats for the chosen items: seated fixers' items at their own bench (up to its seats), free fixers' items by a
 * flow over the benches that fit them. Answers the placed units' benches; `all` says whether every unit fitted.
 */
function seat(input: SearchInput, units: Unit[]): { bench: Int32Array; all: boolean } {
  const { itemClass, classPattern, patternFits, fixerBench, seats } = input;
  const B = seats.length;
  const left = [...seats];
  const bench = new Int32Array(units.length).fill(-1);
  const freeByPattern = new Map<number, number[]>();
  units.forEach((u, k) => {
    const b = fixerBench[u.fixer];
    if (b >= 0) {
      if (left[b] > 0) {
        left[b]--;
        bench[k] = b;
      }
    } else {
      const p = classPattern[itemClass[u.item]];
      const list = freeByPattern.get(p);
      if (list) list.push(k);
      else freeByPattern.set(p, [k]);
    }
  });
  const patterns = [...freeByPattern.keys()];
  const g = new MinCostFlow(2 + patterns.length + B);
  const edges = patterns.map((p, j) => {
    g.addEdge(0, 2 + j, freeByPattern.get(p)!.length, 0);
    const out: { b: number; e: number }[] = [];
    for (let b = 0; b < B; b++)
      if (patternFits[p][b] && left[b] > 0) out.push({ b, e: g.addEdge(2 + j, 2 + patterns.length + b, left[b], 0) });
    return out;
  });
  for (let b = 0; b < B; b++) if (left[b] > 0) g.addEdge(2 + patterns.length + b, 1, left[b], 0);
  g.run(0, 1);
  patterns.forEach((p, j) => {
    const ks = freeByPattern.get(p)!;
    let n = 0;
    for (const { b, e } of edges[j]) for (let f = g.flow(e); f > 0; f--) bench[ks[n++]] = b;
  });
  return { bench, all: bench.every((b) => b >= 0) };
}

/**
 * Branch and bound over the three-way assignment. Each node fixes, for some items, whether a free fixer serves
 * them (or nobody) or a fixer seated at one named bench; its flow relaxation bounds every assignment below it.
 * When the relaxed optimum can be seated as it is, it is the node's optimum; otherwise the best item a seated
 * fixer took is branched on.
 */
export function searchMixed(input: SearchInput): SearchResult {
  const n = input.itemCost.length;
  const cost = (units: Unit[], bench: Int32Array) =>
    units.reduce(
      (s, u, k) =>
        bench[k] < 0
          ? s
          : s + input.itemCost[u.item] + input.needExcess[input.classNeed[input.itemClass[u.item]]][u.fixer],
      0,
    );
  let best: SearchResult = {
    count: 0,
    cost: 0,
    fixer: new Int32Array(n).fill(-1),
    bench: new Int32Array(n).fill(-1),
    ...input.start,
    nodes: 0,
    complete: true,
  };
  const offer = (units: Unit[], bench: Int32Array) => {
    const count = bench.reduce((s, b) => s + (b >= 0 ? 1 : 0), 0);
    const c = cost(units, bench);
    if (count < best.count || (count === best.count && c >= best.cost)) return;
    const fixer = new Int32Array(n).fill(-1);
    const at = new Int32Array(n).fill(-1);
    units.forEach((u, k) => {
      if (bench[k] >= 0) {
        fixer[u.item] = u.fixer;
        at[u.item] = bench[k];
      }
    });
    best = { ...best, count, cost: c, fixer, bench: at };
  };
  let nodes = 0;
  const typing = new Int32Array(n).fill(UNTYPED);
  const visit = () => {
    if (nodes >= NODE_LIMIT) return;
    nodes++;
    const r = relax(input, typing);
    if (r.count < best.count || (r.count === best.count && r.cost >= best.cost)) return;
    const placed = seat(input, r.units);
    offer(r.units, placed.bench);
    if (placed.all) return;
    const pick = r.units.find((u) => typing[u.item] === UNTYPED && input.fixerBench[u.fixer] >= 0)!;
    const i = pick.item;
    const own = input.fixerBench[pick.fixer];
    const need = input.classNeed[input.itemClass[i]];
    const fits = input.patternFits[input.classPattern[input.itemClass[i]]];
    const options = [own, FREE];
    for (let b = 0; b < input.seats.length; b++) {
      if (b === own || !fits[b]) continue;
      if (input.fixerBench.some((fb, v) => fb === b && input.needExcess[need][v] >= 0)) options.push(b);
    }
    for (const o of options) {
      typing[i] = o;
      visit();
    }
    typing[i] = UNTYPED;
  };
  visit();
  return { ...best, nodes, complete: nodes < NODE_LIMIT };
}
