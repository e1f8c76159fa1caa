import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

/** Finds an executable on PATH or in the sbin folders Debian uses for daemons. */
export function findExecutable(name: string): string | null {
  for (const dir of (process.env.PATH ?? '').split(':').concat(['/usr/sbin', '/usr/bin', '/sbin'])) {
    const candidate = `${dir}/${name}`;
    if (dir && existsSync(candidate)) return candidate;
  }
  return null;
}

/**
 * Makes sure a Debian package that provides `executable` is installed. As root it runs apt-get;
 * otherwise it prints the exact command and stops, because nothing else would work.
 */
export function ensureDebianPackage(executable: string, pkg: string, log: (line: string) => void): string {
  const found = findExecutable(executable);
  if (found) return found;
  const command = `apt-get update && apt-get install -y ${pkg}`;
  if (process.getuid?.() !== 0) {
    log(`✗ ${executable} is missing. Install it as root, then run this again:\n    sudo sh -c '${command}'`);
    process.exit(1);
  }
  log(`▸ Installing Debian package ${pkg} (${executable} is missing)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [
    ['update', '-q'],
    ['install', '-y', '-q', pkg],
  ]) {
    const r = spawnSync('apt-get', args, { stdio: ['ignore', 'inherit', 'inherit'], env });
    if (r.status !== 0) {
      log(`✗ apt-get ${args.join(' ')} failed (exit ${r.status}).`);
      process.exit(1);
    }
  }
  const after = findExecutable(executable);
  if (!after) {
    log(`✗ ${pkg} installed but ${executable} is still missing.`);
    process.exit(1);
  }
  return after;
}
