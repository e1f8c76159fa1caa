import type { EventStatus } from '../constants';
import type { RunSummary } from '../triage/run-summary';
import type { PlacementWarning } from '../triage/needs';
import type { WaitingWhy } from '../triage/waiting';

/* The triage board's answers as the server returns them; the client reads them as `Json<T>` (dates as ISO strings). */

export interface BoardItem {
  id: number;
  reference: string;
  visitorName: string;
  bookedAt: Date;
  slotId: number;
  categoryName: string;
  brand: string | null;
  model: string | null;
  fault: string;
  mains: boolean;
  minutes: number;
  needs: { skill: string; minLevel: number; equipment: string[] };
  photoIds: string[];
  placement: {
    userId: number;
    benchId: number;
    locked: boolean;
    source: 'engine' | 'hand';
    startsAt: Date | null;
  } | null;
  warnings: PlacementWarning[];
  /** Why it waits, as a code and values; `detail` is the run's English record of it. */
  reason: (WaitingWhy & { detail: string }) | null;
  estimatedStart: Date | null;
}
export type { PlacementWarning };
export interface Board {
  event: {
    id: number;
    title: string;
    status: EventStatus;
    startsAt: Date;
    endsAt: Date;
    groupId: number;
    groupName: string;
    timeZone: string;
  };
  slots: { id: number; startsAt: Date; endsAt: Date }[];
  benches: { id: number; name: string; seats: number; equipment: string[] }[];
  fixers: {
    userId: number;
    name: string;
    startsAt: Date;
    endsAt: Date;
    benchId: number | null;
    skills: Record<string, number>;
  }[];
  items: BoardItem[];
  runs: {
    id: number;
    slotId: number | null;
    createdAt: Date;
    assigned: number;
    unassigned: number;
    lockedKept: number;
  }[];
}
/** What a triage run placed and left waiting, and how many locked placements it kept. */
export interface TriageRunResult {
  runId: number;
  assigned: number;
  unassigned: number;
  lockedKept: number;
}
/** A placement by hand is kept even when it breaks a rule; the warnings say which. */
export interface PlacementResult {
  warnings?: PlacementWarning[];
}
/** One stored run read back: the summary in words, and the exact input and result behind "technical details". */
export interface TriageRunDetail {
  run: { id: number; createdAt: Date; slotStartsAt: Date | null; lockedKept: number };
  event: { id: number; title: string; startsAt: Date; timeZone: string; groupId: number; groupName: string };
  summary: RunSummary | null;
  technical: { input: unknown; result: unknown };
}
