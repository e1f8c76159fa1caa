import { ITEM_STATUS_LABELS, ITEM_STATUSES, type ItemStatus } from './constants';

/**
 * The day's tallies, one per item status, in the order the day runs. The desk, the live view and the hall display all
 * count with `tallyStatuses` and name each tally with the status's own label, so the same state has one word and one
 * number wherever it shows.
 */
export const TALLY_ORDER = [
  'booked',
  'checked-in',
  'waiting',
  'at-bench',
  'done',
  'no-show',
  'withdrawn',
] as const satisfies readonly ItemStatus[];

/** How many items are in each status; every status is present, 0 when none. */
export function tallyStatuses(statuses: Iterable<ItemStatus>): Record<ItemStatus, number> {
  const counts = Object.fromEntries(ITEM_STATUSES.map((s) => [s, 0])) as Record<ItemStatus, number>;
  for (const s of statuses) counts[s] += 1;
  return counts;
}

/** The tallies as both screens list them: the status, its label and its count. */
export const dayTallies = (counts: Record<ItemStatus, number>) =>
  TALLY_ORDER.map((status) => ({ status, label: ITEM_STATUS_LABELS[status], count: counts[status] }));
