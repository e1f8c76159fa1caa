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

/** Items still in the hall's queue. */
export const QUEUED_STATUSES = ['checked-in', 'waiting'] as const satisfies readonly ItemStatus[];

/** Which changes are allowed; done can be reopened by recording the outcome again, not by a status change. */
export const ITEM_TRANSITIONS: Record<ItemStatus, readonly ItemStatus[]> = {
  booked: ['checked-in', 'no-show', 'withdrawn'],
  'checked-in': ['waiting', 'at-bench', 'done', 'withdrawn'],
  waiting: ['checked-in', 'at-bench', 'done', 'withdrawn'],
  'at-bench': ['done', 'waiting', 'withdrawn'],
  done: ['done'],
  'no-show': ['checked-in'],
  withdrawn: ['checked-in'],
};

export const canMove = (from: ItemStatus, to: ItemStatus) => ITEM_TRANSITIONS[from].includes(to);

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
