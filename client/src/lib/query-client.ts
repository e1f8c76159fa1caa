import { QueryClient } from '@tanstack/react-query';
import type { PersistedClient, Persister } from '@tanstack/react-query-persist-client';
import { ApiError } from './api';
import { eventDayKeys, OUTCOME_MUTATION_KEY, sendOutcome } from '../features/event-day/api';

export const queryClient = new QueryClient({
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      retry: (count, err) => !(err instanceof ApiError && err.status >= 400 && err.status < 500) && count < 2,
    },
  },
});

/**
 * A fixer's outcome recorded with no connection waits in the mutation cache (paused) and is sent when the browser
 * is back online. The default function lets a paused outcome restored after a reload be sent too; a dropped
 * request (status 0) is retried rather than lost. Recording an outcome twice stores the same thing.
 */
queryClient.setMutationDefaults(OUTCOME_MUTATION_KEY, {
  mutationFn: sendOutcome,
  onSuccess: (item) => {
    queryClient.setQueryData(eventDayKeys.item(item.id), item);
    void queryClient.invalidateQueries({ queryKey: ['my-queue'] });
  },
  retry: (count, err) => err instanceof ApiError && err.status === 0 && count < 20,
  retryDelay: (n) => Math.min(30_000, 1000 * 2 ** n),
});

const STORAGE_KEY = 'mendery.pending-writes';

/** Only paused writes are kept on the device: no query data (names, faults) is written to storage. */
export const pendingWritesPersister: Persister = {
  persistClient: (client: PersistedClient) => {
    try {
      localStorage.setItem(STORAGE_KEY, JSON.stringify(client));
    } catch {
      // Storage full or disabled: the write stays in memory until the page closes.
    }
  },
  restoreClient: () => {
    try {
      const raw = localStorage.getItem(STORAGE_KEY);
      return raw ? (JSON.parse(raw) as PersistedClient) : undefined;
    } catch {
      return undefined;
    }
  },
  removeClient: () => localStorage.removeItem(STORAGE_KEY),
};
