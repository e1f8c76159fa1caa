import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { ensureDebianPackage } from './system-packages';

/**
 * A private MariaDB server: its own data folder, socket and loopback port, started with --no-defaults
 * so the system-wide configuration and any system-wide instance are never touched.
 */
export interface PrivateMariadb {
  port: number;
  socket: string;
  /** Runs SQL as the instance's root over the socket (unix_socket authentication). */
  rootSql(sql: string): string;
  stop(): Promise<void>;
}

export interface PrivateMariadbOptions {
  dir: string;
  port: number;
  /** Throwaway test instances trade durability for speed. */
  fast?: boolean;
  log?: (line: string) => void;
}

export function ensureMariadbInstalled(log: (line: string) => void) {
  ensureDebianPackage('mariadbd', 'mariadb-server', log);
}

export function portIsFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = net.createServer();
    probe.once('error', () => resolve(false));
    probe.listen(port, '127.0.0.1', () => probe.close(() => resolve(true)));
  });
}

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

function client(socket: string) {
  return (sql: string) => {
    const r = spawnSync(
      'mariadb',
      ['--no-defaults', `--socket=${socket}`, '-uroot', '--batch', '--skip-column-names', '-e', sql],
      { encoding: 'utf8' },
    );
    if (r.status !== 0) throw new Error(`mariadb client failed: ${r.stderr.trim()}`);
    return r.stdout.trim();
  };
}

function ping(socket: string): boolean {
  const r = spawnSync('mariadb-admin', ['--no-defaults', `--socket=${socket}`, '-uroot', 'ping'], { encoding: 'utf8' });
  return r.status === 0;
}

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

export async function startPrivateMariadb(opts: PrivateMariadbOptions): Promise<PrivateMariadb> {
  const log = opts.log ?? (() => {});
  const dir = path.resolve(opts.dir);
  const data = path.join(dir, 'data');
  const socket = path.join(dir, 'mysqld.sock');
  const pidFile = path.join(dir, 'mysqld.pid');
  const errorLog = path.join(dir, 'error.log');
  mkdirSync(dir, { recursive: true });

  // A server left running by an earlier run that was killed hard: adopt it rather than fight over the files.
  if (existsSync(pidFile)) {
    const pid = Number(readFileSync(pidFile, 'utf8').trim());
    if (pid && alive(pid) && ping(socket)) {
      log(`  MariaDB already running from an earlier start (pid ${pid}); reusing it.`);
      return handle(opts.port, socket, null, pid);
    }
  }

  if (!existsSync(path.join(data, 'mysql'))) {
    log(`  Initialising a private MariaDB data folder in ${data}`);
    const r = spawnSync(
      'mariadb-install-db',
      [
        '--no-defaults',
        `--datadir=${data}`,
        '--user=root',
        '--auth-root-authentication-method=socket',
        '--skip-test-db',
      ],
      { encoding: 'utf8' },
    );
    if (r.status !== 0) throw new Error(`mariadb-install-db failed:\n${r.stdout}\n${r.stderr}`);
  }

  if (!(await portIsFree(opts.port))) {
    throw new Error(`Port ${opts.port} on 127.0.0.1 is already taken by another program. Set DB_PORT to a free port.`);
  }

  const args = [
    '--no-defaults',
    `--datadir=${data}`,
    `--socket=${socket}`,
    `--pid-file=${pidFile}`,
    `--port=${opts.port}`,
    '--bind-address=127.0.0.1',
    '--user=root',
    '--skip-name-resolve',
    '--character-set-server=utf8mb4',
    '--collation-server=utf8mb4_unicode_ci',
    `--log-error=${errorLog}`,
    // Temporary tables in the instance's own folder: a cleaner of /tmp cannot delete them in the middle of a query.
    `--tmpdir=${dir}`,
    '--max-connections=500',
  ];
  if (opts.fast)
    args.push(
      '--innodb-flush-log-at-trx-commit=0',
      '--innodb-doublewrite=0',
      '--innodb-flush-method=nosync',
      '--innodb-buffer-pool-size=256M',
    );
  const child = spawn('mariadbd', args, { stdio: 'ignore' });
  let exited = false;
  child.once('exit', () => (exited = true));

  const deadline = Date.now() + 30_000;
  while (!ping(socket)) {
    if (exited || Date.now() > deadline) {
      const tail = existsSync(errorLog) ? readFileSync(errorLog, 'utf8').split('\n').slice(-15).join('\n') : '';
      throw new Error(`MariaDB did not start on port ${opts.port}.\n${tail}`);
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  return handle(opts.port, socket, child, child.pid!);
}

function handle(port: number, socket: string, child: ChildProcess | null, pid: number): PrivateMariadb {
  const rootSql = client(socket);
  return {
    port,
    socket,
    rootSql,
    async stop() {
      spawnSync('mariadb-admin', ['--no-defaults', `--socket=${socket}`, '-uroot', 'shutdown'], { encoding: 'utf8' });
      const deadline = Date.now() + 15_000;
      while (alive(pid) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
      if (alive(pid)) process.kill(pid, 'SIGKILL');
      child?.removeAllListeners();
    },
  };
}

const ident = (s: string) => {
  if (!/^[A-Za-z0-9_]+$/.test(s)) throw new Error(`unsafe identifier ${s}`);
  return s;
};
const literal = (s: string) => `'${s.replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;

/**
 * Creates the database, a migration user that may change the schema, and an application user that may only
 * read and write rows: the running app cannot drop tables.
 */
export function provisionDatabase(
  db: PrivateMariadb,
  names: { database: string; appUser: string; appPassword: string; migrateUser: string; migratePassword: string },
) {
  const d = ident(names.database);
  db.rootSql(
    [
      `CREATE DATABASE IF NOT EXISTS \`${d}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
      `CREATE USER IF NOT EXISTS '${ident(names.appUser)}'@'127.0.0.1' IDENTIFIED BY ${literal(names.appPassword)}`,
      `ALTER USER '${ident(names.appUser)}'@'127.0.0.1' IDENTIFIED BY ${literal(names.appPassword)}`,
      `GRANT SELECT, INSERT, UPDATE, DELETE ON \`${d}\`.* TO '${ident(names.appUser)}'@'127.0.0.1'`,
      `CREATE USER IF NOT EXISTS '${ident(names.migrateUser)}'@'127.0.0.1' IDENTIFIED BY ${literal(names.migratePassword)}`,
      `ALTER USER '${ident(names.migrateUser)}'@'127.0.0.1' IDENTIFIED BY ${literal(names.migratePassword)}`,
      `GRANT ALL PRIVILEGES ON \`${d}\`.* TO '${ident(names.migrateUser)}'@'127.0.0.1'`,
    ].join(';\n'),
  );
}
