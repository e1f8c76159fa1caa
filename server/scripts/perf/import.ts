import mysql from 'mysql2/promise';
import { mkdtempSync, rmSync } from 'node:fs';
import path from 'node:path';
import { ORDS_PRODUCT_CATEGORIES, ordsCategoryId } from '../../../shared/impact/ords-categories';
import { loadEnv } from '../../src/config/env';
import { repairGroups, users } from '../../src/db/schema/index';
import { runImports, startImport } from '../../src/features/impact/imports';
import { freePort } from '../../src/infra/mariadb';
import { ensureCategories } from '../../src/seed/categories';
import { startServer } from '../../src/server';
import { loadOrCreateSecrets, startLocalDatabase, step } from '../local-stack';

/**
 * `BENCH=import npm run bench`: brings in a generated Open Repair Data v0.3 file of 100,000 records (BENCH_ROWS) as
 * the import job does it, from the file's bytes to the statistics' rollups. Baseline in the same run: the same
 * records written by bare multi-row INSERTs of 500 into one plain table, in one transaction each, with mysql2.
 */
const ROWS = Number(process.env.BENCH_ROWS ?? 100_000);
const STATUSES = ['Fixed', 'Repairable', 'End of life', 'Unknown'];

function generate(n: number) {
  const lines = [
    'id,data_provider,country,partner_product_category,product_category,product_category_id,brand,year_of_manufacture,product_age,repair_status,repair_barrier_if_end_of_life,group_identifier,event_date,problem',
  ];
  for (let i = 0; i < n; i++) {
    const c = ORDS_PRODUCT_CATEGORIES[i % ORDS_PRODUCT_CATEGORIES.length];
    const status = STATUSES[i % 4];
    // Written in date order, as files are exported: 3,000 session dates over eight years.
    const day = new Date(Date.UTC(2016, 0, 1) + Math.floor((i * 3000) / n) * 86400_000).toISOString().slice(0, 10);
    lines.push(
      `b-${i},Bench Data,GBR,,${c},${ordsCategoryId(c)},Brand${i % 50},,${i % 20},${status},${status === 'End of life' ? 'Spare parts not available' : ''},bench,${day},Stops working after a few minutes of use (${i})`,
    );
  }
  return Buffer.from(lines.join('\n'));
}

export async function measureImport() {
  const dir = mkdtempSync(path.join('/dev/shm', 'mendery-bench-import-'));
  const local = await startLocalDatabase({
    dir,
    port: await freePort(),
    database: 'bench_import',
    secrets: loadOrCreateSecrets(dir),
    fast: true,
  });
  try {
    await measure(local.appUrl, local.migrateUrl);
  } finally {
    await local.instance.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

async function measure(appUrl: string, ownerUrl: string) {
  const bytes = generate(ROWS);
  step(`Import of ${ROWS.toLocaleString('en-GB')} records (${(bytes.length / 1024 / 1024).toFixed(1)} MB)`);
  // Baseline: the same rows, bare (the schema owner makes the scratch table).
  const pool = mysql.createPool({ uri: ownerUrl, connectionLimit: 2 });
  await pool.query(
    'CREATE TABLE bench_rows (id BIGINT AUTO_INCREMENT PRIMARY KEY, record_id VARCHAR(80), category VARCHAR(80), status VARCHAR(20), day DATE, problem TEXT)',
  );
  const rows = bytes
    .toString()
    .split('\n')
    .slice(1)
    .map((l) => l.split(','));
  const b0 = performance.now();
  for (let i = 0; i < rows.length; i += 500) {
    const conn = await pool.getConnection();
    await conn.beginTransaction();
    await conn.query('INSERT INTO bench_rows (record_id, category, status, day, problem) VALUES ?', [
      rows.slice(i, i + 500).map((r) => [r[0], r[4], r[9], r[12], r[13]]),
    ]);
    await conn.commit();
    conn.release();
  }
  const bare = (performance.now() - b0) / 1000;
  await pool.end();

  const env = loadEnv({
    NODE_ENV: 'test',
    DATABASE_URL: appUrl,
    PORT: '0',
    SESSION_SECRET: 'bench-session-secret-long-enough-0123456789',
    OUTBOX_POLL_MS: '0',
    JOBS_POLL_MS: '0',
    SMTP_PORT: '1',
    CLIENT_DIST: 'dist/client',
  });
  const server = await startServer(env, { sender: { send: async () => {} }, log: () => {} });
  try {
    const { db } = server.ctx.database;
    await ensureCategories(db);
    const [{ id: groupId }] = await db
      .insert(repairGroups)
      .values({ name: 'Bench group', slug: 'bench', town: 'Benchton', description: '' })
      .$returningId();
    const [{ id: userId }] = await db
      .insert(users)
      .values({ email: 'bench@example.org', name: 'Bench', passwordHash: 'x', admin: true })
      .$returningId();
    const t0 = performance.now();
    const id = await startImport(
      server.ctx,
      {
        bytes,
        fileName: 'bench.csv',
        scope: 'group',
        groupId,
        mapping: {},
        userId,
      },
      'en',
    );
    await runImports(server.ctx);
    const took = (performance.now() - t0) / 1000;
    const [job] = (await server.ctx.database.pool.query('SELECT status, imported FROM import_jobs WHERE id = ?', [
      id,
    ])) as unknown as [{ status: string; imported: number }[]];
    console.log(
      `import: ${job[0].imported.toLocaleString('en-GB')} of ${ROWS.toLocaleString('en-GB')} records (${job[0].status}) in ${took.toFixed(1)} s, ${Math.round(ROWS / took).toLocaleString('en-GB')} records/s`,
    );
    console.log(
      `import baseline (bare 500-row INSERTs into one table): ${bare.toFixed(1)} s; import takes ${(took / bare).toFixed(1)}x the baseline's time`,
    );
  } finally {
    await server.stop();
  }
}
