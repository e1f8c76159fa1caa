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

export interface PlacementWarning {
  code: 'missing-skill' | 'low-level' | 'missing-equipment' | 'seated-elsewhere' | 'over-capacity' | 'bench-full';
  message: string;
}

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
  const level = volunteer.skills[needs.skill] ?? 0;
  if (level === 0) w.push({ code: 'missing-skill', message: `${volunteer.name} has no ${needs.skill} skill.` });
  else if (level < needs.minLevel)
    w.push({
      code: 'low-level',
      message: `${volunteer.name} is at ${needs.skill} level ${level}; this item needs level ${needs.minLevel}.`,
    });
  const missing = needs.equipment.filter((e) => !bench.equipment.includes(e));
  if (missing.length)
    w.push({
      code: 'missing-equipment',
      message: `${bench.name} has no ${missing.map((m) => m.replace(/-/g, ' ')).join(', ')}.`,
    });
  if (volunteer.benchId != null && volunteer.benchId !== bench.id)
    w.push({ code: 'seated-elsewhere', message: `${volunteer.name} is seated at another bench.` });
  if (volunteer.assigned >= volunteer.capacity)
    w.push({
      code: 'over-capacity',
      message: `${volunteer.name} already has ${volunteer.assigned} item${volunteer.assigned === 1 ? '' : 's'}.`,
    });
  if (bench.assigned >= bench.seats)
    w.push({ code: 'bench-full', message: `${bench.name} has all ${bench.seats} seats taken.` });
  return w;
}
