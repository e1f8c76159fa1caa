/** A slot: a time window in which up to `capacity` items can start. */
export interface SlotPlan {
  startsAt: Date;
  endsAt: Date;
  capacity: number;
}

export const MAX_SLOTS_PER_EVENT = 96;

/**
 * Cuts the opening hours into back-to-back slots of `slotMinutes`. A remainder shorter than a slot at the end
 * is left out, so no slot runs past closing time.
 */
export function generateSlots(startsAt: Date, endsAt: Date, slotMinutes: number, capacity: number): SlotPlan[] {
  if (!(endsAt.getTime() > startsAt.getTime())) throw new RangeError('The event must end after it starts.');
  if (!Number.isInteger(slotMinutes) || slotMinutes <= 0)
    throw new RangeError('Slot length must be a whole number of minutes above zero.');
  if (!Number.isInteger(capacity) || capacity < 0) throw new RangeError('Slot capacity cannot be negative.');
  const step = slotMinutes * 60_000;
  const slots: SlotPlan[] = [];
  for (let t = startsAt.getTime(); t + step <= endsAt.getTime(); t += step) {
    slots.push({ startsAt: new Date(t), endsAt: new Date(t + step), capacity });
    if (slots.length > MAX_SLOTS_PER_EVENT)
      throw new RangeError(`At most ${MAX_SLOTS_PER_EVENT} slots per event: make the slots longer.`);
  }
  return slots;
}

export interface SlotLoad {
  capacity: number;
  booked: number;
  held?: number;
}

/** Places still open to a new booking; places held for someone on the waiting list are not free. */
export const freePlaces = (s: SlotLoad): number => Math.max(0, s.capacity - s.booked - (s.held ?? 0));
