import type { PublicReadCache } from './http/public-cache';
import type { Env } from './config/env';
import type { Database } from './db/client';
import type { OutboxWorker } from './mail/outbox';
import type { BlobStorage } from './storage/index';
import type { HookSteps } from './core/hooks';

/** What every feature gets: configuration, the database, the mail outbox and the registered hook steps. No request state. */
export interface AppContext {
  env: Env;
  database: Database;
  outbox: OutboxWorker;
  storage: BlobStorage;
  log: (line: string) => void;
  /** The steps features registered for each other's use cases (server/src/core/hooks.ts). */
  hooks: HookSteps;
  /** Public reads kept in memory, emptied by writes in any process (server/src/http/public-cache.ts). */
  publicCache: PublicReadCache;
}
