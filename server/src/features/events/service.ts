import { generateSlots, freePlaces } from '../../../../shared/booking/slots';
import type { EventStatus } from '../../../../shared/constants';
import { asLanguage } from '../../../../shared/i18n/languages';
import { translate } from '../../i18n';
import { formatDay, formatTimeRange } from '../../../../shared/format';
import type { z } from 'zod';
import type { createEventSchema, eventListQuery, updateEventSchema } from '../../../../shared/schemas/events';
import type { AppContext } from '../../context';
import type { Tx } from '../../db/client';
import { HttpError, notFound } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { runHooks } from '../../core/hooks';
import { composeMail } from '../../mail/templates';
import { excludedCategoryIds } from '../../core/screening';
import {
  cancelConfirmedBookings,
  confirmedBookingsOf,
  deleteSlotRow,
  emptyCancelledEvent,
  eventWithGroupAndVenue,
  groupById,
  insertEventWithSlots,
  listEvents,
  lockEvent,
  replaceSlots,
  setSlotCapacity,
  skillCountsOf,
  slotOfEvent,
  updateEventRow,
  venueById,
} from './queries';
import { slotsOfEvent } from '../../core/events';

const conflict = (code: string, message: string) => new HttpError(409, code, message);

function slotPlans(startsAt: Date, endsAt: Date, slotMinutes: number, capacity: number) {
  try {
    return generateSlots(startsAt, endsAt, slotMinutes, capacity);
  } catch (err) {
    throw new HttpError(400, 'invalid', (err as Error).message, { slotMinutes: (err as Error).message });
  }
}

export async function createEvent(ctx: AppContext, input: z.output<typeof createEventSchema>) {
  const { db } = ctx.database;
  const venue = await venueById(db, input.venueId);
  if (!venue || venue.groupId !== input.groupId)
    throw new HttpError(400, 'invalid', 'errors.invalid', {
      venueId: 'Choose one of the group’s venues.',
    });
  const plans = slotPlans(input.startsAt, input.endsAt, input.slotMinutes, input.slotCapacity);
  if (plans.length === 0)
    throw new HttpError(400, 'invalid', 'errors.invalid', {
      slotMinutes: 'The opening hours are shorter than one slot.',
    });
  const id = await insertEventWithSlots(
    db,
    { ...input, description: input.description ?? '', skillLimits: input.skillLimits ?? {} },
    plans,
  );
  return getEvent(ctx, id, { includeDrafts: true });
}

export async function updateEvent(ctx: AppContext, id: number, input: z.output<typeof updateEventSchema>) {
  await ctx.database.db.transaction(async (tx) => {
    const e = await lockEvent(tx, id);
    if (!e) throw notFound('That session');
    const changesTimes = ['startsAt', 'endsAt', 'slotMinutes', 'slotCapacity', 'venueId', 'skillLimits'].some(
      (k) => k in input,
    );
    if (changesTimes && e.status !== 'draft')
      throw conflict('not-draft', 'Hours, venue, slots and limits can only change while the event is a draft.');
    if (e.status === 'cancelled') throw conflict('cancelled', 'A cancelled event cannot be changed.');
    const next = { ...e, ...input };
    if (next.endsAt <= next.startsAt)
      throw new HttpError(400, 'invalid', 'errors.invalid', {
        endsAt: 'The event must end after it starts.',
      });
    if (input.venueId !== undefined) {
      const venue = await venueById(tx, input.venueId);
      if (!venue || venue.groupId !== e.groupId)
        throw new HttpError(400, 'invalid', 'errors.invalid', {
          venueId: 'Choose one of the group’s venues.',
        });
    }
    await updateEventRow(tx, id, input);
    if (['startsAt', 'endsAt', 'slotMinutes', 'slotCapacity'].some((k) => k in input)) {
      const plans = slotPlans(next.startsAt, next.endsAt, next.slotMinutes, next.slotCapacity);
      if (plans.length === 0)
        throw new HttpError(400, 'invalid', 'errors.invalid', {
          slotMinutes: 'The opening hours are shorter than one slot.',
        });
      await replaceSlots(tx, id, plans);
    }
  });
  return getEvent(ctx, id, { includeDrafts: true });
}

async function lockDraftSlot(tx: Tx, eventId: number, slotId: number) {
  const e = await lockEvent(tx, eventId);
  if (!e) throw notFound('That session');
  if (e.status !== 'draft') throw conflict('not-draft', 'Slots can only be adjusted before the event is published.');
  const s = await slotOfEvent(tx, eventId, slotId);
  if (!s) throw notFound('That slot');
  return s;
}

export async function updateSlot(ctx: AppContext, eventId: number, slotId: number, capacity: number) {
  await ctx.database.db.transaction(async (tx) => {
    await lockDraftSlot(tx, eventId, slotId);
    await setSlotCapacity(tx, slotId, capacity);
  });
  return getEvent(ctx, eventId, { includeDrafts: true });
}

export async function deleteSlot(ctx: AppContext, eventId: number, slotId: number) {
  await ctx.database.db.transaction(async (tx) => {
    await lockDraftSlot(tx, eventId, slotId);
    await deleteSlotRow(tx, slotId);
  });
  return getEvent(ctx, eventId, { includeDrafts: true });
}

const transitions: Record<'publish' | 'close' | 'cancel', { from: EventStatus[]; to: EventStatus }> = {
  publish: { from: ['draft'], to: 'published' },
  close: { from: ['published'], to: 'closed' },
  cancel: { from: ['draft', 'published', 'closed'], to: 'cancelled' },
};

/** draft → published → closed, or → cancelled; cancelling mails everyone booked, in the same transaction. */
export async function changeStatus(ctx: AppContext, id: number, action: keyof typeof transitions, reason?: string) {
  const t = transitions[action];
  await ctx.database.db.transaction(async (tx) => {
    const e = await lockEvent(tx, id);
    if (!e) throw notFound('That session');
    if (!t.from.includes(e.status))
      throw new HttpError(409, 'bad-transition', 'problems.sessionCannotMove', undefined, {
        from: `events.status.${e.status}`,
        to: `events.status.${t.to}`,
      });
    if (action === 'publish') {
      const s = await slotsOfEvent(tx, id);
      if (!s.some((x) => x.capacity > 0))
        throw conflict('no-places', 'Give at least one slot a capacity above zero before publishing.');
      if (e.endsAt.getTime() < Date.now()) throw conflict('in-the-past', 'This event has already ended.');
    }
    await updateEventRow(tx, id, {
      status: t.to,
      ...(action === 'publish' ? { publishedAt: new Date() } : {}),
      ...(action === 'cancel' ? { cancelledAt: new Date() } : {}),
    });
    if (action === 'cancel') {
      const g = await groupById(tx, e.groupId);
      const booked = await confirmedBookingsOf(tx, id);
      for (const b of booked) {
        if (!b.visitorEmail) continue;
        // In the booking's language, not the organiser's: the visitor reads it.
        const lang = asLanguage(b.language, asLanguage(g.defaultLanguage));
        const m = (key: string, values?: Record<string, unknown>) => translate(lang, `mail.${key}`, values);
        const day = formatDay(e.startsAt, g.timeZone, lang);
        await enqueueMail(
          tx,
          composeMail(b.visitorEmail, m('sessionCancelled.subject', { event: e.title, day }), {
            paragraphs: [
              m('hello', { name: b.visitorName }),
              m('sessionCancelled.text', {
                group: g.name,
                event: e.title,
                day,
                time: formatTimeRange(e.startsAt, e.endsAt, g.timeZone, lang),
                reference: b.reference,
              }),
              ...(reason ? [m('sessionCancelled.reason', { reason })] : []),
              m('sessionCancelled.next'),
            ],
            action: { label: m('sessionCancelled.action'), url: `${ctx.env.publicUrl}/events` },
            language: lang,
          }),
        );
      }
      await cancelConfirmedBookings(tx, id);
      // A cancelled session counts nothing in the statistics, even if the desk had started.
      await runHooks(ctx.hooks.eventsCancelled, tx, { eventIds: [id] });
      await emptyCancelledEvent(tx, id);
    }
  });
  ctx.outbox.kick();
  return getEvent(ctx, id, { includeDrafts: true });
}

export async function getEvent(ctx: AppContext, id: number, opts: { includeDrafts: boolean }) {
  const { db } = ctx.database;
  const e = await eventWithGroupAndVenue(db, id);
  if (!e || (!opts.includeDrafts && e.status === 'draft')) throw notFound('That session');
  const rows = await slotsOfEvent(db, id);
  const counts = await skillCountsOf(
    db,
    rows.map((r) => r.id),
  );
  const slotDtos = rows.map((s) => ({
    id: s.id,
    startsAt: s.startsAt,
    endsAt: s.endsAt,
    capacity: s.capacity,
    booked: s.booked,
    held: s.held,
    free: freePlaces(s),
    /** Items of each skill booked at this time, held against the event's skillLimits (shared/booking/bookability). */
    skillTaken: Object.fromEntries(counts.filter((c) => c.slotId === s.id).map((c) => [c.skill, c.booked])),
  }));
  return {
    ...e,
    houseRules: e.houseRules ?? '',
    excludedCategoryIds: await excludedCategoryIds(db, e.groupId),
    totalPlaces: slotDtos.reduce((n, s) => n + s.capacity, 0),
    freePlaces: slotDtos.reduce((n, s) => n + s.free, 0),
    slots: slotDtos,
  };
}

/** Published events for the public calendar and list, with free places. */
export async function listPublicEvents(ctx: AppContext, q: z.output<typeof eventListQuery>) {
  return shapeList(
    await listEvents(ctx.database.db, {
      published: true,
      from: q.from ? new Date(q.from) : undefined,
      to: q.to ? new Date(q.to) : undefined,
      groupId: q.groupId,
      takesCategoryId: q.categoryId,
    }),
  );
}

export async function listGroupEvents(ctx: AppContext, groupId: number) {
  return shapeList(await listEvents(ctx.database.db, { groupId }));
}

const shapeList = (rows: Awaited<ReturnType<typeof listEvents>>) =>
  rows.map((r) => ({
    ...r,
    houseRules: undefined,
    totalPlaces: Number(r.totalPlaces),
    freePlaces: Number(r.freePlaces),
  }));
