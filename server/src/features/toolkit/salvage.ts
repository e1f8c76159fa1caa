import { and, asc, desc, eq, gt, like, or, sql } from 'drizzle-orm';
import type { z } from 'zod';
import { PART_TYPE_LABELS, type PartType } from '../../../../shared/salvage/constants';
import { judgeSubstitute, type Needed } from '../../../../shared/salvage/match';
import type { salvagePartSchema, salvageUpdateSchema } from '../../../../shared/schemas/toolkit';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import type { DbOrTx } from '../../db/client';
import { affectedRows, withDeadlockRetry } from '../../db/retry';
import { salvageParts, salvageTakes, users } from '../../db/schema/index';
import { HttpError, notFound } from '../../http/errors';
import { loadItem } from '../../core/items';

const dto = (p: typeof salvageParts.$inferSelect) => ({ ...p, typeLabel: PART_TYPE_LABELS[p.type] });

export async function listParts(
  ctx: AppContext,
  groupId: number,
  f: { type?: PartType; q?: string; inStock?: boolean },
) {
  const parts = [eq(salvageParts.groupId, groupId)];
  if (f.type) parts.push(eq(salvageParts.type, f.type));
  if (f.inStock) parts.push(gt(salvageParts.quantity, 0));
  if (f.q)
    parts.push(
      or(
        like(salvageParts.value, `%${f.q}%`),
        like(salvageParts.package, `%${f.q}%`),
        like(salvageParts.notes, `%${f.q}%`),
        like(salvageParts.box, `%${f.q}%`),
      )!,
    );
  const rows = await ctx.database.db
    .select()
    .from(salvageParts)
    .where(and(...parts))
    .orderBy(asc(salvageParts.type), asc(salvageParts.value))
    .limit(500);
  return rows.map(dto);
}

export async function partGroupId(db: DbOrTx, partId: number) {
  if (!Number.isInteger(partId) || partId <= 0) return 0;
  const [p] = await db.select({ groupId: salvageParts.groupId }).from(salvageParts).where(eq(salvageParts.id, partId));
  return p?.groupId ?? 0;
}

export async function addPart(
  ctx: AppContext,
  groupId: number,
  input: z.output<typeof salvagePartSchema>,
  user: SessionUser,
) {
  if (input.sourceItemId) {
    const row = await loadItem(ctx.database.db, input.sourceItemId).catch(() => null);
    if (!row || row.group.id !== groupId)
      throw new HttpError(400, 'invalid', 'Some fields need attention.', {
        sourceItemId: 'That item is not one of this group’s.',
      });
  }
  const [{ id }] = await ctx.database.db
    .insert(salvageParts)
    .values({ groupId, ...input, sourceItemId: input.sourceItemId ?? null, addedBy: user.id })
    .$returningId();
  const [p] = await ctx.database.db.select().from(salvageParts).where(eq(salvageParts.id, id));
  return dto(p);
}

export async function updatePart(ctx: AppContext, partId: number, patch: z.output<typeof salvageUpdateSchema>) {
  await ctx.database.db.update(salvageParts).set(patch).where(eq(salvageParts.id, partId));
  const [p] = await ctx.database.db.select().from(salvageParts).where(eq(salvageParts.id, partId));
  if (!p) throw notFound('That part');
  return dto(p);
}

export async function removePart(ctx: AppContext, partId: number) {
  await ctx.database.db.delete(salvageParts).where(eq(salvageParts.id, partId));
}

/**
 * Takes parts from the stock: the conditional UPDATE matches only while enough are left, so two fixers reaching
 * for the last one cannot both have it. The take is recorded against the item it went into.
 */
export async function takePart(
  ctx: AppContext,
  partId: number,
  itemId: number | undefined,
  quantity: number,
  user: SessionUser,
) {
  return withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const [p] = await tx.select().from(salvageParts).where(eq(salvageParts.id, partId));
      if (!p) throw notFound('That part');
      if (itemId) {
        const row = await loadItem(tx, itemId);
        if (row.group.id !== p.groupId)
          throw new HttpError(400, 'invalid', 'Some fields need attention.', {
            itemId: 'That item is not one of this group’s.',
          });
      }
      const res = await tx
        .update(salvageParts)
        .set({ quantity: sql`${salvageParts.quantity} - ${quantity}` })
        .where(and(eq(salvageParts.id, partId), sql`${salvageParts.quantity} >= ${quantity}`));
      if (affectedRows(res) !== 1)
        throw new HttpError(
          409,
          'out-of-stock',
          p.quantity === 0 ? 'None of these is left in the box.' : `Only ${p.quantity} left.`,
        );
      await tx.insert(salvageTakes).values({ partId, itemId: itemId ?? null, quantity, takenBy: user.id });
      const [after] = await tx.select().from(salvageParts).where(eq(salvageParts.id, partId));
      return dto(after);
    }),
  );
}

/** The parts taken for an item, for its page and its record. */
export async function partsUsed(db: DbOrTx, itemId: number) {
  return db
    .select({
      id: salvageTakes.id,
      quantity: salvageTakes.quantity,
      createdAt: salvageTakes.createdAt,
      type: salvageParts.type,
      value: salvageParts.value,
      package: salvageParts.package,
      box: salvageParts.box,
      takenBy: users.name,
    })
    .from(salvageTakes)
    .innerJoin(salvageParts, eq(salvageParts.id, salvageTakes.partId))
    .leftJoin(users, eq(users.id, salvageTakes.takenBy))
    .where(eq(salvageTakes.itemId, itemId))
    .orderBy(desc(salvageTakes.id));
}

/** Stock parts that could stand in for a needed one, judged by the substitution rule, best first. */
export async function substitutes(ctx: AppContext, groupId: number, needed: Needed) {
  const stock = await ctx.database.db
    .select()
    .from(salvageParts)
    .where(and(eq(salvageParts.groupId, groupId), gt(salvageParts.quantity, 0)));
  const rank = { accept: 0, 'accept-with-warnings': 1, refuse: 2 } as const;
  return stock
    .map((p) => ({
      part: dto(p),
      verdict: judgeSubstitute(needed, { type: p.type, ratings: p.ratings, package: p.package, pinout: p.pinout }),
    }))
    .filter((x) => x.verdict.verdict !== 'refuse' || x.part.type === needed.type)
    .sort((a, b) => rank[a.verdict.verdict] - rank[b.verdict.verdict] || a.part.id - b.part.id)
    .slice(0, 20);
}
