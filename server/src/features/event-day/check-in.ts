import type { z } from 'zod';
import { canMoveTo, hasArrived, isAbsent } from '../../../../shared/event-day/constants';
import type { checkInSchema } from '../../../../shared/schemas/event-day';
import type { CheckInResult } from '../../../../shared/api/event-day';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import type { Tx } from '../../db/client';
import { withDeadlockRetry } from '../../db/retry';
import { HttpError, notFound } from '../../http/errors';
import { runHooks } from '../../core/hooks';
import { screenItems } from '../../core/screening';
import { assertDeskOpen } from './desk';
import { newTagCodes, nextQueueNumbers, setStatus } from './items';
import { issuedAfterPlan, replan } from './plan';
import * as q from './queries/desk';

type Wanted = NonNullable<z.output<typeof checkInSchema>['items']>[number];
type BookedItem = Awaited<ReturnType<typeof q.itemsOfBooking>>[number];

/** Items not of this booking and kinds that do not exist, by field. */
async function fieldErrors(tx: Tx, wanted: Wanted[], items: BookedItem[]) {
  const fields: Record<string, string> = {};
  wanted.forEach((w, n) => {
    if (!items.some((i) => i.id === w.id)) fields[`items.${n}.id`] = 'That item is not part of this booking.';
  });
  const known = await q.existingCategoryIds(tx, [
    ...new Set(wanted.map((w) => w.categoryId).filter((c): c is number => c !== undefined)),
  ]);
  wanted.forEach((w, n) => {
    if (w.categoryId !== undefined && !known.includes(w.categoryId))
      fields[`items.${n}.categoryId`] = 'Choose one of the listed kinds of item.';
  });
  if (Object.keys(fields).length) throw new HttpError(400, 'invalid', 'errors.invalid', fields);
}

/**
 * A corrected kind, or a screening answer given at the desk, goes through the same screening as booking: hazards
 * and the group's exclusions still hold.
 */
async function screenAtDesk(tx: Tx, groupId: number, wanted: Wanted[], items: BookedItem[]) {
  const screened = wanted
    .map((w, n) => ({ w, n, booked: items.find((i) => i.id === w.id)! }))
    .filter(
      ({ w, booked }) =>
        w.arrival === 'arrived' &&
        ((w.categoryId !== undefined && w.categoryId !== booked.categoryId) || Boolean(w.hazards?.length)),
    );
  if (!screened.length) return;
  try {
    await screenItems(
      tx,
      await q.groupById(tx, groupId),
      screened.map(({ w, booked }) => ({ categoryId: w.categoryId ?? booked.categoryId, hazards: w.hazards ?? [] })),
    );
  } catch (err) {
    if (!(err instanceof HttpError && err.fields)) throw err;
    // The screening numbers the items it was given; the desk's fields follow the booking's list.
    const byField = Object.entries(err.fields).map(([k, v]) => {
      const [, i, field] = k.split('.');
      return [`items.${screened[Number(i)].n}.${field}`, v];
    });
    throw new HttpError(422, 'item-refused', err.message, Object.fromEntries(byField));
  }
}

/** Marks one item arrived, did not come or withdrawn; arriving items take the codes and numbers handed to them. */
async function record(
  tx: Tx,
  w: Wanted,
  item: BookedItem,
  issue: { tagCode?: string; queueNumber?: number; now: Date } | undefined,
  userId: number,
) {
  const fix = {
    ...(w.categoryId ? { categoryId: w.categoryId } : {}),
    ...(w.weightKg !== undefined ? { weighedKg: w.weightKg } : {}),
  };
  if (w.arrival === 'arrived') {
    if (issue) {
      const extra = {
        ...fix,
        tagCode: item.tagCode ?? issue.tagCode,
        queueNumber: item.queueNumber ?? issue.queueNumber,
        checkedInAt: issue.now,
      };
      await setStatus(tx, [{ itemId: item.id, from: item.status, to: 'checked-in', extra }], userId);
    } else if (Object.keys(fix).length) await q.updateItem(tx, item.id, fix);
  } else if (item.status !== w.arrival) {
    if (!canMoveTo(item.status, w.arrival))
      throw new HttpError(409, 'bad-transition', 'That item is done; it cannot be withdrawn.');
    await setStatus(tx, [{ itemId: item.id, from: item.status, to: w.arrival, extra: fix }], userId);
    await q.dropUnlockedPlacement(tx, item.id);
  }
}

/**
 * Checks a booking in, item by item: arrived items get a tag code and a queue number (kept if they already have
 * them), the category may be corrected and the weight recorded; no-shows and withdrawals are recorded too.
 */
export async function checkIn(
  ctx: AppContext,
  reference: string,
  input: z.output<typeof checkInSchema>,
  user: SessionUser,
): Promise<CheckInResult> {
  const { db } = ctx.database;
  const found = await q.bookingByReference(db, reference);
  if (!found) throw notFound('That booking');
  const result = await withDeadlockRetry(() =>
    db.transaction(async (tx) => {
      const e = await q.lockEvent(tx, found.eventId);
      assertDeskOpen(e);
      const b = await q.lockBooking(tx, found.id);
      if (b.status !== 'confirmed')
        throw new HttpError(409, 'cancelled', 'This booking was cancelled. Book the visitor in as a walk-in instead.');
      const items = await q.itemsOfBooking(tx, b.id);
      const wanted: Wanted[] =
        input.items ??
        items.map((i) => ({ id: i.id, arrival: 'arrived' as const, categoryId: undefined, weightKg: undefined }));
      await fieldErrors(tx, wanted, items);
      await screenAtDesk(tx, e.groupId, wanted, items);
      const itemOf = (w: Wanted) => items.find((i) => i.id === w.id)!;
      for (const [n, w] of wanted.entries()) {
        const status = itemOf(w).status;
        if (w.arrival === 'no-show' && status !== 'no-show' && !canMoveTo(status, 'no-show'))
          throw new HttpError(409, 'bad-transition', 'errors.invalid', {
            [`items.${n}.arrival`]:
              'This item has already been checked in. Mark it withdrawn if the visitor took it away.',
          });
      }
      const arriving = wanted.filter((w) => w.arrival === 'arrived' && !hasArrived(itemOf(w).status));
      const needTag = arriving.filter((w) => !itemOf(w).tagCode);
      const needNumber = arriving.filter((w) => itemOf(w).queueNumber === null);
      const codes = await newTagCodes(tx, needTag.length);
      const numbers = await nextQueueNumbers(tx, e.id, needNumber.length);
      const now = new Date();
      for (const w of wanted) {
        const issue = arriving.includes(w)
          ? { tagCode: codes[needTag.indexOf(w)], queueNumber: numbers[needNumber.indexOf(w)], now }
          : undefined;
        await record(tx, w, itemOf(w), issue, user.id);
      }
      const after = await q.issuedOfBooking(tx, b.id);
      await runHooks(ctx.hooks.itemsCheckedIn, tx, {
        itemIds: after.map((i) => i.id),
        arrivedIds: after.filter((i) => !isAbsent(i.status)).map((i) => i.id),
      });
      return { eventId: e.id, slotId: b.slotId, itemIds: after.map((i) => i.id) };
    }),
  );
  await replan(ctx, result.eventId, result.slotId, user.id);
  return { items: await issuedAfterPlan(ctx, result.itemIds) };
}
