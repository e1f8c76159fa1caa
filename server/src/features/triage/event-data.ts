import { checkPlacement, itemNeeds } from '../../../../shared/triage/needs';
import type { AppContext } from '../../context';
import { notFound } from '../../http/errors';
import { skillsOf } from '../../core/skills';
import { eventLayout } from '../../core/benches';
import * as q from './queries';
import { eventWithGroup, slotsOfEvent } from '../../core/events';

/** Everything the board shows and the engine needs, read in a handful of queries. */
export async function loadEvent(ctx: AppContext, eventId: number) {
  const { db } = ctx.database;
  const e = await eventWithGroup(db, eventId);
  if (!e) throw notFound('That event');
  const slotRows = await slotsOfEvent(db, eventId);
  const items = await q.openItemRows(db, eventId);
  const photos = await q.photoIdsOf(
    db,
    items.map((i) => i.id),
  );
  const fixers = await q.comingFixerRows(db, eventId);
  const skills = await skillsOf(
    db,
    fixers.map((f) => f.shift.userId),
  );
  const benches = await eventLayout(db, eventId);
  const live = new Set(items.map((i) => i.id));
  const placed = (await q.placementRows(db, eventId)).filter((p) => live.has(p.itemId));
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

export type Loaded = Awaited<ReturnType<typeof loadEvent>>;

/** Booked items are served in the order of their slot, then of booking. */
export const priorityOf = (i: Loaded['items'][number]) => i.slotIndex * 1000 + i.order;

/** The time a placed repair keeps its fixer and bench busy: from its planned start for its category's minutes. */
export function windowOf(data: Loaded, itemId: number, startsAt: Date | null): [number, number] {
  const i = data.items.find((x) => x.id === itemId);
  const slot = data.slots.find((s) => s.id === i?.slotId);
  const from = (startsAt ?? slot?.startsAt ?? data.event.startsAt).getTime();
  return [from, from + Math.max(data.event.slotMinutes, i?.minutes ?? data.event.slotMinutes) * 60_000];
}
const overlap = (a: [number, number], b: [number, number]) => a[0] < b[1] && b[0] < a[1];

/** How many other placements keep this fixer (or bench) busy at the same time as the given window. */
export function busyDuring(
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

/** The rules a placement of this item with this fixer at this bench breaks, given what else is placed then. */
export function warningsFor(
  data: Loaded,
  item: Loaded['items'][number],
  fixer: Loaded['fixers'][number],
  bench: Loaded['benches'][number],
  w: [number, number],
) {
  return checkPlacement(
    item.needs,
    {
      name: fixer.name,
      skills: fixer.skills,
      benchId: fixer.benchId,
      capacity: 1,
      assigned: busyDuring(data, 'userId', fixer.userId, w, item.id),
    },
    {
      id: bench.id,
      name: bench.name,
      equipment: bench.equipment,
      seats: bench.seats,
      assigned: busyDuring(data, 'benchId', bench.id, w, item.id),
    },
  );
}
