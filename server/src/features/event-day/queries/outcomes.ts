import { and, desc, eq } from 'drizzle-orm';
import type { DbOrTx, Tx } from '../../../db/client';
import { itemAssignments, itemOutcomes, safetyChecks, shifts } from '../../../db/schema/index';

export async function assignmentOf(db: DbOrTx, itemId: number) {
  const [a] = await db.select().from(itemAssignments).where(eq(itemAssignments.itemId, itemId));
  return a;
}

/** The bench of a fixer's shift at the event, if the rota seated them. */
export async function shiftBenchOf(tx: Tx, eventId: number, userId: number) {
  const [s] = await tx
    .select({ benchId: shifts.benchId })
    .from(shifts)
    .where(and(eq(shifts.eventId, eventId), eq(shifts.userId, userId)));
  return s?.benchId ?? undefined;
}

/** The item becomes this fixer's at this bench, by hand and locked, so a re-plan leaves it. */
export async function placeByHand(
  tx: Tx,
  p: { itemId: number; eventId: number; userId: number; benchId: number; startsAt: Date },
) {
  const values = { ...p, locked: true, source: 'hand' as const };
  await tx
    .insert(itemAssignments)
    .values(values)
    .onDuplicateKeyUpdate({
      set: {
        userId: p.userId,
        benchId: p.benchId,
        startsAt: p.startsAt,
        locked: true,
        source: 'hand',
        runId: null,
        updatedAt: new Date(),
      },
    });
}

export async function insertSafetyCheck(tx: Tx, values: typeof safetyChecks.$inferInsert) {
  const [{ id }] = await tx.insert(safetyChecks).values(values).$returningId();
  return id;
}

export async function latestCheckOf(tx: Tx, itemId: number) {
  const [c] = await tx
    .select()
    .from(safetyChecks)
    .where(eq(safetyChecks.itemId, itemId))
    .orderBy(desc(safetyChecks.id))
    .limit(1);
  return c;
}

/** One outcome row per item: recording again corrects it. */
export async function saveOutcome(tx: Tx, itemId: number, values: Omit<typeof itemOutcomes.$inferInsert, 'itemId'>) {
  await tx
    .insert(itemOutcomes)
    .values({ itemId, ...values })
    .onDuplicateKeyUpdate({ set: values });
}
