import { and, asc, desc, eq, gte, lte, sql, type SQL } from 'drizzle-orm';
import { BARRIERS, type Barrier, type Outcome } from '../../../../../shared/event-day/constants';
import { DEFAULT_DISPLACEMENT } from '../../../../../shared/impact/factors';
import type { ImpactCategory, ImpactCell } from '../../../../../shared/impact/statistics';
import type { DbOrTx } from '../../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  impactCells,
  impactDays,
  itemOutcomes,
  repairGroups,
  settings,
  shifts,
  users,
} from '../../../db/schema/index';
import { countedVisit } from './visits';

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

export async function setDisplacement(db: DbOrTx, value: number) {
  await db.insert(settings).values({ key: 'displacement', value }).onDuplicateKeyUpdate({ set: { value } });
}

export async function impactCategories(
  db: DbOrTx,
): Promise<(ImpactCategory & { slug: string; co2eSource: string | null; weightSource: string })[]> {
  return db
    .select({
      id: categories.id,
      slug: categories.slug,
      name: categories.name,
      skill: categories.skill,
      avgWeightKg: categories.avgWeightKg,
      co2ePerKg: categories.co2ePerKg,
      co2eSource: categories.co2eSource,
      weightSource: categories.weightSource,
    })
    .from(categories);
}

/** A group's or an event's figures come from the event cells; the whole network's from the day sums. */
function source(f: StatsFilter) {
  if (f.groupId || f.eventId) {
    const parts: SQL[] = [];
    if (f.groupId) parts.push(eq(impactCells.groupId, f.groupId));
    if (f.eventId) parts.push(eq(impactCells.eventId, f.eventId));
    if (f.from) parts.push(gte(impactCells.eventDate, f.from));
    if (f.to) parts.push(lte(impactCells.eventDate, f.to));
    return { t: impactCells, where: and(...parts) };
  }
  const parts: SQL[] = [];
  if (f.from) parts.push(gte(impactDays.eventDate, f.from));
  if (f.to) parts.push(lte(impactDays.eventDate, f.to));
  return { t: impactDays, where: parts.length ? and(...parts) : undefined };
}

/**
 * The rolled-up cells of a filter, summed by month and category. The rows come back as stored, without the
 * query builder's per-field mapping, and are added up here (masses in whole grams, so the sum is exact): a group's
 * ten years is about a thousand rows, and MariaDB's GROUP BY on them (a temporary table and a sort) or the mapping
 * cost more than the reading.
 */
export async function readCells(db: DbOrTx, f: StatsFilter): Promise<ImpactCell[]> {
  const { t, where } = source(f);
  const [rows] = (await db.execute(sql`
    SELECT DATE_FORMAT(${t.eventDate}, '%Y-%m') AS month, ${t.categoryId} AS categoryId, ${t.items} AS items,
      ${t.fixed} AS fixed, ${t.partsNeeded} AS partsNeeded, ${t.advice} AS advice, ${t.endOfLife} AS endOfLife,
      CAST(${t.fixedWeighedKg} * 1000 AS SIGNED) AS grams, ${t.fixedUnweighed} AS fixedUnweighed,
      ${t.bSparePartsNotAvailable} AS b0, ${t.bSparePartsTooExpensive} AS b1, ${t.bNoWayToOpen} AS b2,
      ${t.bRepairInformationNotAvailable} AS b3, ${t.bLackOfEquipment} AS b4, ${t.bTooWornOut} AS b5
    FROM ${t} ${where ? sql`WHERE ${where}` : sql``}`)) as unknown as [CellRow[]];
  const cells = new Map<string, { cell: ImpactCell; grams: number }>();
  for (const r of rows) {
    const key = `${r.month}|${r.categoryId}`;
    let c = cells.get(key);
    if (!c) {
      const cell: ImpactCell = {
        month: r.month,
        categoryId: Number(r.categoryId),
        items: 0,
        fixed: 0,
        partsNeeded: 0,
        advice: 0,
        endOfLife: 0,
        fixedWeighedKg: 0,
        fixedUnweighed: 0,
        barriers: {},
      };
      c = { cell, grams: 0 };
      cells.set(key, c);
    }
    const { cell } = c;
    cell.items += r.items;
    cell.fixed += r.fixed;
    cell.partsNeeded += r.partsNeeded;
    cell.advice += r.advice;
    cell.endOfLife += r.endOfLife;
    cell.fixedUnweighed += r.fixedUnweighed;
    c.grams += Number(r.grams);
    BARRIERS.forEach((b, i) => {
      const n = r[`b${i}` as 'b0'];
      if (n > 0) cell.barriers[b] = (cell.barriers[b] ?? 0) + n;
    });
  }
  return [...cells.values()].map(({ cell, grams }) => ({ ...cell, fixedWeighedKg: grams / 1000 }));
}

type CellRow = Omit<ImpactCell, 'barriers' | 'fixedWeighedKg' | 'categoryId'> & {
  categoryId: number | string;
  grams: number | string;
} & Record<'b0' | 'b1' | 'b2' | 'b3' | 'b4' | 'b5', number>;

/** How many sessions have figures, for a group or the network. */
export async function countEventsWithFigures(db: DbOrTx, groupId?: number) {
  const [{ n }] = await db
    .select({ n: sql<number>`COUNT(DISTINCT ${impactCells.eventId})` })
    .from(impactCells)
    .where(groupId ? eq(impactCells.groupId, groupId) : undefined);
  return Number(n);
}

export interface RecordsFilter extends StatsFilter {
  categoryId?: number;
  outcome?: Outcome | 'none';
  month?: string;
  barrier?: Barrier;
}

/** The counted visits behind a figure, newest first, 50 a page, with the total. */
export async function recordRows(db: DbOrTx, f: RecordsFilter, page: number) {
  const parts: SQL[] = countedVisit();
  if (f.groupId) parts.push(eq(events.groupId, f.groupId));
  if (f.eventId) parts.push(eq(events.id, f.eventId));
  if (f.from) parts.push(sql`DATE(${events.startsAt}) >= ${f.from}`);
  if (f.to) parts.push(sql`DATE(${events.startsAt}) <= ${f.to}`);
  if (f.month) parts.push(sql`DATE_FORMAT(${events.startsAt}, '%Y-%m') = ${f.month}`);
  if (f.categoryId) parts.push(eq(bookingItems.categoryId, f.categoryId));
  if (f.outcome === 'none') parts.push(sql`${itemOutcomes.outcome} IS NULL`);
  else if (f.outcome) parts.push(eq(itemOutcomes.outcome, f.outcome));
  if (f.barrier) parts.push(eq(itemOutcomes.barrier, f.barrier));
  return db
    .select({
      itemId: bookingItems.id,
      eventId: events.id,
      eventTitle: events.title,
      eventStartsAt: events.startsAt,
      groupName: repairGroups.name,
      categorySlug: categories.slug,
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
}

export async function groupById(db: DbOrTx, groupId: number) {
  const [g] = await db.select().from(repairGroups).where(eq(repairGroups.id, groupId));
  return g;
}

/** The volunteers who said they are coming to these sessions, with their shift times. */
export async function volunteerShifts(db: DbOrTx, eventIds: number[]) {
  if (!eventIds.length) return [];
  return db
    .select({ name: users.name, startsAt: shifts.startsAt, endsAt: shifts.endsAt })
    .from(shifts)
    .innerJoin(users, eq(users.id, shifts.userId))
    .where(
      and(
        sql`${shifts.eventId} IN (${sql.join(
          eventIds.map((i) => sql`${i}`),
          sql`, `,
        )})`,
        eq(shifts.coming, true),
      ),
    )
    .orderBy(asc(users.name));
}

/** A group's published or closed sessions that have begun, within the dates, oldest first. */
export async function sessionsInRange(db: DbOrTx, groupId: number, from?: string, to?: string) {
  return db
    .select({ id: events.id, startsAt: events.startsAt, endsAt: events.endsAt })
    .from(events)
    .where(
      and(
        eq(events.groupId, groupId),
        sql`${events.status} IN ('published', 'closed')`,
        sql`${events.startsAt} <= NOW(3)`,
        ...(from ? [gte(sql`DATE(${events.startsAt})`, from)] : []),
        ...(to ? [lte(sql`DATE(${events.startsAt})`, to)] : []),
      ),
    )
    .orderBy(asc(events.startsAt));
}

/** A group's rolled-up cells one session at a time (a session has a cell per category it saw). */
export async function readSessionCells(db: DbOrTx, groupId: number): Promise<(ImpactCell & { eventId: number })[]> {
  const rows = await db.select().from(impactCells).where(eq(impactCells.groupId, groupId));
  return rows.map((r) => ({
    eventId: r.eventId,
    month: r.eventDate.slice(0, 7),
    categoryId: r.categoryId,
    items: r.items,
    fixed: r.fixed,
    partsNeeded: r.partsNeeded,
    advice: r.advice,
    endOfLife: r.endOfLife,
    fixedWeighedKg: Number(r.fixedWeighedKg),
    fixedUnweighed: r.fixedUnweighed,
    // The session list shows outcomes and mass only; barriers stay with the dashboard.
    barriers: {},
  }));
}
