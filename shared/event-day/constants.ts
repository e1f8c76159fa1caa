/**
 * An item's day: booked → checked in (at the desk) → waiting (placed with a fixer and bench) → at the bench →
 * done; or no-show / withdrawn. Every change is stored with its time and who made it.
 */
export const ITEM_STATUSES = ['booked', 'checked-in', 'waiting', 'at-bench', 'done', 'no-show', 'withdrawn'] as const;
export type ItemStatus = (typeof ITEM_STATUSES)[number];

export const ITEM_STATUS_LABELS: Record<ItemStatus, string> = {
  booked: 'Still to come',
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

/** What the fixer records. The file formats map these onto their own status words (shared/impact/open-repair-data.ts). */
export const OUTCOMES = ['fixed', 'parts-needed', 'advice', 'end-of-life'] as const;
export type Outcome = (typeof OUTCOMES)[number];
export const OUTCOME_LABELS: Record<Outcome, string> = {
  fixed: 'Fixed',
  'parts-needed': 'Needs a part',
  advice: 'Advice given',
  'end-of-life': 'Beyond mending',
};

/** Why an item is beyond mending. Stored codes; the words on screen and their order are below. */
export const BARRIERS = [
  'spare-parts-not-available',
  'spare-parts-too-expensive',
  'no-way-to-open',
  'repair-information-not-available',
  'lack-of-equipment',
  'too-worn-out',
] as const;
export type Barrier = (typeof BARRIERS)[number];
/** The order a fixer meets them at the bench: the item itself, getting in, finding the fault, then the part. */
export const BARRIER_CHOICES: readonly Barrier[] = [
  'too-worn-out',
  'no-way-to-open',
  'lack-of-equipment',
  'repair-information-not-available',
  'spare-parts-not-available',
  'spare-parts-too-expensive',
];
export const BARRIER_LABELS: Record<Barrier, string> = {
  'too-worn-out': 'Worn past use',
  'no-way-to-open': 'We couldn’t get inside',
  'lack-of-equipment': 'It needs a tool we lack',
  'repair-information-not-available': 'No guide or diagram to go by',
  'spare-parts-not-available': 'The part can’t be had',
  'spare-parts-too-expensive': 'The part costs too much',
};
export const BARRIER_HINTS: Record<Barrier, string> = {
  'too-worn-out': 'Too many faults at once, or not safe to use again.',
  'no-way-to-open': 'Glued or welded shut, or it would break on opening.',
  'lack-of-equipment': 'A special tool, meter or jig the group does not have.',
  'repair-information-not-available': 'No manual, circuit diagram or fault guide to be found.',
  'spare-parts-not-available': 'No longer made or sold, and nothing fits from salvage.',
  'spare-parts-too-expensive': 'More than the item is worth to its owner.',
};

/** Arrival answers at the desk, item by item. */
export const ARRIVALS = ['arrived', 'no-show', 'withdrawn'] as const;
export type Arrival = (typeof ARRIVALS)[number];

/** An item waiting longer than this shows a warning on the organiser's live view. */
export const LONG_WAIT_MINUTES = 45;
