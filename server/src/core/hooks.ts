import type { Outcome } from '../../../shared/event-day/constants';
import type { AppContext } from '../context';
import type { Tx } from '../db/client';
import type { ItemRow } from './items';

/**
 * What one feature's use case sets off in another feature's tables. The feature where it happens runs the steps
 * (inside its transaction where the signature has `tx`); the feature that reacts registers a step in its
 * `feature.ts`. This list is the one place to see what reacts to what.
 */
export interface HookEvents {
  /** An outcome was stored for `item` (loaded once, locked, in this transaction): statistics, follow-up, notes. */
  outcomeRecorded: [tx: Tx, e: { ctx: AppContext; item: ItemRow; outcome: Outcome; notes: string | null }];
  /** The desk changed these items' arrival, kind or weight; `arrivedIds` are the ones now in the hall. */
  itemsCheckedIn: [tx: Tx, e: { itemIds: number[]; arrivedIds: number[] }];
  /** These events were cancelled in this transaction. */
  eventsCancelled: [tx: Tx, e: { eventIds: number[] }];
  /** After a check-in or walk-in committed: who is in the hall changed for this slot. Runs outside a transaction. */
  arrivalsChanged: [ctx: AppContext, e: { eventId: number; slotId: number; userId: number }];
  /** A return visit for `earlierItemId` was booked as `returnItemId`, in the booking's transaction. */
  returnBooked: [tx: Tx, e: { earlierItemId: number; returnItemId: number }];
}

export type HookStep<K extends keyof HookEvents> = (...args: HookEvents[K]) => Promise<void>;
export type HookSteps = { [K in keyof HookEvents]: HookStep<K>[] };

export function collectHooks(from: { hooks?: Partial<HookSteps> }[]): HookSteps {
  const all: HookSteps = {
    outcomeRecorded: [],
    itemsCheckedIn: [],
    eventsCancelled: [],
    arrivalsChanged: [],
    returnBooked: [],
  };
  for (const f of from) {
    for (const key of Object.keys(f.hooks ?? {}) as (keyof HookEvents)[]) {
      (all[key] as unknown[]).push(...(f.hooks![key] as unknown[]));
    }
  }
  return all;
}

/** Runs the steps in the order the features were listed; a step that throws rolls the caller's transaction back. */
export async function runHooks<K extends keyof HookEvents>(steps: HookStep<K>[], ...args: HookEvents[K]) {
  for (const step of steps) await step(...args);
}
