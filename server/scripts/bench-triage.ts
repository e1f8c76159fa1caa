import fc from 'fast-check';
import solver from 'javascript-lp-solver';
import { triage, type TriageInput } from '../../shared/triage/index';
import { largeRound } from '../../shared/triage/fixtures';

/** Times the triage engine on a large event and on a random set, and the reference integer program beside it. */
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
function time(fn: () => unknown, runs: number) {
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const s = performance.now();
    fn();
    t.push(performance.now() - s);
  }
  return { median: median(t), max: Math.max(...t) };
}

function referenceCount(input: TriageInput) {
  const variables: Record<string, Record<string, number>> = {};
  const ints: Record<string, 1> = {};
  const constraints: Record<string, { max: number }> = {};
  for (const i of input.items) constraints[`i:${i.id}`] = { max: 1 };
  for (const v of input.volunteers) constraints[`v:${v.id}`] = { max: v.capacity ?? 1 };
  for (const b of input.benches) constraints[`b:${b.id}`] = { max: b.seats };
  for (const i of input.items)
    for (const v of input.volunteers)
      for (const b of input.benches) {
        if ((v.skills[i.skill] ?? 0) < i.minLevel || !i.equipment.every((e) => b.equipment.includes(e)) || (v.benchId !== undefined && v.benchId !== b.id)) continue;
        const name = `x:${i.id}:${v.id}:${b.id}`;
        variables[name] = { n: 1, [`i:${i.id}`]: 1, [`v:${v.id}`]: 1, [`b:${b.id}`]: 1 };
        ints[name] = 1;
      }
  return { count: Math.round(solver.Solve({ optimize: 'n', opType: 'max', constraints, variables, ints }).result ?? 0), variables: Object.keys(variables).length };
}

export function benchTriage() {
  console.log('Triage engine (pure, no I/O)');
  for (const [label, seatedShare] of [['none seated', 0], ['all seated', 1], ['half seated', 0.5]] as const) {
    const input = largeRound({ items: 500, volunteers: 80, benches: 40, seatedShare });
    triage(input);
    const t = time(() => triage(input), 21);
    console.log(`  large event, 500 items / 80 fixers / 40 benches, ${label.padEnd(11)}  median ${t.median.toFixed(1).padStart(6)} ms  max ${t.max.toFixed(1).padStart(6)} ms  assigned ${triage(input).assignments.length}`);
  }
  const medium = largeRound({ items: 40, volunteers: 10, benches: 6, seatedShare: 0, seed: 3 });
  const e = time(() => triage(medium), 21);
  const r = time(() => referenceCount(medium), 3);
  const ref = referenceCount(medium);
  console.log(`  medium event, 40 items / 10 fixers / 6 benches: engine median ${e.median.toFixed(2)} ms, reference ILP (${ref.variables} variables) median ${r.median.toFixed(0)} ms; assigned ${triage(medium).assignments.length} vs optimum ${ref.count}`);

  const rounds = fc.sample(
    fc.record({ items: fc.integer({ min: 0, max: 9 }), volunteers: fc.integer({ min: 0, max: 4 }), benches: fc.integer({ min: 1, max: 3 }), seed: fc.nat(), seatedShare: fc.constantFrom(0, 1, 0.5) }),
    { numRuns: 300, seed: 99 },
  ).map((o) => largeRound(o));
  const te = time(() => rounds.forEach((x) => triage(x)), 5);
  const tr = time(() => rounds.forEach((x) => referenceCount(x)), 1);
  const equal = rounds.filter((x) => triage(x).assignments.length === referenceCount(x).count).length;
  console.log(`  300 random small rounds: engine ${(te.median / 300).toFixed(3)} ms a round, reference ILP ${(tr.median / 300).toFixed(2)} ms a round; engine reaches the optimum in ${equal}/300`);
}

if (import.meta.url === `file://${process.argv[1]}`) benchTriage();
