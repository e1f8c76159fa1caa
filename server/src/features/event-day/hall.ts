import { and, asc, eq, gt, inArray, isNotNull, lte } from 'drizzle-orm';
import QRCode from 'qrcode';
import {
  isQueued,
  ITEM_STATUS_LABELS,
  ITEM_STATUSES,
  OUTCOME_LABELS,
  type ItemStatus,
} from '../../../../shared/event-day/constants';
import { estimateWaits, liveWarnings, queueOrder } from '../../../../shared/event-day/queue';
import { shortName, tagUrl } from '../../../../shared/event-day/tag-code';
import type { HallQueue, LiveView, PublicTag, TagSheet } from '../../../../shared/api/event-day';
import type { AppContext } from '../../context';
import {
  bookingItems,
  bookings,
  categories,
  eventBenches,
  events,
  itemAssignments,
  itemOutcomes,
  repairGroups,
  shifts,
  slots,
  users,
} from '../../db/schema/index';
import { notFound } from '../../http/errors';
import { eventLayout } from '../../core/benches';
import { itemLabel } from '../../../../shared/item-label';

/** Every item of the event that reached the desk, with its slot, plan and outcome: what the hall views are made of. */
async function hallItems(ctx: AppContext, eventId: number) {
  return ctx.database.db
    .select({
      id: bookingItems.id,
      status: bookingItems.status,
      queueNumber: bookingItems.queueNumber,
      tagCode: bookingItems.tagCode,
      checkedInAt: bookingItems.checkedInAt,
      startedAt: bookingItems.startedAt,
      doneAt: bookingItems.doneAt,
      walkIn: bookings.walkIn,
      visitorName: bookings.visitorName,
      slotStartsAt: slots.startsAt,
      categoryName: categories.name,
      minutes: categories.repairMinutes,
      brand: bookingItems.brand,
      model: bookingItems.model,
      fixerId: itemAssignments.userId,
      benchId: itemAssignments.benchId,
      outcome: itemOutcomes.outcome,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(slots, eq(slots.id, bookings.slotId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemAssignments, eq(itemAssignments.itemId, bookingItems.id))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed'), isNotNull(bookingItems.checkedInAt)));
}
type HallItem = Awaited<ReturnType<typeof hallItems>>[number];

/** Fixers whose shift covers this moment. */
function fixersNow(ctx: AppContext, eventId: number, now: Date) {
  return ctx.database.db
    .select({ userId: shifts.userId, name: users.name, benchId: shifts.benchId })
    .from(shifts)
    .innerJoin(users, eq(users.id, shifts.userId))
    .where(and(eq(shifts.eventId, eventId), eq(shifts.coming, true), lte(shifts.startsAt, now), gt(shifts.endsAt, now)))
    .orderBy(asc(users.name));
}

function waitsFor(items: HallItem[], fixers: { userId: number }[], now: number) {
  const busy = new Map<number, number>();
  for (const i of items)
    if (i.status === 'at-bench' && i.fixerId)
      busy.set(i.fixerId, Math.max(busy.get(i.fixerId) ?? 0, (i.startedAt?.getTime() ?? now) + i.minutes * 60_000));
  const queued = items
    .filter((i) => isQueued(i.status))
    .map((i) => ({
      id: i.id,
      slotStartsAt: i.slotStartsAt.getTime(),
      walkIn: Boolean(i.walkIn),
      checkedInAt: i.checkedInAt!.getTime(),
      fixerId: i.fixerId,
      minutes: i.minutes,
    }));
  return {
    order: queueOrder(queued),
    waits: estimateWaits(
      now,
      fixers.map((f) => ({ id: f.userId, busyUntil: busy.get(f.userId) ?? now })),
      queued,
    ),
  };
}

async function eventHeader(ctx: AppContext, eventId: number, publicOnly: boolean) {
  const [e] = await ctx.database.db
    .select({ event: events, group: repairGroups })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(eq(events.id, eventId));
  if (!e || (publicOnly && !['published', 'closed'].includes(e.event.status))) throw notFound('That event');
  return e;
}

/** The hall's TV: queue numbers only — being served at which bench, and waiting with an estimate. No names. */
export async function hallQueue(ctx: AppContext, eventId: number): Promise<HallQueue> {
  const e = await eventHeader(ctx, eventId, true);
  const now = new Date();
  const [items, fixers, benches] = await Promise.all([
    hallItems(ctx, eventId),
    fixersNow(ctx, eventId, now),
    eventLayout(ctx.database.db, eventId),
  ]);
  const benchName = new Map(benches.map((b) => [b.id, b.name]));
  const { order, waits } = waitsFor(items, fixers, now.getTime());
  const byId = new Map(items.map((i) => [i.id, i]));
  return {
    event: {
      id: e.event.id,
      title: e.event.title,
      groupName: e.group.name,
      timeZone: e.group.timeZone,
      startsAt: e.event.startsAt,
      endsAt: e.event.endsAt,
    },
    serving: items
      .filter((i) => i.status === 'at-bench')
      .sort((a, b) => (a.startedAt?.getTime() ?? 0) - (b.startedAt?.getTime() ?? 0))
      .map((i) => ({ queueNumber: i.queueNumber, benchName: i.benchId ? (benchName.get(i.benchId) ?? null) : null })),
    waiting: order.map((q) => ({ queueNumber: byId.get(q.id)!.queueNumber, waitMinutes: waits.get(q.id) ?? null })),
    done: items.filter((i) => i.status === 'done').length,
    fixersOnHand: fixers.length,
    updatedAt: now,
  };
}

/** The organiser's live view: waiting, at bench and done by bench, the fixers on shift, and warnings. */
export async function liveView(ctx: AppContext, eventId: number): Promise<LiveView> {
  const e = await eventHeader(ctx, eventId, false);
  const now = new Date();
  const [items, fixers, benches] = await Promise.all([
    hallItems(ctx, eventId),
    fixersNow(ctx, eventId, now),
    eventLayout(ctx.database.db, eventId),
  ]);
  const allBooked = await ctx.database.db
    .select({ status: bookingItems.status })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .where(and(eq(bookings.eventId, eventId), eq(bookings.status, 'confirmed')));
  const counts = Object.fromEntries(
    ITEM_STATUSES.map((s) => [s, allBooked.filter((b) => b.status === s).length]),
  ) as Record<ItemStatus, number>;
  const { waits, order } = waitsFor(items, fixers, now.getTime());
  const rank = new Map(order.map((q, i) => [q.id, i]));
  const names = new Map(
    (
      await ctx.database.db
        .select({ id: users.id, name: users.name })
        .from(users)
        .where(inArray(users.id, [0, ...new Set(items.map((i) => i.fixerId).filter((x): x is number => x !== null))]))
    ).map((u) => [u.id, u.name]),
  );
  const card = (i: HallItem) => ({
    id: i.id,
    queueNumber: i.queueNumber,
    tagCode: i.tagCode,
    label: itemLabel(i),
    visitor: shortName(i.visitorName),
    status: i.status,
    fixerName: i.fixerId ? (names.get(i.fixerId) ?? null) : null,
    checkedInAt: i.checkedInAt,
    startedAt: i.startedAt,
    doneAt: i.doneAt,
    outcomeLabel: i.outcome ? OUTCOME_LABELS[i.outcome] : null,
    waitedMinutes: i.checkedInAt ? Math.floor((now.getTime() - i.checkedInAt.getTime()) / 60_000) : null,
    estimatedWaitMinutes: waits.get(i.id) ?? null,
  });
  const queued = items.filter((i) => isQueued(i.status)).sort((a, b) => (rank.get(a.id) ?? 0) - (rank.get(b.id) ?? 0));
  const busyFixers = new Set(items.filter((i) => i.status === 'at-bench').map((i) => i.fixerId));
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
    counts,
    benches: benches.map((b) => ({
      id: b.id,
      name: b.name,
      atBench: items.filter((i) => i.benchId === b.id && i.status === 'at-bench').map(card),
      waiting: queued.filter((i) => i.benchId === b.id).map(card),
      done: items.filter((i) => i.benchId === b.id && i.status === 'done').map(card),
    })),
    unplaced: queued.filter((i) => !i.benchId).map(card),
    fixers: fixers.map((f) => ({ userId: f.userId, name: f.name, busy: busyFixers.has(f.userId) })),
    warnings: liveWarnings(
      now.getTime(),
      queued.map((i) => ({
        id: i.id,
        checkedInAt: i.checkedInAt!.getTime(),
        label: `No. ${i.queueNumber} (${i.categoryName})`,
      })),
      fixers.map((f) => ({ userId: f.userId, name: f.name, busy: busyFixers.has(f.userId) })),
    ),
    updatedAt: now,
  };
}

/** What anyone scanning a tag sees: the item's kind, status and queue number — no names, no fault text. */
export async function publicTag(ctx: AppContext, code: string): Promise<PublicTag> {
  const [r] = await ctx.database.db
    .select({
      id: bookingItems.id,
      status: bookingItems.status,
      queueNumber: bookingItems.queueNumber,
      tagCode: bookingItems.tagCode,
      categoryName: categories.name,
      eventId: events.id,
      eventTitle: events.title,
      eventStatus: events.status,
      groupId: repairGroups.id,
      groupName: repairGroups.name,
      outcome: itemOutcomes.outcome,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .where(eq(bookingItems.tagCode, code));
  if (!r) throw notFound('That tag');
  let waitMinutes: number | null = null;
  if (isQueued(r.status)) {
    const now = new Date();
    const [items, fixers] = await Promise.all([hallItems(ctx, r.eventId), fixersNow(ctx, r.eventId, now)]);
    waitMinutes = waitsFor(items, fixers, now.getTime()).waits.get(r.id) ?? null;
  }
  return {
    tagCode: r.tagCode,
    itemId: r.id,
    groupId: r.groupId,
    groupName: r.groupName,
    eventId: r.eventId,
    eventTitle: r.eventTitle,
    categoryName: r.categoryName,
    status: r.status,
    statusLabel: ITEM_STATUS_LABELS[r.status],
    queueNumber: r.queueNumber,
    outcomeLabel: r.outcome ? OUTCOME_LABELS[r.outcome] : null,
    waitMinutes,
  };
}

/** Printable tags: one item, the items of a slot, or every checked-in item of the event. */
export async function tags(
  ctx: AppContext,
  eventId: number,
  filter: { slotId?: number; itemIds?: number[] },
): Promise<TagSheet> {
  const e = await eventHeader(ctx, eventId, false);
  const rows = await ctx.database.db
    .select({
      id: bookingItems.id,
      tagCode: bookingItems.tagCode,
      queueNumber: bookingItems.queueNumber,
      categoryName: categories.name,
      mains: bookingItems.mains,
      visitorName: bookings.visitorName,
      slotId: bookings.slotId,
      slotStartsAt: slots.startsAt,
      benchName: eventBenches.name,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(slots, eq(slots.id, bookings.slotId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemAssignments, eq(itemAssignments.itemId, bookingItems.id))
    .leftJoin(eventBenches, eq(eventBenches.id, itemAssignments.benchId))
    .where(
      and(
        eq(bookings.eventId, eventId),
        isNotNull(bookingItems.tagCode),
        ...(filter.slotId ? [eq(bookings.slotId, filter.slotId)] : []),
        ...(filter.itemIds?.length ? [inArray(bookingItems.id, filter.itemIds)] : []),
      ),
    )
    .orderBy(asc(bookingItems.queueNumber));
  return {
    event: { id: e.event.id, title: e.event.title, groupName: e.group.name, timeZone: e.group.timeZone },
    tags: await Promise.all(
      rows.map(async (r) => {
        const url = tagUrl(ctx.env.publicUrl, r.tagCode!);
        return {
          itemId: r.id,
          tagCode: r.tagCode!,
          url,
          qrSvg: await QRCode.toString(url, { type: 'svg', margin: 0, errorCorrectionLevel: 'M' }),
          queueNumber: r.queueNumber,
          categoryName: r.categoryName,
          mains: Boolean(r.mains),
          visitor: shortName(r.visitorName),
          slotStartsAt: r.slotStartsAt,
          benchName: r.benchName,
        };
      }),
    ),
  };
}
