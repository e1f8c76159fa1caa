import { eq, isNotNull, notInArray, sql, type SQL } from 'drizzle-orm';
import type { Barrier, Outcome } from '../../../../../shared/event-day/constants';
import { BARRIER_OUTCOME, COUNTED_BOOKING_STATUS, NOT_ARRIVED_STATUSES } from '../../../../../shared/impact/visits';
import { bookingItems, bookings } from '../../../db/schema/index';

/**
 * The SQL form of shared/impact/visits.ts, built from its constants: every query of the impact feature that
 * picks counted visits uses these predicates, and tests/api/impact-rollup.test.ts checks the rollup against the
 * pure rule on random records.
 */
const list = (xs: readonly string[]) =>
  sql.join(
    xs.map((x) => sql`${x}`),
    sql`, `,
  );

/** The visit happened (`arrived`), for aliased tables: `item` of booking_items, `booking` of bookings. */
export const arrivedAs = (item: string, booking: string): SQL =>
  sql`${sql.raw(booking)}.status = ${COUNTED_BOOKING_STATUS} AND ${sql.raw(item)}.checked_in_at IS NOT NULL AND ${sql.raw(item)}.status NOT IN (${list(NOT_ARRIVED_STATUSES)})`;

/** No later visit of the same item that happened supersedes this one (`lastVisits`); `itemId` is its id column. */
const notSupersededOf = (itemId: SQL) =>
  sql`NOT EXISTS (SELECT 1 FROM booking_items r JOIN bookings rb ON rb.id = r.booking_id WHERE r.return_of_item_id = ${itemId} AND ${arrivedAs('r', 'rb')})`;
export const notSupersededAs = (item: string) => notSupersededOf(sql.raw(`${item}.id`));

/** The same predicates on the Drizzle tables, for queries that join booking_items and bookings by name. */
export const arrivedVisit = (): SQL[] => [
  eq(bookings.status, COUNTED_BOOKING_STATUS),
  isNotNull(bookingItems.checkedInAt),
  notInArray(bookingItems.status, [...NOT_ARRIVED_STATUSES]),
];
export const countedVisit = (): SQL[] => [...arrivedVisit(), notSupersededOf(sql`${bookingItems.id}`)];

/** How many of the outcome alias `o`'s visits have this outcome, or this (counted) barrier. */
export const countOutcome = (o: string, outcome: Outcome) =>
  sql`SUM(CASE WHEN ${sql.raw(o)}.outcome = ${outcome} THEN 1 ELSE 0 END)`;
export const countBarrier = (o: string, barrier: Barrier) =>
  sql`SUM(CASE WHEN ${sql.raw(o)}.outcome = ${BARRIER_OUTCOME} AND ${sql.raw(o)}.barrier = ${barrier} THEN 1 ELSE 0 END)`;
