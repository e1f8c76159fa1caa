import autocannon from 'autocannon';
import mysql from 'mysql2/promise';
import { fork } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import { freePort } from '../../src/infra/mariadb';
import { seedDemo } from '../../src/seed/demo';
import { createDatabase } from '../../src/db/client';
import { loadOrCreateSecrets, startLocalDatabase, step } from '../local-stack';

/**
 * `BENCH=memory npm run bench`: what the app process holds after load. The app runs in its own process (memory-app.ts)
 * and three rounds of the same load go through it: public reads, bookings, and photo uploads (the image work runs in
 * sharp/libvips, outside the JavaScript heap). After each round and a forced collection it prints the resident set,
 * the JavaScript heap in use and the memory outside the heap. Baseline: the same figures right after start, in the
 * same run. A leak grows round after round; a cache or the allocator's arenas grow once and stay level.
 */
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 3);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const UPLOAD_BOOKINGS = Number(process.env.BENCH_UPLOADS ?? 40);
const secret = 'bench-secret-'.padEnd(40, 'x');
type Sample = {
  rss: number;
  heapTotal: number;
  heapUsed: number;
  external: number;
  arrayBuffers: number;
  sharpCache: { memory: { current: number } };
};
const mb = (n: number) => `${(n / 1024 / 1024).toFixed(0)} MB`.padStart(7);

export async function measureMemory() {
  const dir = mkdtempSync(path.join('/dev/shm', 'mendery-bench-memory-'));
  const local = await startLocalDatabase({
    dir,
    port: await freePort(),
    database: 'bench_memory',
    secrets: loadOrCreateSecrets(dir),
    fast: true,
  });
  const seedDb = createDatabase(local.appUrl, 2);
  await seedDemo(seedDb.db, { linkSecret: secret });
  await seedDb.close();
  const pool = mysql.createPool({ uri: local.appUrl, connectionLimit: 2 });
  await pool.query(
    "UPDATE slots s JOIN events e ON e.id = s.event_id SET s.capacity = 10000000 WHERE e.status = 'published'",
  );
  const [[slot]] = (await pool.query(
    "SELECT s.id FROM slots s JOIN events e ON e.id = s.event_id WHERE e.status = 'published' AND s.starts_at > NOW() ORDER BY s.starts_at LIMIT 1",
  )) as unknown as [{ id: number }[]];
  const [[kettle]] = (await pool.query("SELECT id FROM categories WHERE slug = 'kettle'")) as unknown as [
    { id: number }[],
  ];
  await pool.end();

  const child = fork(path.join(import.meta.dirname, 'memory-app.ts'), [], {
    execArgv: ['--import', 'tsx', '--expose-gc'],
    env: {
      ...process.env,
      NODE_ENV: 'production',
      DATABASE_URL: local.appUrl,
      PORT: '0',
      SESSION_SECRET: secret,
      OUTBOX_POLL_MS: '0',
      JOBS_POLL_MS: '0',
      DB_POOL_SIZE: '20',
      DATA_DIR: dir,
      BOOKING_RATE_MAX: '100000000',
      BOOKING_EMAIL_RATE_MAX: '100000000',
      VISITOR_MAIL_MAX_PER_HOUR: '100000000',
      BOOKINGS_PER_SESSION_MAX: '100000000',
    },
  });
  const next = () => new Promise<Record<string, unknown>>((r) => child.once('message', (m) => r(m as never)));
  const { url } = (await next()) as { url: string };
  const sample = async (gc: boolean) => {
    const p = next();
    child.send(gc ? 'gc' : 'sample');
    return (await p) as unknown as Sample;
  };
  const print = (label: string, s: Sample) =>
    console.log(
      `${label.padEnd(34)} rss ${mb(s.rss)}   JS heap in use ${mb(s.heapUsed)} of ${mb(s.heapTotal)}   outside the heap ${mb(s.external)} (buffers ${mb(s.arrayBuffers)})   sharp cache ${mb(s.sharpCache.memory.current * 1024 * 1024)}`,
    );

  // A 12-megapixel photo, as a phone takes it (random noise, so JPEG cannot shrink it much).
  const raw = Buffer.alloc(4000 * 3000 * 3);
  for (let i = 0; i < raw.length; i++) raw[i] = (i * 2654435761) >>> 24;
  const photo = await sharp(raw, { raw: { width: 4000, height: 3000, channels: 3 } })
    .jpeg({ quality: 85 })
    .toBuffer();

  step(
    `Memory of the app process: ${ROUNDS} rounds of reads and bookings (${SECONDS} s each) and ${UPLOAD_BOOKINGS * 3} photo uploads of ${mb(photo.length).trim()}`,
  );
  const base = await sample(true);
  print('after start (baseline)', base);
  const csrf = await fetch(`${url}/api/auth/csrf`);
  const cookie = csrf.headers.getSetCookie()[0].split(';')[0];
  const token = ((await csrf.json()) as { token: string }).token;
  const headers = { 'content-type': 'application/json', cookie, 'x-csrf-token': token };
  const booking = JSON.stringify({
    slotId: slot.id,
    visitor: { name: 'Bench Visitor', email: 'bench@example.org' },
    items: [{ categoryId: kettle.id, fault: 'Switches off before it boils.' }],
    consent: true,
  });

  for (let round = 1; round <= ROUNDS; round++) {
    await autocannon({ url: `${url}/api/events`, connections: 20, duration: SECONDS });
    await autocannon({
      url: `${url}/api/bookings`,
      method: 'POST',
      headers,
      body: booking,
      connections: 20,
      duration: SECONDS,
    });
    let uploaded = 0;
    for (let i = 0; i < UPLOAD_BOOKINGS; i++) {
      const r = await fetch(`${url}/api/bookings`, { method: 'POST', headers, body: booking });
      const b = (await r.json()) as { reference: string; manageToken: string; itemIds: number[] };
      const form = new FormData();
      for (let k = 0; k < 3; k++) form.append('photos', new Blob([photo], { type: 'image/jpeg' }), `p${k}.jpg`);
      const u = await fetch(`${url}/api/bookings/${b.reference}/items/${b.itemIds[0]}/photos`, {
        method: 'POST',
        headers: { cookie, 'x-csrf-token': token, 'x-manage-token': b.manageToken },
        body: form,
      });
      if (u.status === 201) uploaded += 3;
    }
    print(`round ${round}: under load`, await sample(false));
    const after = await sample(true);
    print(`round ${round}: after a full GC (${uploaded} photos)`, after);
  }
  await new Promise((r) => setTimeout(r, 10_000));
  const idle = await sample(true);
  print('idle 10 s later, after a full GC', idle);
  console.log(
    `  growth over the baseline: rss ${(idle.rss / base.rss).toFixed(2)}×, JS heap in use ${(idle.heapUsed / base.heapUsed).toFixed(2)}×`,
  );
  child.send('stop');
  await new Promise((r) => child.once('exit', r));
  await local.instance.stop();
  rmSync(dir, { recursive: true, force: true });
}
