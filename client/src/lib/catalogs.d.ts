/** Made by the catalogs plugin in vite.config.ts: one lazily loaded chunk of precompiled messages per language. */
declare module 'virtual:mendery-catalogs' {
  import type { Messages } from '@lingui/core';
  export const catalogs: Record<string, () => Promise<{ messages: Messages }>>;
}
