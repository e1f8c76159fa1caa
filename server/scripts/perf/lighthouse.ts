import { launch } from 'chrome-launcher';
import lighthouse from 'lighthouse';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { loadEnv } from '../../src/config/env';
import { createDatabase } from '../../src/db/client';
import { freePort } from '../../src/infra/mariadb';
import { seedDemo } from '../../src/seed/demo';
import { startServer } from '../../src/server';
import { buildClientIfStale, loadOrCreateSecrets, startLocalDatabase, step } from '../local-stack';

/**
 * `BENCH=lighthouse npm run bench`: the production build against the demo scenario on a throwaway MariaDB, then
 * Lighthouse's mobile preset (its default: simulated slow 4G and a 4× slower CPU) three times on each public page,
 * in Debian's chromium (CHROMIUM_PATH to use another). Prints the median performance score with its LCP and TBT,
 * the three runs, and the JavaScript the page transferred (as served: brotli when the browser asks for it).
 * LIGHTHOUSE_REPORTS=<folder> keeps each page's last report (JSON) to read its opportunities.
 * A measurement, not a test: the scores move with the machine's load.
 */
const RUNS = Number(process.env.LIGHTHOUSE_RUNS ?? 3);

interface Run {
  score: number;
  lcp: number;
  tbt: number;
  jsBytes: number;
  jsFiles: number;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function audit(url: string, port: number, tries = 3): Promise<Run> {
  const result = await lighthouse(url, { port, output: 'json', logLevel: 'error', onlyCategories: ['performance'] });
  if (!result) throw new Error(`Lighthouse gave no result for ${url}`);
  const { lhr } = result;
  // A trace that failed to record (NO_NAVSTART and the like) says nothing about the page: Lighthouse asks to run again.
  if (lhr.runtimeError) {
    if (tries > 1) return audit(url, port, tries - 1);
    throw new Error(`${url}: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`);
  }
  const requests = (
    lhr.audits['network-requests'].details as { items: { resourceType?: string; transferSize?: number }[] }
  ).items;
  if (process.env.LIGHTHOUSE_REPORTS) {
    mkdirSync(process.env.LIGHTHOUSE_REPORTS, { recursive: true });
    const name = new URL(url).pathname.replace(/\W+/g, '_') || '_';
    writeFileSync(path.join(process.env.LIGHTHOUSE_REPORTS, `${name}.json`), JSON.stringify(lhr, null, 1));
  }
  const scripts = requests.filter((r) => r.resourceType === 'Script');
  return {
    score: Math.round((lhr.categories.performance.score ?? 0) * 100),
    lcp: lhr.audits['largest-contentful-paint'].numericValue ?? NaN,
    tbt: lhr.audits['total-blocking-time'].numericValue ?? NaN,
    jsBytes: scripts.reduce((n, r) => n + (r.transferSize ?? 0), 0),
    jsFiles: scripts.length,
  };
}

export async function measureLighthouse(): Promise<void> {
  buildClientIfStale();
  const secret = 'bench-secret-'.padEnd(40, 'x');
  const dir = mkdtempSync(path.join('/dev/shm', 'mendery-lighthouse-'));
  const local = await startLocalDatabase({
    dir,
    port: await freePort(),
    database: 'lighthouse',
    secrets: loadOrCreateSecrets(dir),
    fast: true,
  });
  const seedDb = createDatabase(local.appUrl, 2);
  await seedDemo(seedDb.db, { linkSecret: secret });
  await seedDb.close();
  const env = loadEnv({
    NODE_ENV: 'production',
    DATABASE_URL: local.appUrl,
    PORT: '0',
    SESSION_SECRET: secret,
    OUTBOX_POLL_MS: '0',
    JOBS_POLL_MS: '0',
    DATA_DIR: dir,
  });
  const app = await startServer(env, { sender: { send: async () => {} }, log: () => {} });
  const chrome = await launch({
    chromePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    chromeFlags: ['--headless=new', '--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage'],
  });
  try {
    const events = (await (await fetch(`${app.url}/api/events`)).json()) as { id: number }[];
    if (!events.length) throw new Error('the demo scenario has no published session');
    const id = events[0].id;
    // LIGHTHOUSE_ONLY=/impact (a comma-separated list of the paths below, with :id for the session) narrows the run.
    const only = process.env.LIGHTHOUSE_ONLY?.split(',').map((p) => p.replace(':id', String(id)));
    const pages = ['/', '/events', `/events/${id}`, `/events/${id}/book`, '/impact'].filter(
      (p) => !only || only.includes(p),
    );
    step(`Lighthouse ${RUNS}× per page, mobile preset (simulated throttling), ${app.url}`);
    // One unmeasured visit so the server's first-request work does not land in the first page's figures.
    await audit(`${app.url}/events`, chrome.port);
    for (const page of pages) {
      const runs: Run[] = [];
      for (let i = 0; i < RUNS; i++) runs.push(await audit(app.url + page, chrome.port));
      const mid = runs.find((r) => r.score === median(runs.map((x) => x.score)))!;
      console.log(
        `${page.padEnd(16)} score ${String(median(runs.map((r) => r.score))).padStart(3)}   ` +
          `LCP ${(median(runs.map((r) => r.lcp)) / 1000).toFixed(2)} s   TBT ${Math.round(median(runs.map((r) => r.tbt)))} ms   ` +
          `JS ${(mid.jsBytes / 1000).toFixed(1)} KB in ${mid.jsFiles} file(s)   ` +
          `runs: ${runs.map((r) => `${r.score}/${(r.lcp / 1000).toFixed(2)}s/${Math.round(r.tbt)}ms`).join(' ')}`,
      );
    }
    console.log('  (target: score ≥ 95, LCP ≤ 2.00 s, TBT ≤ 100 ms; figures are medians of the runs)');
  } finally {
    chrome.kill();
    await app.stop();
    await local.instance.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}
