import path from 'node:path';
import { loadEnv } from '../src/config/env';
import { runMigrations } from '../src/db/migrate';
import { startServer } from '../src/server';
import {
  buildClientIfStale,
  loadOrCreateSecrets,
  root,
  seedOnFirstRun,
  startLocalDatabase,
  startLocalMailbox,
  step,
} from './local-stack';

/** `npm start`: private MariaDB, local mailbox, migrations, demo data on first run, client build, server. */
const started = Date.now();
const dataDir = path.resolve(root, process.env.DATA_DIR ?? '.data');
const secrets = loadOrCreateSecrets(dataDir);
const external = Boolean(process.env.DATABASE_URL);
const dbPort = Number(process.env.DB_PORT ?? 3307);
const stops: (() => Promise<void>)[] = [];
let stopping = false;

async function shutdown(code: number) {
  if (stopping) return;
  stopping = true;
  step('Stopping…');
  for (const stop of stops.reverse()) {
    try {
      await stop();
    } catch (err) {
      console.error(`  while stopping: ${(err as Error).message}`);
    }
  }
  console.log('Stopped cleanly.');
  process.exit(code);
}
process.on('SIGINT', () => void shutdown(0));
process.on('SIGTERM', () => void shutdown(0));

try {
  let dbUrl = process.env.DATABASE_URL ?? '';
  if (!external) {
    const local = await startLocalDatabase({
      dir: path.join(dataDir, 'mariadb'),
      port: dbPort,
      database: process.env.DB_NAME ?? 'mendery',
      secrets,
      supervise: true,
    });
    stops.push(() => local.instance.stop());
    dbUrl = local.appUrl;
  } else {
    step('Applying database migrations to DATABASE_URL');
    await runMigrations(process.env.MIGRATE_DATABASE_URL ?? dbUrl);
  }
  const env = loadEnv({
    ...process.env,
    DATABASE_URL: dbUrl,
    DATA_DIR: dataDir,
    SESSION_SECRET: process.env.SESSION_SECRET ?? secrets.sessionSecret,
    NODE_ENV: process.env.NODE_ENV ?? 'production',
    CLIENT_DIST: path.join(root, 'dist/client'),
  });

  await seedOnFirstRun(env.dbUrl, env.SESSION_SECRET);
  if (process.env.MAILBOX !== '0' && ['127.0.0.1', 'localhost'].includes(env.SMTP_HOST))
    stops.push(await startLocalMailbox(env.dbUrl, env.SMTP_PORT));

  buildClientIfStale();
  const running = await startServer(env);
  // Stopped in reverse order: the server first, then the mailbox and the database it uses.
  stops.push(() => running.stop());
  step(
    `Mendery is running at ${running.url}  (ready in ${((Date.now() - started) / 1000).toFixed(1)} s; Ctrl-C stops it)`,
  );
} catch (err) {
  console.error(`✗ ${(err as Error).message}`);
  await shutdown(1);
}
