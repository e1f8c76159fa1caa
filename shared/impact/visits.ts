import type { BOOKING_STATUSES } from '../constants';
import { ABSENT_STATUSES, isAbsent, type Barrier, type ItemStatus, type Outcome } from '../event-day/constants';

type BookingStatus = (typeof BOOKING_STATUSES)[number];

/**
 * Which visits count in the impact figures: the one definition. The statistics engine (statistics.ts) computes
 * from it, and the server builds its SQL predicates and the rollup's sums from the same constants
 * (server/src/features/impact/queries/visits.ts), so the figures the database adds up are the figures this file
 * defines; tests/api/impact-rollup.test.ts checks that on random records.
 *
 * A visit counts when its booking stands, the item reached the desk, and it was not sent home or withdrawn; of an
 * item that came back (e.g. with its part), only the last counted visit counts, with its outcome and date.
 */
export const COUNTED_BOOKING_STATUS = 'confirmed' as const satisfies BookingStatus;

/** Item states of a visit that did not happen, even if the item was once checked in. */
export const NOT_ARRIVED_STATUSES = ABSENT_STATUSES;

/** What one visit looks like to the rule: its booking, its arrival and the earlier visit it continues. */
export interface VisitState {
  itemId: number;
  bookingStatus: BookingStatus;
  itemStatus: ItemStatus;
  checkedIn: boolean;
  returnOfItemId?: number | null;
}

/** The visit happened: the booking stands, the item was checked in and not marked as a no-show or withdrawn. */
export const arrived = (v: Omit<VisitState, 'itemId' | 'returnOfItemId'>) =>
  v.bookingStatus === COUNTED_BOOKING_STATUS && v.checkedIn && !isAbsent(v.itemStatus);

/** Leaves out visits that a later visit of the same item supersedes, following chains of returns. */
export function lastVisits<T extends { itemId: number; returnOfItemId?: number | null }>(visits: readonly T[]): T[] {
  const superseded = new Set(visits.map((r) => r.returnOfItemId).filter((x): x is number => x != null));
  return visits.filter((r) => !superseded.has(r.itemId));
}

/** The visits that count: those that happened, less those a later visit that happened supersedes. */
export const countedVisits = <T extends VisitState>(visits: readonly T[]): T[] => lastVisits(visits.filter(arrived));

/** The three results of the open repair data vocabulary, and what each outcome counts as. */
export const REPAIR_STATUSES = ['fixed', 'repairable', 'end-of-life'] as const;
export type RepairStatus = (typeof REPAIR_STATUSES)[number];
export const REPAIR_STATUS_OF: Record<Outcome, RepairStatus> = {
  fixed: 'fixed',
  'parts-needed': 'repairable',
  advice: 'repairable',
  'end-of-life': 'end-of-life',
};

/** Fixed items divert their mass from landfill; the barrier to repair is counted for end-of-life items only. */
export const DIVERTING_OUTCOME = 'fixed' as const satisfies Outcome;
export const BARRIER_OUTCOME = 'end-of-life' as const satisfies Outcome;

/** The barrier a visit adds to the figures: its own, when its outcome is end of life. */
export const countedBarrier = (outcome: Outcome | null, barrier: Barrier | null | undefined): Barrier | null =>
  outcome === BARRIER_OUTCOME && barrier ? barrier : null;
