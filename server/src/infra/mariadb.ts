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
  /** The server's process id now (it changes when a supervised server is restarted; 0 while it is down). */
  pid(): number;
  stop(): Promise<void>;
}

export interface PrivateMariadbOptions {
  dir: string;
  port: number;
  /** Throwaway test instances trade durability for speed. */
  fast?: boolean;
  log?: (line: string) => void;
  /** Start the server again after an unexpected exit, with backoff (npm start). */
  supervise?: boolean;
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

/** mariadbd's command line: its own files only, loopback, utf8mb4. */
function serverArgs(opts: PrivateMariadbOptions, dir: string): string[] {
  const data = path.join(dir, 'data');
  const socket = path.join(dir, 'mysqld.sock');
  const pidFile = path.join(dir, 'mysqld.pid');
  const errorLog = path.join(dir, 'error.log');
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
  return args;
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
      if (!opts.supervise) return handle(opts.port, socket, null, pid);
      const restart = () => launchMariadbd(serverArgs(opts, dir), errorLog, opts.port);
      return supervise(opts.port, socket, adopt(pid), restart, log);
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

  const args = serverArgs(opts, dir);
  const launch = () => launchMariadbd(args, errorLog, opts.port);
  const first = await launch();
  return opts.supervise
    ? supervise(opts.port, socket, first, launch, log)
    : handle(opts.port, socket, first.child, first.pid);
}

interface Launched {
  child: ChildProcess | null;
  pid: number;
  exited: Promise<string>;
}

/** Starts mariadbd and waits until it answers a ping; `exited` settles with how the process ended. */
async function launchMariadbd(args: string[], errorLog: string, port: number): Promise<Launched> {
  const child = spawn('mariadbd', args, { stdio: 'ignore' });
  let gone: string | null = null;
  const exited = new Promise<string>((resolve) => {
    child.once('exit', (code, signal) => resolve((gone = signal ? `signal ${signal}` : `exit code ${code}`)));
    child.once('error', (err) => resolve((gone = err.message)));
  });
  const deadline = Date.now() + 60_000;
  while (!(await greets(port))) {
    if (gone !== null || Date.now() > deadline) {
      if (gone === null) child.kill('SIGKILL');
      const tail = existsSync(errorLog) ? readFileSync(errorLog, 'utf8').split('\n').slice(-15).join('\n') : '';
      throw new Error(`MariaDB did not start on port ${port}.\n${tail}`);
    }
    await sleep(100);
  }
  return { child, pid: child.pid!, exited };
}

/**
 * Keeps the server running: after an unexpected exit it is started again after restartDelayMs(n), and each restart
 * is logged. A server that stayed up for a minute counts as healthy again, so the next failure waits 0.5 s again.
 */
function supervise(
  port: number,
  socket: string,
  first: Launched,
  launch: () => Promise<Launched>,
  log: (line: string) => void,
): PrivateMariadb {
  let current: Launched | null = first;
  let upSince = Date.now();
  let failures = 0;
  let stopping = false;
  let wake: (() => void) | null = null;
  const pause = (ms: number) =>
    new Promise<void>((resolve) => {
      const t = setTimeout(resolve, ms);
      wake = () => {
        clearTimeout(t);
        resolve();
      };
    });

  const loop = (async () => {
    let exitedHow = await first.exited;
    while (!stopping) {
      current = null;
      if (Date.now() - upSince > 60_000) failures = 0;
      const delay = restartDelayMs(failures++);
      log(`  MariaDB stopped unexpectedly (${exitedHow}); restart ${failures} in ${(delay / 1000).toFixed(1)} s`);
      await pause(delay);
      if (stopping) return;
      try {
        const started = Date.now();
        current = await launch();
        upSince = Date.now();
        if (stopping) return await handle(port, socket, current.child, current.pid).stop();
        log(`  MariaDB is running again (pid ${current.pid}, started in ${((upSince - started) / 1000).toFixed(1)} s)`);
        exitedHow = await current.exited;
      } catch (err) {
        exitedHow = (err as Error).message.split('\n')[0];
      }
    }
  })();

  const base = handle(port, socket, null, first.pid);
  return {
    ...base,
    pid: () => current?.pid ?? 0,
    async stop() {
      stopping = true;
      wake?.();
      const running = current;
      if (running) await handle(port, socket, running.child, running.pid).stop();
      await loop;
    },
  };
}

/** Restart waits: 0.5 s, 1 s, 2 s, 4 s … doubling from the first, never more than 30 s. */
export function restartDelayMs(failuresBefore: number): number {
  return Math.min(30_000, 500 * 2 ** Math.min(failuresBefore, 16));
}

/** A server this process did not start: its end is noticed by polling its process id. */
function adopt(pid: number): Launched {
  const exited = (async () => {
    while (alive(pid)) await sleep(500);
    return 'the earlier server ended';
  })();
  return { child: null, pid, exited };
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Ready once the server greets a client on its port (it opens the port only when ready for connections). */
function greets(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const sock = net.connect({ port, host: '127.0.0.1' });
    const done = (ok: boolean) => {
      sock.destroy();
      resolve(ok);
    };
    sock.setTimeout(2000, () => done(false));
    sock.once('data', () => done(true));
    sock.once('error', () => done(false));
  });
}

function handle(port: number, socket: string, child: ChildProcess | null, pid: number): PrivateMariadb {
  const rootSql = client(socket);
  return {
    port,
    socket,
    rootSql,
    pid: () => pid,
    async stop() {
      spawnSync('mariadb-admin', ['--no-defaults', `--socket=${socket}`, '-uroot', 'shutdown'], {
        encoding: 'utf8',
        timeout: 15_000,
      });
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
