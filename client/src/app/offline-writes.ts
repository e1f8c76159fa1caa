import { persistQueryClient } from '@tanstack/react-query-persist-client';
import { registerOutcomeWrites } from '../features/event-day/api/record-outcome';
import { workbenchKeys } from '../features/workbench/api/keys';
import { pendingWritesPersister, queryClient } from '../lib/query-client';

/**
 * Writes made offline survive a reload: loaded just after the first page, so a visitor's phone does not wait for
 * it. Only paused writes are kept (no query data); restored ones are sent at once if the phone is online.
 */
export function keepOfflineWrites() {
  // An outcome recorded at the bench also changes the fixer's own queue.
  registerOutcomeWrites(queryClient, () => void queryClient.invalidateQueries({ queryKey: workbenchKeys.queue() }));
  const [, restored] = persistQueryClient({
    queryClient,
    persister: pendingWritesPersister,
    maxAge: 7 * 24 * 3600_000,
    dehydrateOptions: { shouldDehydrateQuery: () => false },
  });
  void restored.then(() => queryClient.resumePausedMutations());
}
