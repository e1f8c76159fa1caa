/**
 * Made by the catalogs plugin in vite.config.ts: one lazily loaded chunk of precompiled messages per language, and one
 * per language and on-demand namespace.
 */
declare module 'virtual:mendery-catalogs' {
  import type { Messages } from '@lingui/core';
  type Loader = () => Promise<{ messages: Messages }>;
  export const catalogs: Record<string, Loader>;
}
declare module 'virtual:mendery-catalogs-on-demand' {
  import type { Messages } from '@lingui/core';
  type Loader = () => Promise<{ messages: Messages }>;
  export const onDemand: Record<string, Record<import('../../../shared/i18n/namespaces').OnDemandNamespace, Loader>>;
}
