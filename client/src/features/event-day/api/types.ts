/** What the event-day endpoints answer. */
import type { ItemStatus, Outcome, Barrier } from '../../../../../shared/event-day/constants';
import type { Caution } from '../../../../../shared/safety/cautions';

export interface DeskEvent {
  id: number;
  title: string;
  startsAt: string;
  endsAt: string;
  status: string;
  groupId: number;
  groupName: string;
  timeZone: string;
  open: boolean;
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
  checkedInAt: string | null;
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
export interface Desk {
  event: {
    id: number;
    title: string;
    status: string;
    startsAt: string;
    endsAt: string;
    groupId: number;
    groupName: string;
    timeZone: string;
  };
  open: boolean;
  currentSlotId: number | null;
  slots: { id: number; startsAt: string; endsAt: string; bookings: DeskBooking[] }[];
}
export interface Issued {
  id: number;
  tagCode: string | null;
  queueNumber: number | null;
  status: ItemStatus;
}

export interface SafetyCheck {
  id: number;
  pass: boolean;
  failures: string[];
  applianceClass: 'I' | 'II' | 'III';
  readings: Record<string, unknown>;
  instrument: string | null;
  createdAt: string;
  checkedByName: string | null;
}
export interface ItemDetail {
  id: number;
  status: ItemStatus;
  statusLabel: string;
  tagCode: string | null;
  queueNumber: number | null;
  categoryId: number;
  categoryName: string;
  skill: string;
  mains: boolean;
  battery: boolean;
  heating: boolean;
  brand: string | null;
  model: string | null;
  ageYears: number | null;
  fault: string;
  weighedKg: number | null;
  estimatedMinutes: number;
  checkedInAt: string | null;
  startedAt: string | null;
  doneAt: string | null;
  photos: { id: number; kind: 'intake' | 'repair'; width: number; height: number }[];
  booking: {
    reference: string;
    visitorName: string;
    visitorPhone: string | null;
    walkIn: boolean;
    slotStartsAt: string;
    slotEndsAt: string;
  };
  event: {
    id: number;
    title: string;
    groupId: number;
    groupName: string;
    timeZone: string;
    startsAt: string;
    endsAt: string;
  };
  placement: { userId: number; benchId: number; fixerName: string; benchName: string; startsAt: string | null } | null;
  outcome: null | {
    outcome: Outcome;
    outcomeLabel: string;
    barrier: Barrier | null;
    barrierLabel: string | null;
    partDescription: string | null;
    partLink: string | null;
    partCost: number | null;
    minutes: number | null;
    notes: string | null;
    recordedAt: string;
    recordedByName: string | null;
  };
  safetyChecks: SafetyCheck[];
  history: {
    from: ItemStatus | null;
    to: ItemStatus;
    toLabel: string;
    at: string;
    byName: string | null;
    note: string | null;
  }[];
  partsUsed: {
    id: number;
    quantity: number;
    createdAt: string;
    type: string;
    value: string;
    package: string;
    box: string;
    takenBy: string | null;
  }[];
  returnOfItemId: number | null;
  cautions: Caution[];
  safetyNote: string;
  safetySource: string;
  can: { start: boolean; record: boolean };
}

export interface HallQueue {
  event: { id: number; title: string; groupName: string; timeZone: string; startsAt: string; endsAt: string };
  serving: { queueNumber: number | null; benchName: string | null }[];
  waiting: { queueNumber: number | null; waitMinutes: number | null }[];
  done: number;
  fixersOnHand: number;
  updatedAt: string;
}
export interface LiveCard {
  id: number;
  queueNumber: number | null;
  tagCode: string | null;
  label: string;
  visitor: string;
  status: ItemStatus;
  fixerName: string | null;
  checkedInAt: string | null;
  startedAt: string | null;
  doneAt: string | null;
  outcomeLabel: string | null;
  waitedMinutes: number | null;
  estimatedWaitMinutes: number | null;
}
export interface LiveView {
  event: {
    id: number;
    title: string;
    status: string;
    startsAt: string;
    endsAt: string;
    groupId: number;
    groupName: string;
    timeZone: string;
  };
  counts: Record<ItemStatus, number>;
  benches: { id: number; name: string; atBench: LiveCard[]; waiting: LiveCard[]; done: LiveCard[] }[];
  unplaced: LiveCard[];
  fixers: { userId: number; name: string; busy: boolean }[];
  warnings: { kind: 'long-wait' | 'idle-fixer'; itemId?: number; userId?: number; message: string }[];
  updatedAt: string;
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
  slotStartsAt: string;
  benchName: string | null;
}
export interface TagSheet {
  event: { id: number; title: string; groupName: string; timeZone: string };
  tags: Tag[];
}
export interface PublicTag {
  tagCode: string;
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
export interface SafetyCheckResult {
  id: number;
  pass: boolean;
  failures: string[];
  missing: string[];
  suggestion: string | null;
}
