import type { EventStatus } from '../constants';

/* The rota's answers as the server returns them; the client reads them as `Json<T>` (dates as ISO strings). */

export interface Rota {
  slots: { id: number; startsAt: Date; endsAt: Date; demand: Record<string, number> }[];
  shifts: {
    userId: number;
    name: string;
    coming: boolean;
    startsAt: Date;
    endsAt: Date;
    benchId: number | null;
    skills: Record<string, number>;
  }[];
  coverage: { startsAt: Date; endsAt: Date; bySkill: Record<string, number>; fixers: number }[];
  gaps: { skill: string; from: Date; to: Date; items: number }[];
}
/** A session a volunteer can help at, with their answer so far. */
export interface MyEvent {
  id: number;
  title: string;
  startsAt: Date;
  endsAt: Date;
  status: EventStatus;
  groupName: string;
  timeZone: string;
  shift: { coming: boolean; startsAt: Date; endsAt: Date } | null;
}
/** A volunteer's answer as saved: the hours default to the event's opening hours. */
export interface ShiftAnswer {
  eventId: number;
  coming: boolean;
  startsAt: Date;
  endsAt: Date;
}
/** How many fixers were asked by mail for the wanted skills. */
export interface AskResult {
  sent: number;
}
export interface SeatResult {
  ok: true;
}

/** Whether a person's shift-calendar link is live; the link itself is shown only when made. */
export interface CalendarLinkStatus {
  live: boolean;
}
/** A newly made shift-calendar link: the one time its URL is shown. */
export interface CalendarLink {
  live: true;
  url: string;
}
