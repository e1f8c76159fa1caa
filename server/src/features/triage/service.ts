import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import { itemNeeds, checkPlacement } from '../../../../shared/triage/needs';
import { triage, type TriageInput, type TriageResult } from '../../../../shared/triage/engine';
import { dayPlan } from '../../../../shared/triage/day-plan';
import type { AppContext } from '../../context';
import {
  bookingItems,
  bookings,
  categories,
  events,
  itemAssignments,
  itemPhotos,
  repairGroups,
  shifts,
  slots,
  triageRuns,
  users,
} from '../../db/schema/index';
import { HttpError, notFound } from '../../http/errors';
import { skillsOf } from '../../core/skills';
import { eventLayout } from '../../core/benches';

/** Everything the board shows and the engine needs, read in a handful of queries. */
async function loadEvent(ctx: AppContext, eventId: number) {
  const { db } = ctx.database;
  const [e] = await db
    .select({ event: events, group: repairGroups })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(eq(events.id, eventId));
  if (!e) throw notFound('That event');
  const slotRows = await db.select().from(slots).where(eq(slots.eventId, eventId)).orderBy(asc(slots.startsAt));
  const items = await db
    .select({
      id: bookingItems.id,
      status: bookingItems.status,
      bookingId: bookings.id,
      reference: bookings.reference,
      visitorName: bookings.visitorName,
      bookedAt: bookings.createdAt,
      slotId: bookings.slotId,
      categoryName: categories.name,
      skill: categories.skill,
      equipment: categories.equipment,
      catMains: categories.mains,
      minutes: categories.repairMinutes,
      brand: bookingItems.brand,
      model: bookingItems.model,
      fault: bookingItems.fault,
      mains: bookingItems.mains,
      position: bookingItems.position,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    // Items still to be repaired, and those at a bench now (they hold their fixer and bench); walk-ins after the booked.
    .where(
      and(
        eq(bookings.eventId, eventId),
        eq(bookings.status, 'confirmed'),
        inArray(bookingItems.status, ['booked', 'checked-in', 'waiting', 'at-bench']),
      ),
    )
    .orderBy(asc(bookings.walkIn), asc(bookings.createdAt), asc(bookingItems.position));
  const photos = items.length
    ? await db
        .select({ id: itemPhotos.id, itemId: itemPhotos.itemId })
        .from(itemPhotos)
        .where(
          inArray(
            itemPhotos.itemId,
            items.map((i) => i.id),
          ),
        )
    : [];
  const fixers = await db
    .select({ shift: shifts, name: users.name })
    .from(shifts)
    .innerJoin(users, eq(users.id, shifts.userId))
    .where(and(eq(shifts.eventId, eventId), eq(shifts.coming, true)))
    .orderBy(asc(users.name));
  const skills = await skillsOf(
    db,
    fixers.map((f) => f.shift.userId),
  );
  const benches = await eventLayout(ctx.database.db, eventId);
  const live = new Set(items.map((i) => i.id));
  const placed = (await db.select().from(itemAssignments).where(eq(itemAssignments.eventId, eventId))).filter((p) =>
    live.has(p.itemId),
  );
  const slotIndex = new Map(slotRows.map((s, i) => [s.id, i]));
  const enriched = items.map((i, order) => ({
    ...i,
    mains: Boolean(i.mains),
    slotIndex: slotIndex.get(i.slotId) ?? 0,
    order,
    needs: itemNeeds(
      { skill: i.skill, equipment: i.equipment, mains: Boolean(i.catMains) },
      { mains: Boolean(i.mains) },
    ),
    photoIds: photos.filter((p) => p.itemId === i.id).map((p) => p.id),
  }));
  return {
    event: e.event,
    group: e.group,
    slots: slotRows,
    items: enriched,
    fixers: fixers.map((f) => ({
      userId: f.shift.userId,
      name: f.name,
      startsAt: f.shift.startsAt,
      endsAt: f.shift.endsAt,
      benchId: f.shift.benchId,
      skills: skills.get(f.shift.userId)!,
    })),
    benches,
    placed,
  };
}

type Loaded = Awaited<ReturnType<typeof loadEvent>>;

/** Booked items are served in the order of their slot, then of booking. */
const priorityOf = (i: Loaded['items'][number]) => i.slotIndex * 1000 + i.order;

/** The time a placed repair keeps its fixer and bench busy: from its planned start for its category's minutes. */
function windowOf(data: Loaded, itemId: number, startsAt: Date | null): [number, number] {
  const i = data.items.find((x) => x.id === itemId);
  const slot = data.slots.find((s) => s.id === i?.slotId);
  const from = (startsAt ?? slot?.startsAt ?? data.event.startsAt).getTime();
  return [from, from + Math.max(data.event.slotMinutes, i?.minutes ?? data.event.slotMinutes) * 60_000];
}
const overlap = (a: [number, number], b: [number, number]) => a[0] < b[1] && b[0] < a[1];

/** How many other placements keep this fixer (or bench) busy at the same time as the given window. */
function busyDuring(
  data: Loaded,
  key: 'userId' | 'benchId',
  id: number,
  window: [number, number],
  exceptItem?: number,
) {
  return data.placed.filter(
    (p) => p[key] === id && p.itemId !== exceptItem && overlap(windowOf(data, p.itemId, p.startsAt), window),
  ).length;
}

/**
 * Runs the engine. For the whole session it plans the day round by round (one round per slot, repairs keeping
 * their fixer and bench for their minutes, waiting items carried forward); for one slot it fills what is free in
 * that slot. Locked placements are kept and hold their fixer and bench for their time. Each run is stored with
 * its exact input and result.
 */
export async function runTriage(ctx: AppContext, eventId: number, slotId: number | undefined, userId: number) {
  const data = await loadEvent(ctx, eventId);
  const slot = slotId ? data.slots.find((s) => s.id === slotId) : undefined;
  if (slotId && !slot)
    throw new HttpError(400, 'invalid', 'Some fields need attention.', {
      slotId: 'That slot is not part of this event.',
    });
  // A repair under way is as fixed as a locked placement.
  const atBench = new Set(data.items.filter((i) => i.status === 'at-bench').map((i) => i.id));
  const locked = data.placed.filter((p) => p.locked || atBench.has(p.itemId));
  const lockedItems = new Set(locked.map((p) => p.itemId));
  const pool = data.items.filter(
    (i) => !lockedItems.has(i.id) && !atBench.has(i.id) && (!slot || i.slotId === slot.id),
  );
  const poolIds = new Set(pool.map((i) => i.id));
  const fixerOf = (f: Loaded['fixers'][number], capacity: number) => ({
    id: String(f.userId),
    name: f.name,
    skills: f.skills,
    capacity,
    ...(f.benchId ? { benchId: String(f.benchId) } : {}),
  });
  const benchOf = (b: Loaded['benches'][number], seats: number) => ({
    id: String(b.id),
    name: b.name,
    equipment: b.equipment,
    seats,
  });

  let input: unknown;
  let result: TriageResult;
  let starts = new Map<string, Date>();
  if (slot) {
    const w: [number, number] = [slot.startsAt.getTime(), slot.endsAt.getTime()];
    // Whatever else is placed at this time (locked, or from an earlier run outside this slot) keeps its room.
    const keep = { ...data, placed: data.placed.filter((p) => !poolIds.has(p.itemId) || lockedItems.has(p.itemId)) };
    const present = data.fixers.filter((f) => f.startsAt <= slot.startsAt && f.endsAt >= slot.endsAt);
    const round: TriageInput = {
      items: pool.map((i) => ({
        id: String(i.id),
        skill: i.needs.skill,
        minLevel: i.needs.minLevel,
        equipment: i.needs.equipment,
        priority: priorityOf(i),
      })),
      volunteers: present.map((f) => fixerOf(f, Math.max(0, 1 - busyDuring(keep, 'userId', f.userId, w)))),
      benches: data.benches.map((b) => benchOf(b, Math.max(0, b.seats - busyDuring(keep, 'benchId', b.id, w)))),
    };
    input = round;
    result = triage(round);
    starts = new Map(result.assignments.map((a) => [a.itemId, slot.startsAt]));
  } else {
    const roundOf = (t: Date) =>
      Math.max(
        0,
        data.slots.findIndex((s) => s.endsAt > t),
      );
    const plan = {
      slots: data.slots.map((s) => ({ id: String(s.id), startsAt: s.startsAt, endsAt: s.endsAt })),
      items: pool.map((i) => ({
        id: String(i.id),
        slotIndex: i.slotIndex,
        skill: i.needs.skill,
        minLevel: i.needs.minLevel,
        equipment: i.needs.equipment,
        minutes: i.minutes,
        order: i.order,
      })),
      volunteers: data.fixers.map((f) => ({ ...fixerOf(f, 1), from: f.startsAt, to: f.endsAt })),
      benches: data.benches.map((b) => benchOf(b, b.seats)),
      reserved: locked.map((p) => {
        const [from, to] = windowOf(data, p.itemId, p.startsAt);
        return {
          volunteerId: String(p.userId),
          benchId: String(p.benchId),
          fromRound: roundOf(new Date(from)),
          untilRound: Math.max(roundOf(new Date(from)) + 1, roundOf(new Date(to - 1)) + 1),
        };
      }),
    };
    input = plan;
    const day = dayPlan(plan);
    const placedIds = pool.filter((i) => day.placement[String(i.id)]);
    const waiting = pool.filter((i) => !day.placement[String(i.id)]);
    // Why the rest wait all day: the engine's reason with everyone free, or "busy" when room was the only lack.
    const why = triage({
      items: waiting.map((i) => ({
        id: String(i.id),
        skill: i.needs.skill,
        minLevel: i.needs.minLevel,
        equipment: i.needs.equipment,
        priority: priorityOf(i),
      })),
      volunteers: plan.volunteers,
      benches: plan.benches,
    });
    const reasons = new Map(why.unassigned.map((u) => [u.itemId, u]));
    result = {
      assignments: placedIds.map((i) => ({ itemId: String(i.id), ...day.placement[String(i.id)]! })),
      unassigned: waiting.map(
        (i) =>
          reasons.get(String(i.id)) ?? {
            itemId: String(i.id),
            reason: 'capacity' as const,
            detail: 'Every fixer and bench that could take it is busy in each slot from its booking to closing time.',
          },
      ),
    };
    starts = new Map(placedIds.map((i) => [String(i.id), day.start[String(i.id)]!]));
  }

  const { db } = ctx.database;
  const runId = await db.transaction(async (tx) => {
    const [{ id }] = await tx
      .insert(triageRuns)
      .values({ eventId, slotId: slot?.id ?? null, input, result, lockedKept: locked.length, createdBy: userId })
      .$returningId();
    if (poolIds.size)
      await tx
        .delete(itemAssignments)
        .where(
          and(
            eq(itemAssignments.eventId, eventId),
            eq(itemAssignments.locked, false),
            inArray(itemAssignments.itemId, [...poolIds]),
          ),
        );
    if (result.assignments.length) {
      await tx.insert(itemAssignments).values(
        result.assignments.map((a) => ({
          itemId: Number(a.itemId),
          eventId,
          userId: Number(a.volunteerId),
          benchId: Number(a.benchId),
          startsAt: starts.get(a.itemId) ?? null,
          source: 'engine' as const,
          runId: id,
          locked: false,
        })),
      );
    }
    return id;
  });
  return {
    runId,
    assigned: result.assignments.length,
    unassigned: result.unassigned.length,
    lockedKept: locked.length,
  };
}

/** The triage board: benches and fixers with their items, the unplaced items with reasons, the day plan. */
export async function board(ctx: AppContext, eventId: number) {
  const data = await loadEvent(ctx, eventId);
  const { db } = ctx.database;
  const runs = await db
    .select({
      id: triageRuns.id,
      slotId: triageRuns.slotId,
      createdAt: triageRuns.createdAt,
      result: triageRuns.result,
      lockedKept: triageRuns.lockedKept,
    })
    .from(triageRuns)
    .where(eq(triageRuns.eventId, eventId))
    .orderBy(desc(triageRuns.id))
    .limit(20);
  const latest = runs[0]?.result as TriageResult | undefined;
  const reasons = new Map((latest?.unassigned ?? []).map((u) => [Number(u.itemId), u]));
  const placedBy = new Map(data.placed.map((p) => [p.itemId, p]));
  const plan = dayPlan({
    slots: data.slots.map((s) => ({ id: String(s.id), startsAt: s.startsAt, endsAt: s.endsAt })),
    items: data.items.map((i) => ({
      id: String(i.id),
      slotIndex: i.slotIndex,
      skill: i.needs.skill,
      minLevel: i.needs.minLevel,
      equipment: i.needs.equipment,
      minutes: i.minutes,
      order: i.order,
    })),
    volunteers: data.fixers.map((f) => ({
      id: String(f.userId),
      skills: f.skills,
      from: f.startsAt,
      to: f.endsAt,
      ...(f.benchId ? { benchId: String(f.benchId) } : {}),
    })),
    benches: data.benches.map((b) => ({ id: String(b.id), equipment: b.equipment, seats: b.seats })),
  });
  const items = data.items.map((i) => {
    const p = placedBy.get(i.id);
    const fixer = p && data.fixers.find((f) => f.userId === p.userId);
    const bench = p && data.benches.find((b) => b.id === p.benchId);
    const w = p ? windowOf(data, i.id, p.startsAt) : null;
    const warnings =
      p && fixer && bench && w
        ? checkPlacement(
            i.needs,
            {
              name: fixer.name,
              skills: fixer.skills,
              benchId: fixer.benchId,
              capacity: 1,
              assigned: busyDuring(data, 'userId', fixer.userId, w, i.id),
            },
            {
              id: bench.id,
              name: bench.name,
              equipment: bench.equipment,
              seats: bench.seats,
              assigned: busyDuring(data, 'benchId', bench.id, w, i.id),
            },
          )
        : p
          ? [{ code: 'missing-skill' as const, message: 'The fixer is no longer coming or the bench was removed.' }]
          : [];
    return {
      id: i.id,
      reference: i.reference,
      visitorName: i.visitorName,
      bookedAt: i.bookedAt,
      slotId: i.slotId,
      categoryName: i.categoryName,
      brand: i.brand,
      model: i.model,
      fault: i.fault,
      mains: i.mains,
      minutes: i.minutes,
      needs: i.needs,
      photoIds: i.photoIds,
      placement: p
        ? { userId: p.userId, benchId: p.benchId, locked: Boolean(p.locked), source: p.source, startsAt: p.startsAt }
        : null,
      warnings,
      reason: p ? null : (reasons.get(i.id) ?? null),
      estimatedStart: p ? (p.startsAt ?? plan.start[String(i.id)]) : null,
    };
  });
  return {
    event: {
      id: data.event.id,
      title: data.event.title,
      status: data.event.status,
      startsAt: data.event.startsAt,
      endsAt: data.event.endsAt,
      groupId: data.group.id,
      groupName: data.group.name,
      timeZone: data.group.timeZone,
    },
    slots: data.slots.map((s) => ({ id: s.id, startsAt: s.startsAt, endsAt: s.endsAt })),
    benches: data.benches.map((b) => ({ id: b.id, name: b.name, seats: b.seats, equipment: b.equipment })),
    fixers: data.fixers,
    items,
    runs: runs.map((r) => ({
      id: r.id,
      slotId: r.slotId,
      createdAt: r.createdAt,
      assigned: (r.result as TriageResult).assignments.length,
      unassigned: (r.result as TriageResult).unassigned.length,
      lockedKept: r.lockedKept,
    })),
  };
}

/** An organiser's hand: placed where they say, locked by default, with a warning for each rule it breaks. */
export async function placeByHand(
  ctx: AppContext,
  eventId: number,
  itemId: number,
  to: { userId: number; benchId: number; locked: boolean },
) {
  const data = await loadEvent(ctx, eventId);
  const item = data.items.find((i) => i.id === itemId);
  if (!item) throw notFound('That item');
  const fixer = data.fixers.find((f) => f.userId === to.userId);
  if (!fixer)
    throw new HttpError(400, 'invalid', 'Some fields need attention.', {
      userId: 'That fixer has not said they are coming.',
    });
  const bench = data.benches.find((b) => b.id === to.benchId);
  if (!bench)
    throw new HttpError(400, 'invalid', 'Some fields need attention.', {
      benchId: 'That bench is not set out at this event.',
    });
  const startsAt =
    data.placed.find((p) => p.itemId === itemId)?.startsAt ??
    data.slots.find((s) => s.id === item.slotId)?.startsAt ??
    null;
  const w = windowOf(data, itemId, startsAt);
  const warnings = checkPlacement(
    item.needs,
    {
      name: fixer.name,
      skills: fixer.skills,
      benchId: fixer.benchId,
      capacity: 1,
      assigned: busyDuring(data, 'userId', fixer.userId, w, itemId),
    },
    {
      id: bench.id,
      name: bench.name,
      equipment: bench.equipment,
      seats: bench.seats,
      assigned: busyDuring(data, 'benchId', bench.id, w, itemId),
    },
  );
  await ctx.database.db
    .insert(itemAssignments)
    .values({
      itemId,
      eventId,
      userId: to.userId,
      benchId: to.benchId,
      startsAt,
      locked: to.locked,
      source: 'hand',
      runId: null,
    })
    .onDuplicateKeyUpdate({
      set: {
        userId: to.userId,
        benchId: to.benchId,
        startsAt,
        locked: to.locked,
        source: 'hand',
        runId: null,
        updatedAt: new Date(),
      },
    });
  return { warnings };
}

export async function setLock(ctx: AppContext, eventId: number, itemId: number, locked: boolean) {
  const res = await ctx.database.db
    .update(itemAssignments)
    .set({ locked })
    .where(and(eq(itemAssignments.itemId, itemId), eq(itemAssignments.eventId, eventId)));
  if (((res as unknown as [{ affectedRows: number }])[0]?.affectedRows ?? 0) === 0)
    throw new HttpError(409, 'not-placed', 'Place the item before locking it.');
}

export async function unplace(ctx: AppContext, eventId: number, itemId: number) {
  await ctx.database.db
    .delete(itemAssignments)
    .where(and(eq(itemAssignments.itemId, itemId), eq(itemAssignments.eventId, eventId)));
}

export async function runDetail(ctx: AppContext, eventId: number, runId: number) {
  const [r] = await ctx.database.db
    .select()
    .from(triageRuns)
    .where(and(eq(triageRuns.id, runId), eq(triageRuns.eventId, eventId)));
  if (!r) throw notFound('That run');
  return r;
}

/** A fixer's own queue across upcoming events, in the order the items come. */
export async function myQueue(ctx: AppContext, userId: number) {
  const { db } = ctx.database;
  const rows = await db
    .select({
      itemId: bookingItems.id,
      status: bookingItems.status,
      tagCode: bookingItems.tagCode,
      queueNumber: bookingItems.queueNumber,
      eventId: events.id,
      eventTitle: events.title,
      timeZone: repairGroups.timeZone,
      slotStartsAt: sql<Date>`COALESCE(${itemAssignments.startsAt}, ${slots.startsAt})`,
      reference: bookings.reference,
      visitorName: bookings.visitorName,
      categoryName: categories.name,
      minutes: categories.repairMinutes,
      brand: bookingItems.brand,
      model: bookingItems.model,
      fault: bookingItems.fault,
      mains: bookingItems.mains,
      benchId: itemAssignments.benchId,
      locked: itemAssignments.locked,
    })
    .from(itemAssignments)
    .innerJoin(bookingItems, eq(bookingItems.id, itemAssignments.itemId))
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(slots, eq(slots.id, bookings.slotId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .where(
      and(
        eq(itemAssignments.userId, userId),
        eq(bookings.status, 'confirmed'),
        inArray(events.status, ['published', 'closed']),
        inArray(bookingItems.status, ['booked', 'checked-in', 'waiting', 'at-bench']),
      ),
    )
    .orderBy(sql`COALESCE(${itemAssignments.startsAt}, ${slots.startsAt})`, asc(bookings.createdAt));
  const ids = rows.map((r) => r.itemId);
  const photos = ids.length
    ? await db
        .select({ id: itemPhotos.id, itemId: itemPhotos.itemId })
        .from(itemPhotos)
        .where(inArray(itemPhotos.itemId, ids))
    : [];
  const benchNames = new Map(
    (await Promise.all([...new Set(rows.map((r) => r.eventId))].map((e) => eventLayout(ctx.database.db, e))))
      .flat()
      .map((b) => [b.id, b.name]),
  );
  return rows.map((r) => ({
    ...r,
    mains: Boolean(r.mains),
    locked: Boolean(r.locked),
    visitorName: r.visitorName.split(' ')[0],
    benchName: benchNames.get(r.benchId) ?? '',
    photoIds: photos.filter((p) => p.itemId === r.itemId).map((p) => p.id),
  }));
}
