import { catalogs } from 'virtual:mendery-catalogs';
import { pickInitialLanguage, STORAGE_KEY } from './lib/language-choice';

/**
 * The page's first script (vite.config.ts puts it before the entry): it asks at once for the reader's language and
 * for Lingui, which the first render waits for. Without it they were asked for only once the entry (React, the router,
 * the query cache) had arrived and run, one more round trip after it on every first visit. The entry's own
 * `activate` then finds both modules already fetched. A failure is left to the entry, which tries again.
 */
let stored: string | null = null;
try {
  stored = localStorage.getItem(STORAGE_KEY);
} catch {
  // A browser that keeps nothing: the address and the browser's languages decide.
}
catalogs[pickInitialLanguage(stored).lang]().catch(() => undefined);
import('@lingui/core').catch(() => undefined);
