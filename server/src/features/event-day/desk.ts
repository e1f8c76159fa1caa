import { randomBytes } from 'node:crypto';
import { and, asc, eq, gte, inArray, lte } from 'drizzle-orm';
import type { z } from 'zod';
import { formatReference } from '../../../../shared/booking/reference';
import {
  canMoveTo,
  hasArrived,
  isAbsent,
  QUEUED_STATUSES,
  type ItemStatus,
} from '../../../../shared/event-day/constants';
import type { checkInSchema, walkInSchema } from '../../../../shared/schemas/event-day';
import type { CheckInResult, DeskEvent, DeskItem, DeskView, WalkInResult } from '../../../../shared/api/event-day';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import type { Tx } from '../../db/client';
import { isDuplicate, withDeadlockRetry } from '../../db/retry';
import {
  bookingItems,
  bookings,
  categories,
  events,
  itemAssignments,
  memberships,
  repairGroups,
  slots,
} from '../../db/schema/index';
import { sha256 } from '../../auth/tokens';
import { HttpError, notFound } from '../../http/errors';
import { runHooks } from '../../core/hooks';
import { manageTokenFor } from '../../core/links';
import { screenItems } from '../../core/screening';
import { newTagCodes, nextQueueNumbers, setStatus } from './items';

/** The desk opens 12 hours before the event starts and closes 12 hours after it ends. */
const DESK_OPENS_H = 12;

function assertDeskOpen(e: { status: string; startsAt: Date; endsAt: Date }) {
  if (e.status === 'cancelled') throw new HttpError(409, 'not-open', 'This event has been cancelled.');
  if (e.status === 'draft') throw new HttpError(409, 'not-open', 'This event is not published.');
  const now = Date.now();
  if (now < e.startsAt.getTime() - DESK_OPENS_H * 3600_000)
    throw new HttpError(409, 'not-open', 'Check-in opens on the day of the event.');
  if (now > e.endsAt.getTime() + DESK_OPENS_H * 3600_000) throw new HttpError(409, 'not-open', 'This event is over.');
}

interface Issued {
  id: number;
  tagCode: string | null;
  queueNumber: number | null;
  status: ItemStatus;
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
  const [found] = await db
    .select({ id: bookings.id, eventId: bookings.eventId })
    .from(bookings)
    .where(eq(bookings.reference, reference));
  if (!found) throw notFound('That booking');
  const result = await withDeadlockRetry(() =>
    db.transaction(async (tx) => {
      const [e] = await tx.select().from(events).where(eq(events.id, found.eventId)).for('update');
      assertDeskOpen(e);
      const [b] = await tx.select().from(bookings).where(eq(bookings.id, found.id)).for('update');
      if (b.status !== 'confirmed')
        throw new HttpError(409, 'cancelled', 'This booking was cancelled. Book the visitor in as a walk-in instead.');
      const items = await tx
        .select()
        .from(bookingItems)
        .where(eq(bookingItems.bookingId, b.id))
        .orderBy(asc(bookingItems.position));
      const wanted =
        input.items ??
        items.map((i) => ({ id: i.id, arrival: 'arrived' as const, categoryId: undefined, weightKg: undefined }));
      const fields: Record<string, string> = {};
      wanted.forEach((w, n) => {
        if (!items.some((i) => i.id === w.id)) fields[`items.${n}.id`] = 'That item is not part of this booking.';
      });
      const newCats = [...new Set(wanted.map((w) => w.categoryId).filter((c): c is number => c !== undefined))];
      if (newCats.length) {
        const found = await tx.select({ id: categories.id }).from(categories).where(inArray(categories.id, newCats));
        wanted.forEach((w, n) => {
          if (w.categoryId !== undefined && !found.some((c) => c.id === w.categoryId))
            fields[`items.${n}.categoryId`] = 'Choose one of the listed kinds of item.';
        });
      }
      if (Object.keys(fields).length) throw new HttpError(400, 'invalid', 'Some fields need attention.', fields);
      // A corrected kind goes through the same screening as booking: the group's exclusions still hold.
      const corrected = wanted
        .map((w, n) => ({ w, n }))
        .filter(
          ({ w }) =>
            w.arrival === 'arrived' &&
            w.categoryId !== undefined &&
            w.categoryId !== items.find((i) => i.id === w.id)!.categoryId,
        );
      if (corrected.length) {
        const [g] = await tx.select().from(repairGroups).where(eq(repairGroups.id, e.groupId));
        try {
          await screenItems(
            tx,
            g,
            corrected.map(({ w }) => ({
              categoryId: w.categoryId!,
              brand: undefined,
              model: undefined,
              fault: 'checked at the desk',
              hazards: [],
            })),
          );
        } catch (err) {
          if (err instanceof HttpError && err.fields) {
            throw new HttpError(
              422,
              'item-refused',
              err.message,
              Object.fromEntries(
                Object.entries(err.fields).map(([k, v]) => [
                  `items.${corrected[Number(k.split('.')[1])].n}.categoryId`,
                  v,
                ]),
              ),
            );
          }
          throw err;
        }
      }
      for (const [n, w] of wanted.entries()) {
        const item = items.find((i) => i.id === w.id)!;
        if (w.arrival === 'no-show' && item.status !== 'no-show' && !canMoveTo(item.status, 'no-show'))
          throw new HttpError(409, 'bad-transition', 'Some fields need attention.', {
            [`items.${n}.arrival`]:
              'This item has already been checked in. Mark it withdrawn if the visitor took it away.',
          });
      }
      const arriving = wanted.filter(
        (w) => w.arrival === 'arrived' && !hasArrived(items.find((i) => i.id === w.id)!.status),
      );
      const needTag = arriving.filter((w) => !items.find((i) => i.id === w.id)!.tagCode);
      const needNumber = arriving.filter((w) => items.find((i) => i.id === w.id)!.queueNumber === null);
      const codes = await newTagCodes(tx, needTag.length);
      const numbers = await nextQueueNumbers(tx, e.id, needNumber.length);
      const now = new Date();
      for (const w of wanted) {
        const item = items.find((i) => i.id === w.id)!;
        const fix = {
          ...(w.categoryId ? { categoryId: w.categoryId } : {}),
          ...(w.weightKg !== undefined ? { weighedKg: w.weightKg } : {}),
        };
        if (w.arrival === 'arrived') {
          if (arriving.includes(w)) {
            const tagCode = item.tagCode ?? codes[needTag.indexOf(w)];
            const queueNumber = item.queueNumber ?? numbers[needNumber.indexOf(w)];
            await setStatus(
              tx,
              [
                {
                  itemId: item.id,
                  from: item.status,
                  to: 'checked-in',
                  extra: { ...fix, tagCode, queueNumber, checkedInAt: now },
                },
              ],
              user.id,
            );
          } else if (Object.keys(fix).length) {
            await tx.update(bookingItems).set(fix).where(eq(bookingItems.id, item.id));
          }
        } else if (item.status !== w.arrival) {
          if (!canMoveTo(item.status, w.arrival))
            throw new HttpError(409, 'bad-transition', 'That item is done; it cannot be withdrawn.');
          await setStatus(tx, [{ itemId: item.id, from: item.status, to: w.arrival, extra: fix }], user.id);
          await tx
            .delete(itemAssignments)
            .where(and(eq(itemAssignments.itemId, item.id), eq(itemAssignments.locked, false)));
        }
      }
      const after = await tx
        .select({
          id: bookingItems.id,
          tagCode: bookingItems.tagCode,
          queueNumber: bookingItems.queueNumber,
          status: bookingItems.status,
        })
        .from(bookingItems)
        .where(eq(bookingItems.bookingId, b.id))
        .orderBy(asc(bookingItems.position));
      await runHooks(ctx.hooks.itemsCheckedIn, tx, {
        itemIds: after.map((i) => i.id),
        arrivedIds: after.filter((i) => !isAbsent(i.status)).map((i) => i.id),
      });
      return { eventId: e.id, slotId: b.slotId, items: after as Issued[] };
    }),
  );
  await replan(ctx, result.eventId, result.slotId, user.id);
  return {
    items: await currentStatus(
      ctx,
      result.items.map((i) => i.id),
    ),
  };
}

/** A walk-in: the booking and its items are made already checked in; they queue after the booked items of their slot. */
export async function walkIn(
  ctx: AppContext,
  eventId: number,
  input: z.output<typeof walkInSchema>,
  user: SessionUser,
): Promise<WalkInResult> {
  const { db } = ctx.database;
  const [e] = await db
    .select({ event: events, group: repairGroups })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(eq(events.id, eventId));
  if (!e) throw notFound('That event');
  assertDeskOpen(e.event);
  const eventSlots = await db.select().from(slots).where(eq(slots.eventId, eventId)).orderBy(asc(slots.startsAt));
  let slot = input.slotId ? eventSlots.find((s) => s.id === input.slotId) : currentSlot(eventSlots, Date.now());
  if (input.slotId && !slot)
    throw new HttpError(400, 'invalid', 'Some fields need attention.', {
      slotId: 'That time is not part of this event.',
    });
  slot ??= eventSlots[0];
  if (!slot) throw new HttpError(409, 'no-slots', 'This event has no times to queue in.');
  const cats = await screenItems(db, e.group, input.items);
  for (let attempt = 0; ; attempt++) {
    const reference = formatReference(randomBytes(6));
    try {
      const out = await withDeadlockRetry(() =>
        db.transaction(async (tx) => {
          const numbers = await nextQueueNumbers(tx, eventId, input.items.length);
          const codes = await newTagCodes(tx, input.items.length);
          const [{ id }] = await tx
            .insert(bookings)
            .values({
              reference,
              eventId,
              slotId: slot.id,
              visitorName: input.visitor.name,
              visitorEmail: input.visitor.email ?? null,
              visitorPhone: input.visitor.phone ?? null,
              walkIn: true,
              consentName: input.consentName,
              manageTokenHash: sha256(manageTokenFor(ctx, reference)),
              consentAt: new Date(),
            })
            .$returningId();
          const now = new Date();
          const ids = await tx
            .insert(bookingItems)
            .values(
              input.items.map((i, position) => ({
                bookingId: id,
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
            )
            .$returningId();
          await setStatus(
            tx,
            ids.map((x) => ({ itemId: x.id, from: 'booked' as const, to: 'checked-in' as const })),
            user.id,
            'walk-in',
          );
          await runHooks(ctx.hooks.itemsCheckedIn, tx, { itemIds: ids.map((x) => x.id), arrivedIds: [] });
          return { reference, ids: ids.map((x) => x.id) };
        }),
      );
      await replan(ctx, eventId, slot.id, user.id);
      return { reference: out.reference, items: await currentStatus(ctx, out.ids) };
    } catch (err) {
      if (isDuplicate(err) && attempt < 4) continue;
      throw err;
    }
  }
}

/** The slot running now; before the first, the first; after the last, the last. */
export function currentSlot<T extends { startsAt: Date; endsAt: Date }>(list: T[], now: number): T | undefined {
  return (
    list.find((s) => s.startsAt.getTime() <= now && s.endsAt.getTime() > now) ??
    list.find((s) => s.startsAt.getTime() > now) ??
    list[list.length - 1]
  );
}

async function currentStatus(ctx: AppContext, ids: number[]) {
  if (!ids.length) return [];
  return ctx.database.db
    .select({
      id: bookingItems.id,
      tagCode: bookingItems.tagCode,
      queueNumber: bookingItems.queueNumber,
      status: bookingItems.status,
    })
    .from(bookingItems)
    .where(inArray(bookingItems.id, ids))
    .orderBy(asc(bookingItems.id));
}

/**
 * Keeps the plan current as people arrive: the engine re-plans the slot, then items checked in with a fixer and
 * bench are "waiting", and those left without one go back to "checked in". A failure here never undoes a check-in.
 */
export async function replan(ctx: AppContext, eventId: number, slotId: number, userId: number) {
  try {
    await runHooks(ctx.hooks.arrivalsChanged, ctx, { eventId, slotId, userId });
  } catch (err) {
    ctx.log(`replan after check-in failed: ${(err as Error).message}`);
  }
  await syncWaiting(ctx, eventId, userId);
}

export async function syncWaiting(ctx: AppContext, eventId: number, userId: number | null) {
  await ctx.database.db.transaction(async (tx) => {
    const rows = await tx
      .select({ id: bookingItems.id, status: bookingItems.status, placed: itemAssignments.itemId })
      .from(bookingItems)
      .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
      .leftJoin(itemAssignments, eq(itemAssignments.itemId, bookingItems.id))
      .where(and(eq(bookings.eventId, eventId), inArray(bookingItems.status, [...QUEUED_STATUSES])))
      .for('update');
    const changes = rows
      .filter((r) => (r.status === 'checked-in') === (r.placed !== null))
      .map((r) => ({ itemId: r.id, from: r.status, to: (r.placed !== null ? 'waiting' : 'checked-in') as ItemStatus }));
    await setStatus(tx as Tx, changes, userId, 'plan updated');
  });
}

/** Today's desk: every booking of the event by slot, with its items' status, tag and queue number. */
export async function deskView(ctx: AppContext, eventId: number): Promise<DeskView> {
  const { db } = ctx.database;
  const [e] = await db
    .select({ event: events, group: repairGroups })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(eq(events.id, eventId));
  if (!e) throw notFound('That event');
  const slotRows = await db.select().from(slots).where(eq(slots.eventId, eventId)).orderBy(asc(slots.startsAt));
  const rows = await db
    .select({ booking: bookings, item: bookingItems, categoryName: categories.name, categorySlug: categories.slug })
    .from(bookings)
    .innerJoin(bookingItems, eq(bookingItems.bookingId, bookings.id))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed')))
    .orderBy(asc(bookings.walkIn), asc(bookings.createdAt), asc(bookingItems.position));
  const byBooking = new Map<
    number,
    {
      id: number;
      reference: string;
      visitorName: string;
      visitorPhone: string | null;
      walkIn: boolean;
      slotId: number;
      items: DeskItem[];
    }
  >();
  for (const r of rows) {
    const b = byBooking.get(r.booking.id) ?? {
      id: r.booking.id,
      reference: r.booking.reference,
      visitorName: r.booking.visitorName,
      visitorPhone: r.booking.visitorPhone,
      walkIn: Boolean(r.booking.walkIn),
      slotId: r.booking.slotId,
      items: [],
    };
    b.items.push({
      id: r.item.id,
      categoryId: r.item.categoryId,
      categoryName: r.categoryName,
      brand: r.item.brand,
      model: r.item.model,
      fault: r.item.fault,
      mains: Boolean(r.item.mains),
      status: r.item.status,
      tagCode: r.item.tagCode,
      queueNumber: r.item.queueNumber,
      weighedKg: r.item.weighedKg,
      checkedInAt: r.item.checkedInAt,
    });
    byBooking.set(r.booking.id, b);
  }
  const now = Date.now();
  return {
    event: {
      id: e.event.id,
      title: e.event.title,
      status: e.event.status,
      startsAt: e.event.startsAt,
      endsAt: e.event.endsAt,
      groupId: e.group.id,
      groupName: e.group.name,
      timeZone: e.group.timeZone,
    },
    open:
      e.event.status !== 'draft' &&
      e.event.status !== 'cancelled' &&
      now >= e.event.startsAt.getTime() - DESK_OPENS_H * 3600_000 &&
      now <= e.event.endsAt.getTime() + DESK_OPENS_H * 3600_000,
    currentSlotId: currentSlot(slotRows, now)?.id ?? null,
    slots: slotRows.map((s) => ({
      id: s.id,
      startsAt: s.startsAt,
      endsAt: s.endsAt,
      bookings: [...byBooking.values()].filter((b) => b.slotId === s.id),
    })),
  };
}

/** Events a host or organiser may run the desk for: from those that ended up to 12 hours ago, soonest first. */
export async function deskEvents(ctx: AppContext, user: SessionUser): Promise<DeskEvent[]> {
  const { db } = ctx.database;
  const groupIds = user.admin
    ? undefined
    : (
        await db
          .select({ groupId: memberships.groupId })
          .from(memberships)
          .where(
            and(
              eq(memberships.userId, user.id),
              inArray(memberships.role, ['host', 'organiser']),
              eq(memberships.status, 'active'),
            ),
          )
      ).map((m) => m.groupId);
  if (groupIds && groupIds.length === 0) return [];
  const since = new Date(Date.now() - DESK_OPENS_H * 3600_000);
  const rows = await db
    .select({
      id: events.id,
      title: events.title,
      startsAt: events.startsAt,
      endsAt: events.endsAt,
      status: events.status,
      groupId: repairGroups.id,
      groupName: repairGroups.name,
      timeZone: repairGroups.timeZone,
    })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(
      and(
        inArray(events.status, ['published', 'closed']),
        gte(events.endsAt, since),
        ...(groupIds ? [inArray(events.groupId, groupIds)] : []),
        lte(events.startsAt, new Date(Date.now() + 60 * 86400_000)),
      ),
    )
    .orderBy(asc(events.startsAt))
    .limit(10);
  const now = Date.now();
  return rows.map((r) => ({ ...r, open: now >= r.startsAt.getTime() - DESK_OPENS_H * 3600_000 }));
}
