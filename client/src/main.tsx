import './fonts.css';
import './index.css';
import { startTransition, StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { QueryClientProvider } from '@tanstack/react-query';
import { RouterProvider } from 'react-router';
import { queryClient } from './lib/query-client';
import { router } from './app/router';

// The first render is a transition: React renders in short slices, so a slow phone still answers a tap meanwhile.
startTransition(() =>
  createRoot(document.getElementById('root')!).render(
    <StrictMode>
      <QueryClientProvider client={queryClient}>
        <RouterProvider router={router} />
      </QueryClientProvider>
    </StrictMode>,
  ),
);

// Offline writes (and their restore after a reload) come in their own chunk, after the page has started.
void import('./app/offline-writes').then((m) => m.keepOfflineWrites());
