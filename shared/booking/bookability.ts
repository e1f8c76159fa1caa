import type { Skill } from '../constants';
import { freePlaces } from './slots';

/**
 * What a time slot looks like to a new booking: its hours, its places, and per kind of repair (skill) how many
 * items the fixers can take at this time and how many are already booked. Dates may be `Date`s (server) or the
 * ISO strings JSON carries (client).
 */
export interface SlotState {
  startsAt: Date | string;
  endsAt: Date | string;
  capacity: number;
  booked: number;
  held?: number;
  /** At most this many items of a skill per slot (the event's limits); a skill not listed has no limit. */
  skillLimits: Partial<Record<Skill, number>>;
  /** Items of each skill already booked in this slot. */
  skillTaken: Partial<Record<Skill, number>>;
}

export type Bookability =
  | { ok: true; free: number }
  | { ok: false; reason: 'past'; message: string; short: string }
  /** Not enough places for all the items: the whole booking may join the waiting list. */
  | { ok: false; reason: 'full'; free: number; message: string; short: string }
  /** A kind's limit would be passed: the whole booking is refused at this time (never half wait-listed). */
  | {
      ok: false;
      reason: 'skill-full';
      skill: Skill;
      limit: number;
      left: number;
      wanted: number;
      message: string;
      short: string;
    };

/** The kind of repair as the start of a sentence on a time tile: "Textile repairs are full at this time". */
const REPAIR_WORD: Record<Skill, string> = {
  electrical: 'Electrical',
  electronics: 'Electronics',
  computers: 'Computer',
  phones: 'Phone and tablet',
  textiles: 'Textile',
  bikes: 'Bike',
  woodwork: 'Woodwork',
  toys: 'Toy',
  jewellery: 'Jewellery',
  mechanical: 'Mechanical',
};

const time = (d: Date | string) => (typeof d === 'string' ? new Date(d).getTime() : d.getTime());

/** A time whose end has passed can no longer be booked (a time under way still can). */
export const slotHasPassed = (slot: Pick<SlotState, 'endsAt'>, now: Date) => time(slot.endsAt) <= now.getTime();

export const countSkills = (skills: readonly Skill[]) =>
  skills.reduce((m, s) => m.set(s, (m.get(s) ?? 0) + 1), new Map<Skill, number>());

/** The server's answer when a kind's limit is passed; the tile says the same in short. */
export function skillFullMessage(skill: Skill, limit: number, left: number, wanted: number) {
  return `At this time the fixers can take ${limit} ${skill} item${limit === 1 ? '' : 's'}; ${left === 0 ? 'none is left' : `only ${left} ${left === 1 ? 'is' : 'are'} left`} and you are booking ${wanted}. Choose another time${wanted > 1 ? ', or book fewer of them here' : ''}.`;
}

/**
 * Can this slot take these items (one skill per item) now? The checks run in the order a visitor would want to
 * hear them: a time that has passed, then a kind whose limit is reached (refused, for all the items alike), then
 * places (a full time can be waited for). `spare` lets a return visit go one over the capacity and the limits.
 * With no items yet, only time and places count, so the tile shows what any first item would meet.
 */
export function slotBookability(
  slot: SlotState,
  itemSkills: readonly Skill[],
  now: Date,
  opts: { spare?: number } = {},
): Bookability {
  const spare = opts.spare ?? 0;
  if (slotHasPassed(slot, now))
    return { ok: false, reason: 'past', message: 'That time has already passed.', short: 'Already passed' };
  for (const [skill, wanted] of countSkills(itemSkills)) {
    const base = slot.skillLimits[skill];
    if (base === undefined) continue;
    const limit = base + spare;
    const left = Math.max(0, limit - (slot.skillTaken[skill] ?? 0));
    if (wanted > left)
      return {
        ok: false,
        reason: 'skill-full',
        skill,
        limit,
        left,
        wanted,
        message: skillFullMessage(skill, limit, left, wanted),
        short:
          left === 0
            ? `${REPAIR_WORD[skill]} repairs are full at this time`
            : `Only ${left} ${REPAIR_WORD[skill].toLowerCase()} ${left === 1 ? 'place' : 'places'} left at this time`,
      };
  }
  const free = Math.max(0, freePlaces(slot) + spare);
  const wanted = Math.max(1, itemSkills.length);
  if (wanted > free)
    return {
      ok: false,
      reason: 'full',
      free,
      message: 'That time is fully booked. Choose another time, or join its waiting list.',
      short: free === 0 ? 'full · wait' : `${free} free · wait`,
    };
  return { ok: true, free };
}
