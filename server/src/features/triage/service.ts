import { triage, type TriageInput, type TriageResult } from '../../../../shared/triage/engine';
import type { PlacementResult, TriageRunDetail, TriageRunResult } from '../../../../shared/api/triage';
import { itemLabel } from '../../../../shared/item-label';
import { summariseRun } from '../../../../shared/triage/run-summary';
import { waitingDetail } from '../../../../shared/triage/waiting';
import { eventWithGroup, slotsOfEvent } from '../../core/events';
import { dayPlan } from '../../../../shared/triage/day-plan';
import type { AppContext } from '../../context';
import { HttpError, notFound } from '../../http/errors';
import { busyDuring, loadEvent, priorityOf, warningsFor, windowOf, type Loaded } from './event-data';
import * as q from './queries';
import { categoryText } from '../../i18n';
import { DEFAULT_LANGUAGE, type Language } from '../../../../shared/i18n/languages';

/**
 * Runs the engine. For the whole session it plans the day round by round (one round per slot, repairs keeping
 * their fixer and bench for their minutes, waiting items carried forward); for one slot it fills what is free in
 * that slot. Locked placements are kept and hold their fixer and bench for their time. Each run is stored with
 * its exact input and result.
 */
export async function runTriage(
  ctx: AppContext,
  eventId: number,
  slotId: number | undefined,
  userId: number,
): Promise<TriageRunResult> {
  const data = await loadEvent(ctx, eventId);
  const slot = slotId ? data.slots.find((s) => s.id === slotId) : undefined;
  if (slotId && !slot)
    throw new HttpError(400, 'invalid', 'errors.invalid', {
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
    const allDay = { reason: 'capacity', allDay: true } as const;
    result = {
      assignments: placedIds.map((i) => ({ itemId: String(i.id), ...day.placement[String(i.id)]! })),
      unassigned: waiting.map(
        (i) =>
          reasons.get(String(i.id)) ?? {
            itemId: String(i.id),
            ...allDay,
            detail: waitingDetail(allDay),
          },
      ),
    };
    starts = new Map(placedIds.map((i) => [String(i.id), day.start[String(i.id)]!]));
  }

  const runId = await ctx.database.db.transaction(async (tx) => {
    const id = await q.insertRun(tx, {
      eventId,
      slotId: slot?.id ?? null,
      input,
      result,
      lockedKept: locked.length,
      createdBy: userId,
    });
    if (poolIds.size) await q.deleteUnlockedPlacements(tx, eventId, [...poolIds]);
    if (result.assignments.length) {
      await q.insertPlacements(
        tx,
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

/** An organiser's hand: placed where they say, locked by default, with a warning for each rule it breaks. */
export async function placeByHand(
  ctx: AppContext,
  eventId: number,
  itemId: number,
  to: { userId: number; benchId: number; locked: boolean },
): Promise<PlacementResult> {
  const data = await loadEvent(ctx, eventId);
  const item = data.items.find((i) => i.id === itemId);
  if (!item) throw notFound('That item');
  const fixer = data.fixers.find((f) => f.userId === to.userId);
  if (!fixer)
    throw new HttpError(400, 'invalid', 'errors.invalid', {
      userId: 'That fixer has not said they are coming.',
    });
  const bench = data.benches.find((b) => b.id === to.benchId);
  if (!bench)
    throw new HttpError(400, 'invalid', 'errors.invalid', {
      benchId: 'That bench is not set out at this event.',
    });
  const startsAt =
    data.placed.find((p) => p.itemId === itemId)?.startsAt ??
    data.slots.find((s) => s.id === item.slotId)?.startsAt ??
    null;
  const w = windowOf(data, itemId, startsAt);
  const warnings = warningsFor(data, item, fixer, bench, w);
  await q.upsertPlacement(ctx.database.db, {
    itemId,
    eventId,
    userId: to.userId,
    benchId: to.benchId,
    startsAt,
    locked: to.locked,
    source: 'hand',
    runId: null,
  });
  return { warnings };
}

export async function setLock(ctx: AppContext, eventId: number, itemId: number, locked: boolean): Promise<void> {
  if ((await q.lockPlacement(ctx.database.db, eventId, itemId, locked)) === 0)
    throw new HttpError(409, 'not-placed', 'Place the item before locking it.');
}

export async function unplace(ctx: AppContext, eventId: number, itemId: number): Promise<void> {
  await q.deletePlacement(ctx.database.db, eventId, itemId);
}

/** A stored run read back for the organiser: the summary in words, and the exact input and result it kept. */
export async function runDetail(
  ctx: AppContext,
  eventId: number,
  runId: number,
  lang: Language = DEFAULT_LANGUAGE,
): Promise<TriageRunDetail> {
  const { db } = ctx.database;
  const e = await eventWithGroup(db, eventId);
  const r = e && (await q.runRow(db, eventId, runId));
  if (!e || !r) throw notFound('That run');
  const [names, slots] = await Promise.all([q.itemNameRows(db, eventId), slotsOfEvent(db, eventId)]);
  const labels = new Map(
    names.map((n) => [
      String(n.id),
      `${itemLabel({ ...n, categoryName: categoryText(lang, n.categorySlug, 'name', n.categoryName) })} · ${n.reference}`,
    ]),
  );
  return {
    run: {
      id: r.id,
      createdAt: r.createdAt,
      slotStartsAt: slots.find((s) => s.id === r.slotId)?.startsAt ?? null,
      lockedKept: r.lockedKept,
    },
    event: {
      id: e.event.id,
      title: e.event.title,
      startsAt: e.event.startsAt,
      timeZone: e.group.timeZone,
      groupId: e.group.id,
      groupName: e.group.name,
    },
    summary: summariseRun(r.input, r.result, labels, r.lockedKept),
    technical: { input: r.input, result: r.result },
  };
}
