import type { z } from 'zod';
import type { KnowledgeEntry, KnowledgeSharing, SalvagePart, Substitute } from '../../../../shared/api/toolkit';
import { OUTCOME_LABELS, type Outcome } from '../../../../shared/event-day/constants';
import { PART_TYPE_LABELS, type PartType } from '../../../../shared/salvage/constants';
import { judgeSubstitute, type Needed } from '../../../../shared/salvage/match';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type {
  knowledgeQuery,
  salvagePartSchema,
  salvageUpdateSchema,
  writeupSchema,
} from '../../../../shared/schemas/toolkit';
import { scrubSharedNote } from '../../../../shared/privacy/shared-note';
import { scrubPersonalData } from '../../../../shared/privacy/scrub';
import { hasGroupRole } from '../../auth/guards';
import type { AppContext } from '../../context';
import type { DbOrTx, Tx } from '../../db/client';
import { withDeadlockRetry } from '../../db/retry';
import { HttpError, notFound } from '../../http/errors';
import { loadItem, type ItemRow } from '../../core/items';
import {
  deleteEntry,
  entryRow,
  findEntry,
  groupSharing,
  insertEntry,
  repairPhotos,
  searchEntries,
  setGroupSharing,
  similarEntries,
  updateEntry,
  type EntryRow,
  type Reader,
} from './queries/knowledge';
import {
  deletePart,
  findPart,
  insertPart,
  partGroupId,
  partRows,
  recordTake,
  stockRows,
  takeFromStock,
  updatePartRow,
  type PartRow,
} from './queries/salvage';
import { categoryText } from '../../i18n';
import { DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';

/* Repair notes: kept in step with outcomes, searched, written up; and the group's salvage stock. */

/** Keeps the item's knowledge entry in step with its outcome: notes make an entry; a write-up is never lost. */
export async function syncKnowledge(tx: Tx, row: ItemRow, outcome: Outcome, notes: string | undefined) {
  const existing = await findEntry(tx, row.item.id);
  if (!notes && !existing?.writtenUp) {
    if (existing) await deleteEntry(tx, row.item.id);
    return;
  }
  const values = {
    groupId: row.group.id,
    categoryId: row.item.categoryId,
    brand: row.item.brand ?? '',
    model: row.item.model ?? '',
    outcome,
    // The visitor's own words, without their name, address or number: the note may be read across the network.
    symptom: existing?.writtenUp ? existing.symptom : scrubPersonalData(row.item.fault, [row.booking.visitorName]),
    notes: notes ?? '',
    eventDate: row.event.startsAt,
    updatedAt: new Date(),
  };
  if (existing) await updateEntry(tx, row.item.id, values);
  else await insertEntry(tx, row.item.id, { ...values, measured: '', fix: '', faultyPart: '' });
}

const readerOf = (user: SessionUser): Reader => ({ admin: user.admin, groupIds: user.roles.map((r) => r.groupId) });

/** Readers outside the note's group get it without the visitor's name, address or number (finding 8). */
const entryFor =
  (user: SessionUser, lang: Language) =>
  (r: EntryRow): Omit<KnowledgeEntry, 'photoIds'> => {
    const dto = entryDto(r, lang);
    return user.roles.some((g) => g.groupId === r.e.groupId) ? dto : scrubSharedNote(dto, r.visitorName);
  };

const entryDto = (r: EntryRow, lang: Language): Omit<KnowledgeEntry, 'photoIds'> => ({
  itemId: r.e.itemId,
  groupName: r.groupName,
  categoryId: r.e.categoryId,
  categoryName: categoryText(lang, r.categorySlug, 'name', r.categoryName),
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

/** The fixer's photos from the bench go with the record (the visitor's own photos stay with the booking). */
async function withPhotos<T extends { itemId: number }>(
  db: DbOrTx,
  entries: T[],
): Promise<(T & { photoIds: string[] })[]> {
  const photos = await repairPhotos(
    db,
    entries.map((e) => e.itemId),
  );
  return entries.map((e) => ({ ...e, photoIds: photos.filter((p) => p.itemId === e.itemId).map((p) => p.id) }));
}

/** Search the notes this person may read; exact brand and model first (queries/knowledge.ts says how it ranks). */
export async function searchKnowledge(
  ctx: AppContext,
  user: SessionUser,
  q: z.output<typeof knowledgeQuery>,
  lang: Language = DEFAULT_LANGUAGE,
): Promise<KnowledgeEntry[]> {
  const { db } = ctx.database;
  const rows = await searchEntries(db, readerOf(user), q);
  return withPhotos(db, rows.map(entryFor(user, lang)));
}

/** Similar past repairs for an item: same kind first, then the same brand and model, then the fault's words. */
export async function similarRepairs(
  ctx: AppContext,
  itemId: number,
  user: SessionUser,
  lang: Language = DEFAULT_LANGUAGE,
): Promise<KnowledgeEntry[]> {
  const { db } = ctx.database;
  const { item } = await loadItem(db, itemId);
  const rows = await similarEntries(db, readerOf(user), item);
  return withPhotos(db, rows.map(entryFor(user, lang)));
}

/** A fixer's short write-up of a repair: symptom, what was measured, the faulty part, the fix. */
export async function writeUp(
  ctx: AppContext,
  itemId: number,
  w: z.output<typeof writeupSchema>,
  user: SessionUser,
  lang: Language = DEFAULT_LANGUAGE,
): Promise<KnowledgeEntry> {
  const { db } = ctx.database;
  const e = await findEntry(db, itemId);
  if (!e) throw notFound('That repair record');
  if (!hasGroupRole(user, e.groupId, ['fixer', 'organiser']))
    throw new HttpError(403, 'forbidden', 'Only the group’s fixers and organisers write up its repairs.');
  await updateEntry(db, itemId, { ...w, writtenUp: true, authorId: user.id, updatedAt: new Date() });
  const row = await entryRow(db, itemId);
  if (!row) throw notFound('That repair record');
  return (await withPhotos(db, [entryDto(row, lang)]))[0];
}

export async function getSharing(ctx: AppContext, groupId: number): Promise<KnowledgeSharing> {
  return { share: await groupSharing(ctx.database.db, groupId) };
}

export async function setSharing(ctx: AppContext, groupId: number, share: boolean): Promise<KnowledgeSharing> {
  await setGroupSharing(ctx.database.db, groupId, share);
  return { share };
}

const partDto = (p: PartRow): SalvagePart => ({ ...p, typeLabel: PART_TYPE_LABELS[p.type] });

/** The group a part belongs to, for the role guards (0 when there is no such part, which the guards refuse). */
export const partGroup = (ctx: AppContext, partId: number) => partGroupId(ctx.database.db, partId);

export async function listParts(
  ctx: AppContext,
  groupId: number,
  f: { type?: PartType; q?: string; inStock?: boolean },
): Promise<SalvagePart[]> {
  return (await partRows(ctx.database.db, groupId, f)).map(partDto);
}

const notThisGroups = (field: string) =>
  new HttpError(400, 'invalid', 'errors.invalid', { [field]: 'That item is not one of this group’s.' });

export async function addPart(
  ctx: AppContext,
  groupId: number,
  input: z.output<typeof salvagePartSchema>,
  user: SessionUser,
): Promise<SalvagePart> {
  const { db } = ctx.database;
  if (input.sourceItemId) {
    const row = await loadItem(db, input.sourceItemId).catch(() => null);
    if (!row || row.group.id !== groupId) throw notThisGroups('sourceItemId');
  }
  const id = await insertPart(db, { groupId, ...input, sourceItemId: input.sourceItemId ?? null, addedBy: user.id });
  return partDto((await findPart(db, id))!);
}

export async function updatePart(
  ctx: AppContext,
  partId: number,
  patch: z.output<typeof salvageUpdateSchema>,
): Promise<SalvagePart> {
  await updatePartRow(ctx.database.db, partId, patch);
  const p = await findPart(ctx.database.db, partId);
  if (!p) throw notFound('That part');
  return partDto(p);
}

export async function removePart(ctx: AppContext, partId: number) {
  await deletePart(ctx.database.db, partId);
}

/**
 * Takes parts from the stock; two fixers reaching for the last one cannot both have it (see `takeFromStock`).
 * The take is recorded against the item it went into.
 */
export async function takePart(
  ctx: AppContext,
  partId: number,
  itemId: number | undefined,
  quantity: number,
  user: SessionUser,
): Promise<SalvagePart> {
  return withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const p = await findPart(tx, partId);
      if (!p) throw notFound('That part');
      if (itemId) {
        const row = await loadItem(tx, itemId);
        if (row.group.id !== p.groupId) throw notThisGroups('itemId');
      }
      if (!(await takeFromStock(tx, partId, quantity)))
        throw new HttpError(
          409,
          'out-of-stock',
          p.quantity === 0 ? 'None of these is left in the box.' : `Only ${p.quantity} left.`,
        );
      await recordTake(tx, { partId, itemId: itemId ?? null, quantity, takenBy: user.id });
      return partDto((await findPart(tx, partId))!);
    }),
  );
}

/** Stock parts that could stand in for a needed one, judged by the substitution rule, best first. */
export async function substitutes(ctx: AppContext, groupId: number, needed: Needed): Promise<Substitute[]> {
  const stock = await stockRows(ctx.database.db, groupId);
  const rank = { accept: 0, 'accept-with-warnings': 1, refuse: 2 } as const;
  return stock
    .map((p) => ({
      part: partDto(p),
      verdict: judgeSubstitute(needed, { type: p.type, ratings: p.ratings, package: p.package, pinout: p.pinout }),
    }))
    .filter((x) => x.verdict.verdict !== 'refuse' || x.part.type === needed.type)
    .sort((a, b) => rank[a.verdict.verdict] - rank[b.verdict.verdict] || a.part.id - b.part.id)
    .slice(0, 20);
}
