import type { Env } from './config/env';
import type { Database } from './db/client';
import type { OutboxWorker } from './mail/outbox';
import type { BlobStorage } from './storage/index';

/** What every feature gets: configuration, the database and the mail outbox. No request state. */
export interface AppContext {
  env: Env;
  database: Database;
  outbox: OutboxWorker;
  storage: BlobStorage;
  log: (line: string) => void;
}
