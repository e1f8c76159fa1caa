import type { Barrier, Outcome } from '../event-day/constants';
import type { FollowUpStatus } from '../impact/follow-ups';
import type { ImpactTotals } from '../impact/statistics';

/*
 * The impact API's answers as the server returns them; the client reads them as `Json<T>` (dates as ISO strings).
 * The filters' `from`, `to` and `month` are calendar dates as typed (YYYY-MM-DD, YYYY-MM).
 */

export interface StatsFilter {
  groupId?: number;
  eventId?: number;
  from?: string;
  to?: string;
}
export type Stats = ImpactTotals & { displacement: number; filter: StatsFilter };
/** One session's figures for the group's list of past sessions. */
export type SessionFigures = { eventId: number } & Pick<
  ImpactTotals,
  'items' | 'fixed' | 'partsNeeded' | 'advice' | 'endOfLife' | 'unknown' | 'kgDiverted'
>;
/** The method in the reader's language (the request's Accept-Language); a source an admin typed as typed. */
export interface Method {
  displacement: number;
  displacementNote: string;
  displacementSource: string;
  factorSource: string;
  text: string[];
  categories: {
    id: number;
    name: string;
    avgWeightKg: number;
    weightSource: string;
    /** The weight source as people outside the group read it: a figure from memory is called an estimate. */
    weightSourceForReaders: string;
    co2ePerKg: number | null;
    co2eSource: string | null;
  }[];
}
export interface RecordRow {
  itemId: number;
  eventId: number;
  eventTitle: string;
  eventStartsAt: Date;
  groupName: string;
  categoryName: string;
  brand: string | null;
  model: string | null;
  fault: string;
  weighedKg: number | null;
  outcome: Outcome | null;
  barrier: Barrier | null;
  visitor: string;
  kg: number;
  outcomeLabel: string;
  barrierLabel: string | null;
}
export interface RecordsFilter extends StatsFilter {
  categoryId?: number;
  outcome?: Outcome | 'none';
  barrier?: Barrier;
  month?: string;
  page?: number;
}
export type PublicImpact = Omit<Stats, 'filter'> & {
  group: { name: string; town: string } | null;
  events: number;
  method: Method;
};
export interface EventReport {
  range?: { from: string | null; to: string | null; sessions: number };
  event: {
    id: number;
    title: string;
    startsAt: Date;
    endsAt: Date;
    groupId: number;
    groupName: string;
    timeZone: string;
  };
  stats: Stats;
  volunteers: { name: string; hours: number }[];
  volunteerHours: number;
  method: Method;
}
export interface FollowUp {
  itemId: number;
  status: FollowUpStatus;
  statusLabel: string;
  createdAt: Date;
  mailedAt: Date | null;
  remindedAt: Date | null;
  returnItemId: number | null;
  note: string | null;
  ageDays: number;
  reminderDue: boolean;
  item: string;
  part: string | null;
  partLink: string | null;
  partCost: number | null;
  /** The group's ISO 4217 code, in which partCost is written. */
  currency: string;
  visitor: { name: string; email: string | null; phone: string | null; reference: string };
  event: { title: string; startsAt: Date };
  rebookUrl: string | null;
  returnVisit: { reference: string; eventTitle: string | null; startsAt: Date } | null;
}
export interface RebookView {
  item: { categoryName: string; brand: string | null; model: string | null; part: string | null };
  visitorName: string;
  group: { name: string; timeZone: string };
  status: FollowUpStatus;
  booked: boolean;
  events: {
    id: number;
    title: string;
    startsAt: Date;
    endsAt: Date;
    slots: { id: number; startsAt: Date; endsAt: Date; free: number }[];
  }[];
}
export interface RecordsPage {
  total: number;
  page: number;
  records: RecordRow[];
}
export interface ReturnBooked {
  reference: string;
  manageToken: string;
  eventId: number;
}
export interface ImpactSettings {
  displacement: number;
}
export type FollowUpChange = 'open' | 'part-ordered' | 'gave-up';
