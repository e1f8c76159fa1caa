import { and, desc, eq, inArray, or, sql, type SQL } from 'drizzle-orm';
import type { DbOrTx } from '../../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  itemPhotos,
  knowledgeEntries,
  repairGroups,
} from '../../../db/schema/index';

/** Who is reading: an admin reads every group's notes; others their own groups' and those of groups that share. */
export interface Reader {
  admin: boolean;
  groupIds: number[];
}

type EntryValues = Omit<typeof knowledgeEntries.$inferInsert, 'itemId'>;

export async function findEntry(db: DbOrTx, itemId: number) {
  const [e] = await db.select().from(knowledgeEntries).where(eq(knowledgeEntries.itemId, itemId));
  return e;
}

export async function deleteEntry(db: DbOrTx, itemId: number) {
  await db.delete(knowledgeEntries).where(eq(knowledgeEntries.itemId, itemId));
}

export async function updateEntry(db: DbOrTx, itemId: number, values: Partial<EntryValues>) {
  await db.update(knowledgeEntries).set(values).where(eq(knowledgeEntries.itemId, itemId));
}

export async function insertEntry(db: DbOrTx, itemId: number, values: EntryValues) {
  await db.insert(knowledgeEntries).values({ itemId, ...values });
}

/** The groups whose entries this person may read: their own, and every group that shares. */
function visible(reader: Reader): SQL | undefined {
  if (reader.admin) return undefined;
  const own = [...new Set(reader.groupIds)];
  return or(eq(repairGroups.shareKnowledge, true), own.length ? inArray(knowledgeEntries.groupId, own) : sql`FALSE`);
}

const match = (q: string) =>
  sql<number>`MATCH(${knowledgeEntries.brand}, ${knowledgeEntries.model}, ${knowledgeEntries.symptom}, ${knowledgeEntries.notes}, ${knowledgeEntries.measured}, ${knowledgeEntries.faultyPart}, ${knowledgeEntries.fix}) AGAINST (${q} IN NATURAL LANGUAGE MODE)`;

function select(db: DbOrTx, score: SQL<number>) {
  return db
    .select({
      e: knowledgeEntries,
      categoryName: categories.name,
      categorySlug: categories.slug,
      groupName: repairGroups.name,
      // Only to take the visitor's name out of the note for readers outside the group; never sent.
      visitorName: bookings.visitorName,
      score: sql<number>`${score}`.as('score'),
    })
    .from(knowledgeEntries)
    .innerJoin(categories, eq(categories.id, knowledgeEntries.categoryId))
    .innerJoin(repairGroups, eq(repairGroups.id, knowledgeEntries.groupId))
    .leftJoin(bookingItems, eq(bookingItems.id, knowledgeEntries.itemId))
    .leftJoin(bookings, eq(bookings.id, bookingItems.bookingId));
}

export type EntryRow = Awaited<ReturnType<ReturnType<typeof select>['execute']>>[number];

export interface EntrySearch {
  q: string;
  categoryId?: number;
  brand: string;
  model: string;
  scope: 'mine' | 'network';
}

/**
 * Search: an exact brand and model count most, then the kind of item, then how well the words match (MariaDB's
 * full-text relevance, capped so a long text cannot outrank an exact model). At most 30, best first.
 */
export async function searchEntries(db: DbOrTx, reader: Reader, q: EntrySearch): Promise<EntryRow[]> {
  const text = q.q.trim();
  const score = sql<number>`(CASE WHEN ${q.brand} <> '' AND ${knowledgeEntries.brand} = ${q.brand} THEN 20 ELSE 0 END)
    + (CASE WHEN ${q.model} <> '' AND ${knowledgeEntries.model} = ${q.model} THEN 20 ELSE 0 END)
    + (CASE WHEN ${knowledgeEntries.categoryId} = ${q.categoryId ?? 0} THEN 10 ELSE 0 END)
    + ${text ? sql`LEAST(${match(text)}, 9)` : sql`0`}`;
  const own = [...new Set(reader.groupIds)];
  const parts: (SQL | undefined)[] = [visible(reader)];
  if (q.scope === 'mine') parts.push(own.length ? inArray(knowledgeEntries.groupId, own) : sql`FALSE`);
  const wanted: SQL[] = [];
  if (text) wanted.push(sql`${match(text)} > 0`);
  if (q.brand) wanted.push(eq(knowledgeEntries.brand, q.brand));
  if (q.model) wanted.push(eq(knowledgeEntries.model, q.model));
  // A chosen kind of item narrows the search; brand, model and words rank within it.
  if (q.categoryId) parts.push(eq(knowledgeEntries.categoryId, q.categoryId));
  else if (wanted.length) parts.push(or(...wanted));
  return select(db, score)
    .where(and(...parts))
    .orderBy(desc(sql`score`), desc(knowledgeEntries.writtenUp), desc(knowledgeEntries.eventDate))
    .limit(30);
}

/** Entries like this item: same kind first, then the same brand and model, then the fault's words. At most 5. */
export async function similarEntries(
  db: DbOrTx,
  reader: Reader,
  item: { id: number; categoryId: number; brand: string | null; model: string | null; fault: string },
): Promise<EntryRow[]> {
  const fault = item.fault.slice(0, 300);
  const score = sql<number>`(CASE WHEN ${knowledgeEntries.categoryId} = ${item.categoryId} THEN 100 ELSE 0 END)
    + (CASE WHEN ${item.brand ?? ''} <> '' AND ${knowledgeEntries.brand} = ${item.brand ?? ''} THEN 10 ELSE 0 END)
    + (CASE WHEN ${item.model ?? ''} <> '' AND ${knowledgeEntries.model} = ${item.model ?? ''} THEN 10 ELSE 0 END)
    + LEAST(${match(fault)}, 9)`;
  return select(db, score)
    .where(
      and(
        visible(reader),
        sql`${knowledgeEntries.itemId} <> ${item.id}`,
        or(eq(knowledgeEntries.categoryId, item.categoryId), sql`${match(fault)} > 0`),
      ),
    )
    .orderBy(desc(sql`score`), desc(knowledgeEntries.eventDate))
    .limit(5);
}

/** One entry with its kind and group, as the search shows it. */
export async function entryRow(db: DbOrTx, itemId: number): Promise<EntryRow | undefined> {
  const [row] = await select(db, sql<number>`0`).where(eq(knowledgeEntries.itemId, itemId));
  return row;
}

/** The fixer's photos from the bench for these items (the visitor's own photos stay with the booking). */
export async function repairPhotos(db: DbOrTx, itemIds: number[]) {
  if (!itemIds.length) return [];
  return db
    .select({ id: itemPhotos.publicId, itemId: itemPhotos.itemId })
    .from(itemPhotos)
    .where(and(inArray(itemPhotos.itemId, itemIds), eq(itemPhotos.kind, 'repair')));
}

export async function groupSharing(db: DbOrTx, groupId: number) {
  const [g] = await db
    .select({ share: repairGroups.shareKnowledge })
    .from(repairGroups)
    .where(eq(repairGroups.id, groupId));
  return Boolean(g?.share);
}

export async function setGroupSharing(db: DbOrTx, groupId: number, share: boolean) {
  await db.update(repairGroups).set({ shareKnowledge: share }).where(eq(repairGroups.id, groupId));
}
