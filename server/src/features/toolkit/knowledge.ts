import { and, desc, eq, inArray, or, sql, type SQL } from 'drizzle-orm';
import type { z } from 'zod';
import type { Outcome } from '../../../../shared/event-day/constants';
import { OUTCOME_LABELS } from '../../../../shared/event-day/constants';
import type { knowledgeQuery, writeupSchema } from '../../../../shared/schemas/toolkit';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import type { DbOrTx, Tx } from '../../db/client';
import { categories, itemPhotos, knowledgeEntries, repairGroups } from '../../db/schema/index';
import { hasGroupRole } from '../../auth/guards';
import { HttpError, notFound } from '../../http/errors';
import { loadItem, type ItemRow } from '../../core/items';

/** Keeps the item's knowledge entry in step with its outcome: notes make an entry; a write-up is never lost. */
export async function syncKnowledge(tx: Tx, row: ItemRow, outcome: Outcome, notes: string | undefined) {
  const [existing] = await tx.select().from(knowledgeEntries).where(eq(knowledgeEntries.itemId, row.item.id));
  if (!notes && !existing?.writtenUp) {
    if (existing) await tx.delete(knowledgeEntries).where(eq(knowledgeEntries.itemId, row.item.id));
    return;
  }
  const values = {
    groupId: row.group.id,
    categoryId: row.item.categoryId,
    brand: row.item.brand ?? '',
    model: row.item.model ?? '',
    outcome,
    symptom: existing?.writtenUp ? existing.symptom : row.item.fault,
    notes: notes ?? '',
    eventDate: row.event.startsAt,
    updatedAt: new Date(),
  };
  if (existing) await tx.update(knowledgeEntries).set(values).where(eq(knowledgeEntries.itemId, row.item.id));
  else
    await tx.insert(knowledgeEntries).values({ itemId: row.item.id, ...values, measured: '', fix: '', faultyPart: '' });
}

/** The groups whose entries this person may read: their own, and every group that shares. */
function visible(user: SessionUser): SQL | undefined {
  if (user.admin) return undefined;
  const own = [...new Set(user.roles.map((r) => r.groupId))];
  return or(eq(repairGroups.shareKnowledge, true), own.length ? inArray(knowledgeEntries.groupId, own) : sql`FALSE`);
}

const match = (q: string) =>
  sql<number>`MATCH(${knowledgeEntries.brand}, ${knowledgeEntries.model}, ${knowledgeEntries.symptom}, ${knowledgeEntries.notes}, ${knowledgeEntries.measured}, ${knowledgeEntries.faultyPart}, ${knowledgeEntries.fix}) AGAINST (${q} IN NATURAL LANGUAGE MODE)`;

function select(db: DbOrTx, score: SQL<number>) {
  return db
    .select({
      e: knowledgeEntries,
      categoryName: categories.name,
      groupName: repairGroups.name,
      score: sql<number>`${score}`.as('score'),
    })
    .from(knowledgeEntries)
    .innerJoin(categories, eq(categories.id, knowledgeEntries.categoryId))
    .innerJoin(repairGroups, eq(repairGroups.id, knowledgeEntries.groupId));
}

const dto = (r: Awaited<ReturnType<ReturnType<typeof select>['execute']>>[number]) => ({
  itemId: r.e.itemId,
  groupName: r.groupName,
  categoryId: r.e.categoryId,
  categoryName: r.categoryName,
  brand: r.e.brand,
  model: r.e.model,
  outcome: r.e.outcome,
  outcomeLabel: OUTCOME_LABELS[r.e.outcome],
  symptom: r.e.symptom,
  notes: r.e.notes,
  measured: r.e.measured,
  faultyPart: r.e.faultyPart,
  fix: r.e.fix,
  writtenUp: Boolean(r.e.writtenUp),
  eventDate: r.e.eventDate,
  score: Math.round(Number(r.score) * 100) / 100,
});

/**
 * Search: an exact brand and model count most, then the kind of item, then how well the words match (MariaDB's
 * full-text relevance, capped so a long text cannot outrank an exact model).
 */
export async function searchKnowledge(ctx: AppContext, user: SessionUser, q: z.output<typeof knowledgeQuery>) {
  const { db } = ctx.database;
  const text = q.q.trim();
  const score = sql<number>`(CASE WHEN ${q.brand} <> '' AND ${knowledgeEntries.brand} = ${q.brand} THEN 20 ELSE 0 END)
    + (CASE WHEN ${q.model} <> '' AND ${knowledgeEntries.model} = ${q.model} THEN 20 ELSE 0 END)
    + (CASE WHEN ${knowledgeEntries.categoryId} = ${q.categoryId ?? 0} THEN 10 ELSE 0 END)
    + ${text ? sql`LEAST(${match(text)}, 9)` : sql`0`}`;
  const own = [...new Set(user.roles.map((r) => r.groupId))];
  const parts: (SQL | undefined)[] = [visible(user)];
  if (q.scope === 'mine') parts.push(own.length ? inArray(knowledgeEntries.groupId, own) : sql`FALSE`);
  const wanted: SQL[] = [];
  if (text) wanted.push(sql`${match(text)} > 0`);
  if (q.brand) wanted.push(eq(knowledgeEntries.brand, q.brand));
  if (q.model) wanted.push(eq(knowledgeEntries.model, q.model));
  // A chosen kind of item narrows the search; brand, model and words rank within it.
  if (q.categoryId) parts.push(eq(knowledgeEntries.categoryId, q.categoryId));
  else if (wanted.length) parts.push(or(...wanted));
  const rows = await select(db, score)
    .where(and(...parts))
    .orderBy(desc(sql`score`), desc(knowledgeEntries.writtenUp), desc(knowledgeEntries.eventDate))
    .limit(30);
  return withPhotos(db, rows.map(dto));
}

/** Similar past repairs for an item: same kind first, then the same brand and model, then the fault's words. */
export async function similarRepairs(ctx: AppContext, itemId: number, user: SessionUser) {
  const row = await loadItem(ctx.database.db, itemId);
  const fault = row.item.fault.slice(0, 300);
  const score = sql<number>`(CASE WHEN ${knowledgeEntries.categoryId} = ${row.item.categoryId} THEN 100 ELSE 0 END)
    + (CASE WHEN ${row.item.brand ?? ''} <> '' AND ${knowledgeEntries.brand} = ${row.item.brand ?? ''} THEN 10 ELSE 0 END)
    + (CASE WHEN ${row.item.model ?? ''} <> '' AND ${knowledgeEntries.model} = ${row.item.model ?? ''} THEN 10 ELSE 0 END)
    + LEAST(${match(fault)}, 9)`;
  const rows = await select(ctx.database.db, score)
    .where(
      and(
        visible(user),
        sql`${knowledgeEntries.itemId} <> ${itemId}`,
        or(eq(knowledgeEntries.categoryId, row.item.categoryId), sql`${match(fault)} > 0`),
      ),
    )
    .orderBy(desc(sql`score`), desc(knowledgeEntries.eventDate))
    .limit(5);
  return withPhotos(ctx.database.db, rows.map(dto));
}

/** The fixer's photos from the bench go with the record (the visitor's own photos stay with the booking). */
async function withPhotos<T extends { itemId: number }>(db: DbOrTx, entries: T[]) {
  if (!entries.length) return entries.map((e) => ({ ...e, photoIds: [] as number[] }));
  const photos = await db
    .select({ id: itemPhotos.id, itemId: itemPhotos.itemId })
    .from(itemPhotos)
    .where(
      and(
        inArray(
          itemPhotos.itemId,
          entries.map((e) => e.itemId),
        ),
        eq(itemPhotos.kind, 'repair'),
      ),
    );
  return entries.map((e) => ({ ...e, photoIds: photos.filter((p) => p.itemId === e.itemId).map((p) => p.id) }));
}

/** A fixer's short write-up of a repair: symptom, what was measured, the faulty part, the fix. */
export async function writeUp(ctx: AppContext, itemId: number, w: z.output<typeof writeupSchema>, user: SessionUser) {
  const { db } = ctx.database;
  const [e] = await db.select().from(knowledgeEntries).where(eq(knowledgeEntries.itemId, itemId));
  if (!e) throw notFound('That repair record');
  if (!hasGroupRole(user, e.groupId, ['fixer', 'organiser']))
    throw new HttpError(403, 'forbidden', 'Only the group’s fixers and organisers write up its repairs.');
  await db
    .update(knowledgeEntries)
    .set({ ...w, writtenUp: true, authorId: user.id, updatedAt: new Date() })
    .where(eq(knowledgeEntries.itemId, itemId));
  const [row] = await select(db, sql<number>`0`).where(eq(knowledgeEntries.itemId, itemId));
  return (await withPhotos(db, [dto(row)]))[0];
}

export async function setSharing(ctx: AppContext, groupId: number, share: boolean) {
  await ctx.database.db.update(repairGroups).set({ shareKnowledge: share }).where(eq(repairGroups.id, groupId));
}
