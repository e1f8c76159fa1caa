import { asc, eq } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { events, repairGroups, slots } from '../db/schema/index';

/** The group of an event, for the role guards (0 when there is no such event, which the guards refuse). */
export async function eventGroupId(db: DbOrTx, eventId: number): Promise<number> {
  if (!Number.isInteger(eventId) || eventId <= 0) return 0;
  const [row] = await db.select({ groupId: events.groupId }).from(events).where(eq(events.id, eventId));
  return row?.groupId ?? 0;
}

/** A session with its group: what the desk, the hall display, triage, the rota and reports all start from. */
export async function eventWithGroup(db: DbOrTx, eventId: number) {
  const [e] = await db
    .select({ event: events, group: repairGroups })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(eq(events.id, eventId));
  return e;
}

/** A session's slots, earliest first. */
export const slotsOfEvent = (db: DbOrTx, eventId: number) =>
  db.select().from(slots).where(eq(slots.eventId, eventId)).orderBy(asc(slots.startsAt));
