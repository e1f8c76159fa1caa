import type { z } from 'zod';
import { mayRecordOutcome, mayStartRepair } from '../../../../shared/event-day/constants';
import { mayRecordFixed } from '../../../../shared/safety/may-record-fixed';
import { judgeSafety, type SafetyVerdict } from '../../../../shared/safety/limits';
import { visualOk, type outcomeSchema, type SafetyCheckValues } from '../../../../shared/schemas/event-day';
import type { SafetyCheckResult } from '../../../../shared/api/event-day';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import type { DbOrTx, Tx } from '../../db/client';
import { withDeadlockRetry } from '../../db/retry';
import { hasGroupRole } from '../../auth/guards';
import { GROUP_ROLES_FOR } from '../../../../shared/permissions';
import { HttpError } from '../../http/errors';
import { eventLayout } from '../../core/benches';
import { runHooks } from '../../core/hooks';
import { isHeating, setStatus } from './items';
import { loadItem, type ItemRow } from '../../core/items';
import * as q from './queries/outcomes';
import { lockEvent } from './queries/desk';

const forbidden = (message: string) => new HttpError(403, 'forbidden', message);

/** The assigned fixer or an organiser of the group; a fixer of the group may take an item nobody has. */
export async function assertMayRecord(tx: DbOrTx, row: ItemRow, user: SessionUser) {
  if (!hasGroupRole(user, row.group.id, GROUP_ROLES_FOR.benchWork))
    throw forbidden('Only the fixer working on this item or an organiser can record this.');
  if (hasGroupRole(user, row.group.id, ['organiser'])) return;
  const a = await q.assignmentOf(tx, row.item.id);
  if (a && a.userId !== user.id)
    throw forbidden('This item is with another fixer. Ask an organiser to move it to you first.');
}

/** A fixer starts on an item: it becomes theirs (locked, so a re-plan leaves it), at their bench or a suitable one. */
export async function startRepair(ctx: AppContext, itemId: number, user: SessionUser) {
  await withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const row = await loadItem(tx, itemId, { lock: true });
      if (!hasGroupRole(user, row.group.id, GROUP_ROLES_FOR.benchWork))
        throw forbidden('Only the group’s fixers and organisers can start a repair.');
      if (row.item.status === 'at-bench') return;
      if (!mayStartRepair(row.item.status))
        throw new HttpError(
          409,
          'bad-transition',
          row.item.status === 'booked' ? 'Check the item in at reception first.' : 'problems.itemNotForBench',
          undefined,
          { status: `fixer.status.${row.item.status}` },
        );
      const a = await q.assignmentOf(tx, itemId);
      const fixerId =
        a && hasGroupRole(user, row.group.id, ['organiser']) && !hasGroupRole(user, row.group.id, ['fixer'])
          ? a.userId
          : user.id;
      let benchId = a?.userId === fixerId ? a.benchId : undefined;
      if (benchId === undefined) {
        const shiftBench = await q.shiftBenchOf(tx, row.event.id, fixerId);
        const benches = await eventLayout(tx, row.event.id);
        benchId =
          shiftBench ??
          benches.find((b) => row.category.equipment.every((q) => b.equipment.includes(q)))?.id ??
          benches[0]?.id ??
          a?.benchId;
      }
      if (benchId !== undefined)
        await q.placeByHand(tx, { itemId, eventId: row.event.id, userId: fixerId, benchId, startsAt: new Date() });
      await setStatus(
        tx,
        [{ itemId, from: row.item.status, to: 'at-bench', extra: { startedAt: new Date() } }],
        user.id,
      );
    }),
  );
}

function verdictOf(row: ItemRow, s: SafetyCheckValues): SafetyVerdict {
  return judgeSafety({
    visualOk: visualOk(s.visual),
    applianceClass: s.applianceClass,
    cordLengthM: s.cordLengthM,
    protectiveConductorOhm: s.protectiveConductorOhm,
    insulationMOhm: s.insulationMOhm,
    heating: s.heating || isHeating(row.category.slug),
    heatingKw: s.heatingKw,
    protectiveCurrentMA: s.protectiveCurrentMA,
    touchCurrentMA: s.touchCurrentMA,
  });
}

async function insertCheck(tx: Tx, row: ItemRow, s: SafetyCheckValues, user: SessionUser) {
  const v = verdictOf(row, s);
  const id = await q.insertSafetyCheck(tx, {
    itemId: row.item.id,
    applianceClass: s.applianceClass,
    readings: s,
    instrument: s.instrument ?? null,
    pass: v.pass,
    failures: [...v.failures, ...v.missing.map((m) => `Missing: ${m}.`)],
    checkedBy: user.id,
  });
  return { id, ...v };
}

const suggestion = (v: SafetyVerdict) =>
  v.pass
    ? null
    : 'It cannot go home as fixed. Record it as needing a part, or as beyond mending, and tell the visitor not to use it.';

/** Records an electrical safety check; the verdict comes from the shared limits table, never from the client. */
export async function recordSafetyCheck(
  ctx: AppContext,
  itemId: number,
  s: SafetyCheckValues,
  user: SessionUser,
): Promise<SafetyCheckResult> {
  return withDeadlockRetry(() =>
    ctx.database.db.transaction(async (tx) => {
      const row = await loadItem(tx, itemId, { lock: true });
      await assertMayRecord(tx, row, user);
      if (!row.item.mains)
        throw new HttpError(409, 'not-mains', 'This item does not run on mains; it needs no electrical safety check.');
      if (!mayRecordOutcome(row.item.status))
        throw new HttpError(409, 'bad-transition', 'Check the item in before testing it.');
      const v = await insertCheck(tx, row, s, user);
      return { id: v.id, pass: v.pass, failures: v.failures, missing: v.missing, suggestion: suggestion(v) };
    }),
  );
}

/**
 * Records what happened. A mains item is recorded fixed only when its latest safety check (sent with the outcome,
 * or recorded before) passed; otherwise 422 with the reasons, and nothing changes but the check itself.
 */
export async function recordOutcome(
  ctx: AppContext,
  itemId: number,
  input: z.output<typeof outcomeSchema>,
  user: SessionUser,
) {
  const { db } = ctx.database;
  // A check sent with the outcome is kept even when the outcome is refused: the readings were taken.
  if (input.safety) {
    const row = await loadItem(db, itemId);
    if (row.item.mains)
      await withDeadlockRetry(() =>
        db.transaction(async (tx) => {
          await assertMayRecord(tx, row, user);
          await insertCheck(tx, row, input.safety!, user);
        }),
      );
  }
  const { event } = await loadItem(db, itemId);
  const done = await withDeadlockRetry(() =>
    db.transaction(async (tx) => {
      // The session's row first, as check-ins and walk-ins take it: its figures are rewritten below, and writers of
      // one session's figures in a different order deadlocked at a busy desk.
      await lockEvent(tx, event.id);
      const row = await loadItem(tx, itemId, { lock: true });
      await assertMayRecord(tx, row, user);
      if (!mayRecordOutcome(row.item.status))
        throw new HttpError(
          409,
          'bad-transition',
          row.item.status === 'booked' ? 'Check the item in at reception first.' : 'problems.itemNoOutcome',
          undefined,
          { status: `fixer.status.${row.item.status}` },
        );
      const latest = await q.latestCheckOf(tx, itemId);
      if (input.outcome === 'fixed') {
        const fixed = mayRecordFixed({ mains: Boolean(row.item.mains) }, latest);
        if (!fixed.ok) throw new HttpError(422, fixed.code, fixed.message, { [fixed.field]: fixed.fieldMessage });
      }
      const values = {
        outcome: input.outcome,
        barrier: input.barrier ?? null,
        partDescription: input.part?.description ?? null,
        partLink: input.part?.link ?? null,
        partCostCents: input.part?.cost === undefined ? null : Math.round(input.part.cost * 100),
        minutes: input.minutes ?? null,
        notes: input.notes ?? null,
        safetyCheckId: latest?.id ?? null,
        recordedBy: user.id,
        recordedAt: new Date(),
      };
      await q.saveOutcome(tx, itemId, values);
      // A fixer recording an item nobody had takes it, at the event's first bench (if it has benches at all).
      if (!(await q.assignmentOf(tx, itemId)) && hasGroupRole(user, row.group.id, ['fixer'])) {
        const [first] = await eventLayout(tx, row.event.id);
        if (first)
          await q.placeByHand(tx, {
            itemId,
            eventId: row.event.id,
            userId: user.id,
            benchId: first.id,
            startsAt: row.item.startedAt ?? new Date(),
          });
      }
      await setStatus(
        tx,
        [{ itemId, from: row.item.status, to: 'done', extra: { doneAt: new Date() } }],
        user.id,
        `outcome: ${input.outcome}`,
      );
      await runHooks(ctx.hooks.outcomeRecorded, tx, {
        ctx,
        item: row,
        outcome: input.outcome,
        notes: input.notes ?? null,
      });
      return { ok: true };
    }),
  );
  ctx.outbox.kick();
  return done;
}
