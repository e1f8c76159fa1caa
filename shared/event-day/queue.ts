import { LONG_WAIT_MINUTES } from './constants';

/**
 * Queue order and estimated waits for the hall. Pure: the server feeds it what the database says, the tests feed
 * it worked examples.
 */
export interface QueueItem {
  id: number;
  slotStartsAt: number;
  walkIn: boolean;
  checkedInAt: number;
  /** The fixer the plan gives it to, if any. */
  fixerId?: number | null;
  minutes: number;
}

/** Booked items first within their slot, walk-ins after them, each in the order they checked in. */
export function queueOrder<T extends QueueItem>(items: readonly T[]): T[] {
  return [...items].sort(
    (a, b) =>
      a.slotStartsAt - b.slotStartsAt ||
      Number(a.walkIn) - Number(b.walkIn) ||
      a.checkedInAt - b.checkedInAt ||
      a.id - b.id,
  );
}

export interface FixerNow {
  id: number;
  /** When the repair in hand should end (ms); at or before now when free. */
  busyUntil: number;
}

/**
 * Estimated minutes until each waiting item reaches a bench: items go in queue order to their planned fixer, or
 * to whoever is free first; each keeps its fixer for its category's minutes. Null when no fixer is on hand.
 */
export function estimateWaits(
  now: number,
  fixers: readonly FixerNow[],
  waiting: readonly QueueItem[],
): Map<number, number | null> {
  const free = new Map(fixers.map((f) => [f.id, Math.max(now, f.busyUntil)]));
  const out = new Map<number, number | null>();
  for (const item of queueOrder(waiting)) {
    if (free.size === 0) {
      out.set(item.id, null);
      continue;
    }
    let fixer = item.fixerId != null && free.has(item.fixerId) ? item.fixerId : undefined;
    if (fixer === undefined) {
      for (const [id, at] of free) if (fixer === undefined || at < free.get(fixer)!) fixer = id;
    }
    const start = free.get(fixer!)!;
    free.set(fixer!, start + item.minutes * 60_000);
    out.set(item.id, Math.round((start - now) / 60_000));
  }
  return out;
}

export interface LiveWarning {
  kind: 'long-wait' | 'idle-fixer';
  itemId?: number;
  userId?: number;
  /** In English, for logs; the screen words it from `kind` and `values` in the reader's language. */
  message: string;
  values: { label?: string; minutes?: number; name?: string; waiting?: number };
}

/** Warnings for the organiser: an item waiting over 45 minutes, a fixer on shift with nothing in hand while items wait. */
export function liveWarnings(
  now: number,
  queued: readonly { id: number; checkedInAt: number; label: string }[],
  fixersOnShift: readonly { userId: number; name: string; busy: boolean }[],
): LiveWarning[] {
  const out: LiveWarning[] = [];
  for (const q of queued) {
    const minutes = Math.floor((now - q.checkedInAt) / 60_000);
    if (minutes > LONG_WAIT_MINUTES)
      out.push({
        kind: 'long-wait',
        itemId: q.id,
        message: `${q.label} has waited ${minutes} minutes since check-in.`,
        values: { label: q.label, minutes },
      });
  }
  if (queued.length > 0) {
    for (const f of fixersOnShift)
      if (!f.busy)
        out.push({
          kind: 'idle-fixer',
          userId: f.userId,
          message: `${f.name} has nothing at the bench while ${queued.length} item${queued.length === 1 ? '' : 's'} wait${queued.length === 1 ? 's' : ''}.`,
          values: { name: f.name, waiting: queued.length },
        });
  }
  return out;
}
