import fc from 'fast-check';
import { triage, type TriageInput } from '../../../shared/triage/engine';
import { largeRound } from '../../../shared/triage/fixtures';
import { referenceOptimum } from '../../../tests/support/triage-reference';

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

const referenceCount = (input: TriageInput) => referenceOptimum(input);

export function measureTriage() {
  console.log('Triage engine (pure, no I/O)');
  for (const [label, seatedShare] of [
    ['none seated', 0],
    ['all seated', 1],
    ['half seated', 0.5],
  ] as const) {
    const input = largeRound({ items: 500, volunteers: 80, benches: 40, seatedShare });
    triage(input);
    const t = time(() => triage(input), 21);
    console.log(
      `  large event, 500 items / 80 fixers / 40 benches, ${label.padEnd(11)}  median ${t.median.toFixed(1).padStart(6)} ms  max ${t.max.toFixed(1).padStart(6)} ms  assigned ${triage(input).assignments.length}`,
    );
  }
  const medium = largeRound({ items: 40, volunteers: 10, benches: 6, seatedShare: 0, seed: 3 });
  const e = time(() => triage(medium), 21);
  const r = time(() => referenceCount(medium), 3);
  const ref = referenceCount(medium);
  console.log(
    `  medium event, 40 items / 10 fixers / 6 benches: engine median ${e.median.toFixed(2)} ms, reference ILP (${ref.variables} variables) median ${r.median.toFixed(0)} ms; assigned ${triage(medium).assignments.length} vs optimum ${ref.count}`,
  );

  const rounds = fc
    .sample(
      fc.record({
        items: fc.integer({ min: 0, max: 9 }),
        volunteers: fc.integer({ min: 0, max: 4 }),
        benches: fc.integer({ min: 1, max: 3 }),
        seed: fc.nat(),
        seatedShare: fc.constantFrom(0, 1, 0.5),
      }),
      { numRuns: 300, seed: 99 },
    )
    .map((o) => largeRound(o));
  const te = time(() => rounds.forEach((x) => triage(x)), 5);
  const tr = time(() => rounds.forEach((x) => referenceCount(x)), 1);
  const equal = rounds.filter((x) => triage(x).assignments.length === referenceCount(x).count).length;
  console.log(
    `  300 random small rounds: engine ${(te.median / 300).toFixed(3)} ms a round, reference ILP ${(tr.median / 300).toFixed(2)} ms a round; engine reaches the optimum in ${equal}/300`,
  );
}

if (import.meta.url === `file://${process.argv[1]}`) measureTriage();
