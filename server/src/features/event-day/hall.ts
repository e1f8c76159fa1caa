import QRCode from 'qrcode';
import { isQueued, type Outcome } from '../../../../shared/event-day/constants';
import { tallyStatuses } from '../../../../shared/event-day/tallies';
import { estimateWaits, liveWarnings, queueOrder } from '../../../../shared/event-day/queue';
import { shortName, tagUrl } from '../../../../shared/event-day/tag-code';
import { itemLabel } from '../../../../shared/item-label';
import type { HallQueue, LiveView, PublicTag, TagSheet } from '../../../../shared/api/event-day';
import type { AppContext } from '../../context';
import { notFound } from '../../http/errors';
import { eventBenchesAsTheyStand, eventLayout } from '../../core/benches';
import * as q from './queries/hall';
import { eventWithGroup } from '../../core/events';
import { categoryText, translate } from '../../i18n';
import type { Language } from '../../../../shared/i18n/languages';

type HallItem = q.HallItem;

/** The kind of item in the reader's language (a group's own kinds keep their stored name). */
const kindOf = (lang: Language, r: { categorySlug: string; categoryName: string }) =>
  categoryText(lang, r.categorySlug, 'name', r.categoryName);
const outcomeLabel = (lang: Language, outcome: Outcome | null) =>
  outcome ? translate(lang, `fixer.outcomeValue.${outcome}`) : null;
const hallItems = (ctx: AppContext, eventId: number) => q.hallItems(ctx.database.db, eventId);
const fixersNow = (ctx: AppContext, eventId: number, now: Date) => q.fixersNow(ctx.database.db, eventId, now);

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
  const e = await eventWithGroup(ctx.database.db, eventId);
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
    // The public display takes no lock and writes nothing: until the layout is copied, no item has a bench.
    eventBenchesAsTheyStand(ctx.database.db, eventId),
  ]);
  const benchName = new Map(benches.map((b) => [b.id, b.name]));
  const { order, waits } = waitsFor(items, fixers, now.getTime());
  const byId = new Map(items.map((i) => [i.id, i]));
  return {
    event: {
      id: e.event.id,
      title: e.event.title,
      groupName: e.group.name,
      groupLanguage: e.group.defaultLanguage,
      timeZone: e.group.timeZone,
      startsAt: e.event.startsAt,
      endsAt: e.event.endsAt,
    },
    serving: items
      .filter((i) => i.status === 'at-bench')
      .sort((a, b) => (a.startedAt?.getTime() ?? 0) - (b.startedAt?.getTime() ?? 0))
      .map((i) => ({ queueNumber: i.queueNumber, benchName: i.benchId ? (benchName.get(i.benchId) ?? null) : null })),
    waiting: order.map((q) => ({ queueNumber: byId.get(q.id)!.queueNumber, waitMinutes: waits.get(q.id) ?? null })),
    done: tallyStatuses(items.map((i) => i.status)).done,
    fixersOnHand: fixers.length,
    updatedAt: now,
  };
}

/** The organiser's live view: waiting, at bench and done by bench, the fixers on shift, and warnings. */
export async function liveView(ctx: AppContext, eventId: number, lang: Language): Promise<LiveView> {
  const e = await eventHeader(ctx, eventId, false);
  const now = new Date();
  const [items, fixers, benches] = await Promise.all([
    hallItems(ctx, eventId),
    fixersNow(ctx, eventId, now),
    eventLayout(ctx.database.db, eventId),
  ]);
  const allBooked = await q.bookedStatuses(ctx.database.db, eventId);
  const counts = tallyStatuses(allBooked.map((b) => b.status));
  const { waits, order } = waitsFor(items, fixers, now.getTime());
  const rank = new Map(order.map((q, i) => [q.id, i]));
  const names = await q.userNames(ctx.database.db, [
    ...new Set(items.map((i) => i.fixerId).filter((x): x is number => x !== null)),
  ]);
  const card = (i: HallItem) => ({
    id: i.id,
    queueNumber: i.queueNumber,
    tagCode: i.tagCode,
    label: itemLabel({ ...i, categoryName: kindOf(lang, i) }),
    visitor: shortName(i.visitorName),
    status: i.status,
    fixerName: i.fixerId ? (names.get(i.fixerId) ?? null) : null,
    checkedInAt: i.checkedInAt,
    startedAt: i.startedAt,
    doneAt: i.doneAt,
    outcomeLabel: outcomeLabel(lang, i.outcome),
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
        label: translate(lang, 'desk.live.itemLabel', { number: i.queueNumber ?? '—', kind: kindOf(lang, i) }),
      })),
      fixers.map((f) => ({ userId: f.userId, name: f.name, busy: busyFixers.has(f.userId) })),
    ),
    updatedAt: now,
  };
}

/** What anyone scanning a tag sees: the item's kind, status and queue number — no names, no fault text. */
export async function publicTag(ctx: AppContext, code: string, lang: Language): Promise<PublicTag> {
  const r = await q.tagRow(ctx.database.db, code);
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
    categoryName: kindOf(lang, r),
    status: r.status,
    statusLabel: translate(lang, `fixer.status.${r.status}`),
    queueNumber: r.queueNumber,
    outcomeLabel: outcomeLabel(lang, r.outcome),
    waitMinutes,
  };
}

/** Printable tags: one item, the items of a slot, or every checked-in item of the event. */
export async function tags(
  ctx: AppContext,
  eventId: number,
  filter: { slotId?: number; itemIds?: number[] },
  lang: Language,
): Promise<TagSheet> {
  const e = await eventHeader(ctx, eventId, false);
  const rows = await q.tagSheetRows(ctx.database.db, eventId, filter);
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
          categoryName: kindOf(lang, r),
          mains: Boolean(r.mains),
          visitor: shortName(r.visitorName),
          slotStartsAt: r.slotStartsAt,
          benchName: r.benchName,
        };
      }),
    ),
  };
}
