import type { DeskBooking, DeskEvent, DeskView } from '../../../../shared/api/event-day';
import type { SessionUser } from '../../../../shared/schemas/auth';
import type { AppContext } from '../../context';
import { HttpError, notFound } from '../../http/errors';
import * as q from './queries/desk';
import { eventWithGroup, slotsOfEvent } from '../../core/events';
import { categoryText } from '../../i18n';
import { DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';

/** The desk opens 12 hours before the event starts and closes 12 hours after it ends. */
const DESK_OPENS_H = 12;

export function assertDeskOpen(e: { status: string; startsAt: Date; endsAt: Date }) {
  if (e.status === 'cancelled') throw new HttpError(409, 'not-open', 'This event has been cancelled.');
  if (e.status === 'draft') throw new HttpError(409, 'not-open', 'This event is not published.');
  const now = Date.now();
  if (now < e.startsAt.getTime() - DESK_OPENS_H * 3600_000)
    throw new HttpError(409, 'not-open', 'Check-in opens on the day of the event.');
  if (now > e.endsAt.getTime() + DESK_OPENS_H * 3600_000) throw new HttpError(409, 'not-open', 'This event is over.');
}

/** The slot running now; before the first, the first; after the last, the last. */
export function currentSlot<T extends { startsAt: Date; endsAt: Date }>(list: T[], now: number): T | undefined {
  return (
    list.find((s) => s.startsAt.getTime() <= now && s.endsAt.getTime() > now) ??
    list.find((s) => s.startsAt.getTime() > now) ??
    list[list.length - 1]
  );
}

/** Today's desk: every booking of the event by slot, with its items' status, tag and queue number. */
export async function deskView(ctx: AppContext, eventId: number, lang: Language = DEFAULT_LANGUAGE): Promise<DeskView> {
  const { db } = ctx.database;
  const e = await eventWithGroup(db, eventId);
  if (!e) throw notFound('That event');
  const slotRows = await slotsOfEvent(db, eventId);
  const rows = await q.deskRows(db, eventId);
  const byBooking = new Map<number, DeskBooking>();
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
      categoryName: categoryText(lang, r.categorySlug, 'name', r.categoryName),
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
  const groupIds = user.admin ? undefined : await q.deskGroupIds(db, user.id);
  if (groupIds && groupIds.length === 0) return [];
  const since = new Date(Date.now() - DESK_OPENS_H * 3600_000);
  const rows = await q.deskEventRows(db, since, new Date(Date.now() + 60 * 86400_000), groupIds);
  const now = Date.now();
  return rows.map((r) => ({ ...r, open: now >= r.startsAt.getTime() - DESK_OPENS_H * 3600_000 }));
}
