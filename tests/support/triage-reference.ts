// javascript-lp-solver: a widely used LP/MIP solver on npm, independent of the engine's flow code.
import solver from 'javascript-lp-solver';
import type { TriageInput } from '../../shared/triage/engine';

/**
 * The exact optimum of a round by integer programming: one 0/1 variable per (item, fixer, bench) triple the rules
 * allow. `value` weighs each placement by priority rank and level excess, like the engine's objective.
 */
export function referenceOptimum(input: TriageInput) {
  const priorities = [...new Set(input.items.map((i) => i.priority))].sort((a, b) => a - b);
  const K2 = 2 * input.items.length + 1;
  const K1 = priorities.length * K2 * Math.max(1, input.items.length) + 1;
  const variables: Record<string, Record<string, number>> = {};
  const ints: Record<string, 1> = {};
  const constraints: Record<string, { max: number }> = {};
  for (const i of input.items) constraints[`i:${i.id}`] = { max: 1 };
  for (const v of input.volunteers) constraints[`v:${v.id}`] = { max: v.capacity ?? 1 };
  for (const b of input.benches) constraints[`b:${b.id}`] = { max: b.seats };
  for (const i of input.items)
    for (const v of input.volunteers)
      for (const b of input.benches) {
        const level = v.skills[i.skill] ?? 0;
        if (
          level < i.minLevel ||
          !i.equipment.every((e) => b.equipment.includes(e)) ||
          (v.benchId !== undefined && v.benchId !== b.id)
        )
          continue;
        const name = `x:${i.id}:${v.id}:${b.id}`;
        variables[name] = {
          count: 1,
          value: K1 - priorities.indexOf(i.priority) * K2 - (level - i.minLevel),
          [`i:${i.id}`]: 1,
          [`v:${v.id}`]: 1,
          [`b:${b.id}`]: 1,
        };
        ints[name] = 1;
      }
  const solve = (optimize: 'count' | 'value') =>
    Math.round(solver.Solve({ optimize, opType: 'max', constraints, variables, ints }).result ?? 0) + 0;
  return {
    count: solve('count'),
    value: () => solve('value'),
    K1,
    K2,
    priorities,
    variables: Object.keys(variables).length,
  };
}
