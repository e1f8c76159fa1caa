import { and, asc, eq, gte, inArray, lte, notInArray, sql } from 'drizzle-orm';
import { generateSlots, freePlaces } from '../../../../shared/booking/slots';
import type { EventStatus } from '../../../../shared/constants';
import { formatDay, formatTimeRange } from '../../../../shared/format';
import type { z } from 'zod';
import type { createEventSchema, eventListQuery, updateEventSchema } from '../../../../shared/schemas/events';
import type { AppContext } from '../../context';
import type { DbOrTx } from '../../db/client';
import {
  bookings,
  events,
  groupExclusions,
  repairGroups,
  slots,
  slotSkillCounts,
  venues,
  waitlistEntries,
} from '../../db/schema/index';
import { HttpError, notFound } from '../../http/errors';
import { enqueueMail } from '../../mail/outbox';
import { runHooks } from '../../core/hooks';
import { composeMail } from '../../mail/templates';
import { excludedCategoryIds } from '../../core/screening';

const conflict = (code: string, message: string) => new HttpError(409, code, message);

function slotPlans(startsAt: Date, endsAt: Date, slotMinutes: number, capacity: number) {
  try {
    return generateSlots(startsAt, endsAt, slotMinutes, capacity);
  } catch (err) {
    throw new HttpError(400, 'invalid', (err as Error).message, { slotMinutes: (err as Error).message });
  }
}

const eventColumns = {
  id: events.id,
  groupId: events.groupId,
  title: events.title,
  description: events.description,
  status: events.status,
  startsAt: events.startsAt,
  endsAt: events.endsAt,
  slotMinutes: events.slotMinutes,
  slotCapacity: events.slotCapacity,
  skillLimits: events.skillLimits,
  groupName: repairGroups.name,
  timeZone: repairGroups.timeZone,
  houseRules: repairGroups.houseRules,
  venue: {
    id: venues.id,
    name: venues.name,
    address: venues.address,
    town: venues.town,
    accessNotes: venues.accessNotes,
  },
};

export async function createEvent(ctx: AppContext, input: z.output<typeof createEventSchema>) {
  const { db } = ctx.database;
  const [venue] = await db.select().from(venues).where(eq(venues.id, input.venueId));
  if (!venue || venue.groupId !== input.groupId)
    throw new HttpError(400, 'invalid', 'Some fields need attention.', {
      venueId: 'Choose one of the group’s venues.',
    });
  const plans = slotPlans(input.startsAt, input.endsAt, input.slotMinutes, input.slotCapacity);
  if (plans.length === 0)
    throw new HttpError(400, 'invalid', 'Some fields need attention.', {
      slotMinutes: 'The opening hours are shorter than one slot.',
    });
  const id = await db.transaction(async (tx) => {
    const [{ id }] = await tx
      .insert(events)
      .values({ ...input, description: input.description ?? '', skillLimits: input.skillLimits ?? {} })
      .$returningId();
    await tx.insert(slots).values(plans.map((p) => ({ eventId: id, ...p })));
    return id;
  });
  return getEvent(ctx, id, { includeDrafts: true });
}

export async function updateEvent(ctx: AppContext, id: number, input: z.output<typeof updateEventSchema>) {
  await ctx.database.db.transaction(async (tx) => {
    const [e] = await tx.select().from(events).where(eq(events.id, id)).for('update');
    if (!e) throw notFound('That event');
    const changesTimes = ['startsAt', 'endsAt', 'slotMinutes', 'slotCapacity', 'venueId', 'skillLimits'].some(
      (k) => k in input,
    );
    if (changesTimes && e.status !== 'draft')
      throw conflict('not-draft', 'Hours, venue, slots and limits can only change while the event is a draft.');
    if (e.status === 'cancelled') throw conflict('cancelled', 'A cancelled event cannot be changed.');
    const next = { ...e, ...input };
    if (next.endsAt <= next.startsAt)
      throw new HttpError(400, 'invalid', 'Some fields need attention.', {
        endsAt: 'The event must end after it starts.',
      });
    if (input.venueId !== undefined) {
      const [venue] = await tx.select().from(venues).where(eq(venues.id, input.venueId));
      if (!venue || venue.groupId !== e.groupId)
        throw new HttpError(400, 'invalid', 'Some fields need attention.', {
          venueId: 'Choose one of the group’s venues.',
        });
    }
    await tx.update(events).set(input).where(eq(events.id, id));
    if (['startsAt', 'endsAt', 'slotMinutes', 'slotCapacity'].some((k) => k in input)) {
      const plans = slotPlans(next.startsAt, next.endsAt, next.slotMinutes, next.slotCapacity);
      if (plans.length === 0)
        throw new HttpError(400, 'invalid', 'Some fields need attention.', {
          slotMinutes: 'The opening hours are shorter than one slot.',
        });
      await tx.delete(slots).where(eq(slots.eventId, id));
      await tx.insert(slots).values(plans.map((p) => ({ eventId: id, ...p })));
    }
  });
  return getEvent(ctx, id, { includeDrafts: true });
}

async function lockDraftSlot(tx: DbOrTx, eventId: number, slotId: number) {
  const [e] = await tx.select().from(events).where(eq(events.id, eventId)).for('update');
  if (!e) throw notFound('That event');
  if (e.status !== 'draft') throw conflict('not-draft', 'Slots can only be adjusted before the event is published.');
  const [s] = await tx
    .select()
    .from(slots)
    .where(and(eq(slots.id, slotId), eq(slots.eventId, eventId)));
  if (!s) throw notFound('That slot');
  return s;
}

export async function updateSlot(ctx: AppContext, eventId: number, slotId: number, capacity: number) {
  await ctx.database.db.transaction(async (tx) => {
    await lockDraftSlot(tx, eventId, slotId);
    await tx.update(slots).set({ capacity }).where(eq(slots.id, slotId));
  });
  return getEvent(ctx, eventId, { includeDrafts: true });
}

export async function deleteSlot(ctx: AppContext, eventId: number, slotId: number) {
  await ctx.database.db.transaction(async (tx) => {
    await lockDraftSlot(tx, eventId, slotId);
    await tx.delete(slots).where(eq(slots.id, slotId));
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
    const [e] = await tx.select().from(events).where(eq(events.id, id)).for('update');
    if (!e) throw notFound('That event');
    if (!t.from.includes(e.status)) throw conflict('bad-transition', `A ${e.status} event cannot be ${t.to}.`);
    if (action === 'publish') {
      const s = await tx.select().from(slots).where(eq(slots.eventId, id));
      if (!s.some((x) => x.capacity > 0))
        throw conflict('no-places', 'Give at least one slot a capacity above zero before publishing.');
      if (e.endsAt.getTime() < Date.now()) throw conflict('in-the-past', 'This event has already ended.');
    }
    await tx
      .update(events)
      .set({
        status: t.to,
        ...(action === 'publish' ? { publishedAt: new Date() } : {}),
        ...(action === 'cancel' ? { cancelledAt: new Date() } : {}),
      })
      .where(eq(events.id, id));
    if (action === 'cancel') {
      const [g] = await tx.select().from(repairGroups).where(eq(repairGroups.id, e.groupId));
      const booked = await tx
        .select()
        .from(bookings)
        .where(and(eq(bookings.eventId, id), eq(bookings.status, 'confirmed')));
      for (const b of booked) {
        if (!b.visitorEmail) continue;
        await enqueueMail(
          tx,
          composeMail(b.visitorEmail, `Cancelled: ${e.title} on ${formatDay(e.startsAt, g.timeZone)}`, {
            paragraphs: [
              `Hello ${b.visitorName},`,
              `we are sorry: ${g.name} has had to cancel ${e.title} on ${formatDay(e.startsAt, g.timeZone)} (${formatTimeRange(e.startsAt, e.endsAt, g.timeZone)}). Your booking ${b.reference} is cancelled, so please do not come to the venue.`,
              ...(reason ? [`The organisers say: ${reason}`] : []),
              'Look out for the group’s next date; you are welcome to book again.',
            ],
            action: { label: 'See upcoming events', url: `${ctx.env.publicUrl}/events` },
          }),
        );
      }
      await tx
        .update(bookings)
        .set({ status: 'cancelled', cancelledAt: new Date() })
        .where(and(eq(bookings.eventId, id), eq(bookings.status, 'confirmed')));
      // A cancelled session counts nothing in the statistics, even if the desk had started.
      await runHooks(ctx.hooks.eventsCancelled, tx, { eventIds: [id] });
      // Nothing is booked or held at a cancelled event.
      await tx.update(slots).set({ booked: 0, held: 0 }).where(eq(slots.eventId, id));
      await tx
        .update(waitlistEntries)
        .set({ status: 'withdrawn' })
        .where(and(eq(waitlistEntries.eventId, id), inArray(waitlistEntries.status, ['waiting', 'offered'])));
    }
  });
  ctx.outbox.kick();
  return getEvent(ctx, id, { includeDrafts: true });
}

export async function getEvent(ctx: AppContext, id: number, opts: { includeDrafts: boolean }) {
  const { db } = ctx.database;
  const [e] = await db
    .select(eventColumns)
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId))
    .where(eq(events.id, id));
  if (!e || (!opts.includeDrafts && e.status === 'draft')) throw notFound('That event');
  const rows = await db.select().from(slots).where(eq(slots.eventId, id)).orderBy(asc(slots.startsAt));
  const counts = rows.length
    ? await db
        .select()
        .from(slotSkillCounts)
        .where(
          inArray(
            slotSkillCounts.slotId,
            rows.map((r) => r.id),
          ),
        )
    : [];
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
  const { db } = ctx.database;
  const conditions = [eq(events.status, 'published')];
  if (q.from) conditions.push(gte(events.endsAt, new Date(q.from)));
  if (q.to) conditions.push(lte(events.startsAt, new Date(q.to)));
  if (q.groupId) conditions.push(eq(events.groupId, q.groupId));
  if (q.categoryId) {
    const excluding = db
      .select({ g: groupExclusions.groupId })
      .from(groupExclusions)
      .where(eq(groupExclusions.categoryId, q.categoryId));
    conditions.push(notInArray(events.groupId, excluding));
  }
  return listEvents(db, and(...conditions)!);
}

export async function listGroupEvents(ctx: AppContext, groupId: number) {
  return listEvents(ctx.database.db, eq(events.groupId, groupId));
}

async function listEvents(db: DbOrTx, where: ReturnType<typeof and>) {
  const rows = await db
    .select({
      ...eventColumns,
      totalPlaces: sql<number>`(SELECT COALESCE(SUM(s.capacity), 0) FROM ${slots} s WHERE s.event_id = ${events.id})`,
      freePlaces: sql<number>`(SELECT COALESCE(SUM(GREATEST(s.capacity - s.booked - s.held, 0)), 0) FROM ${slots} s WHERE s.event_id = ${events.id})`,
    })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(venues, eq(venues.id, events.venueId))
    .where(where)
    .orderBy(asc(events.startsAt))
    .limit(500);
  return rows.map((r) => ({
    ...r,
    houseRules: undefined,
    totalPlaces: Number(r.totalPlaces),
    freePlaces: Number(r.freePlaces),
  }));
}
