import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    root: '.',
    include: ['tests/**/*.test.ts'],
    pool: 'forks',
    maxWorkers: 2,
    testTimeout: 60_000,
    hookTimeout: 90_000,
    // Each file gets its own database; outbound network beyond loopback is never used.
    env: { TZ: 'UTC' },
  },
});
