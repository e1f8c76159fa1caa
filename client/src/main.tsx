import './fonts.css';
import './index.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { PersistQueryClientProvider } from '@tanstack/react-query-persist-client';
import { RouterProvider } from 'react-router';
import { pendingWritesPersister, queryClient } from './lib/query-client';
import { router } from './app/router';
import { registerOutcomeWrites } from './features/event-day/api/record-outcome';
import { workbenchKeys } from './features/workbench/api/keys';

// An outcome recorded at the bench also changes the fixer's own queue.
registerOutcomeWrites(queryClient, () => void queryClient.invalidateQueries({ queryKey: workbenchKeys.queue() }));

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <PersistQueryClientProvider
      client={queryClient}
      persistOptions={{
        persister: pendingWritesPersister,
        maxAge: 7 * 24 * 3600_000,
        dehydrateOptions: { shouldDehydrateQuery: () => false },
      }}
      // Writes made offline before a reload are sent as soon as they are restored (if online).
      onSuccess={() => void queryClient.resumePausedMutations()}
    >
      <RouterProvider router={router} />
    </PersistQueryClientProvider>
  </StrictMode>,
);
