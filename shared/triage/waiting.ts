/**
 * Why an item waits, as a code and the values a sentence needs: the screen words it in the reader's language
 * (client/src/features/triage/wording.ts). Skills and kinds of kit are their slugs; fixers are named as the run knew
 * them.
 */
export type WaitingWhy =
  /** Nobody present has the skill at `level` or above. */
  | { reason: 'no-skill'; skill: string; level: number }
  /** `missing`: kit no bench has at all; when empty, each kind exists but no single bench has all of `kit`. */
  | { reason: 'no-equipment'; missing: string[]; kit: string[] }
  /** The `fixers` who have the skill are all seated at benches without the item's `kit`. */
  | { reason: 'no-pair'; skill: string; fixers: string[]; kit: string[] }
  /** A fixer and a bench exist but are busy: in this round, or (`allDay`) in every slot until closing time. */
  | { reason: 'capacity'; allDay?: boolean };

export type WaitingReason = WaitingWhy['reason'];

const list = (words: string[]) =>
  words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`;
const kit = (e: string) => e.replace(/-/g, ' ');
const levelWord = (n: number) => (n >= 3 ? 'expert' : n === 2 ? 'capable' : 'learning');

/**
 * The English sentence a run stores beside the code, for the record (the "technical details" of a run show it, and
 * runs stored before the codes had only this). Screens word the code instead.
 */
export function waitingDetail(why: WaitingWhy): string {
  switch (why.reason) {
    case 'no-skill':
      return `Nobody here has ${why.skill} at level ${why.level} (${levelWord(why.level)}) or above.`;
    case 'no-equipment':
      return why.missing.length
        ? `No bench has a ${list(why.missing.map(kit))}.`
        : `No single bench has all of: ${list(why.kit.map(kit))}.`;
    case 'no-pair': {
      const many = why.fixers.length > 1;
      return `${list(why.fixers)} ${many ? 'have' : 'has'} the ${why.skill} skill but ${many ? 'are' : 'is'} seated at a bench without ${list(why.kit.map(kit))}; move a fixer or the kit.`;
    }
    case 'capacity':
      return why.allDay
        ? 'Every fixer and bench that could take it is busy in each slot from its booking to closing time.'
        : 'A fixer and a bench for it exist, but they are busy with other items (served first, or locked there); it waits for the next round.';
  }
}

const strings = (x: unknown): x is string[] => Array.isArray(x) && x.every((s) => typeof s === 'string');

/** The code and values of a stored reason, or null when it was stored before runs kept them (or is not one). */
export function storedWhy(u: unknown): WaitingWhy | null {
  if (typeof u !== 'object' || u === null) return null;
  const r = u as Record<string, unknown>;
  switch (r.reason) {
    case 'no-skill':
      return typeof r.skill === 'string' && typeof r.level === 'number'
        ? { reason: 'no-skill', skill: r.skill, level: r.level }
        : null;
    case 'no-equipment':
      return strings(r.missing) && strings(r.kit) ? { reason: 'no-equipment', missing: r.missing, kit: r.kit } : null;
    case 'no-pair':
      return typeof r.skill === 'string' && strings(r.fixers) && strings(r.kit)
        ? { reason: 'no-pair', skill: r.skill, fixers: r.fixers, kit: r.kit }
        : null;
    case 'capacity':
      return r.allDay === true ? { reason: 'capacity', allDay: true } : { reason: 'capacity' };
    default:
      return null;
  }
}
