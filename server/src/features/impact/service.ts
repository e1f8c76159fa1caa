import { and, asc, desc, eq, gte, isNotNull, lte, notInArray, sql, type SQL } from 'drizzle-orm';
import {
  BARRIERS,
  OUTCOME_LABELS,
  BARRIER_LABELS,
  type Barrier,
  type Outcome,
} from '../../../../shared/event-day/constants';
import { DEFAULT_DISPLACEMENT, DISPLACEMENT_NOTE, FACTOR_SOURCE } from '../../../../shared/impact/factors';
import { totalsFromCells, type ImpactCategory, type ImpactCell } from '../../../../shared/impact/statistics';
import { shortName } from '../../../../shared/event-day/tag-code';
import type { AppContext } from '../../context';
import type { DbOrTx } from '../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  impactCells,
  itemOutcomes,
  repairGroups,
  settings,
  shifts,
  users,
} from '../../db/schema/index';
import { HttpError, notFound } from '../../http/errors';

export interface StatsFilter {
  groupId?: number;
  eventId?: number;
  from?: string;
  to?: string;
}

export async function displacement(db: DbOrTx): Promise<number> {
  const [s] = await db.select().from(settings).where(eq(settings.key, 'displacement'));
  const v = Number(s?.value);
  return s && v >= 0 && v <= 1 ? v : DEFAULT_DISPLACEMENT;
}

export async function setDisplacement(ctx: AppContext, value: number) {
  await ctx.database.db
    .insert(settings)
    .values({ key: 'displacement', value })
    .onDuplicateKeyUpdate({ set: { value } });
}

export async function impactCategories(
  db: DbOrTx,
): Promise<(ImpactCategory & { co2eSource: string | null; weightSource: string })[]> {
  const rows = await db
    .select({
      id: categories.id,
      name: categories.name,
      skill: categories.skill,
      avgWeightKg: categories.avgWeightKg,
      co2ePerKg: categories.co2ePerKg,
      co2eSource: categories.co2eSource,
      weightSource: categories.weightSource,
    })
    .from(categories);
  return rows;
}

function where(f: StatsFilter): SQL | undefined {
  const parts: SQL[] = [];
  if (f.groupId) parts.push(eq(impactCells.groupId, f.groupId));
  if (f.eventId) parts.push(eq(impactCells.eventId, f.eventId));
  if (f.from) parts.push(gte(impactCells.eventDate, f.from));
  if (f.to) parts.push(lte(impactCells.eventDate, f.to));
  return parts.length ? and(...parts) : undefined;
}

/** The rolled-up cells of a filter, summed by month and category in the database (a few hundred rows at most). */
async function cells(db: DbOrTx, f: StatsFilter): Promise<ImpactCell[]> {
  const sum = (c: SQL.Aliased | unknown) => sql<string>`SUM(${c})`;
  const month = sql<string>`DATE_FORMAT(${impactCells.eventDate}, '%Y-%m')`;
  const rows = await db
    .select({
      month,
      categoryId: impactCells.categoryId,
      items: sum(impactCells.items),
      fixed: sum(impactCells.fixed),
      partsNeeded: sum(impactCells.partsNeeded),
      advice: sum(impactCells.advice),
      endOfLife: sum(impactCells.endOfLife),
      fixedWeighedKg: sum(impactCells.fixedWeighedKg),
      fixedUnweighed: sum(impactCells.fixedUnweighed),
      b0: sum(impactCells.bSparePartsNotAvailable),
      b1: sum(impactCells.bSparePartsTooExpensive),
      b2: sum(impactCells.bNoWayToOpen),
      b3: sum(impactCells.bRepairInformationNotAvailable),
      b4: sum(impactCells.bLackOfEquipment),
      b5: sum(impactCells.bTooWornOut),
    })
    .from(impactCells)
    .where(where(f))
    .groupBy(month, impactCells.categoryId);
  return rows.map((r) => ({
    month: r.month,
    categoryId: r.categoryId,
    items: Number(r.items),
    fixed: Number(r.fixed),
    partsNeeded: Number(r.partsNeeded),
    advice: Number(r.advice),
    endOfLife: Number(r.endOfLife),
    fixedWeighedKg: Number(r.fixedWeighedKg),
    fixedUnweighed: Number(r.fixedUnweighed),
    barriers: Object.fromEntries(
      BARRIERS.map((b, i) => [b, Number(r[`b${i}` as 'b0'])]).filter(([, n]) => (n as number) > 0),
    ),
  }));
}

/** Statistics for a group, an event, a date range or the whole network. */
export async function stats(ctx: AppContext, f: StatsFilter) {
  const { db } = ctx.database;
  const [c, cats, d] = await Promise.all([cells(db, f), impactCategories(db), displacement(db)]);
  return { ...totalsFromCells(c, cats, d), displacement: d, filter: f };
}

/** The method and its sources, shown beside every figure. */
export async function method(ctx: AppContext) {
  const { db } = ctx.database;
  const [cats, d] = await Promise.all([impactCategories(db), displacement(db)]);
  return {
    displacement: d,
    displacementNote: DISPLACEMENT_NOTE,
    factorSource: FACTOR_SOURCE,
    text: [
      'Items: every item that reached the reception desk. An item that came back with its part counts once, with the outcome of its last visit.',
      'Kilograms diverted from landfill: the mass of the items fixed — weighed at the desk where it was, otherwise the average weight of its kind.',
      `Emissions avoided (kg CO2e): mass fixed × the production emission factor of its kind × the displacement factor (${d}).`,
      'Fix rate: items fixed ÷ items with a recorded outcome.',
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
export async function records(
  ctx: AppContext,
  f: StatsFilter & {
    categoryId?: number;
    outcome?: Outcome | 'none';
    month?: string;
    barrier?: Barrier;
    page?: number;
  },
) {
  const { db } = ctx.database;
  const parts: SQL[] = [
    eq(bookings.status, 'confirmed'),
    isNotNull(bookingItems.checkedInAt),
    notInArray(bookingItems.status, ['no-show', 'withdrawn']),
  ];
  parts.push(
    sql`NOT EXISTS (SELECT 1 FROM booking_items r JOIN bookings rb ON rb.id = r.booking_id AND rb.status = 'confirmed' WHERE r.return_of_item_id = ${bookingItems.id} AND r.checked_in_at IS NOT NULL AND r.status NOT IN ('no-show','withdrawn'))`,
  );
  if (f.groupId) parts.push(eq(events.groupId, f.groupId));
  if (f.eventId) parts.push(eq(events.id, f.eventId));
  if (f.from) parts.push(sql`DATE(${events.startsAt}) >= ${f.from}`);
  if (f.to) parts.push(sql`DATE(${events.startsAt}) <= ${f.to}`);
  if (f.month) parts.push(sql`DATE_FORMAT(${events.startsAt}, '%Y-%m') = ${f.month}`);
  if (f.categoryId) parts.push(eq(bookingItems.categoryId, f.categoryId));
  if (f.outcome === 'none') parts.push(sql`${itemOutcomes.outcome} IS NULL`);
  else if (f.outcome) parts.push(eq(itemOutcomes.outcome, f.outcome));
  if (f.barrier) parts.push(eq(itemOutcomes.barrier, f.barrier));
  const page = Math.max(1, f.page ?? 1);
  const rows = await db
    .select({
      itemId: bookingItems.id,
      eventId: events.id,
      eventTitle: events.title,
      eventStartsAt: events.startsAt,
      groupName: repairGroups.name,
      categoryName: categories.name,
      avgWeightKg: categories.avgWeightKg,
      brand: bookingItems.brand,
      model: bookingItems.model,
      fault: bookingItems.fault,
      weighedKg: bookingItems.weighedKg,
      outcome: itemOutcomes.outcome,
      barrier: itemOutcomes.barrier,
      visitorName: bookings.visitorName,
      total: sql<number>`COUNT(*) OVER ()`,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .where(and(...parts))
    .orderBy(desc(events.startsAt), asc(bookingItems.id))
    .limit(50)
    .offset((page - 1) * 50);
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
export async function eventReport(ctx: AppContext, eventId: number) {
  const { db } = ctx.database;
  const [e] = await db
    .select({ event: events, group: repairGroups })
    .from(events)
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .where(eq(events.id, eventId));
  if (!e) throw notFound('That event');
  const volunteers = await db
    .select({ name: users.name, startsAt: shifts.startsAt, endsAt: shifts.endsAt })
    .from(shifts)
    .innerJoin(users, eq(users.id, shifts.userId))
    .where(and(eq(shifts.eventId, eventId), eq(shifts.coming, true)))
    .orderBy(asc(users.name));
  const hours = volunteers.map((v) => ({
    name: v.name,
    hours: Math.round(((v.endsAt.getTime() - v.startsAt.getTime()) / 3600_000) * 100) / 100,
  }));
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
export async function rangeReport(ctx: AppContext, groupId: number, from?: string, to?: string) {
  const { db } = ctx.database;
  const [g] = await db.select().from(repairGroups).where(eq(repairGroups.id, groupId));
  if (!g) throw notFound('That group');
  const inRange = and(
    eq(events.groupId, groupId),
    sql`${events.status} IN ('published', 'closed')`,
    sql`${events.startsAt} <= NOW(3)`,
    ...(from ? [gte(sql`DATE(${events.startsAt})`, from)] : []),
    ...(to ? [lte(sql`DATE(${events.startsAt})`, to)] : []),
  );
  const sessions = await db
    .select({ id: events.id, startsAt: events.startsAt, endsAt: events.endsAt })
    .from(events)
    .where(inRange)
    .orderBy(asc(events.startsAt));
  const ids = sessions.map((e) => e.id);
  const rows = ids.length
    ? await db
        .select({ name: users.name, startsAt: shifts.startsAt, endsAt: shifts.endsAt })
        .from(shifts)
        .innerJoin(users, eq(users.id, shifts.userId))
        .where(
          and(
            sql`${shifts.eventId} IN (${sql.join(
              ids.map((i) => sql`${i}`),
              sql`, `,
            )})`,
            eq(shifts.coming, true),
          ),
        )
    : [];
  const byName = new Map<string, number>();
  for (const r of rows)
    byName.set(r.name, (byName.get(r.name) ?? 0) + (r.endsAt.getTime() - r.startsAt.getTime()) / 3600_000);
  const hours = [...byName]
    .map(([name, h]) => ({ name, hours: Math.round(h * 100) / 100 }))
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
export async function publicImpact(ctx: AppContext, groupId?: number) {
  if (groupId) {
    const [g] = await ctx.database.db
      .select({ id: repairGroups.id })
      .from(repairGroups)
      .where(eq(repairGroups.id, groupId));
    if (!g) throw notFound('That group');
  }
  const s = await stats(ctx, { groupId });
  const { filter: _f, ...rest } = s;
  const [g] = groupId
    ? await ctx.database.db
        .select({ name: repairGroups.name, town: repairGroups.town })
        .from(repairGroups)
        .where(eq(repairGroups.id, groupId))
    : [];
  const [{ n }] = await ctx.database.db
    .select({ n: sql<number>`COUNT(DISTINCT ${impactCells.eventId})` })
    .from(impactCells)
    .where(groupId ? eq(impactCells.groupId, groupId) : undefined);
  return { ...rest, group: g ?? null, events: Number(n), method: await method(ctx) };
}

export function assertDateRange(from?: string, to?: string) {
  if (from && to && from > to)
    throw new HttpError(400, 'invalid', 'Some fields need attention.', {
      to: 'The end date is before the start date.',
    });
}
