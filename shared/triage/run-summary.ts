import { z } from 'zod';
import { EQUIPMENT_LABELS, SKILL_LABELS, type Equipment, type Skill } from '../constants';
import { SKILL_LEVEL_WORDS, skillNeedPhrase } from './skill-words';
import { explainAgain } from './engine';
import { storedWhy, type WaitingWhy } from './waiting';

/** Why the engine left an item waiting, in the organiser's words (the detail line says who or what was missing). */
export const WAITING_REASON_LABELS: Record<string, string> = {
  'no-skill': 'No fixer with the skill',
  'no-equipment': 'No bench with the kit',
  'no-pair': 'Skill and kit never meet',
  capacity: 'Waiting for a free place',
};

/* A stored run's input and result, read loosely: runs are kept as they were, and older ones may lack a field. */
const id = z.union([z.string(), z.number()]).transform(String);
const level = z.coerce.number().catch(0);
const storedInput = z.object({
  slots: z.array(z.object({ id, startsAt: z.coerce.date() })).optional(),
  items: z.array(
    z.object({
      id,
      skill: z.string(),
      minLevel: level,
      equipment: z.array(z.string()).catch([]),
      slotIndex: z.number().optional(),
    }),
  ),
  volunteers: z.array(
    z.object({
      id,
      name: z.string().optional(),
      skills: z.record(z.string(), level).catch({}),
      benchId: id.optional(),
      from: z.coerce.date().optional(),
      to: z.coerce.date().optional(),
    }),
  ),
  benches: z.array(z.object({ id, name: z.string().optional(), seats: z.number(), equipment: z.array(z.string()) })),
  reserved: z.array(z.object({ volunteerId: id })).optional(),
});
const storedResult = z.object({
  assignments: z.array(z.object({ itemId: id, volunteerId: id, benchId: id })),
  unassigned: z.array(z.looseObject({ itemId: id, reason: z.string(), detail: z.string().catch('') })),
});

/**
 * Why each item of a stored run waits, as a code and values: as the run stored them, or, for a run stored before
 * reasons kept their values, worked out again from the run's input. Null when neither can be read.
 */
export function storedReasons(input: unknown): (entry: unknown) => WaitingWhy | null {
  let parsed: z.infer<typeof storedInput> | null | undefined;
  return (entry) => {
    const why = storedWhy(entry);
    if (why) return why;
    const itemId = (entry as { itemId?: unknown } | null)?.itemId;
    if (typeof itemId !== 'string' && typeof itemId !== 'number') return null;
    if (parsed === undefined) {
      const i = storedInput.safeParse(input);
      parsed = i.success ? i.data : null;
    }
    return parsed && explainAgain(parsed, String(itemId));
  };
}

export interface RunSummary {
  /** The whole session planned slot by slot, or one slot's round. */
  scope: 'day' | 'slot';
  /**
   * The English `needs`, `kit`, `skills` and `rules` come with their codes and values (`skill`, `minLevel`,
   * `equipment`, `skillLevels`, `scope` and `lockedKept`) for the screen to word in the reader's language.
   */
  items: {
    id: string;
    label: string;
    slotStartsAt: Date | null;
    needs: string;
    kit: string;
    skill: string;
    minLevel: number;
    equipment: string[];
  }[];
  fixers: {
    id: string;
    name: string;
    skills: string;
    skillLevels: { skill: string; level: number }[];
    from: Date | null;
    to: Date | null;
    seat: string | null;
    seatId: string | null;
  }[];
  benches: { id: string; name: string; seats: number; kit: string; equipment: string[] }[];
  /** The rules the run kept, in English sentences; the screen words them from `scope` and `lockedKept`. */
  rules: string[];
  /** How many placements were locked or already at the bench, and so kept. */
  lockedKept: number;
  /** The ids of the items, fixers and benches named as the board names them; the rest are known by their number. */
  given: { items: string[]; fixers: string[]; benches: string[] };
  placed: { itemId: string; item: string; fixerId: string; fixer: string; benchId: string; bench: string }[];
  /**
   * `reason` and `detail` are in English, as the run stored them; `code` is the reason's code and `why` the same
   * as a code and values.
   */
  waiting: { itemId: string; item: string; code: string; reason: string; detail: string; why: WaitingWhy | null }[];
}

const skillLabel = (s: string) => SKILL_LABELS[s as Skill] ?? s;
const kitOf = (e: string[]) => e.map((x) => EQUIPMENT_LABELS[x as Equipment] ?? x).join(', ');

/**
 * A triage run as sentences and tables: what went in (items, fixers, benches, the rules) and what came out (who
 * takes which item at which bench, and why the rest wait). `labels` names the items as the board does ("Kettle —
 * Brava K200 · K7M-2QD"); an item since deleted keeps its number. Answers null when the stored run cannot be read.
 */
export function summariseRun(
  input: unknown,
  result: unknown,
  labels: ReadonlyMap<string, string>,
  lockedKept: number,
): RunSummary | null {
  const i = storedInput.safeParse(input);
  const r = storedResult.safeParse(result);
  if (!i.success || !r.success) return null;
  const { items, volunteers, benches, slots } = i.data;
  const scope = slots ? 'day' : 'slot';
  const whyOf = storedReasons(input);
  const itemName = (x: string) => labels.get(x) ?? `Item ${x}`;
  const fixerName = new Map(volunteers.map((v) => [v.id, v.name ?? `Fixer ${v.id}`]));
  const benchName = new Map(benches.map((b) => [b.id, b.name ?? `Bench ${b.id}`]));
  const rules = [
    'Each item goes to a fixer who has its skill at the level it needs, at a bench with all the kit it needs.',
    'A fixer takes one item at a time, and a bench as many as it has seats; a fixer seated at a bench works only there.',
    scope === 'day'
      ? 'The session is planned slot by slot: an item joins the queue in its own slot and waits until a fixer and bench are free; a repair keeps them for its minutes. Earlier bookings go first, walk-ins after the booked.'
      : 'Only the items booked into this slot, and only the fixers whose shift covers the whole slot; whatever is already placed at this time keeps its fixer and bench.',
    'Among the ways to place the most items, experts are kept free for the items only they can take.',
    lockedKept === 0
      ? 'No placement was locked, so every item could move.'
      : `${lockedKept} placement${lockedKept === 1 ? ' was' : 's were'} locked or already at the bench: ${lockedKept === 1 ? 'it stayed' : 'they stayed'} where ${lockedKept === 1 ? 'it was' : 'they were'} and kept ${lockedKept === 1 ? 'its' : 'their'} fixer and bench busy.`,
  ];
  return {
    scope,
    items: items.map((x) => ({
      id: x.id,
      label: itemName(x.id),
      slotStartsAt: slots && x.slotIndex !== undefined ? (slots[x.slotIndex]?.startsAt ?? null) : null,
      needs: skillNeedPhrase(skillLabel(x.skill), x.minLevel),
      kit: kitOf(x.equipment),
      skill: x.skill,
      minLevel: x.minLevel,
      equipment: x.equipment,
    })),
    fixers: volunteers.map((v) => {
      const skillLevels = Object.entries(v.skills)
        .filter(([, l]) => l > 0)
        .sort((a, b) => b[1] - a[1] || skillLabel(a[0]).localeCompare(skillLabel(b[0])))
        .map(([skill, l]) => ({ skill, level: Math.min(3, l) }));
      return {
        id: v.id,
        name: fixerName.get(v.id)!,
        skills:
          skillLevels.map((x) => `${skillLabel(x.skill)} (${SKILL_LEVEL_WORDS[x.level]})`).join(', ') ||
          'no skills given',
        skillLevels,
        from: v.from ?? null,
        to: v.to ?? null,
        seat: v.benchId ? (benchName.get(v.benchId) ?? `Bench ${v.benchId}`) : null,
        seatId: v.benchId ?? null,
      };
    }),
    benches: benches.map((b) => ({
      id: b.id,
      name: benchName.get(b.id)!,
      seats: b.seats,
      kit: kitOf(b.equipment),
      equipment: b.equipment,
    })),
    rules,
    lockedKept,
    given: {
      items: [
        ...new Set([...items.map((x) => x.id), ...[...r.data.assignments, ...r.data.unassigned].map((x) => x.itemId)]),
      ].filter((x) => labels.has(x)),
      fixers: volunteers.filter((v) => v.name !== undefined).map((v) => v.id),
      benches: benches.filter((b) => b.name !== undefined).map((b) => b.id),
    },
    placed: r.data.assignments
      .map((a) => ({
        itemId: a.itemId,
        item: itemName(a.itemId),
        fixerId: a.volunteerId,
        fixer: fixerName.get(a.volunteerId) ?? `Fixer ${a.volunteerId}`,
        benchId: a.benchId,
        bench: benchName.get(a.benchId) ?? `Bench ${a.benchId}`,
      }))
      .sort((a, b) => a.fixer.localeCompare(b.fixer)),
    waiting: r.data.unassigned.map((u) => ({
      itemId: u.itemId,
      item: itemName(u.itemId),
      code: u.reason,
      reason: WAITING_REASON_LABELS[u.reason] ?? u.reason,
      detail: u.detail,
      why: whyOf(u),
    })),
  };
}
