import { eq } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { events } from '../db/schema/index';

/** The group of an event, for the role guards (0 when there is no such event, which the guards refuse). */
export async function eventGroupId(db: DbOrTx, eventId: number): Promise<number> {
  if (!Number.isInteger(eventId) || eventId <= 0) return 0;
  const [row] = await db.select({ groupId: events.groupId }).from(events).where(eq(events.id, eventId));
  return row?.groupId ?? 0;
}
