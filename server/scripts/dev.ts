import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { loadOrCreateSecrets, root, seedOnFirstRun, startLocalDatabase, startLocalMailbox, step } from './local-stack';

/** `npm run dev`: the same private MariaDB and mailbox, the API under tsx watch on 3001, Vite with hot reload on 5173. */
const dataDir = path.resolve(root, process.env.DATA_DIR ?? '.data');
const secrets = loadOrCreateSecrets(dataDir);
const apiPort = Number(process.env.API_PORT ?? 3001);
const vitePort = Number(process.env.VITE_PORT ?? 5173);
const smtpPort = Number(process.env.SMTP_PORT ?? 2525);

const local = await startLocalDatabase({
  dir: path.join(dataDir, 'mariadb'),
  port: Number(process.env.DB_PORT ?? 3307),
  database: 'mendery',
  secrets,
  supervise: true,
});
await seedOnFirstRun(local.appUrl, secrets.sessionSecret);
const stopMailbox = await startLocalMailbox(local.appUrl, smtpPort);

const env = {
  ...process.env,
  NODE_ENV: 'development',
  DATABASE_URL: local.appUrl,
  SESSION_SECRET: secrets.sessionSecret,
  PORT: String(apiPort),
  SMTP_PORT: String(smtpPort),
  PUBLIC_URL: `http://127.0.0.1:${vitePort}`,
  API_PORT: String(apiPort),
  VITE_PORT: String(vitePort),
};
const children: ChildProcess[] = [
  spawn(
    process.execPath,
    [path.join(root, 'node_modules/tsx/dist/cli.mjs'), 'watch', '--clear-screen=false', 'server/src/index.ts'],
    { cwd: root, env, stdio: 'inherit' },
  ),
  spawn(process.execPath, [path.join(root, 'node_modules/vite/bin/vite.js')], { cwd: root, env, stdio: 'inherit' }),
];
step(`Open http://127.0.0.1:${vitePort} (API on ${apiPort}, Ctrl-C stops everything)`);

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  for (const c of children) c.kill('SIGTERM');
  await stopMailbox();
  await local.instance.stop();
  process.exit(0);
}
process.on('SIGINT', () => void stop());
process.on('SIGTERM', () => void stop());
for (const c of children) c.on('exit', () => void stop());
