import { useMutation, useMutationState, type QueryClient } from '@tanstack/react-query';
import type { OutcomeInput } from '../../../../../shared/schemas/event-day';
import { api, ApiError } from '../../../lib/api';
import { eventDayKeys, outcomeMutationKey } from './keys';
import type { ItemView } from './types';

export interface OutcomeVariables {
  itemId: number;
  body: OutcomeInput;
}

export const recordOutcome = ({ itemId, body }: OutcomeVariables) =>
  api<ItemView>('POST', `/api/items/${itemId}/outcome`, body);

/**
 * A fixer's outcome recorded with no connection waits in the mutation cache (paused) and is sent when the browser
 * is back online. The default function lets a paused outcome restored after a reload be sent too; a dropped
 * request (status 0) is retried rather than lost. Recording an outcome twice stores the same thing. The app passes
 * `onRecorded` for what other features show of the item (the fixer's queue).
 */
export function registerOutcomeWrites(queryClient: QueryClient, onRecorded: () => void) {
  queryClient.setMutationDefaults(outcomeMutationKey, {
    mutationFn: recordOutcome,
    onSuccess: (item: ItemView) => {
      queryClient.setQueryData(eventDayKeys.item(item.id), item);
      onRecorded();
    },
    retry: (count, err) => err instanceof ApiError && err.status === 0 && count < 20,
    retryDelay: (n) => Math.min(30_000, 1000 * 2 ** n),
  });
}

/** No callbacks here: the defaults registered above update the item, also for an outcome sent after a reload. */
export const useRecordOutcome = () =>
  useMutation<ItemView, Error, OutcomeVariables>({ mutationKey: outcomeMutationKey });

/** This item's outcomes still on their way: `paused` while the phone is offline. */
export const usePendingOutcomes = (itemId: number) =>
  useMutationState({
    filters: { mutationKey: outcomeMutationKey, status: 'pending' },
    select: (m) => ({ vars: m.state.variables as OutcomeVariables, paused: m.state.isPaused }),
  }).filter((p) => p.vars?.itemId === itemId);
