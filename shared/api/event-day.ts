import type { EventStatus, Skill } from '../constants';
import type { Barrier, ItemStatus, Outcome } from '../event-day/constants';
import type { LiveWarning } from '../event-day/queue';
import type { Caution } from '../safety/cautions';
import type { ApplianceClass } from '../safety/readings';
import type { SafetyCheckValues } from '../schemas/event-day';

/*
 * The event-day API's answers. The server's services return these (with `Date`s); the client reads them as
 * `Json<T>` from ./json (dates as ISO strings).
 */

/** An event the desk may run, on the reception's start page. */
export interface DeskEvent {
  id: number;
  title: string;
  startsAt: Date;
  endsAt: Date;
  status: EventStatus;
  groupId: number;
  groupName: string;
  timeZone: string;
  open: boolean;
}

export interface EventHeader {
  id: number;
  title: string;
  status: EventStatus;
  startsAt: Date;
  endsAt: Date;
  groupId: number;
  groupName: string;
  timeZone: string;
}

export interface DeskItem {
  id: number;
  categoryId: number;
  categoryName: string;
  brand: string | null;
  model: string | null;
  fault: string;
  mains: boolean;
  status: ItemStatus;
  tagCode: string | null;
  queueNumber: number | null;
  weighedKg: number | null;
  checkedInAt: Date | null;
}
export interface DeskBooking {
  id: number;
  reference: string;
  visitorName: string;
  visitorPhone: string | null;
  walkIn: boolean;
  slotId: number;
  items: DeskItem[];
}
/** Today's desk: every booking by slot. */
export interface DeskView {
  event: EventHeader;
  open: boolean;
  currentSlotId: number | null;
  slots: { id: number; startsAt: Date; endsAt: Date; bookings: DeskBooking[] }[];
}

/** An item as the desk left it: its tag, queue number and status. */
export interface IssuedItem {
  id: number;
  tagCode: string | null;
  queueNumber: number | null;
  status: ItemStatus;
}
export interface CheckInResult {
  items: IssuedItem[];
}
export interface WalkInResult {
  reference: string;
  items: IssuedItem[];
}

/** The answer to a safety check: the verdict from shared/safety/limits, never the client's. */
export interface SafetyCheckResult {
  id: number;
  pass: boolean;
  failures: string[];
  missing: string[];
  suggestion: string | null;
}

export interface SafetyCheckRecord {
  id: number;
  pass: boolean;
  failures: string[];
  applianceClass: ApplianceClass;
  readings: SafetyCheckValues;
  instrument: string | null;
  createdAt: Date;
  checkedByName: string | null;
}

export interface ItemOutcomeRecord {
  itemId: number;
  outcome: Outcome;
  outcomeLabel: string;
  barrier: Barrier | null;
  barrierLabel: string | null;
  partDescription: string | null;
  partLink: string | null;
  partCostCents: number | null;
  partCost: number | null;
  minutes: number | null;
  notes: string | null;
  safetyCheckId: number | null;
  recordedBy: number | null;
  recordedAt: Date;
  recordedByName: string | null;
}

export interface ItemPartUsed {
  id: number;
  quantity: number;
  createdAt: Date;
  type: string;
  value: string;
  package: string;
  box: string;
  takenBy: string | null;
}

/** The item page, for the fixer at the bench, reception and organisers. */
export interface ItemView {
  id: number;
  status: ItemStatus;
  statusLabel: string;
  tagCode: string | null;
  queueNumber: number | null;
  categoryId: number;
  categoryName: string;
  skill: Skill;
  mains: boolean;
  battery: boolean;
  heating: boolean;
  brand: string | null;
  model: string | null;
  ageYears: number | null;
  fault: string;
  weighedKg: number | null;
  estimatedMinutes: number;
  checkedInAt: Date | null;
  startedAt: Date | null;
  doneAt: Date | null;
  photos: { id: string; kind: 'intake' | 'repair'; width: number; height: number }[];
  booking: {
    reference: string;
    visitorName: string;
    visitorPhone: string | null;
    walkIn: boolean;
    slotStartsAt: Date;
    slotEndsAt: Date;
  };
  /** currency: the group's ISO 4217 code, for the part cost. */
  event: Omit<EventHeader, 'status'> & { currency: string };
  placement: { userId: number; benchId: number; fixerName: string; benchName: string; startsAt: Date | null } | null;
  outcome: ItemOutcomeRecord | null;
  safetyChecks: SafetyCheckRecord[];
  history: {
    from: ItemStatus | null;
    to: ItemStatus;
    toLabel: string;
    at: Date;
    byName: string | null;
    note: string | null;
  }[];
  partsUsed: ItemPartUsed[];
  returnOfItemId: number | null;
  cautions: Caution[];
  safetyNote: string;
  safetySource: string;
  can: { start: boolean; record: boolean };
}

/** The hall's TV: queue numbers only. */
export interface HallQueue {
  event: {
    id: number;
    title: string;
    groupName: string;
    /** The group's language, which the hall's screen speaks unless the browser has chosen one. */
    groupLanguage: string;
    timeZone: string;
    startsAt: Date;
    endsAt: Date;
  };
  serving: { queueNumber: number | null; benchName: string | null }[];
  waiting: { queueNumber: number | null; waitMinutes: number | null }[];
  done: number;
  fixersOnHand: number;
  updatedAt: Date;
}

export interface LiveCard {
  id: number;
  queueNumber: number | null;
  tagCode: string | null;
  label: string;
  visitor: string;
  status: ItemStatus;
  fixerName: string | null;
  checkedInAt: Date | null;
  startedAt: Date | null;
  doneAt: Date | null;
  outcomeLabel: string | null;
  waitedMinutes: number | null;
  estimatedWaitMinutes: number | null;
}
/** The organiser's live view. */
export interface LiveView {
  event: EventHeader;
  counts: Record<ItemStatus, number>;
  benches: { id: number; name: string; atBench: LiveCard[]; waiting: LiveCard[]; done: LiveCard[] }[];
  unplaced: LiveCard[];
  fixers: { userId: number; name: string; busy: boolean }[];
  warnings: LiveWarning[];
  updatedAt: Date;
}

export interface Tag {
  itemId: number;
  tagCode: string;
  url: string;
  qrSvg: string;
  queueNumber: number | null;
  categoryName: string;
  mains: boolean;
  visitor: string;
  slotStartsAt: Date;
  benchName: string | null;
}
export interface TagSheet {
  event: { id: number; title: string; groupName: string; timeZone: string };
  tags: Tag[];
}

/** What a scanned tag shows anyone: no names, no fault text. */
export interface PublicTag {
  tagCode: string | null;
  itemId: number;
  groupId: number;
  groupName: string;
  eventId: number;
  eventTitle: string;
  categoryName: string;
  status: ItemStatus;
  statusLabel: string;
  queueNumber: number | null;
  outcomeLabel: string | null;
  waitMinutes: number | null;
}
