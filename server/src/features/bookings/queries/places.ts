import { and, eq, sql } from 'drizzle-orm';
import type { DbOrTx, Tx } from '../../../db/client';
import { affectedRows } from '../../../db/retry';
import { slots, slotSkillCounts } from '../../../db/schema/index';

/**
 * Takes `n` places atomically: the UPDATE matches only while booked + held + n fits the capacity (plus `spare`).
 * With `fromHeld` the places held for a waiting-list offer turn into booked ones. Answers whether it took them.
 */
export async function takePlaces(tx: Tx, slotId: number, n: number, fromHeld: boolean, spare = 0) {
  const res = fromHeld
    ? await tx
        .update(slots)
        .set({ booked: sql`${slots.booked} + ${n}`, held: sql`${slots.held} - ${n}` })
        .where(and(eq(slots.id, slotId), sql`${slots.held} >= ${n}`))
    : await tx
        .update(slots)
        .set({ booked: sql`${slots.booked} + ${n}` })
        .where(and(eq(slots.id, slotId), sql`${slots.booked} + ${slots.held} + ${n} <= ${slots.capacity} + ${spare}`));
  return affectedRows(res) === 1;
}

/** Takes `n` items of one skill under its `limit`, the same conditional way; answers false with what is booked. */
export async function takeSkillPlaces(tx: Tx, slotId: number, skill: string, n: number, limit: number) {
  await tx
    .insert(slotSkillCounts)
    .values({ slotId, skill, booked: 0 })
    .onDuplicateKeyUpdate({ set: { booked: sql`${slotSkillCounts.booked}` } });
  const res = await tx
    .update(slotSkillCounts)
    .set({ booked: sql`${slotSkillCounts.booked} + ${n}` })
    .where(
      and(
        eq(slotSkillCounts.slotId, slotId),
        eq(slotSkillCounts.skill, skill),
        sql`${slotSkillCounts.booked} + ${n} <= ${limit}`,
      ),
    );
  if (affectedRows(res) === 1) return { ok: true as const };
  const [row] = await tx
    .select()
    .from(slotSkillCounts)
    .where(and(eq(slotSkillCounts.slotId, slotId), eq(slotSkillCounts.skill, skill)));
  return { ok: false as const, booked: row?.booked ?? 0 };
}

export async function releaseSkillPlaces(tx: Tx, slotId: number, perSkill: Map<string, number>) {
  for (const [skill, n] of perSkill) {
    await tx
      .update(slotSkillCounts)
      .set({ booked: sql`GREATEST(${slotSkillCounts.booked} - ${n}, 0)` })
      .where(and(eq(slotSkillCounts.slotId, slotId), eq(slotSkillCounts.skill, skill)));
  }
}

export async function releaseSlotPlaces(tx: Tx, slotId: number, places: number) {
  await tx
    .update(slots)
    .set({ booked: sql`GREATEST(${slots.booked} - ${places}, 0)` })
    .where(eq(slots.id, slotId));
}

export async function holdPlaces(tx: Tx, slotId: number, places: number) {
  await tx
    .update(slots)
    .set({ held: sql`${slots.held} + ${places}` })
    .where(eq(slots.id, slotId));
}

export async function lockSlot(tx: DbOrTx, slotId: number) {
  const [s] = await tx.select().from(slots).where(eq(slots.id, slotId)).for('update');
  return s;
}
