import { QueryClient } from '@tanstack/react-query';
import type { PersistedClient, Persister } from '@tanstack/react-query-persist-client';
import { ApiError } from './api';

export const queryClient = new QueryClient({
  defaultOptions: {
    queries: {
      staleTime: 30_000,
      retry: (count, err) => !(err instanceof ApiError && err.status >= 400 && err.status < 500) && count < 2,
    },
  },
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
