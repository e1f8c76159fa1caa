import { randomBytes } from 'node:crypto';
import { and, desc, eq, inArray, isNull, lt, or, sql } from 'drizzle-orm';
import { formatReference } from '../../../../../shared/booking/reference';
import type { Outcome } from '../../../../../shared/event-day/constants';
import type { ImportedRecord } from '../../../../../shared/impact/ords-reader';
import type { Db, DbOrTx } from '../../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  importedRecords,
  importJobs,
  itemOutcomes,
  repairGroups,
  slots,
  venues,
} from '../../../db/schema/index';
import { affectedRows, isDuplicate } from '../../../db/retry';

export type ImportJob = typeof importJobs.$inferSelect;
/** What the job tables hold about a job, without the file. */
export const jobSummary = {
  id: importJobs.id,
  groupId: importJobs.groupId,
  scope: importJobs.scope,
  createdBy: importJobs.createdBy,
  fileName: importJobs.fileName,
  kind: importJobs.kind,
  status: importJobs.status,
  total: importJobs.total,
  imported: importJobs.imported,
  skipped: importJobs.skipped,
  position: importJobs.position,
  refusedCount: importJobs.refusedCount,
  refusals: importJobs.refusals,
  message: importJobs.message,
  createdAt: importJobs.createdAt,
  finishedAt: importJobs.finishedAt,
};

export async function insertJob(db: Db, values: typeof importJobs.$inferInsert): Promise<number> {
  const [{ id }] = await db.insert(importJobs).values(values).$returningId();
  return id;
}

export const jobById = async (db: DbOrTx, id: number) =>
  (await db.select(jobSummary).from(importJobs).where(eq(importJobs.id, id)))[0] ?? null;

export const recentJobs = (db: DbOrTx, groupId: number | null) =>
  db
    .select(jobSummary)
    .from(importJobs)
    .where(groupId === null ? eq(importJobs.scope, 'network') : eq(importJobs.groupId, groupId))
    .orderBy(desc(importJobs.id))
    .limit(10);

/**
 * Takes one job that is waiting, or running with a lapsed lease (its process stopped), for `leaseMs`. The
 * conditional update makes two processes that pick the same row take it once.
 */
export async function claimJob(db: Db, leaseMs: number): Promise<ImportJob | null> {
  const now = new Date();
  const open = or(
    eq(importJobs.status, 'queued'),
    and(eq(importJobs.status, 'running'), or(isNull(importJobs.leaseUntil), lt(importJobs.leaseUntil, now))),
  );
  const [candidate] = await db
    .select({ id: importJobs.id })
    .from(importJobs)
    .where(open)
    .orderBy(importJobs.id)
    .limit(1);
  if (!candidate) return null;
  const r = await db
    .update(importJobs)
    .set({ status: 'running', leaseUntil: new Date(now.getTime() + leaseMs) })
    .where(and(eq(importJobs.id, candidate.id), open));
  if (affectedRows(r) !== 1) return null;
  return (await db.select().from(importJobs).where(eq(importJobs.id, candidate.id)))[0] ?? null;
}

export const setJob = (db: DbOrTx, id: number, values: Partial<typeof importJobs.$inferInsert>) =>
  db.update(importJobs).set(values).where(eq(importJobs.id, id));

export const kindsForImport = (db: DbOrTx) =>
  db
    .select({ id: categories.id, slug: categories.slug, name: categories.name, mains: categories.mains })
    .from(categories);

/** The keys among these that an earlier import already brought in. */
export async function knownKeys(tx: DbOrTx, records: ImportedRecord[]): Promise<Set<string>> {
  if (!records.length) return new Set();
  const rows = await tx
    .select({ provider: importedRecords.provider, recordId: importedRecords.recordId })
    .from(importedRecords)
    .where(
      inArray(
        importedRecords.recordId,
        records.map((r) => r.recordId),
      ),
    );
  return new Set(rows.map((r) => `${r.provider}\u0000${r.recordId}`));
}

/** The group a network file names, made as a history-only group when there is none yet. */
export async function groupForIdentifier(tx: DbOrTx, slug: string, name: string, country: string | null) {
  const [g] = await tx.select({ id: repairGroups.id }).from(repairGroups).where(eq(repairGroups.slug, slug));
  if (g) return g.id;
  const [{ id }] = await tx
    .insert(repairGroups)
    .values({
      name: name.slice(0, 120),
      slug,
      town: '',
      description: '',
      country: country && /^[A-Z]{3}$/.test(country) ? country : null,
      historyOnly: true,
    })
    .$returningId();
  return id;
}

export const IMPORT_VENUE = 'Records brought in';
const NOON = 12;

/**
 * The past session holding a group's records of one date, with its one booking: made on first use. Its thank-you
 * is marked sent, so no job writes to anyone about it.
 */
export async function sessionForDate(tx: DbOrTx, groupId: number, date: string) {
  const startsAt = new Date(`${date}T${String(NOON).padStart(2, '0')}:00:00Z`);
  const [found] = await tx
    .select({ eventId: events.id, bookingId: bookings.id })
    .from(events)
    .innerJoin(bookings, eq(bookings.eventId, events.id))
    .where(and(eq(events.groupId, groupId), eq(events.imported, true), eq(events.startsAt, startsAt)))
    .limit(1);
  if (found) return found;
  let [venue] = await tx
    .select({ id: venues.id })
    .from(venues)
    .where(and(eq(venues.groupId, groupId), eq(venues.name, IMPORT_VENUE)));
  if (!venue)
    [venue] = await tx
      .insert(venues)
      .values({ groupId, name: IMPORT_VENUE, address: '', town: '', accessNotes: '' })
      .$returningId();
  const endsAt = new Date(startsAt.getTime() + 3600_000);
  const [{ id: eventId }] = await tx
    .insert(events)
    .values({
      groupId,
      venueId: venue.id,
      title: `Records of ${date}`,
      description: 'Repairs brought in from an earlier record.',
      startsAt,
      endsAt,
      slotMinutes: 60,
      slotCapacity: 1,
      skillLimits: {},
      status: 'closed',
      imported: true,
      thankYouSentAt: endsAt,
    })
    .$returningId();
  const [{ id: slotId }] = await tx
    .insert(slots)
    .values({ eventId, startsAt, endsAt, capacity: 1, booked: 1 })
    .$returningId();
  for (let attempt = 0; ; attempt++) {
    try {
      const [{ id: bookingId }] = await tx
        .insert(bookings)
        .values({
          reference: formatReference(randomBytes(6)),
          eventId,
          slotId,
          visitorName: 'Records brought in',
          manageTokenHash: randomBytes(32).toString('hex'),
          consentAt: startsAt,
          anonymisedAt: new Date(),
        })
        .$returningId();
      return { eventId, bookingId };
    } catch (err) {
      // A reference taken already (about a billion exist): draw another.
      if (!isDuplicate(err) || attempt > 5) throw err;
    }
  }
}

export interface ItemToWrite {
  record: ImportedRecord;
  bookingId: number;
  categoryId: number;
  mains: boolean;
  fault: string;
  outcome: Outcome | null;
  at: Date;
  jobId: number;
}

/** Writes the items of one batch, their outcomes and their keys. */
export async function writeItems(tx: DbOrTx, items: ItemToWrite[]) {
  if (!items.length) return;
  const bookingIds = [...new Set(items.map((i) => i.bookingId))];
  const next = new Map<number, number>();
  for (const row of await tx
    .select({ bookingId: bookingItems.bookingId, last: sql<number>`MAX(${bookingItems.position})` })
    .from(bookingItems)
    .where(inArray(bookingItems.bookingId, bookingIds))
    .groupBy(bookingItems.bookingId))
    next.set(row.bookingId, Number(row.last) + 1);
  const placed = items.map((i) => {
    const position = next.get(i.bookingId) ?? 0;
    next.set(i.bookingId, position + 1);
    return { ...i, position };
  });
  await tx.insert(bookingItems).values(
    placed.map((i) => ({
      bookingId: i.bookingId,
      categoryId: i.categoryId,
      brand: i.record.brand?.slice(0, 80) ?? null,
      ageYears: i.record.ageYears === null ? null : Math.round(i.record.ageYears),
      fault: i.fault,
      mains: i.mains,
      position: i.position,
      status: 'done' as const,
      checkedInAt: i.at,
      startedAt: i.at,
      doneAt: i.at,
    })),
  );
  const ids = new Map(
    (
      await tx
        .select({ id: bookingItems.id, bookingId: bookingItems.bookingId, position: bookingItems.position })
        .from(bookingItems)
        .where(inArray(bookingItems.bookingId, bookingIds))
    ).map((r) => [`${r.bookingId}:${r.position}`, r.id]),
  );
  const withIds = placed.map((i) => ({ ...i, itemId: ids.get(`${i.bookingId}:${i.position}`)! }));
  const outcomes = withIds.filter((i) => i.outcome);
  if (outcomes.length)
    await tx.insert(itemOutcomes).values(
      outcomes.map((i) => ({
        itemId: i.itemId,
        outcome: i.outcome!,
        barrier: i.outcome === 'end-of-life' ? i.record.barrier : null,
        recordedAt: i.at,
      })),
    );
  await tx.insert(importedRecords).values(
    withIds.map((i) => ({
      provider: i.record.provider,
      recordId: i.record.recordId,
      itemId: i.itemId,
      jobId: i.jobId,
      ordsCategory: i.record.ordsCategory,
    })),
  );
}
