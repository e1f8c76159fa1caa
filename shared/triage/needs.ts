import type { Level } from './engine';

/**
 * What an item needs at the bench, from its category. Our rule: a mains item needs a fixer at least capable (2)
 * in the skill, because it ends with an electrical safety check; anything else can go to a learner.
 */
export function itemNeeds(
  category: { skill: string; equipment: readonly string[]; mains: boolean },
  item: { mains: boolean },
): { skill: string; minLevel: Level; equipment: string[] } {
  return { skill: category.skill, minLevel: item.mains || category.mains ? 2 : 1, equipment: [...category.equipment] };
}

/** A rule a placement breaks, as a code and the values the screen words it with (names as the board shows them). */
export type PlacementWarning =
  | { code: 'missing-skill'; fixer: string; skill: string }
  | { code: 'low-level'; fixer: string; skill: string; level: number; need: number }
  | { code: 'missing-equipment'; bench: string; missing: string[] }
  | { code: 'seated-elsewhere'; fixer: string }
  | { code: 'over-capacity'; fixer: string; n: number }
  | { code: 'bench-full'; bench: string; seats: number }
  /** The placement's fixer is no longer coming, or its bench was removed. */
  | { code: 'gone' };

/** The rules a hand-made move may break; the organiser is warned, not stopped. */
export function checkPlacement(
  needs: { skill: string; minLevel: number; equipment: readonly string[] },
  volunteer: {
    name: string;
    skills: Record<string, number>;
    benchId?: number | null;
    capacity: number;
    assigned: number;
  },
  bench: { id: number; name: string; equipment: readonly string[]; seats: number; assigned: number },
): PlacementWarning[] {
  const w: PlacementWarning[] = [];
  const fixer = volunteer.name;
  const skill = needs.skill;
  const level = volunteer.skills[skill] ?? 0;
  if (level === 0) w.push({ code: 'missing-skill', fixer, skill });
  else if (level < needs.minLevel) w.push({ code: 'low-level', fixer, skill, level, need: needs.minLevel });
  const missing = needs.equipment.filter((e) => !bench.equipment.includes(e));
  if (missing.length) w.push({ code: 'missing-equipment', bench: bench.name, missing });
  if (volunteer.benchId != null && volunteer.benchId !== bench.id) w.push({ code: 'seated-elsewhere', fixer });
  if (volunteer.assigned >= volunteer.capacity) w.push({ code: 'over-capacity', fixer, n: volunteer.assigned });
  if (bench.assigned >= bench.seats) w.push({ code: 'bench-full', bench: bench.name, seats: bench.seats });
  return w;
}
