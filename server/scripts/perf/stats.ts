import express from 'express';
import mysql from 'mysql2/promise';
import type { AddressInfo } from 'node:net';
import { mkdtempSync, rmSync } from 'node:fs';
import path from 'node:path';
import { loadEnv } from '../../src/config/env';
import { createDatabase } from '../../src/db/client';
import { rebuildRollups } from '../../src/features/impact/queries/cells';
import { hashPassword } from '../../src/auth/passwords';
import { users } from '../../src/db/schema/index';
import { freePort } from '../../src/infra/mariadb';
import { ensureCategories } from '../../src/seed/categories';
import { startServer } from '../../src/server';
import { loadOrCreateSecrets, startLocalDatabase, step } from '../local-stack';

/**
 * `BENCH=stats npm run bench`: fills a throwaway MariaDB with 1,000,000 repair records over 10 years and 200
 * groups (MariaDB's sequence engine makes the rows in the database), builds the rollups, then times
 * GET /api/stats over HTTP as an admin: the whole network for a year, one group for a year, one group all time.
 * Baseline in the same run: a bare Express + mysql2 handler (no session, no engine) answering the same filter with
 * the per-event rollup's month-and-category sum, the read every statistics request made before impact_days.
 */
const GROUPS = 200;
const YEARS = 10;
const RECORDS = Number(process.env.BENCH_RECORDS ?? 1_000_000);
const RUNS = 50;

export async function measureStats() {
  const dir = mkdtempSync(path.join('/dev/shm', 'mendery-bench-stats-'));
  const local = await startLocalDatabase({
    dir,
    port: await freePort(),
    database: 'bench_stats',
    secrets: loadOrCreateSecrets(dir),
    fast: true,
  });
  // A failed run still stops its MariaDB and removes its folder.
  try {
    await measure(local.appUrl, dir);
  } finally {
    await local.instance.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

async function measure(appUrl: string, dir: string) {
  const seed = createDatabase(appUrl, 2);
  await ensureCategories(seed.db);
  await seed.db.insert(users).values({
    email: 'bench-admin@example.org',
    name: 'Bench Admin',
    admin: true,
    passwordHash: await hashPassword('bench-password-1'),
    emailVerifiedAt: new Date(),
  });
  await seed.close();
  const pool = mysql.createPool({ uri: appUrl, connectionLimit: 4, multipleStatements: false });
  const q = (s: string, v: unknown[] = []) => pool.query(s, v);
  const t0 = Date.now();
  const events = GROUPS * YEARS * 12;
  const perEvent = Math.ceil(RECORDS / events);
  step(`Generating ${GROUPS} groups, ${events} events and ${RECORDS.toLocaleString('en-GB')} repair records`);
  await q(
    `INSERT INTO repair_groups (name, slug, town, description) SELECT CONCAT('Bench group ', seq), CONCAT('bench-', seq), 'Benchton', '' FROM seq_1_to_${GROUPS}`,
  );
  await q(
    `INSERT INTO venues (group_id, name, address, town, access_notes) SELECT id, 'Hall', '1 Bench Row', 'Benchton', '' FROM repair_groups`,
  );
  // One event a month for ten years up to last month, per group.
  await q(`INSERT INTO events (group_id, venue_id, title, description, starts_at, ends_at, slot_minutes, slot_capacity, skill_limits, status)
    SELECT g.id, v.id, 'Bench session', '', TIMESTAMP(DATE_SUB(DATE_FORMAT(NOW(), '%Y-%m-12'), INTERVAL m.seq MONTH), '10:00:00'), TIMESTAMP(DATE_SUB(DATE_FORMAT(NOW(), '%Y-%m-12'), INTERVAL m.seq MONTH), '13:00:00'), 180, 100, '{}', 'closed'
    FROM repair_groups g JOIN venues v ON v.group_id = g.id JOIN seq_1_to_${YEARS * 12} m`);
  await q(
    `INSERT INTO slots (event_id, starts_at, ends_at, capacity, booked) SELECT id, starts_at, ends_at, 100, ${perEvent} FROM events`,
  );
  const [[range]] = (await q('SELECT MIN(id) AS lo, COUNT(*) AS n FROM events')) as unknown as [
    { lo: number; n: number }[],
  ];
  const [[cats]] = (await q('SELECT MIN(id) AS lo, COUNT(*) AS n FROM categories')) as unknown as [
    { lo: number; n: number }[],
  ];
  const chunk = 200_000;
  for (let from = 0; from < RECORDS; from += chunk) {
    const to = Math.min(RECORDS, from + chunk) - 1;
    await q(`INSERT INTO bookings (reference, event_id, slot_id, visitor_name, visitor_email, manage_token_hash, consent_at, status)
      SELECT CONCAT(LEFT(LPAD(CONV(s.seq, 10, 32), 6, '0'), 3), '-', RIGHT(LPAD(CONV(s.seq, 10, 32), 6, '0'), 3)), e.id, sl.id, 'Bench Visitor', NULL, REPEAT('0', 64), e.starts_at, 'confirmed'
      FROM seq_${from}_to_${to} s JOIN events e ON e.id = ${range.lo} + (s.seq MOD ${range.n}) JOIN slots sl ON sl.event_id = e.id`);
  }
  // Items: category spread over the taxonomy, 30 % weighed, checked in at the event.
  await q(`INSERT INTO booking_items (booking_id, category_id, fault, mains, position, status, weighed_kg, checked_in_at, done_at)
    SELECT b.id, ${cats.lo} + (b.id * 7919 MOD ${cats.n}), 'Bench fault', 1, 0, 'done', IF(b.id MOD 10 < 3, 0.5 + (b.id MOD 97) / 10, NULL), b.consent_at, b.consent_at FROM bookings b`);
  // Outcomes: 55 % fixed, 12 % a part, 13 % advice, 15 % end of life (barrier spread), 5 % none.
  await q(`INSERT INTO item_outcomes (item_id, outcome, barrier, recorded_at)
    SELECT bi.id, CASE WHEN r < 55 THEN 'fixed' WHEN r < 67 THEN 'parts-needed' WHEN r < 80 THEN 'advice' ELSE 'end-of-life' END,
      CASE WHEN r >= 80 THEN ELT(1 + (bi.id MOD 6), 'spare-parts-not-available', 'spare-parts-too-expensive', 'no-way-to-open', 'repair-information-not-available', 'lack-of-equipment', 'too-worn-out') END, bi.done_at
    FROM (SELECT id, done_at, (id * 2654435761) MOD 100 AS r FROM booking_items) bi WHERE bi.r < 95`);
  step(`Generated in ${((Date.now() - t0) / 1000).toFixed(1)} s; building the rollups`);
  const t1 = Date.now();
  const rollup = createDatabase(appUrl, 1);
  await rebuildRollups(rollup.db);
  await rollup.close();
  const [[cells]] = (await q(
    'SELECT COUNT(*) AS n, SUM(items) AS items, (SELECT COUNT(*) FROM impact_days) AS days FROM impact_cells',
  )) as unknown as [{ n: number; items: number; days: number }[]];
  step(
    `Rollups: ${Number(cells.n).toLocaleString('en-GB')} event cells and ${Number(cells.days).toLocaleString('en-GB')} network day rows holding ${Number(cells.items).toLocaleString('en-GB')} records, built in ${((Date.now() - t1) / 1000).toFixed(1)} s`,
  );

  const env = loadEnv({
    NODE_ENV: 'production',
    DATABASE_URL: appUrl,
    PORT: '0',
    SESSION_SECRET: 'bench-secret-'.padEnd(40, 'x'),
    OUTBOX_POLL_MS: '0',
    JOBS_POLL_MS: '0',
    DATA_DIR: dir,
    LOGIN_RATE_MAX: '1000',
  });
  const app = await startServer(env, { sender: { send: async () => {} }, log: () => {} });
  const csrf = async (cookie: string) => {
    const r = await fetch(`${app.url}/api/auth/csrf`, { headers: { cookie } });
    return {
      token: (await r.json()).token as string,
      cookie: [cookie, ...r.headers.getSetCookie().map((c) => c.split(';')[0])].filter(Boolean).join('; '),
    };
  };
  const pre = await csrf('');
  const login = await fetch(`${app.url}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: pre.cookie, 'x-csrf-token': pre.token },
    body: JSON.stringify({ email: 'bench-admin@example.org', password: 'bench-password-1' }),
  });
  const cookie = login.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const [[g]] = (await q("SELECT id FROM repair_groups WHERE slug = 'bench-17'")) as unknown as [{ id: number }[]];
  const yearAgo = new Date(Date.now() - 365 * 86400_000).toISOString().slice(0, 10);
  const today = new Date().toISOString().slice(0, 10);
  const bare = await startBare(pool);
  const cases = [
    { name: 'network, last 12 months', query: `from=${yearAgo}&to=${today}`, goal: [60, 120] },
    { name: 'one group, last 12 months', query: `groupId=${g.id}&from=${yearAgo}&to=${today}` },
    { name: 'one group, all 10 years', query: `groupId=${g.id}`, goal: [15] },
    { name: 'network, all 10 years', query: '' },
  ];
  console.log(`GET /api/stats over HTTP, ${RUNS} runs each after 3 warm-ups; baseline: bare handler, old cells read`);
  for (const c of cases) {
    const [app1, base] = await timeGets([
      { url: `${app.url}/api/stats?${c.query}`, headers: { cookie } },
      { url: `${bare.url}/cells?${c.query}`, headers: {} },
    ]);
    if (app1.items !== base.items) throw new Error(`${c.name}: ${app1.items} items, the baseline ${base.items}`);
    const goal = c.goal
      ? `  goal median ≤ ${c.goal[0]}${c.goal[1] ? `, p95 ≤ ${c.goal[1]}` : ''} ms: ${app1.median <= c.goal[0] && (!c.goal[1] || app1.p95 <= c.goal[1]) ? 'met' : 'NOT met'}`
      : '';
    console.log(
      `  ${c.name.padEnd(26)} ${String(app1.items).padStart(9)} items  median ${app1.median.toFixed(1)} ms  p95 ${app1.p95.toFixed(1)} ms  | baseline ${base.median.toFixed(1)} / ${base.p95.toFixed(1)} ms  | ratio ${(app1.median / base.median).toFixed(2)}× / ${(app1.p95 / base.p95).toFixed(2)}×${goal}`,
    );
  }
  await new Promise((r) => bare.server.close(r));
  await app.stop();
  await pool.end();
}

/**
 * Median and p95 of RUNS GETs of each URL (after 3 warm-ups), taken in turns (the order alternating) so load from
 * elsewhere on the machine falls on both alike, and the item count each answered.
 */
async function timeGets(targets: { url: string; headers: Record<string, string> }[]) {
  const times = targets.map(() => [] as number[]);
  const items = targets.map(() => 0);
  for (let i = 0; i < RUNS + 3; i++) {
    const order = i % 2 ? [...targets.keys()].reverse() : [...targets.keys()];
    for (const k of order) {
      const t = performance.now();
      const r = await fetch(targets[k].url, { headers: targets[k].headers });
      const body = await r.json();
      if (r.status !== 200) throw new Error(`${targets[k].url} answered ${r.status}: ${JSON.stringify(body)}`);
      if (i >= 3) times[k].push(performance.now() - t);
      items[k] = Number(body.items);
    }
  }
  return times.map((ts, k) => {
    ts.sort((a, b) => a - b);
    const at = (x: number) => ts[Math.min(ts.length - 1, Math.floor(x * ts.length))];
    return { median: at(0.5), p95: at(0.95), items: items[k] };
  });
}

/** The baseline: the per-event cells summed by month and category for the same filter, straight to JSON. */
async function startBare(pool: mysql.Pool) {
  const bare = express();
  bare.get('/cells', async (req, res) => {
    const f = req.query as Record<string, string | undefined>;
    const where: string[] = [];
    const args: unknown[] = [];
    const add = (clause: string, arg: unknown) => {
      where.push(clause);
      args.push(arg);
    };
    if (f.groupId) add('group_id = ?', Number(f.groupId));
    if (f.from) add('event_date >= ?', f.from);
    if (f.to) add('event_date <= ?', f.to);
    const [rows] = (await pool.query(
      `SELECT DATE_FORMAT(event_date, '%Y-%m') AS month, category_id, SUM(items) AS items, SUM(fixed) AS fixed,
         SUM(parts_needed) AS parts_needed, SUM(advice) AS advice, SUM(end_of_life) AS end_of_life,
         SUM(fixed_weighed_kg) AS kg, SUM(fixed_unweighed) AS unweighed, SUM(b_spare_parts_not_available) AS b0,
         SUM(b_spare_parts_too_expensive) AS b1, SUM(b_no_way_to_open) AS b2,
         SUM(b_repair_information_not_available) AS b3, SUM(b_lack_of_equipment) AS b4, SUM(b_too_worn_out) AS b5
       FROM impact_cells ${where.length ? `WHERE ${where.join(' AND ')}` : ''} GROUP BY month, category_id`,
      args,
    )) as unknown as [{ items: string }[]];
    res.json({ items: rows.reduce((n, r) => n + Number(r.items), 0), rows });
  });
  const server = bare.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  return { server, url: `http://127.0.0.1:${(server.address() as AddressInfo).port}` };
}
