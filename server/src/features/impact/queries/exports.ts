import { and, asc, eq, gte, lte, sql, type SQL } from 'drizzle-orm';
import type { DbOrTx } from '../../../db/client';
import {
  bookingItems,
  bookings,
  categories,
  events,
  importedRecords,
  itemOutcomes,
  repairGroups,
  users,
} from '../../../db/schema/index';
import type { StatsFilter } from './stats';
import { arrivedVisit } from './visits';

/** Every visit that happened in the filter's group, event and dates. */
function filterOf(f: StatsFilter): SQL[] {
  const parts: SQL[] = arrivedVisit();
  if (f.groupId) parts.push(eq(events.groupId, f.groupId));
  if (f.eventId) parts.push(eq(events.id, f.eventId));
  if (f.from) parts.push(gte(sql`DATE(${events.startsAt})`, f.from));
  if (f.to) parts.push(lte(sql`DATE(${events.startsAt})`, f.to));
  return parts;
}

/** The rows of the Open Repair Data file: kind, brand, age, fault, outcome; oldest session first. */
export const openRepairDataRows = (db: DbOrTx, f: StatsFilter) =>
  db
    .select({
      id: bookingItems.id,
      groupSlug: repairGroups.slug,
      country: repairGroups.country,
      categoryName: categories.name,
      categorySlug: categories.slug,
      weeeCategory: categories.weeeCategory,
      brand: bookingItems.brand,
      ageYears: bookingItems.ageYears,
      fault: bookingItems.fault,
      visitor: bookings.visitorName,
      outcome: itemOutcomes.outcome,
      barrier: itemOutcomes.barrier,
      startsAt: events.startsAt,
      ordsCategory: importedRecords.ordsCategory,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .leftJoin(importedRecords, eq(importedRecords.itemId, bookingItems.id))
    .where(and(...filterOf(f)))
    .orderBy(asc(events.startsAt), asc(bookingItems.id));

/** The rows of the organisers' own file: every recorded detail of each repair; oldest session first. */
export const recordFileRows = (db: DbOrTx, f: StatsFilter) =>
  db
    .select({
      id: bookingItems.id,
      startsAt: events.startsAt,
      event: events.title,
      reference: bookings.reference,
      walkIn: bookings.walkIn,
      category: categories.name,
      avgKg: categories.avgWeightKg,
      brand: bookingItems.brand,
      model: bookingItems.model,
      ageYears: bookingItems.ageYears,
      fault: bookingItems.fault,
      visitor: bookings.visitorName,
      weighedKg: bookingItems.weighedKg,
      outcome: itemOutcomes.outcome,
      barrier: itemOutcomes.barrier,
      part: itemOutcomes.partDescription,
      partCostCents: itemOutcomes.partCostCents,
      currency: repairGroups.currency,
      minutes: itemOutcomes.minutes,
      notes: itemOutcomes.notes,
      fixer: users.name,
      returnOf: bookingItems.returnOfItemId,
    })
    .from(bookingItems)
    .innerJoin(bookings, eq(bookings.id, bookingItems.bookingId))
    .innerJoin(events, eq(events.id, bookings.eventId))
    .innerJoin(repairGroups, eq(repairGroups.id, events.groupId))
    .innerJoin(categories, eq(categories.id, bookingItems.categoryId))
    .leftJoin(itemOutcomes, eq(itemOutcomes.itemId, bookingItems.id))
    .leftJoin(users, eq(users.id, itemOutcomes.recordedBy))
    .where(and(...filterOf(f)))
    .orderBy(asc(events.startsAt), asc(bookingItems.id));
