import { triage, type Level, type TriageBench } from './engine';

export interface PlanItem {
  id: string;
  /** The slot the item was booked into (walk-ins: the slot they arrived in). */
  slotIndex: number;
  skill: string;
  minLevel: Level;
  equipment: string[];
  minutes: number;
  walkIn?: boolean;
  /** Order within the slot (booking time). */
  order: number;
}
export interface PlanVolunteer {
  id: string;
  skills: Record<string, Level>;
  benchId?: string;
  capacity?: number;
  from: Date;
  to: Date;
}
export interface PlanSlot {
  id: string;
  startsAt: Date;
  endsAt: Date;
}
/** A fixer and bench already taken (a locked placement) from one round up to, not including, another. */
export interface Reserved {
  volunteerId: string;
  benchId: string;
  fromRound: number;
  untilRound: number;
}

export interface DayPlan {
  rounds: {
    slotId: string;
    startsAt: Date;
    assignments: { itemId: string; volunteerId: string; benchId: string }[];
    waiting: string[];
  }[];
  /** When each item is expected to reach a bench; null when the day ends first. */
  start: Record<string, Date | null>;
  placement: Record<string, { volunteerId: string; benchId: string } | null>;
}

/**
 * A plan for the whole event, one triage round per slot. An item joins the queue in its slot and waits, round
 * after round, until a compatible fixer and bench are free; booked items go before walk-ins, earlier slots
 * before later ones. A repair keeps its fixer and bench busy for as many slots as its minutes need.
 */
export function dayPlan(input: {
  slots: PlanSlot[];
  items: PlanItem[];
  volunteers: PlanVolunteer[];
  benches: TriageBench[];
  reserved?: Reserved[];
}): DayPlan {
  const slots = [...input.slots].sort((a, b) => a.startsAt.getTime() - b.startsAt.getTime());
  const busyVolunteer = new Map<string, number[]>(); // release round of each item in progress
  const busyBench = new Map<string, number[]>();
  const placed = new Set<string>();
  const plan: DayPlan = { rounds: [], start: {}, placement: {} };
  const priority = (i: PlanItem) => (i.walkIn ? 1_000_000 : 0) + i.slotIndex * 1000 + i.order;
  const held = (r: number, key: 'volunteerId' | 'benchId', id: string) =>
    (input.reserved ?? []).filter((x) => x[key] === id && x.fromRound <= r && r < x.untilRound).length;

  slots.forEach((slot, r) => {
    const release = (m: Map<string, number[]>) =>
      m.forEach((list, k) =>
        m.set(
          k,
          list.filter((until) => until > r),
        ),
      );
    release(busyVolunteer);
    release(busyBench);
    const slotMinutes = (slot.endsAt.getTime() - slot.startsAt.getTime()) / 60_000;
    const waiting = input.items.filter((i) => i.slotIndex <= r && !placed.has(i.id));
    const present = input.volunteers
      .filter((v) => v.from.getTime() <= slot.startsAt.getTime() && v.to.getTime() >= slot.endsAt.getTime())
      .map((v) => ({
        id: v.id,
        skills: v.skills,
        benchId: v.benchId,
        capacity: Math.max(
          0,
          (v.capacity ?? 1) - (busyVolunteer.get(v.id)?.length ?? 0) - held(r, 'volunteerId', v.id),
        ),
      }));
    const benches = input.benches.map((b) => ({
      ...b,
      seats: Math.max(0, b.seats - (busyBench.get(b.id)?.length ?? 0) - held(r, 'benchId', b.id)),
    }));
    const result = triage({
      items: waiting.map((i) => ({
        id: i.id,
        skill: i.skill,
        minLevel: i.minLevel,
        equipment: i.equipment,
        priority: priority(i),
      })),
      volunteers: present,
      benches,
    });
    for (const a of result.assignments) {
      const item = input.items.find((i) => i.id === a.itemId)!;
      const until = r + Math.max(1, Math.ceil(item.minutes / slotMinutes));
      busyVolunteer.set(a.volunteerId, [...(busyVolunteer.get(a.volunteerId) ?? []), until]);
      busyBench.set(a.benchId, [...(busyBench.get(a.benchId) ?? []), until]);
      placed.add(a.itemId);
      plan.start[a.itemId] = slot.startsAt;
      plan.placement[a.itemId] = { volunteerId: a.volunteerId, benchId: a.benchId };
    }
    plan.rounds.push({
      slotId: slot.id,
      startsAt: slot.startsAt,
      assignments: result.assignments,
      waiting: result.unassigned.map((u) => u.itemId),
    });
  });
  for (const i of input.items) {
    plan.start[i.id] ??= null;
    plan.placement[i.id] ??= null;
  }
  return plan;
}
