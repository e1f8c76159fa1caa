import autocannon from 'autocannon';
import express from 'express';
import mysql from 'mysql2/promise';
import { mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { loadEnv } from '../../src/config/env';
import { createDatabase } from '../../src/db/client';
import { freePort } from '../../src/infra/mariadb';
import { seedDemo } from '../../src/seed/demo';
import { startServer } from '../../src/server';
import { loadOrCreateSecrets, startLocalDatabase, step } from '../local-stack';
import { measureTriage } from './triage';
import { measureStats } from './stats';
import { measureLighthouse } from './lighthouse';
import { measureImport } from './import';
import { measureMemory } from './memory';
import { bareBookingHandler, measureBooking } from './booking';

measureTriage();
if (process.env.BENCH === 'triage') process.exit(0);
// BENCH=reads or BENCH=booking: only that HTTP section (after the quick triage figures).
const only = process.env.BENCH === 'reads' || process.env.BENCH === 'booking';
console.log('');
if (!only && (!process.env.BENCH || process.env.BENCH === 'stats')) {
  await measureStats();
  if (process.env.BENCH === 'stats') process.exit(0);
  console.log('');
}
if (!only && (!process.env.BENCH || process.env.BENCH === 'import')) {
  await measureImport();
  if (process.env.BENCH === 'import') process.exit(0);
  console.log('');
}
if (!only && (!process.env.BENCH || process.env.BENCH === 'memory')) {
  await measureMemory();
  if (process.env.BENCH === 'memory') process.exit(0);
  console.log('');
}
if (!only && (!process.env.BENCH || process.env.BENCH === 'lighthouse')) {
  await measureLighthouse();
  if (process.env.BENCH === 'lighthouse') process.exit(0);
  console.log('');
}

/**
 * `npm run bench`: loads GET /api/events and POST /api/bookings with autocannon against a throwaway MariaDB and,
 * in the same run, a bare Express + mysql2 handler doing a comparable indexed query. Prints requests/s, p99 and
 * the ratio. Not part of the tests: figures depend on the machine.
 */
const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);
const secret = 'bench-secret-'.padEnd(40, 'x');

const dir = mkdtempSync(path.join('/dev/shm', 'mendery-bench-'));
const local = await startLocalDatabase({
  dir,
  port: await freePort(),
  database: 'bench',
  secrets: loadOrCreateSecrets(dir),
  fast: true,
});
const seedDb = createDatabase(local.appUrl, 2);
await seedDemo(seedDb.db, { linkSecret: secret });
await seedDb.close();

const pool = mysql.createPool({ uri: local.appUrl, connectionLimit: 20 });
// One slot with room for every request the load can send, so bookings measure work, not refusals.
await pool.query(
  "UPDATE slots s JOIN events e ON e.id = s.event_id SET s.capacity = 10000000 WHERE e.status = 'published'",
);
const [[slot]] = (await pool.query(
  "SELECT s.id FROM slots s JOIN events e ON e.id = s.event_id WHERE e.status = 'published' AND s.starts_at > NOW() ORDER BY s.starts_at LIMIT 1",
)) as unknown as [{ id: number }[]];
const [[kettle]] = (await pool.query("SELECT id FROM categories WHERE slug = 'kettle'")) as unknown as [
  { id: number }[],
];

const env = loadEnv({
  NODE_ENV: 'production',
  DATABASE_URL: local.appUrl,
  PORT: '0',
  SESSION_SECRET: secret,
  OUTBOX_POLL_MS: '0',
  JOBS_POLL_MS: '0',
  DB_POOL_SIZE: '20',
  DATA_DIR: dir,
  // Load from one address: the per-visitor limits would refuse it (they have their own tests).
  BOOKING_RATE_MAX: '100000000',
  BOOKING_EMAIL_RATE_MAX: '100000000',
  VISITOR_MAIL_MAX_PER_HOUR: '100000000',
  BOOKINGS_PER_SESSION_MAX: '100000000',
});
const app = await startServer(env, { sender: { send: async () => {} }, log: () => {} });

const bare = express();
bare.use(express.json());
bare.get('/events', async (_req, res) => {
  const [rows] = await pool.query(
    `SELECT e.id, e.title, e.starts_at, e.ends_at, g.name, v.name AS venue,
            (SELECT SUM(s.capacity - s.booked - s.held) FROM slots s WHERE s.event_id = e.id) AS free
       FROM events e JOIN repair_groups g ON g.id = e.group_id JOIN venues v ON v.id = e.venue_id
      WHERE e.status = 'published' AND e.ends_at >= ? ORDER BY e.starts_at LIMIT 500`,
    [new Date()],
  );
  res.json(rows);
});
bare.get('/events/:id', async (req, res) => {
  const [[event]] = (await pool.query(
    `SELECT e.*, g.name AS group_name, g.time_zone, v.name AS venue, v.address, v.town, v.access_notes
       FROM events e JOIN repair_groups g ON g.id = e.group_id JOIN venues v ON v.id = e.venue_id
      WHERE e.id = ? AND e.status <> 'draft'`,
    [Number(req.params.id)],
  )) as unknown as [Record<string, unknown>[]];
  const [slotRows] = await pool.query('SELECT * FROM slots WHERE event_id = ? ORDER BY starts_at', [
    Number(req.params.id),
  ]);
  res.json({ ...event, slots: slotRows });
});
bare.get('/public/groups', async (_req, res) => {
  const [rows] = await pool.query('SELECT id, name, slug, town, description FROM repair_groups ORDER BY name');
  res.json(rows);
});
bare.post('/bookings', bareBookingHandler(pool));
const bareServer = bare.listen(0, '127.0.0.1');
await new Promise((r) => bareServer.once('listening', r));
const bareUrl = `http://127.0.0.1:${(bareServer.address() as AddressInfo).port}`;

// Visitors each have their own session and CSRF token, as their browsers would.
const visitors = await Promise.all(
  Array.from({ length: CONNECTIONS }, async () => {
    const r = await fetch(`${app.url}/api/auth/csrf`);
    return { cookie: r.headers.getSetCookie()[0].split(';')[0], token: (await r.json()).token as string };
  }),
);
interface Line {
  title: string;
  rps: number;
  p99: number;
  bad: number;
  /** Requests completed in the run. */
  total: number;
}
async function load(title: string, opts: autocannon.Options): Promise<Line> {
  const r = await autocannon({ connections: CONNECTIONS, duration: SECONDS, ...opts });
  const line = {
    title,
    rps: Math.round(r.requests.average),
    p99: r.latency.p99,
    bad: r.errors + r.non2xx,
    total: r.requests.total,
  };
  console.log(
    `${title.padEnd(44)} ${String(line.rps).padStart(6)} req/s   p99 ${String(line.p99).padStart(4)} ms   non-2xx/errors ${line.bad}`,
  );
  return line;
}

step(`Warming up (${CONNECTIONS} connections, ${SECONDS} s per run)`);
await autocannon({ url: `${app.url}/api/events`, connections: 10, duration: 2 });
console.log('');
const ratio = (a: Line, b: Line) =>
  console.log(
    `${'  ratio Mendery / bare'.padEnd(44)} ${(a.rps / b.rps).toFixed(2)}× requests/s, p99 ${(a.p99 / Math.max(b.p99, 1)).toFixed(2)}×\n`,
  );
// Public reads: a first visit sends no If-None-Match, so these figures are the full answer, from memory or not
// (docs/decisions/009). The 304 line shows a returning browser's revalidation.
if (process.env.BENCH !== 'booking') {
  const [[event]] = (await pool.query(
    "SELECT e.id FROM events e WHERE e.status = 'published' AND e.ends_at > NOW() ORDER BY e.starts_at LIMIT 1",
  )) as unknown as [{ id: number }[]];
  for (const [name, bareUrlPath, appPath] of [
    ['GET events', '/events', '/api/events'],
    ['GET one session', `/events/${event.id}`, `/api/events/${event.id}`],
    ['GET public groups', '/public/groups', '/api/public/groups'],
  ]) {
    const bareLine = await load(`bare Express + mysql2: ${name}`, { url: bareUrl + bareUrlPath });
    const appLine = await load(`Mendery ${appPath}`, { url: app.url + appPath });
    ratio(appLine, bareLine);
  }
  const etag = (await fetch(`${app.url}/api/events`)).headers.get('etag') ?? '';
  await load('Mendery /api/events, ETag sent (304s count as non-2xx)', {
    url: `${app.url}/api/events`,
    headers: { 'if-none-match': etag },
  });
}
if (process.env.BENCH !== 'reads')
  await measureBooking({
    appUrl: app.url,
    bareUrl,
    pool,
    slotId: slot.id,
    kettleId: kettle.id,
    visitors,
    load,
    ratio,
  });

bareServer.close();
await pool.end();
await app.stop();
await local.instance.stop();
rmSync(dir, { recursive: true, force: true });
process.exit(0);
