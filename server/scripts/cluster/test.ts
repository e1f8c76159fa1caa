import { readFileSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import mysql from 'mysql2/promise';
import { freePort } from '../../src/infra/mariadb';
import { isSynced } from './galera';
import { startCluster, type ClusterStack } from './stack';

/**
 * `npm run test:cluster`: the cluster of `npm run start:cluster` under faults.
 * 1. A race of 600 bookings at one slot of capacity 20, half through each app process.
 * 2. Booking load through the proxy while the writing Galera node is killed (SIGKILL), then restarted; it must
 *    catch up (IST or SST) and hold what the others hold.
 * 3. Booking load while one app process is killed (SIGKILL), then restarted.
 * Scheduled jobs run every half second in both processes meanwhile (reminders are made due for the race's bookings).
 * Then it counts what must be 0 and prints one line with the counts and the failover time (the longest stretch without
 * a confirmed booking during the node's death and return); it exits 1 unless every count is 0.
 * `.ci/run` runs it after `npm test`; CLUSTER_KEEP=1 keeps the folder with every process's log.
 */
const log = (line: string) => console.log(line);
const RACE = 600;
const RACE_CAPACITY = 20;
const WORKERS = 12;

type Tally = Map<string, number>;
const count = (t: Tally, k: string) => t.set(k, (t.get(k) ?? 0) + 1);
const show = (t: Tally) =>
  [...t.entries()]
    .sort()
    .map(([k, v]) => `${k}: ${v}`)
    .join(', ');

interface Visitor {
  cookie: string;
  token: string;
}
async function visitor(base: string): Promise<Visitor> {
  const r = await fetch(`${base}/api/auth/csrf`);
  return { cookie: r.headers.getSetCookie()[0].split(';')[0], token: ((await r.json()) as { token: string }).token };
}

let serial = 0;
const noAnswerAt: string[] = [];
let appKilledAt = 0;
/** One booking; returns its status and, when confirmed, its reference. */
async function book(base: string, v: Visitor, slotId: number, categoryId: number) {
  const n = ++serial;
  try {
    const r = await fetch(`${base}/api/bookings`, {
      method: 'POST',
      headers: {
        'content-type': 'application/json',
        cookie: v.cookie,
        'x-csrf-token': v.token,
        'idempotency-key': `cluster-${process.pid}-${n}`,
      },
      body: JSON.stringify({
        slotId,
        visitor: { name: `Cluster Visitor ${n}`, email: `visitor-${n}@example.org` },
        items: [{ categoryId, fault: 'Stops after a minute.' }],
        consent: true,
      }),
      signal: AbortSignal.timeout(20_000),
    });
    const body = (await r.json().catch(() => ({}))) as { reference?: string };
    const retryAfter = r.status === 503 && r.headers.get('retry-after') ? ' with Retry-After' : '';
    return { status: `${r.status}${retryAfter}`, reference: r.status === 201 ? body.reference : undefined };
  } catch (err) {
    const e = err as Error & { cause?: { code?: string; message?: string } };
    noAnswerAt.push(`${((Date.now() - appKilledAt) / 1000).toFixed(2)} s (${e.cause?.message ?? e.message})`);
    return {
      status: e.name === 'TimeoutError' ? 'timeout' : `no answer (${e.cause?.code ?? e.cause?.message ?? e.message})`,
    };
  }
}

/** Steady load through the proxy while `fault` runs; every confirmed reference is kept to be checked later. */
async function loadDuring(
  stack: ClusterStack,
  v: Visitor,
  slotId: number,
  categoryId: number,
  confirmed: string[],
  fault: (t0: number, stats: { lastOk: number }) => Promise<void>,
) {
  const tally: Tally = new Map();
  const stats = { lastOk: Date.now(), longestGap: 0 };
  let running = true;
  const worker = async () => {
    while (running) {
      const r = await book(stack.appUrl, v, slotId, categoryId);
      count(tally, r.status);
      if (r.reference) {
        confirmed.push(r.reference);
        stats.longestGap = Math.max(stats.longestGap, Date.now() - stats.lastOk);
        stats.lastOk = Date.now();
      }
      if (r.status.startsWith('503')) await new Promise((res) => setTimeout(res, 250));
    }
  };
  const t0 = Date.now();
  const workers = Array.from({ length: WORKERS }, worker);
  await fault(t0, stats);
  running = false;
  await Promise.all(workers);
  const seconds = (Date.now() - t0) / 1000;
  log(`  ${((tally.get('201') ?? 0) / seconds).toFixed(0)} bookings confirmed a second over ${seconds.toFixed(0)} s`);
  return { tally, longestGap: stats.longestGap / 1000 };
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function main() {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'mendery-cluster-test-'));
  const started = Date.now();
  const stack = await startCluster({
    dir,
    basePort: Number(process.env.CLUSTER_BASE_PORT ?? 4500),
    appPort: await freePort(),
    demo: true,
    log,
    appEnv: {
      BOOKING_RATE_MAX: '100000000',
      BOOKING_EMAIL_RATE_MAX: '100000000',
      VISITOR_MAIL_MAX_PER_HOUR: '100000000',
      BOOKINGS_PER_SESSION_MAX: '100000000',
      AUTH_RATE_MAX: '100000000',
      OUTBOX_POLL_MS: '300',
      JOBS_POLL_MS: '500',
    },
  });
  const db = mysql.createPool({ uri: stack.dbUrl, connectionLimit: 2 });
  const failures: string[] = [];
  try {
    log(`▸ Cluster up in ${((Date.now() - started) / 1000).toFixed(0)} s`);
    const q = async <T>(sql: string, args: unknown[] = []) => (await db.query(sql, args))[0] as T[];
    const [kettle] = await q<{ id: number }>("SELECT id FROM categories WHERE slug = 'kettle'");
    const slotsOpen = await q<{ id: number; event_id: number }>(
      "SELECT s.id, s.event_id FROM slots s JOIN events e ON e.id = s.event_id WHERE e.status = 'published' AND s.starts_at > NOW() + INTERVAL 2 DAY ORDER BY s.starts_at",
    );
    const race = slotsOpen[0];
    const busy = slotsOpen.find((s) => s.event_id !== race.event_id) ?? slotsOpen[1];
    await db.query('UPDATE slots SET capacity = booked + held + ? WHERE id = ?', [RACE_CAPACITY, race.id]);
    await db.query('UPDATE slots SET capacity = 1000000 WHERE id = ?', [busy.id]);
    const confirmed: string[] = [];

    // 1. The race, half through each app process.
    log(`▸ Race: ${RACE} bookings at once for one slot with ${RACE_CAPACITY} places, half through each app process`);
    const direct = stack.apps.map((a) => `http://127.0.0.1:${a.port}`);
    const raceVisitors = await Promise.all(direct.map(visitor));
    const raceTally: Tally = new Map();
    const results = await Promise.all(
      Array.from({ length: RACE }, (_, i) => book(direct[i % 2], raceVisitors[i % 2], race.id, kettle.id)),
    );
    for (const r of results) {
      count(raceTally, r.status);
      if (r.reference) confirmed.push(r.reference);
    }
    log(`  answers: ${show(raceTally)}`);

    // Reminders become due for the race's bookings: the jobs of both processes compete for them during the faults.
    await db.query(
      `UPDATE slots s SET s.starts_at = NOW() + INTERVAL 12 HOUR, s.ends_at = NOW() + INTERVAL 13 HOUR WHERE s.id = ?`,
      [race.id],
    );
    await db.query('UPDATE bookings SET created_at = NOW() - INTERVAL 3 DAY WHERE slot_id = ?', [race.id]);

    // 2. The writing node dies under load, then comes back and catches up.
    const v = await visitor(stack.appUrl);
    const writer = 0;
    let failover = 0;
    log(
      `▸ Booking load through the proxy (${WORKERS} at a time); SIGKILL to ${stack.nodes[writer].name}, the writing node`,
    );
    const nodeFault = await loadDuring(stack, v, busy.id, kettle.id, confirmed, async (t0, stats) => {
      await sleep(4000);
      const killedAt = Date.now();
      stack.killNode(writer);
      while (stats.lastOk < killedAt && Date.now() - killedAt < 60_000) await sleep(50);
      log(`  a booking confirmed ${((stats.lastOk - killedAt) / 1000).toFixed(1)} s after the kill`);
      await sleep(3000);
      log(`  restarting ${stack.nodes[writer].name}`);
      const back = Date.now();
      await stack.restartNode(writer);
      log(`  ${stack.nodes[writer].name} Synced ${((Date.now() - back) / 1000).toFixed(1)} s after its restart`);
      await sleep(4000);
      void t0;
    });
    log(`  answers: ${show(nodeFault.tally)}`);
    // The failover time: the longest stretch without a confirmed booking while the node died and came back.
    failover = nodeFault.longestGap;
    const errorLog = readFileSync(path.join(stack.nodes[writer].dir, 'error.log'), 'utf8');
    for (const l of errorLog
      .split('\n')
      .filter((x) => /\b(IST|SST)\b/.test(x))
      .slice(0, 6))
      log(`    ${l.slice(0, 200)}`);
    const how = /IST received/i.test(errorLog)
      ? 'IST'
      : /SST.*complete|sst_received|State transfer.*complete/i.test(errorLog)
        ? 'SST'
        : 'unknown';
    log(`  ${stack.nodes[writer].name} caught up by ${how}; synced: ${isSynced(stack.nodes[writer])}`);

    // 3. One app process dies under load, then comes back.
    log('▸ Booking load through the proxy; SIGKILL to app1');
    const appFault = await loadDuring(stack, v, busy.id, kettle.id, confirmed, async () => {
      await sleep(4000);
      appKilledAt = Date.now();
      stack.killApp(0);
      await sleep(4000);
      log('  restarting app1');
      await stack.restartApp(0);
      await sleep(3000);
    });
    log(`  answers: ${show(appFault.tally)}`);

    // Let the outbox and the jobs finish.
    const deadline = Date.now() + 60_000;
    for (;;) {
      const [w] = await q<{ n: number }>("SELECT COUNT(*) AS n FROM outbox WHERE status = 'pending'");
      const [m] = await q<{ due: number }>(
        'SELECT COUNT(*) AS due FROM bookings WHERE slot_id = ? AND reminder_sent_at IS NULL AND status = ?',
        [race.id, 'confirmed'],
      );
      if ((Number(w.n) === 0 && Number(m.due) === 0) || Date.now() > deadline) break;
      await sleep(500);
    }

    // The counts.
    const found = confirmed.length
      ? await q<{ reference: string }>(
          "SELECT reference FROM bookings WHERE status = 'confirmed' AND reference IN (?)",
          [confirmed],
        )
      : [];
    const lost = confirmed.length - found.length;
    const over = await q<{ id: number; capacity: number; taken: number }>(
      `SELECT s.id, s.capacity, COUNT(bi.id) AS taken FROM slots s
         JOIN bookings b ON b.slot_id = s.id AND b.status = 'confirmed' JOIN booking_items bi ON bi.booking_id = b.id
        GROUP BY s.id, s.capacity HAVING taken > s.capacity`,
    );
    const overbooked = over.reduce((n, s) => n + Number(s.taken) - Number(s.capacity), 0);
    const raceConfirmed = await q<{ n: number }>(
      "SELECT COUNT(*) AS n FROM bookings WHERE slot_id = ? AND status = 'confirmed' AND visitor_email LIKE 'visitor-%'",
      [race.id],
    );
    if (Number(raceConfirmed[0].n) !== RACE_CAPACITY)
      failures.push(`the race confirmed ${raceConfirmed[0].n} bookings, not ${RACE_CAPACITY}`);
    const [dupMail] = await q<{ n: number }>(
      `SELECT COALESCE(SUM(c - 1), 0) AS n FROM (SELECT COUNT(*) AS c FROM mailbox_messages
         GROUP BY to_address, subject, MD5(COALESCE(text, ''))) t`,
    );
    const [dupJobs] = await q<{ n: number }>(
      `SELECT COALESCE(SUM(c - 1), 0) AS n FROM (SELECT COUNT(*) AS c FROM outbox
         GROUP BY to_address, subject, MD5(COALESCE(text, ''))) t`,
    );
    const [reminded] = await q<{ n: number }>(
      'SELECT COUNT(*) AS n FROM bookings WHERE slot_id = ? AND reminder_sent_at IS NOT NULL',
      [race.id],
    );
    const [mails] = await q<{ n: number }>('SELECT COUNT(*) AS n FROM mailbox_messages');
    log(
      `  ${confirmed.length} bookings confirmed to callers; ${mails.n} mails delivered; ${reminded.n} reminders sent`,
    );
    const all = [raceTally, nodeFault.tally, appFault.tally];
    const other5xx = all
      .flatMap((t) => [...t.entries()])
      .filter(([k]) => /^5\d\d/.test(k) && !k.startsWith('503 with Retry-After'))
      .reduce((n, [, c]) => n + c, 0);
    const noAnswer = all
      .flatMap((t) => [...t.entries()])
      .filter(([k]) => !/^\d/.test(k))
      .reduce((n, [, c]) => n + c, 0);
    if (noAnswerAt.length) log(`  no answer (time from the app kill): ${noAnswerAt.join('; ')}`);
    if (noAnswer) failures.push(`${noAnswer} requests got no answer or timed out`);
    const counts = {
      overbooked,
      lost,
      'duplicate mails': Number(dupMail.n),
      'duplicate jobs': Number(dupJobs.n),
      '5xx other than 503': other5xx,
    };
    for (const [k, n] of Object.entries(counts)) if (n !== 0) failures.push(`${k}: ${n}`);
    if (how === 'unknown') failures.push(`${stack.nodes[writer].name}'s log shows neither IST nor SST`);
    for (const a of stack.apps) {
      const lines = readFileSync(path.join(dir, `${a.name}.log`), 'utf8').split('\n');
      const errors: Tally = new Map();
      lines.forEach((l, i) => {
        if (/^(unhandled error|database unavailable) on/.test(l))
          count(errors, `${l.split(' on ')[0]}: ${(lines[i + 1] ?? '').slice(0, 160)}`);
      });
      for (const [k, n] of errors) log(`  ${a.name} logged ${n}× ${k}`);
    }
    for (const f of failures) log(`✗ ${f}`);
    log(
      `cluster: ${Object.entries(counts)
        .map(([k, n]) => `${k} ${n}`)
        .join(', ')}, failover seconds ${failover.toFixed(1)}`,
    );
  } finally {
    await db.end();
    await stack.stop();
    if (process.env.CLUSTER_KEEP === '1') log(`  files kept in ${dir}`);
    else rmSync(dir, { recursive: true, force: true });
  }
  process.exit(failures.length ? 1 : 0);
}

await main();
