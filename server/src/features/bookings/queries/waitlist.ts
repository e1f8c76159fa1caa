import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import type { DbOrTx, Tx } from '../../../db/client';
import { waitlistEntries } from '../../../db/schema/index';
import { sha256 } from '../../../auth/tokens';

export const waitingInLine = (tx: Tx, slotId: number) =>
  tx
    .select()
    .from(waitlistEntries)
    .where(and(eq(waitlistEntries.slotId, slotId), eq(waitlistEntries.status, 'waiting')))
    .orderBy(asc(waitlistEntries.id))
    .for('update');

export async function markOffered(tx: Tx, entryId: number, claimTokenHash: string, expires: Date) {
  await tx
    .update(waitlistEntries)
    .set({ status: 'offered', claimTokenHash, offeredAt: new Date(), offerExpiresAt: expires })
    .where(eq(waitlistEntries.id, entryId));
}

export async function markClaimed(tx: Tx, entryId: number, bookingId: number) {
  await tx.update(waitlistEntries).set({ status: 'claimed', bookingId }).where(eq(waitlistEntries.id, entryId));
}

export async function insertWaitlistEntry(tx: Tx, entry: typeof waitlistEntries.$inferInsert) {
  await tx.insert(waitlistEntries).values(entry);
}

/** How many are waiting or have an open offer for a slot: the newcomer's place in line. */
export async function lineLength(tx: DbOrTx, slotId: number) {
  const [{ n }] = await tx
    .select({ n: sql<number>`COUNT(*)` })
    .from(waitlistEntries)
    .where(and(eq(waitlistEntries.slotId, slotId), inArray(waitlistEntries.status, ['waiting', 'offered'])));
  return Number(n);
}

export async function offerByToken(tx: Tx, token: string, lock: boolean) {
  const q = tx
    .select()
    .from(waitlistEntries)
    .where(eq(waitlistEntries.claimTokenHash, sha256(token)));
  const [w] = lock ? await q.for('update') : await q;
  return w;
}
