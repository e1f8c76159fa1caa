import sharp from 'sharp';
import v8 from 'node:v8';
import { loadEnv } from '../../src/config/env';
import { startServer } from '../../src/server';

/**
 * The app process of `BENCH=memory`, started by memory.ts with --expose-gc and an IPC channel, so its memory is the
 * app's alone (the load generator lives in the parent). Answers each message with its memory figures; "gc" first runs
 * a full collection twice.
 */
// BENCH_SHARP_THREADS=1 tries libvips with one worker thread (fewer malloc arenas); unset keeps sharp's default.
if (process.env.BENCH_SHARP_THREADS) sharp.concurrency(Number(process.env.BENCH_SHARP_THREADS));
const app = await startServer(loadEnv(), { sender: { send: async () => {} }, log: () => {} });
const gc = (globalThis as { gc?: () => void }).gc;
process.send!({ url: app.url });
process.on('message', (m) => {
  if (m === 'stop') return void app.stop().then(() => process.exit(0));
  if (m === 'gc') {
    gc?.();
    gc?.();
  }
  const h = v8.getHeapStatistics();
  process.send!({
    ...process.memoryUsage(),
    heapTotalV8: h.total_heap_size,
    mallocedMemory: h.malloced_memory,
    sharpCache: sharp.cache(),
  });
});
