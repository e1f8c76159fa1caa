import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildClientIfStale, step } from '../local-stack';
import { startCluster } from './stack';

/**
 * `npm run start:cluster`: a trial of the cluster on one machine, three Galera nodes, HAProxy, two app processes
 * and the local mailbox, with demo data, in a fresh folder each time. Ctrl-C stops everything and removes it.
 */
const dir = mkdtempSync(path.join(os.tmpdir(), 'mendery-cluster-'));
buildClientIfStale();
let stopping = false;
try {
  const stack = await startCluster({
    dir,
    basePort: Number(process.env.CLUSTER_BASE_PORT ?? 4400),
    appPort: Number(process.env.PORT ?? 3000),
    demo: process.env.DEMO !== '0',
    log: console.log,
  });
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    step('Stopping the cluster…');
    await stack.stop();
    rmSync(dir, { recursive: true, force: true });
    console.log('Stopped cleanly.');
    process.exit(0);
  };
  process.on('SIGINT', () => void stop());
  process.on('SIGTERM', () => void stop());
  step(
    `Mendery runs at ${stack.appUrl} on two app processes and three Galera nodes (files in ${dir}; Ctrl-C stops it)`,
  );
} catch (err) {
  console.error(`✗ ${(err as Error).message}`);
  rmSync(dir, { recursive: true, force: true });
  process.exit(1);
}
