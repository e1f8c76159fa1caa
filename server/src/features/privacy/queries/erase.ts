import { and, eq, inArray, isNull, lt, or, sql } from 'drizzle-orm';
import type { DbOrTx, Tx } from '../../../db/client';
import {
  bookingItems,
  bookings,
  events,
  followUps,
  itemOutcomes,
  itemPhotos,
  itemStatusChanges,
  knowledgeEntries,
  mailboxMessages,
  outbox,
  rateLimits,
  repairGroups,
  waitlistEntries,
} from '../../../db/schema/index';

export type BookingRow = typeof bookings.$inferSelect;

export const bookingByReference = async (db: DbOrTx, reference: string) =>
  (await db.select().from(bookings).where(eq(bookings.reference, reference)))[0];

export const lockBookingRow = async (tx: Tx, bookingId: number) =>
  (await tx.select().from(bookings).where(eq(bookings.id, bookingId)).for('update'))[0];

export const groupOfEvent = async (db: DbOrTx, eventId: number) =>
  (await db.select({ groupId: events.groupId }).from(events).where(eq(events.id, eventId)))[0]?.groupId;

export const itemsOfBooking = (db: DbOrTx, bookingId: number) =>
  db.select().from(bookingItems).where(eq(bookingItems.bookingId, bookingId));

/** Rewrites one text column of the rows given, through `f`; rows whose text does not change are left alone. */
async function rewrite<T extends { id: number; text: string | null }>(
  rows: T[],
  f: (s: string) => string,
  write: (id: number, text: string) => Promise<unknown>,
) {
  for (const r of rows) if (r.text !== null && f(r.text) !== r.text) await write(r.id, f(r.text));
}

/** Scrubs the free text kept about these items; answers the storage keys of their photos, whose rows are gone. */
export async function scrubItems(tx: Tx, itemIds: number[], f: (s: string) => string): Promise<string[]> {
  if (!itemIds.length) return [];
  const items = await tx
    .select({ id: bookingItems.id, text: bookingItems.fault })
    .from(bookingItems)
    .where(inArray(bookingItems.id, itemIds));
  await rewrite(items, f, (id, fault) => tx.update(bookingItems).set({ fault }).where(eq(bookingItems.id, id)));
  const changes = await tx
    .select({ id: itemStatusChanges.id, text: itemStatusChanges.note })
    .from(itemStatusChanges)
    .where(inArray(itemStatusChanges.itemId, itemIds));
  await rewrite(changes, f, (id, note) =>
    tx.update(itemStatusChanges).set({ note }).where(eq(itemStatusChanges.id, id)),
  );
  const outcomes = await tx
    .select({ id: itemOutcomes.itemId, text: itemOutcomes.notes })
    .from(itemOutcomes)
    .where(inArray(itemOutcomes.itemId, itemIds));
  await rewrite(outcomes, f, (id, notes) => tx.update(itemOutcomes).set({ notes }).where(eq(itemOutcomes.itemId, id)));
  const notes = await tx
    .select({ id: followUps.itemId, text: followUps.note })
    .from(followUps)
    .where(inArray(followUps.itemId, itemIds));
  await rewrite(notes, f, (id, note) => tx.update(followUps).set({ note }).where(eq(followUps.itemId, id)));
  const entries = await tx.select().from(knowledgeEntries).where(inArray(knowledgeEntries.itemId, itemIds));
  for (const e of entries) {
    const next = { symptom: f(e.symptom), notes: f(e.notes), measured: f(e.measured), fix: f(e.fix) };
    if (Object.entries(next).some(([k, v]) => v !== e[k as keyof typeof next]))
      await tx.update(knowledgeEntries).set(next).where(eq(knowledgeEntries.itemId, e.itemId));
  }
  const photos = await tx
    .select({ id: itemPhotos.id, key: itemPhotos.storageKey })
    .from(itemPhotos)
    .where(inArray(itemPhotos.itemId, itemIds));
  if (photos.length)
    await tx.delete(itemPhotos).where(
      inArray(
        itemPhotos.id,
        photos.map((p) => p.id),
      ),
    );
  return photos.map((p) => p.key);
}

/** Waiting-list entries of this visitor: the one that became the booking, and their others for the same session. */
export const waitlistOfVisitor = (db: DbOrTx, b: BookingRow) =>
  db
    .select()
    .from(waitlistEntries)
    .where(
      or(
        eq(waitlistEntries.bookingId, b.id),
        b.visitorEmail
          ? and(eq(waitlistEntries.eventId, b.eventId), eq(waitlistEntries.visitorEmail, b.visitorEmail))
          : undefined,
      ),
    );

export type WaitlistRow = typeof waitlistEntries.$inferSelect;

export async function eraseWaitlistEntry(tx: Tx, w: WaitlistRow, name: string, f: (s: string) => string) {
  const request = {
    visitor: { name, email: '' },
    items: w.request.items.map((i) => ({ ...i, fault: f(i.fault) })),
  };
  await tx
    .update(waitlistEntries)
    .set({ visitorName: name, visitorEmail: '', request })
    .where(eq(waitlistEntries.id, w.id));
}

/**
 * Mail to the address about this booking (its text names the reference), or sent before an instant, is dropped:
 * what is still queued is never sent, and the kept copies of what went out go too. Answers how many were queued.
 */
export async function dropMailTo(tx: Tx, email: string, scope: { reference: string } | { before: Date }) {
  const about =
    'reference' in scope ? sql`LOCATE(${scope.reference}, ${outbox.text}) > 0` : lt(outbox.createdAt, scope.before);
  const queued = await tx
    .select({ id: outbox.id })
    .from(outbox)
    .where(and(eq(outbox.toAddress, email), eq(outbox.status, 'pending'), about));
  await tx.delete(outbox).where(and(eq(outbox.toAddress, email), about));
  await tx
    .delete(mailboxMessages)
    .where(
      and(
        sql`LOCATE(${email.toLowerCase()}, LOWER(${mailboxMessages.toAddress})) > 0`,
        'reference' in scope
          ? sql`LOCATE(${scope.reference}, COALESCE(${mailboxMessages.text}, ${mailboxMessages.raw})) > 0`
          : lt(mailboxMessages.receivedAt, scope.before),
      ),
    );
  // Rate-limit counters may be keyed by the address.
  await tx.delete(rateLimits).where(sql`LOCATE(${email.toLowerCase()}, LOWER(${rateLimits.key})) > 0`);
  return queued.length;
}

export async function markBookingErased(tx: Tx, bookingId: number, name: string, tokenHash: string) {
  await tx
    .update(bookings)
    .set({
      visitorName: name,
      visitorEmail: null,
      visitorPhone: null,
      consentName: null,
      manageTokenHash: tokenHash,
      anonymisedAt: new Date(),
    })
    .where(eq(bookings.id, bookingId));
}

/** Groups whose retention job is due: never run, or last run a day ago or more. */
export const groupsDueForRetention = (db: DbOrTx, now: Date) =>
  db
    .select({ id: repairGroups.id, months: repairGroups.retentionMonths })
    .from(repairGroups)
    .where(
      or(isNull(repairGroups.retentionRanAt), lt(repairGroups.retentionRanAt, new Date(now.getTime() - 24 * 3600_000))),
    );

/** Takes the group's row unless another process holds it (that one is running the job). */
export const claimGroup = async (tx: Tx, groupId: number) =>
  (
    await tx
      .select({ id: repairGroups.id, ranAt: repairGroups.retentionRanAt })
      .from(repairGroups)
      .where(eq(repairGroups.id, groupId))
      .for('update', { skipLocked: true })
  )[0];

/** Bookings of the group's sessions that ended before the cutoff and still hold personal data. */
export const bookingsPastRetention = (tx: Tx, groupId: number, cutoff: Date) =>
  tx
    .select({ booking: bookings })
    .from(bookings)
    .innerJoin(events, eq(events.id, bookings.eventId))
    .where(and(eq(events.groupId, groupId), lt(events.endsAt, cutoff), isNull(bookings.anonymisedAt)));

/** Waiting-list entries of those sessions that still hold a name (people who never got a place). */
export const waitlistPastRetention = (tx: Tx, groupId: number, cutoff: Date) =>
  tx
    .select({ entry: waitlistEntries })
    .from(waitlistEntries)
    .innerJoin(events, eq(events.id, waitlistEntries.eventId))
    .where(and(eq(events.groupId, groupId), lt(events.endsAt, cutoff), sql`${waitlistEntries.visitorEmail} <> ''`));

export async function recordRetentionRun(tx: Tx, groupId: number, at: Date, anonymised: number) {
  await tx
    .update(repairGroups)
    .set({ retentionRanAt: at, retentionAnonymised: anonymised })
    .where(eq(repairGroups.id, groupId));
}

export const groupForNotice = async (db: DbOrTx, groupId: number) =>
  (
    await db
      .select({
        name: repairGroups.name,
        retentionMonths: repairGroups.retentionMonths,
        contactEmail: repairGroups.contactEmail,
      })
      .from(repairGroups)
      .where(eq(repairGroups.id, groupId))
  )[0];
