/**
 * An item's day: booked → checked in (at the desk) → waiting (placed with a fixer and bench) → at the bench →
 * done; or no-show / withdrawn. Every change is stored with its time and who made it.
 */
export const ITEM_STATUSES = ['booked', 'checked-in', 'waiting', 'at-bench', 'done', 'no-show', 'withdrawn'] as const;
export type ItemStatus = (typeof ITEM_STATUSES)[number];

export const ITEM_STATUS_LABELS: Record<ItemStatus, string> = {
  booked: 'Booked',
  'checked-in': 'Checked in',
  waiting: 'In the queue',
  'at-bench': 'At the bench',
  done: 'Done',
  'no-show': 'Did not come',
  withdrawn: 'Withdrawn',
};

/** Which changes are allowed; done can be reopened by recording the outcome again, not by a status change. */
export const ITEM_TRANSITIONS: Record<ItemStatus, readonly ItemStatus[]> = {
  booked: ['checked-in', 'no-show', 'withdrawn'],
  'checked-in': ['waiting', 'at-bench', 'done', 'withdrawn'],
  waiting: ['checked-in', 'at-bench', 'done', 'withdrawn'],
  'at-bench': ['done', 'waiting', 'withdrawn'],
  done: ['done'],
  'no-show': ['checked-in', 'withdrawn'],
  withdrawn: ['checked-in'],
};

/** The one check of a status change: every service that moves an item asks this table. */
export const canMoveTo = (from: ItemStatus, to: ItemStatus) => ITEM_TRANSITIONS[from].includes(to);

/** Items still in the hall's queue: checked in, with or without a fixer and bench yet. */
export const QUEUED_STATUSES = ['checked-in', 'waiting'] as const satisfies readonly ItemStatus[];
/** Items not finished with: from booked up to at the bench. */
export const OPEN_STATUSES = ['booked', 'checked-in', 'waiting', 'at-bench'] as const satisfies readonly ItemStatus[];
/** Items that reached the desk and stayed: checked in, queued, at a bench or done. */
export const ARRIVED_STATUSES = ['checked-in', 'waiting', 'at-bench', 'done'] as const satisfies readonly ItemStatus[];
/** Items that did not come or were taken away: they count nowhere and wait for nobody. */
export const ABSENT_STATUSES = ['no-show', 'withdrawn'] as const satisfies readonly ItemStatus[];

const isIn = (list: readonly ItemStatus[]) => (status: ItemStatus) => list.includes(status);
export const isQueued = isIn(QUEUED_STATUSES);
export const isOpen = isIn(OPEN_STATUSES);
/** Done, no-show or withdrawn: nothing more happens to it without checking it in again (or re-recording done). */
export const isClosed = (status: ItemStatus) => !isOpen(status);
export const hasArrived = isIn(ARRIVED_STATUSES);
export const isAbsent = isIn(ABSENT_STATUSES);
/** A fixer may test an item and record what happened once it has arrived, and again after it is done. */
export const mayRecordOutcome = (status: ItemStatus) => canMoveTo(status, 'done');
/** A fixer may start on an item that waits in the hall, not on one already at a bench. */
export const mayStartRepair = (status: ItemStatus) => canMoveTo(status, 'at-bench');

/** What the fixer records. The first three map onto the open repair data vocabulary's Fixed / Repairable / End of life. */
export const OUTCOMES = ['fixed', 'parts-needed', 'advice', 'end-of-life'] as const;
export type Outcome = (typeof OUTCOMES)[number];
export const OUTCOME_LABELS: Record<Outcome, string> = {
  fixed: 'Fixed',
  'parts-needed': 'Needs a part',
  advice: 'Advice given',
  'end-of-life': 'End of life',
};

/** Barriers to repair for an end-of-life item, as the Open Repair Data Standard words them (REFERENCE.md §5). */
export const BARRIERS = [
  'spare-parts-not-available',
  'spare-parts-too-expensive',
  'no-way-to-open',
  'repair-information-not-available',
  'lack-of-equipment',
  'too-worn-out',
] as const;
export type Barrier = (typeof BARRIERS)[number];
export const BARRIER_LABELS: Record<Barrier, string> = {
  'spare-parts-not-available': 'Spare parts not available',
  'spare-parts-too-expensive': 'Spare parts too expensive',
  'no-way-to-open': 'No way to open the product',
  'repair-information-not-available': 'Repair information not available',
  'lack-of-equipment': 'Lack of equipment',
  'too-worn-out': 'Product too worn out',
};

/** Arrival answers at the desk, item by item. */
export const ARRIVALS = ['arrived', 'no-show', 'withdrawn'] as const;
export type Arrival = (typeof ARRIVALS)[number];

/** An item waiting longer than this shows a warning on the organiser's live view. */
export const LONG_WAIT_MINUTES = 45;
