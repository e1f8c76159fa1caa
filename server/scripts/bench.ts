import autocannon from 'autocannon';
import express from 'express';
import mysql from 'mysql2/promise';
import { mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { loadEnv } from '../src/config/env';
import { freePort } from '../src/infra/mariadb';
import { seedDemo } from '../src/seed/demo';
import { createDatabase } from '../src/db/client';
import { startServer } from '../src/server';
import { loadOrCreateSecrets, startLocalDatabase, step } from './local-stack';

/**
 * `npm run bench`: loads the API with autocannon against a throwaway MariaDB and, in the same run, a bare
 * Express + mysql2 handler doing a comparable indexed query. Prints requests/s, p99 and the ratio.
 */
const dir = mkdtempSync(path.join('/dev/shm', 'mendery-bench-'));
const local = await startLocalDatabase({ dir, port: await freePort(), database: 'bench', secrets: loadOrCreateSecrets(dir), fast: true });
const seedDb = createDatabase(local.appUrl, 2);
await seedDemo(seedDb.db, { linkSecret: 'b'.repeat(40) });
await seedDb.close();

const env = loadEnv({ NODE_ENV: 'production', DATABASE_URL: local.appUrl, PORT: '0', SESSION_SECRET: 'b'.repeat(40), OUTBOX_POLL_MS: '0', DB_POOL_SIZE: '20' });
const app = await startServer(env, { sender: { send: async () => {} }, log: () => {} });

const pool = mysql.createPool({ uri: local.appUrl, connectionLimit: 20 });
const bare = express();
bare.get('/groups', async (_req, res) => {
  const [rows] = await pool.query('SELECT id, name, slug, town, description FROM repair_groups ORDER BY name');
  res.json(rows);
});
const bareServer = bare.listen(0, '127.0.0.1');
await new Promise((r) => bareServer.once('listening', r));
const bareUrl = `http://127.0.0.1:${(bareServer.address() as AddressInfo).port}`;

async function load(title: string, url: string) {
  const r = await autocannon({ url, connections: 50, duration: 8, pipelining: 1 });
  const line = { title, rps: Math.round(r.requests.average), p99: r.latency.p99, errors: r.errors + r.non2xx };
  console.log(`${title.padEnd(40)} ${String(line.rps).padStart(6)} req/s   p99 ${String(line.p99).padStart(4)} ms   errors ${line.errors}`);
  return line;
}

step('Warming up');
await autocannon({ url: `${app.url}/api/public/groups`, connections: 10, duration: 2 });
const results = [await load('bare Express + mysql2: groups', `${bareUrl}/groups`), await load('Mendery GET /api/public/groups', `${app.url}/api/public/groups`)];
console.log(`ratio Mendery / bare: ${(results[1].rps / results[0].rps).toFixed(2)}×`);

bareServer.close();
await pool.end();
await app.stop();
await local.instance.stop();
rmSync(dir, { recursive: true, force: true });
process.exit(0);
