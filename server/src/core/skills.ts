import { inArray } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { volunteerSkills } from '../db/schema/index';

/** Each volunteer's skill levels (1–3), for the skills pages and the triage engine. */
export async function skillsOf(db: DbOrTx, userIds: number[]): Promise<Map<number, Record<string, 1 | 2 | 3>>> {
  const map = new Map<number, Record<string, 1 | 2 | 3>>(userIds.map((id) => [id, {}]));
  if (!userIds.length) return map;
  for (const r of await db.select().from(volunteerSkills).where(inArray(volunteerSkills.userId, userIds)))
    map.get(r.userId)![r.skill] = r.level as 1 | 2 | 3;
  return map;
}
