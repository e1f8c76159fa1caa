import { randomBytes } from 'node:crypto';
import type { z } from 'zod';
import { formatReference } from '../../../../shared/booking/reference';
import type { walkInSchema } from '../../../../shared/schemas/event-day';
import type { WalkInResult } from '../../../../shared/api/event-day';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import { isDuplicate, withDeadlockRetry } from '../../db/retry';
import { sha256 } from '../../auth/tokens';
import { HttpError, notFound } from '../../http/errors';
import { runHooks } from '../../core/hooks';
import { manageTokenFor } from '../../core/links';
import { screenItems } from '../../core/screening';
import { assertDeskOpen, currentSlot } from './desk';
import { newTagCodes, nextQueueNumbers, setStatus } from './items';
import { issuedAfterPlan, replan } from './plan';
import * as q from './queries/desk';
import { eventWithGroup, slotsOfEvent } from '../../core/events';

/**
 * A walk-in: the booking and its items are made already checked in; they queue after the booked items of their
 * slot. Its items go through the same screening as a booking (the group's refused kinds, swollen battery, damaged
 * cable, gas) before anything is written.
 */
export async function walkIn(
  ctx: AppContext,
  eventId: number,
  input: z.output<typeof walkInSchema>,
  user: SessionUser,
): Promise<WalkInResult> {
  const { db } = ctx.database;
  const e = await eventWithGroup(db, eventId);
  if (!e) throw notFound('That event');
  assertDeskOpen(e.event);
  const eventSlots = await slotsOfEvent(db, eventId);
  let slot = input.slotId ? eventSlots.find((s) => s.id === input.slotId) : currentSlot(eventSlots, Date.now());
  if (input.slotId && !slot)
    throw new HttpError(400, 'invalid', 'errors.invalid', {
      slotId: 'That time is not part of this event.',
    });
  slot ??= eventSlots[0];
  if (!slot) throw new HttpError(409, 'no-slots', 'This event has no times to queue in.');
  const slotId = slot.id;
  const cats = await screenItems(db, e.group, input.items);
  for (let attempt = 0; ; attempt++) {
    const reference = formatReference(randomBytes(6));
    try {
      const ids = await withDeadlockRetry(() =>
        db.transaction(async (tx) => {
          const numbers = await nextQueueNumbers(tx, eventId, input.items.length);
          const codes = await newTagCodes(tx, input.items.length);
          const bookingId = await q.insertBooking(tx, {
            reference,
            eventId,
            slotId,
            visitorName: input.visitor.name,
            visitorEmail: input.visitor.email ?? null,
            visitorPhone: input.visitor.phone ?? null,
            walkIn: true,
            // Nobody at the desk picked a language for the visitor: the group's own is the best guess for its mails.
            language: e.group.defaultLanguage,
            consentName: input.consentName,
            manageTokenHash: sha256(manageTokenFor(ctx, reference, 1)),
            consentAt: new Date(),
          });
          const now = new Date();
          const itemIds = await q.insertItems(
            tx,
            input.items.map((i, position) => ({
              bookingId,
              categoryId: i.categoryId,
              brand: i.brand ?? null,
              model: i.model ?? null,
              ageYears: i.ageYears ?? null,
              fault: i.fault,
              mains: i.mains ?? Boolean(cats.get(i.categoryId)!.mains),
              battery: i.battery ?? false,
              position,
              status: 'booked' as const,
              tagCode: codes[position],
              queueNumber: numbers[position],
              weighedKg: i.weightKg ?? null,
              checkedInAt: now,
            })),
          );
          await setStatus(
            tx,
            itemIds.map((itemId) => ({ itemId, from: 'booked' as const, to: 'checked-in' as const })),
            user.id,
            'walk-in',
          );
          await runHooks(ctx.hooks.itemsCheckedIn, tx, { itemIds, arrivedIds: [] });
          return itemIds;
        }),
      );
      // Stored: from here on nothing may answer as if it was not (reception would enter it again).
      await replan(ctx, eventId, slotId, user.id);
      return { reference, items: await issuedAfterPlan(ctx, ids) };
    } catch (err) {
      // Only the insert can collide on a reference; once stored, the loop never runs again.
      if (isDuplicate(err) && attempt < 4) continue;
      throw err;
    }
  }
}
