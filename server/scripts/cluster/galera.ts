import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { renderFile } from './templates';

/** One Galera node on this machine: its folder, ports and rendered configuration. */
export interface GaleraNodeSpec {
  name: string;
  dir: string;
  sqlPort: number;
  gcommPort: number;
  istPort: number;
  sstPort: number;
  checkPort: number;
}

export interface ClusterSettings {
  clusterName: string;
  peers: string;
  bufferPool: string;
  gcacheSize: string;
  fcLimit: number;
  syncWait: number;
  keepalivePeriod: string;
  suspectTimeout: string;
  inactiveTimeout: string;
}

const MYSQL_USER = 'mysql';

function mysqlIds() {
  const r = spawnSync('id', ['-u', MYSQL_USER], { encoding: 'utf8' });
  const g = spawnSync('id', ['-g', MYSQL_USER], { encoding: 'utf8' });
  if (r.status !== 0) throw new Error('The system user "mysql" is missing (it comes with Debian\'s mariadb-server).');
  return { uid: Number(r.stdout.trim()), gid: Number(g.stdout.trim()) };
}

function chownTree(p: string, uid: number, gid: number) {
  chownSync(p, uid, gid);
  for (const e of readdirSync(p, { withFileTypes: true }))
    if (e.isDirectory()) chownTree(path.join(p, e.name), uid, gid);
    else chownSync(path.join(p, e.name), uid, gid);
}

const socketOf = (n: GaleraNodeSpec) => path.join(n.dir, 'mysqld.sock');

export function rootSql(n: GaleraNodeSpec, sql: string): string {
  const r = spawnSync(
    'mariadb',
    ['--no-defaults', `--socket=${socketOf(n)}`, '-uroot', '--batch', '--skip-column-names', '-e', sql],
    { encoding: 'utf8' },
  );
  if (r.status !== 0) throw new Error(`mariadb client on ${n.name} failed: ${r.stderr.trim()}`);
  return r.stdout.trim();
}

function tryStatus(n: GaleraNodeSpec, name: string): string | null {
  try {
    return rootSql(n, `SHOW GLOBAL STATUS LIKE '${name}'`).split('\t')[1] ?? null;
  } catch {
    return null;
  }
}

/** wsrep_local_state 4 is Synced: the node holds everything the cluster committed and takes queries. */
export const isSynced = (n: GaleraNodeSpec) => tryStatus(n, 'wsrep_local_state') === '4';

/**
 * Renders the node's configuration from deploy/cluster/galera.cnf and starts mariadbd as the mysql user (the rsync
 * state transfer drops to that user; started as root it fails). `bootstrap` starts a new cluster from this node.
 */
export async function startNode(
  n: GaleraNodeSpec,
  settings: ClusterSettings,
  opts: { bootstrap: boolean; timeoutMs?: number },
): Promise<ChildProcess> {
  const { uid, gid } = mysqlIds();
  const data = path.join(n.dir, 'data');
  const cnf = path.join(n.dir, 'my.cnf');
  mkdirSync(path.join(n.dir, 'tmp'), { recursive: true });
  if (opts.bootstrap && !existsSync(path.join(data, 'mysql'))) {
    const r = spawnSync(
      'mariadb-install-db',
      [
        '--no-defaults',
        `--datadir=${data}`,
        `--user=${MYSQL_USER}`,
        '--auth-root-authentication-method=socket',
        '--skip-test-db',
      ],
      { encoding: 'utf8' },
    );
    if (r.status !== 0) throw new Error(`mariadb-install-db failed:\n${r.stdout}\n${r.stderr}`);
  }
  mkdirSync(data, { recursive: true });
  renderFile('galera.cnf', cnf, {
    DATA_DIR: data,
    SOCKET: socketOf(n),
    PID_FILE: path.join(n.dir, 'mysqld.pid'),
    ERROR_LOG: path.join(n.dir, 'error.log'),
    TMP_DIR: path.join(n.dir, 'tmp'),
    SQL_PORT: n.sqlPort,
    BIND_ADDRESS: '127.0.0.1',
    BUFFER_POOL: settings.bufferPool,
    CLUSTER_NAME: settings.clusterName,
    CLUSTER_PEERS: settings.peers,
    NODE_NAME: n.name,
    NODE_ADDRESS: '127.0.0.1',
    GCOMM_PORT: n.gcommPort,
    IST_PORT: n.istPort,
    SST_PORT: n.sstPort,
    GCACHE_SIZE: settings.gcacheSize,
    FC_LIMIT: settings.fcLimit,
    SYNC_WAIT: settings.syncWait,
    KEEPALIVE_PERIOD: settings.keepalivePeriod,
    SUSPECT_TIMEOUT: settings.suspectTimeout,
    INACTIVE_TIMEOUT: settings.inactiveTimeout,
  });
  chownTree(n.dir, uid, gid);
  const args = [`--defaults-file=${cnf}`, `--user=${MYSQL_USER}`];
  if (opts.bootstrap) args.push('--wsrep-new-cluster');
  else {
    const position = recoveredPosition(cnf, n.dir);
    if (position) args.push(`--wsrep-start-position=${position}`);
  }
  const child = spawn('mariadbd', args, { stdio: 'ignore' });
  let exited = false;
  child.once('exit', () => (exited = true));
  const deadline = Date.now() + (opts.timeoutMs ?? 90_000);
  while (!isSynced(n)) {
    if (exited || Date.now() > deadline) {
      const log = path.join(n.dir, 'error.log');
      const tail = existsSync(log) ? readFileSync(log, 'utf8').split('\n').slice(-20).join('\n') : '';
      if (!exited) child.kill('SIGKILL');
      throw new Error(`Galera node ${n.name} did not reach Synced.\n${tail}`);
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  return child;
}

/**
 * After a crash the node's saved state has no position (seqno -1), and without one it would ask for a full copy
 * (SST), blocking its donor meanwhile. `--wsrep-recover` reads the last committed position from InnoDB, as Debian's
 * galera_recovery does under systemd, so the node can ask for the missing write-sets only (IST).
 */
function recoveredPosition(cnf: string, dir: string): string | null {
  const log = path.join(dir, 'recover.log');
  spawnSync('mariadbd', [`--defaults-file=${cnf}`, `--user=${MYSQL_USER}`, '--wsrep-recover', `--log-error=${log}`], {
    encoding: 'utf8',
  });
  const text = existsSync(log) ? readFileSync(log, 'utf8') : '';
  const m = /WSREP: Recovered position: ([0-9a-f-]{36}:-?\d+)/.exec(text);
  return m && !m[1].endsWith(':-1') ? m[1] : null;
}

/** A clean shutdown, or SIGKILL after 20 s. */
export async function stopNode(n: GaleraNodeSpec, child: ChildProcess | null) {
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const done = new Promise((r) => child.once('exit', r));
  spawnSync('mariadb-admin', ['--no-defaults', `--socket=${socketOf(n)}`, '-uroot', 'shutdown'], { encoding: 'utf8' });
  const timer = setTimeout(() => child.kill('SIGKILL'), 20_000);
  await done;
  clearTimeout(timer);
}
