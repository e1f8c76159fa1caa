import mysql from 'mysql2';
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

/** The keys among these that an earlier import already brought in (one indexed lookup per data provider). */
export async function knownKeys(tx: DbOrTx, records: ImportedRecord[]): Promise<Set<string>> {
  const known = new Set<string>();
  for (const provider of new Set(records.map((r) => r.provider))) {
    const ids = records.filter((r) => r.provider === provider).map((r) => r.recordId);
    for (const r of await tx
      .select({ recordId: importedRecords.recordId })
      .from(importedRecords)
      .where(and(eq(importedRecords.provider, provider), inArray(importedRecords.recordId, ids))))
      known.add(`${provider}\u0000${r.recordId}`);
  }
  return known;
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
 * The past sessions holding a group's records of these dates, each with its one booking: made on first use, all of a
 * batch's new ones in a few multi-row statements. Their thank-you is marked sent, so no job writes about them.
 */
export async function sessionsForDates(tx: DbOrTx, groupId: number, dates: string[]) {
  const startOf = (d: string) => new Date(`${d}T${String(NOON).padStart(2, '0')}:00:00Z`);
  const keyOf = (d: Date) => d.toISOString().slice(0, 10);
  const found = new Map<string, { eventId: number; bookingId: number }>();
  const importedOn = (starts: Date[]) =>
    and(eq(events.groupId, groupId), eq(events.imported, true), inArray(events.startsAt, starts));
  const read = async (starts: Date[]) => {
    for (const r of await tx
      .select({ eventId: events.id, startsAt: events.startsAt, bookingId: bookings.id })
      .from(events)
      .innerJoin(bookings, eq(bookings.eventId, events.id))
      .where(importedOn(starts)))
      found.set(keyOf(r.startsAt), { eventId: r.eventId, bookingId: r.bookingId });
  };
  await read(dates.map(startOf));
  const missing = dates.filter((d) => !found.has(d)).map(startOf);
  if (!missing.length) return found;
  let [venue] = await tx
    .select({ id: venues.id })
    .from(venues)
    .where(and(eq(venues.groupId, groupId), eq(venues.name, IMPORT_VENUE)));
  if (!venue)
    [venue] = await tx
      .insert(venues)
      .values({ groupId, name: IMPORT_VENUE, address: '', town: '', accessNotes: '' })
      .$returningId();
  const hour = 3600_000;
  await tx.insert(events).values(
    missing.map((startsAt) => ({
      groupId,
      venueId: venue.id,
      title: `Records of ${keyOf(startsAt)}`,
      description: 'Repairs brought in from an earlier record.',
      startsAt,
      endsAt: new Date(startsAt.getTime() + hour),
      slotMinutes: 60,
      slotCapacity: 1,
      skillLimits: {},
      status: 'closed' as const,
      imported: true,
      thankYouSentAt: new Date(startsAt.getTime() + hour),
    })),
  );
  const made = await tx.select({ id: events.id, startsAt: events.startsAt }).from(events).where(importedOn(missing));
  await tx.insert(slots).values(
    made.map((e) => ({
      eventId: e.id,
      startsAt: e.startsAt,
      endsAt: new Date(e.startsAt.getTime() + hour),
      capacity: 1,
      booked: 1,
    })),
  );
  const slotOf = new Map(
    (
      await tx
        .select({ id: slots.id, eventId: slots.eventId })
        .from(slots)
        .where(
          inArray(
            slots.eventId,
            made.map((e) => e.id),
          ),
        )
    ).map((r) => [r.eventId, r.id]),
  );
  for (let attempt = 0; ; attempt++) {
    try {
      await tx.insert(bookings).values(
        made.map((e) => ({
          reference: formatReference(randomBytes(6)),
          eventId: e.id,
          slotId: slotOf.get(e.id)!,
          visitorName: 'Records brought in',
          manageTokenHash: randomBytes(32).toString('hex'),
          consentAt: e.startsAt,
          anonymisedAt: new Date(),
        })),
      );
      break;
    } catch (err) {
      // A reference taken already (about a billion exist): the statement alone is undone; draw others.
      if (!isDuplicate(err) || attempt > 5) throw err;
    }
  }
  await read(missing);
  return found;
}

/**
 * One multi-row INSERT, its values escaped by mysql2 (dates in UTC, as the pool reads them). Drizzle's builder takes
 * most of a batch's time on thousands of rows; this is the same statement without it.
 */
async function bulkInsert(tx: DbOrTx, table: string, columns: string[], rows: unknown[][]) {
  if (!rows.length) return;
  await tx.execute(sql.raw(mysql.format('INSERT INTO ?? (??) VALUES ?', [table, columns, rows] as never, false, 'Z')));
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
  await bulkInsert(
    tx,
    'booking_items',
    [
      'booking_id',
      'category_id',
      'brand',
      'age_years',
      'fault',
      'mains',
      'position',
      'status',
      'checked_in_at',
      'started_at',
      'done_at',
    ],
    placed.map((i) => [
      i.bookingId,
      i.categoryId,
      i.record.brand?.slice(0, 80) ?? null,
      i.record.ageYears === null ? null : Math.round(i.record.ageYears),
      i.fault,
      i.mains,
      i.position,
      'done',
      i.at,
      i.at,
      i.at,
    ]),
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
  await bulkInsert(
    tx,
    'item_outcomes',
    ['item_id', 'outcome', 'barrier', 'recorded_at'],
    outcomes.map((i) => [i.itemId, i.outcome, i.outcome === 'end-of-life' ? i.record.barrier : null, i.at]),
  );
  await bulkInsert(
    tx,
    'imported_records',
    ['provider', 'record_id', 'item_id', 'job_id', 'ords_category'],
    withIds.map((i) => [i.record.provider, i.record.recordId, i.itemId, i.jobId, i.record.ordsCategory]),
  );
}
