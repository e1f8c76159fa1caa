import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { rateLimits } from '../../server/src/db/schema/index';
import { MariadbRateLimitStore } from '../../server/src/http/rate-limit-store';
import { createTestDatabase, type TestDatabase } from '../support/db';

let db: TestDatabase;
beforeAll(async () => {
  db = await createTestDatabase();
});
afterAll(async () => {
  await db.drop();
});

describe('the rate-limit store in MariaDB', () => {
  it('counts hits in one window, keeps its end, and starts again at 1 once it has ended', async () => {
    const store = new MariadbRateLimitStore(db.db, 'store-test:');
    store.windowMs = 60_000;
    const before = Date.now();
    const first = await store.increment('198.51.100.7');
    const second = await store.increment('198.51.100.7');
    const third = await store.increment('198.51.100.7');
    expect([first.totalHits, second.totalHits, third.totalHits]).toEqual([1, 2, 3]);
    // The window's end is the first hit's: later hits do not move it.
    expect(third.resetTime!.getTime()).toBe(first.resetTime!.getTime());
    expect(first.resetTime!.getTime()).toBeGreaterThanOrEqual(before + 60_000 - 5);
    expect((await store.increment('203.0.113.9')).totalHits).toBe(1);

    await db.db
      .update(rateLimits)
      .set({ resetAt: new Date(Date.now() - 1000) })
      .where(sql`${rateLimits.key} = 'store-test:198.51.100.7'`);
    const fresh = await store.increment('198.51.100.7');
    expect(fresh.totalHits).toBe(1);
    expect(fresh.resetTime!.getTime()).toBeGreaterThan(Date.now() + 50_000);

    await store.decrement('198.51.100.7');
    await store.flush();
    expect((await store.increment('198.51.100.7')).totalHits).toBe(1);
  });
});
