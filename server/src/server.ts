import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createApp } from './app';
import type { Env } from './config/env';
import type { AppContext } from './context';
import { createDatabase } from './db/client';
import { OutboxWorker } from './mail/outbox';
import { smtpSender, type MailSender } from './mail/transport';
import { LocalDiskStorage } from './storage/index';
import { Scheduler } from './jobs/scheduler';
import { PublicReadCache } from './http/public-cache';
import { collectHooks } from './core/hooks';
import { FEATURES } from './features';
import { announceSetup } from './auth/setup';
import path from 'node:path';

export interface RunningServer {
  ctx: AppContext;
  server: Server;
  url: string;
  stop(): Promise<void>;
}

/** Opens the pool, starts the outbox worker and listens. Several of these may run against one database. */
export async function startServer(
  env: Env,
  opts: { sender?: MailSender; log?: (l: string) => void } = {},
): Promise<RunningServer> {
  const log = opts.log ?? ((l: string) => console.log(l));
  const database = createDatabase(env.dbUrl, env.DB_POOL_SIZE, {
    queryMs: env.DB_QUERY_TIMEOUT_MS,
    connectMs: env.DB_CONNECT_TIMEOUT_MS,
    acquireMs: env.DB_ACQUIRE_TIMEOUT_MS,
  });
  const outbox = new OutboxWorker(database.db, opts.sender ?? smtpSender(env), log);
  const ctx: AppContext = {
    env,
    database,
    outbox,
    log,
    storage: new LocalDiskStorage(path.resolve(env.DATA_DIR, 'uploads')),
    hooks: collectHooks(FEATURES),
    publicCache: new PublicReadCache(database.db, {
      pollMs: env.READ_CACHE_POLL_MS,
      maxAgeMs: env.READ_CACHE_MAX_AGE_MS,
    }),
  };
  const scheduler = new Scheduler(
    ctx,
    FEATURES.flatMap((f) => f.jobs ?? []),
  );
  const { app, close } = createApp(ctx);
  const server = await new Promise<Server>((resolve, reject) => {
    const s = app.listen(env.PORT, env.HOST, () => resolve(s));
    s.once('error', reject);
  });
  outbox.start(env.OUTBOX_POLL_MS);
  ctx.publicCache.start();
  scheduler.start(env.JOBS_POLL_MS);
  const { port } = server.address() as AddressInfo;
  const url = `http://${env.HOST}:${port}`;
  // With PORT=0 the real port is known only now; links in mail must carry it.
  if (!env.PUBLIC_URL) env.publicUrl = url;
  await announceSetup(ctx);
  return {
    ctx,
    server,
    url,
    async stop() {
      await scheduler.stop();
      await ctx.publicCache.stop();
      await outbox.stop();
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
      await close();
      await database.close();
    },
  };
}
