// Entry of `npm start|dev|test|bench`: plain Node with no dependencies, so it can install them first.
import { existsSync, lstatSync, statSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { fileURLToPath, pathToFileURL } from 'node:url';
import path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const command = process.argv[2];
const scripts = {
  start: 'start.ts',
  dev: 'dev.ts',
  test: 'test.ts',
  bench: 'perf/http.ts',
  migrate: 'migrate.ts',
  'stats-rebuild': 'stats-rebuild.ts',
  screenshots: 'screenshots.ts',
  'start:cluster': 'cluster/start.ts',
  'test:cluster': 'cluster/test.ts',
};
if (!scripts[command]) {
  console.error(`usage: bootstrap.mjs ${Object.keys(scripts).join('|')}`);
  process.exit(2);
}

const marker = path.join(root, 'node_modules', '.package-lock.json');
const lock = path.join(root, 'package-lock.json');
const stale = !existsSync(marker) || (existsSync(lock) && statSync(lock).mtimeMs > statSync(marker).mtimeMs + 1000);
// A node_modules that is a link to another checkout's belongs to that checkout: `npm ci` through the link would
// empty it for everyone who shares it, so install there instead.
const modules = path.join(root, 'node_modules');
const shared = existsSync(modules) && lstatSync(modules).isSymbolicLink();
if (stale && shared) console.log('▸ node_modules is a link to another checkout: install there, not through the link');
else if (stale) {
  console.log('▸ Installing npm dependencies (first run)…');
  const r = spawnSync('npm', [existsSync(lock) ? 'ci' : 'install', '--no-audit', '--no-fund'], {
    cwd: root,
    stdio: 'inherit',
  });
  if (r.status !== 0) {
    console.error('✗ npm could not install the dependencies; see the messages above.');
    process.exit(r.status ?? 1);
  }
}

const { register } = await import('tsx/esm/api');
register();
await import(pathToFileURL(path.join(root, 'server', 'scripts', scripts[command])).href);
