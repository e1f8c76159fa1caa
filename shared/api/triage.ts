/* The triage board's answers as the client reads them (dates as ISO strings). */

export interface BoardItem {
  id: number;
  reference: string;
  visitorName: string;
  bookedAt: string;
  slotId: number;
  categoryName: string;
  brand: string | null;
  model: string | null;
  fault: string;
  mains: boolean;
  minutes: number;
  needs: { skill: string; minLevel: number; equipment: string[] };
  photoIds: number[];
  placement: {
    userId: number;
    benchId: number;
    locked: boolean;
    source: 'engine' | 'hand';
    startsAt: string | null;
  } | null;
  warnings: PlacementWarning[];
  reason: { reason: string; detail: string } | null;
  estimatedStart: string | null;
}
export interface PlacementWarning {
  code: string;
  message: string;
}
export interface Board {
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
  slots: { id: number; startsAt: string; endsAt: string }[];
  benches: { id: number; name: string; seats: number; equipment: string[] }[];
  fixers: {
    userId: number;
    name: string;
    startsAt: string;
    endsAt: string;
    benchId: number | null;
    skills: Record<string, number>;
  }[];
  items: BoardItem[];
  runs: {
    id: number;
    slotId: number | null;
    createdAt: string;
    assigned: number;
    unassigned: number;
    lockedKept: number;
  }[];
}
/** What a triage run placed and left waiting. */
export interface TriageRunResult {
  assigned: number;
  unassigned: number;
}
/** A placement by hand is kept even when it breaks a rule; the warnings say which. */
export interface PlacementResult {
  warnings?: PlacementWarning[];
}
