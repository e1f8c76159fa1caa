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
): Promise<(ImpactCategory & { co2eSource: string | null; weightSource: string })[]> {
  return db
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
export async function readCells(db: DbOrTx, f: StatsFilter): Promise<ImpactCell[]> {
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
