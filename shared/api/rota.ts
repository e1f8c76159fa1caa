/* The rota's answers as the client reads them (dates as ISO strings). */

export interface Rota {
  slots: { id: number; startsAt: string; endsAt: string; demand: Record<string, number> }[];
  shifts: {
    userId: number;
    name: string;
    coming: boolean;
    startsAt: string;
    endsAt: string;
    benchId: number | null;
    skills: Record<string, number>;
  }[];
  coverage: { startsAt: string; endsAt: string; bySkill: Record<string, number>; fixers: number }[];
  gaps: { skill: string; from: string; to: string; items: number }[];
}
/** A session a volunteer can help at, with their answer so far. */
export interface MyEvent {
  id: number;
  title: string;
  startsAt: string;
  endsAt: string;
  status: string;
  groupName: string;
  timeZone: string;
  shift: { coming: boolean; startsAt: string; endsAt: string } | null;
}
export interface ShiftAnswer {
  eventId: number;
  coming: boolean;
  startsAt?: string;
  endsAt?: string;
}
