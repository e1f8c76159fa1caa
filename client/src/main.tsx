import './fonts.css';
import './index.css';
import { startTransition, StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { QueryClientProvider } from '@tanstack/react-query';
import { RouterProvider } from 'react-router';
import { queryClient } from './lib/query-client';
import { activate, initialLanguage } from './lib/i18n';
import { router } from './app/router';

// The language's messages load beside the page's chunks (the router has started on those already); the first render
// waits for them. Should they not come, English is tried once more.
void activate(initialLanguage())
  .catch(() => activate('en'))
  .then(() =>
    // The first render is a transition: React renders in short slices, so a slow phone still answers a tap meanwhile.
    startTransition(() =>
      createRoot(document.getElementById('root')!).render(
        <StrictMode>
          <QueryClientProvider client={queryClient}>
            <RouterProvider router={router} />
          </QueryClientProvider>
        </StrictMode>,
      ),
    ),
  );

// Offline writes (and their restore after a reload) come in their own chunk, after the page has started.
void import('./app/offline-writes').then((m) => m.keepOfflineWrites());
