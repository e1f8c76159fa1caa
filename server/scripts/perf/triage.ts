import fc from 'fast-check';
import { triage, type TriageInput } from '../../../shared/triage/engine';
import { largeRound } from '../../../shared/triage/fixtures';
import { referenceOptimum } from '../../../tests/support/triage-reference';
import { triage as previousTriage } from './triage-previous/engine';

/**
 * Times the triage engine beside its previous version (kept in ./triage-previous as the same-run baseline: staged
 * mixed rounds, the older flow code) and the reference integer program. Figures are medians and 95th percentiles
 * of interleaved runs; the ratio is new / previous (below 1 is faster).
 */
const quantile = (xs: number[], q: number) =>
  [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(xs.length * q))];
function timeBoth(a: () => unknown, b: () => unknown, runs: number) {
  const ta: number[] = [];
  const tb: number[] = [];
  for (let i = 0; i < runs; i++) {
    for (const [fn, out] of [
      [a, ta],
      [b, tb],
    ] as const) {
      const s = performance.now();
      fn();
      out.push(performance.now() - s);
    }
  }
  return {
    a: { median: quantile(ta, 0.5), p95: quantile(ta, 0.95) },
    b: { median: quantile(tb, 0.5), p95: quantile(tb, 0.95) },
  };
}
const ms = (x: number) => `${x.toFixed(1).padStart(5)} ms`;

export function measureTriage() {
  console.log('Triage engine (pure, no I/O): engine vs previous engine in the same run');
  for (const [label, seatedShare] of [
    ['none seated', 0],
    ['all seated', 1],
    ['half seated', 0.5],
  ] as const) {
    const input = largeRound({ items: 500, volunteers: 80, benches: 40, seatedShare });
    triage(input);
    previousTriage(input);
    const t = timeBoth(
      () => triage(input),
      () => previousTriage(input),
      31,
    );
    console.log(
      `  500 items / 80 fixers / 40 benches, ${label.padEnd(11)}  median ${ms(t.a.median)} (previous ${ms(t.b.median)}, ratio ${(t.a.median / t.b.median).toFixed(2)})  p95 ${ms(t.a.p95)} (previous ${ms(t.b.p95)}, ratio ${(t.a.p95 / t.b.p95).toFixed(2)})  assigned ${triage(input).assignments.length} vs ${previousTriage(input).assignments.length}`,
    );
  }
  // Per-slot mixed rounds of a busy session: the exact search runs here.
  const slots = Array.from({ length: 40 }, (_, seed) =>
    largeRound({ items: 30, volunteers: 8, benches: 5, seatedShare: 0.5, seed: seed + 1 }),
  );
  const s = timeBoth(
    () => slots.forEach((x) => triage(x)),
    () => slots.forEach((x) => previousTriage(x)),
    5,
  );
  console.log(
    `  40 mixed per-slot rounds (30 items / 8 fixers / 5 benches): ${(s.a.median / 40).toFixed(2)} ms a round (previous ${(s.b.median / 40).toFixed(2)}, ratio ${(s.a.median / s.b.median).toFixed(2)})`,
  );

  const rounds = fc
    .sample(
      fc.record({
        items: fc.integer({ min: 0, max: 9 }),
        volunteers: fc.integer({ min: 0, max: 4 }),
        benches: fc.integer({ min: 1, max: 3 }),
        seed: fc.nat(),
        seatedShare: fc.constant(0.5),
      }),
      { numRuns: 300, seed: 99 },
    )
    .map((o) => largeRound(o));
  const objective = (
    input: TriageInput,
    out: Pick<ReturnType<typeof triage>, 'assignments'>,
    ref: ReturnType<typeof referenceOptimum>,
  ) =>
    out.assignments.reduce((sum, a) => {
      const i = input.items.find((x) => x.id === a.itemId)!;
      const v = input.volunteers.find((x) => x.id === a.volunteerId)!;
      return sum + ref.K1 - ref.priorities.indexOf(i.priority) * ref.K2 - ((v.skills[i.skill] ?? 0) - i.minLevel);
    }, 0);
  let t0 = performance.now();
  const refs = rounds.map((x) => referenceOptimum(x));
  const values = refs.map((r) => r.value());
  const tr = performance.now() - t0;
  t0 = performance.now();
  const outs = rounds.map((x) => triage(x));
  const te = performance.now() - t0;
  const equal = outs.filter((o, k) => objective(rounds[k], o, refs[k]) === values[k]).length;
  const before = rounds.filter((x, k) => objective(x, previousTriage(x), refs[k]) === values[k]).length;
  console.log(
    `  300 random small mixed rounds: engine ${(te / 300).toFixed(3)} ms a round, reference ILP ${(tr / 300).toFixed(2)} ms a round (ratio ${(te / tr).toFixed(3)}); whole objective equal to the ILP in ${equal}/300 (previous engine ${before}/300)`,
  );
}

if (import.meta.url === `file://${process.argv[1]}`) measureTriage();
