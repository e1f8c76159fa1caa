import { isDuplicate } from '../../db/retry';
import type { z } from 'zod';
import type { groupSchema } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import { HttpError, notFound } from '../../http/errors';
import { applyDefaultExclusions } from '../../core/screening';
import * as q from './queries';

const slugify = (s: string) =>
  s
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 60);

export const mailbox = (ctx: AppContext) => q.mailboxRows(ctx.database.db);

export async function mailboxMessage(ctx: AppContext, id: number) {
  const m = await q.mailboxRow(ctx.database.db, id);
  if (!m) throw notFound('That message');
  return {
    id: m.id,
    from: m.fromAddress,
    to: m.toAddress,
    subject: m.subject,
    receivedAt: m.receivedAt,
    text: m.text,
    hasHtml: m.html !== null,
  };
}

export async function mailboxHtml(ctx: AppContext, id: number) {
  const m = await q.mailboxRow(ctx.database.db, id);
  if (!m?.html) throw notFound('That message');
  return m.html;
}

export const clearMailbox = (ctx: AppContext) => q.clearMailbox(ctx.database.db);

export async function outboxOverview(ctx: AppContext) {
  const { db } = ctx.database;
  const totals = await q.outboxTotals(db);
  const recent = await q.recentOutbox(db);
  return { totals: Object.fromEntries(totals.map((t) => [t.status, t.n])), recent };
}

export async function groups(ctx: AppContext) {
  return (await q.groupRows(ctx.database.db)).map((g) => ({ ...g, members: Number(g.members) }));
}

/** A new group, with the kinds every group refuses until it says otherwise. */
export async function createGroup(ctx: AppContext, input: z.output<typeof groupSchema>) {
  try {
    const id = await ctx.database.db.transaction(async (tx) => {
      const id = await q.insertGroup(tx, { ...input, slug: slugify(input.name) });
      await applyDefaultExclusions(tx, id);
      return id;
    });
    return { id, ...input };
  } catch (err) {
    if (isDuplicate(err))
      throw new HttpError(409, 'duplicate', 'A group with that name exists.', {
        name: 'A group with that name exists.',
      });
    throw err;
  }
}

export async function allUsers(ctx: AppContext) {
  return (await q.userRows(ctx.database.db)).map((u) => ({
    ...u,
    admin: Boolean(u.admin),
    verified: u.verified !== null,
  }));
}

/**
 * Merges a group made by a network import (records only) into a real group: an admin's way to give its history to
 * the group it belongs to. A group with people or its own sessions is never merged away.
 */
export async function mergeGroup(ctx: AppContext, from: number, into: number) {
  if (from === into) throw new HttpError(400, 'invalid', 'errors.invalid', { into: 'Choose another group.' });
  await ctx.database.db.transaction(async (tx) => {
    const source = await q.groupForMerge(tx, from);
    const target = await q.groupForMerge(tx, into);
    if (!source) throw notFound('That group');
    if (!target) throw new HttpError(400, 'invalid', 'errors.invalid', { into: 'That group was not found.' });
    if (!source.historyOnly || (await q.groupHasOwnLife(tx, from)))
      throw new HttpError(
        409,
        'not-history-only',
        'Only a group made by an import, holding records only, can be merged away. This one has people or sessions of its own.',
      );
    await q.moveGroupInto(tx, from, into);
  });
}
