import { BARRIER_LABELS, OUTCOME_LABELS } from '../../../../shared/event-day/constants';
import type {
  EventReport,
  Method,
  PublicImpact,
  RecordsPage,
  SessionFigures,
  Stats,
} from '../../../../shared/api/impact';
import { DISPLACEMENT_NOTE, DISPLACEMENT_SOURCE, FACTOR_SOURCE } from '../../../../shared/impact/factors';
import { totalsFromCells } from '../../../../shared/impact/statistics';
import { shortName } from '../../../../shared/event-day/tag-code';
import type { AppContext } from '../../context';
import { HttpError, notFound } from '../../http/errors';
import {
  countEventsWithFigures,
  displacement,
  groupById,
  impactCategories,
  readCells,
  readSessionCells,
  recordRows,
  sessionsInRange,
  setDisplacement as storeDisplacement,
  volunteerShifts,
  type RecordsFilter,
  type StatsFilter,
} from './queries/stats';
import { eventWithGroup } from '../../core/events';

export type { StatsFilter };

export const getDisplacement = (ctx: AppContext) => displacement(ctx.database.db);

export async function setDisplacement(ctx: AppContext, value: number): Promise<number> {
  await storeDisplacement(ctx.database.db, value);
  return getDisplacement(ctx);
}

const hoursOf = (shift: { startsAt: Date; endsAt: Date }) =>
  (shift.endsAt.getTime() - shift.startsAt.getTime()) / 3600_000;
const round2 = (x: number) => Math.round(x * 100) / 100;

/** Statistics for a group, an event, a date range or the whole network. */
export async function stats(ctx: AppContext, f: StatsFilter): Promise<Stats> {
  const { db } = ctx.database;
  const [c, cats, d] = await Promise.all([readCells(db, f), impactCategories(db), displacement(db)]);
  return { ...totalsFromCells(c, cats, d), displacement: d, filter: f };
}

/** Each past session's outcomes and kilograms, for the group's session list (the same engine as every figure). */
export async function sessionFigures(ctx: AppContext, groupId: number): Promise<SessionFigures[]> {
  const { db } = ctx.database;
  const [cells, cats, d] = await Promise.all([readSessionCells(db, groupId), impactCategories(db), displacement(db)]);
  const byEvent = new Map<number, typeof cells>();
  for (const c of cells) byEvent.set(c.eventId, [...(byEvent.get(c.eventId) ?? []), c]);
  return [...byEvent].map(([eventId, cs]) => {
    const t = totalsFromCells(cs, cats, d);
    return {
      eventId,
      items: t.items,
      fixed: t.fixed,
      partsNeeded: t.partsNeeded,
      advice: t.advice,
      endOfLife: t.endOfLife,
      unknown: t.unknown,
      kgDiverted: t.kgDiverted,
    };
  });
}

/** The method and its sources, shown beside every figure. */
export async function method(ctx: AppContext): Promise<Method> {
  const { db } = ctx.database;
  const [cats, d] = await Promise.all([impactCategories(db), displacement(db)]);
  return {
    displacement: d,
    displacementNote: DISPLACEMENT_NOTE,
    displacementSource: DISPLACEMENT_SOURCE,
    factorSource: FACTOR_SOURCE,
    text: [
      'Items: every item that reached the reception desk. An item that came back with its part counts once, with the outcome of its last visit.',
      'Kilograms diverted from landfill: the mass of the items fixed — weighed at the desk where it was, otherwise the average weight of its kind.',
      `Emissions avoided (kg CO2e): mass fixed × the production emission factor of its kind × the displacement factor (${d}).`,
      'Fix rate: items fixed ÷ items with a recorded outcome.',
      'Items with no outcome recorded (and records brought in from a file with the status "Unknown") count as items, and in no outcome: not in the fix rate, and not in the kilograms or emissions.',
      'Records brought in from a file count like any other: "Repairable" as a part needed, "End of life" with its reason, and their kind of item as the nearest Mendery kind, whose average weight is used.',
    ],
    categories: cats.map((c) => ({
      id: c.id,
      name: c.name,
      avgWeightKg: c.avgWeightKg,
      weightSource: c.weightSource,
      co2ePerKg: c.co2ePerKg,
      co2eSource: c.co2eSource,
    })),
  };
}

/** The records behind a figure, newest first, 50 a page. */
export async function records(ctx: AppContext, f: RecordsFilter & { page?: number }): Promise<RecordsPage> {
  const page = Math.max(1, f.page ?? 1);
  const rows = await recordRows(ctx.database.db, f, page);
  return {
    total: Number(rows[0]?.total ?? 0),
    page,
    records: rows.map(({ total: _t, visitorName, avgWeightKg, ...r }) => ({
      ...r,
      visitor: shortName(visitorName),
      kg: r.weighedKg ?? avgWeightKg,
      outcomeLabel: r.outcome ? OUTCOME_LABELS[r.outcome] : 'Not recorded',
      barrierLabel: r.barrier ? BARRIER_LABELS[r.barrier] : null,
    })),
  };
}

/** A funder's one-page report of an event: totals, categories, the volunteers' hours, the method. */
export async function eventReport(ctx: AppContext, eventId: number): Promise<EventReport> {
  const { db } = ctx.database;
  const e = await eventWithGroup(db, eventId);
  if (!e) throw notFound('That event');
  const hours = (await volunteerShifts(db, [eventId])).map((v) => ({ name: v.name, hours: round2(hoursOf(v)) }));
  return {
    event: {
      id: e.event.id,
      title: e.event.title,
      startsAt: e.event.startsAt,
      endsAt: e.event.endsAt,
      groupId: e.group.id,
      groupName: e.group.name,
      timeZone: e.group.timeZone,
    },
    stats: await stats(ctx, { eventId }),
    volunteers: hours,
    volunteerHours: Math.round(hours.reduce((n, v) => n + v.hours, 0) * 100) / 100,
    method: await method(ctx),
  };
}

/** The same report for a group over a date range: every session in it, the volunteers' hours added up. */
export async function rangeReport(ctx: AppContext, groupId: number, from?: string, to?: string): Promise<EventReport> {
  const { db } = ctx.database;
  const g = await groupById(db, groupId);
  if (!g) throw notFound('That group');
  const sessions = await sessionsInRange(db, groupId, from, to);
  const byName = new Map<string, number>();
  for (const r of await volunteerShifts(
    db,
    sessions.map((e) => e.id),
  ))
    byName.set(r.name, (byName.get(r.name) ?? 0) + hoursOf(r));
  const hours = [...byName]
    .map(([name, h]) => ({ name, hours: round2(h) }))
    .sort((a, b) => a.name.localeCompare(b.name));
  const first = sessions[0]?.startsAt ?? (from ? new Date(`${from}T00:00:00Z`) : new Date());
  const last = sessions[sessions.length - 1]?.endsAt ?? (to ? new Date(`${to}T23:59:59Z`) : new Date());
  return {
    event: {
      id: 0,
      title: `${g.name}: ${sessions.length} session${sessions.length === 1 ? '' : 's'}`,
      startsAt: first,
      endsAt: last,
      groupId: g.id,
      groupName: g.name,
      timeZone: g.timeZone,
    },
    range: { from: from ?? null, to: to ?? null, sessions: sessions.length },
    stats: await stats(ctx, { groupId, from, to }),
    volunteers: hours,
    volunteerHours: Math.round(hours.reduce((n, v) => n + v.hours, 0) * 100) / 100,
    method: await method(ctx),
  };
}

/** Public figures: the same totals, with nothing about any person. */
export async function publicImpact(ctx: AppContext, groupId?: number): Promise<PublicImpact> {
  const { db } = ctx.database;
  const g = groupId ? await groupById(db, groupId) : undefined;
  if (groupId && !g) throw notFound('That group');
  const { filter: _f, ...rest } = await stats(ctx, { groupId });
  return {
    ...rest,
    group: g ? { name: g.name, town: g.town } : null,
    events: await countEventsWithFigures(db, groupId),
    method: await method(ctx),
  };
}

export function assertDateRange(from?: string, to?: string) {
  if (from && to && from > to)
    throw new HttpError(400, 'invalid', 'errors.invalid', {
      to: 'The end date is before the start date.',
    });
}
