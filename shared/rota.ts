/** Who covers which skill when: the organiser's rota, as pure arithmetic on shifts and slots. */
export interface RotaShift {
  userId: number;
  name: string;
  startsAt: Date;
  endsAt: Date;
  skills: Record<string, number>;
}
export interface RotaSlot {
  startsAt: Date;
  endsAt: Date;
}
export interface Coverage {
  startsAt: Date;
  endsAt: Date;
  /** Fixers present for the whole slot, per skill (any level). */
  bySkill: Record<string, number>;
  fixers: number;
}

const covers = (s: RotaShift, slot: RotaSlot) =>
  s.startsAt.getTime() <= slot.startsAt.getTime() && s.endsAt.getTime() >= slot.endsAt.getTime();

export function coverage(shifts: RotaShift[], slots: RotaSlot[], skills: readonly string[]): Coverage[] {
  return slots.map((slot) => {
    const present = shifts.filter((s) => covers(s, slot));
    const bySkill = Object.fromEntries(skills.map((k) => [k, present.filter((s) => (s.skills[k] ?? 0) > 0).length]));
    return { startsAt: slot.startsAt, endsAt: slot.endsAt, bySkill, fixers: present.length };
  });
}

export interface Gap {
  skill: string;
  from: Date;
  to: Date;
  /** Items booked in those slots that need the skill. */
  items: number;
}

/** Runs of slots where items needing a skill are booked but no fixer with that skill is present. */
export function gaps(
  cover: Coverage[],
  demand: { slotIndex: number; skill: string }[],
  skills: readonly string[],
): Gap[] {
  const out: Gap[] = [];
  for (const skill of skills) {
    let open: Gap | null = null;
    cover.forEach((c, i) => {
      const wanted = demand.filter((d) => d.slotIndex === i && d.skill === skill).length;
      if (wanted > 0 && c.bySkill[skill] === 0) {
        if (open && open.to.getTime() === c.startsAt.getTime()) {
          open.to = c.endsAt;
          open.items += wanted;
        } else {
          open = { skill, from: c.startsAt, to: c.endsAt, items: wanted };
          out.push(open);
        }
      }
    });
  }
  return out.sort((a, b) => a.from.getTime() - b.from.getTime() || a.skill.localeCompare(b.skill));
}
