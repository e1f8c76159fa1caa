// Runs the API and client against an already-running database (production: DATABASE_URL set).
import { loadEnv } from './config/env';
import { startServer } from './server';

const env = loadEnv();
const running = await startServer(env);
console.log(`Mendery listening on ${running.url}`);
for (const sig of ['SIGINT', 'SIGTERM'] as const) {
  process.once(sig, () => void running.stop().then(() => process.exit(0)));
}
