import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { rateLimits } from '../../server/src/db/schema/index';
import { countHits, MariadbRateLimitStore } from '../../server/src/http/rate-limit-store';
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

  it('counts several keys in one statement, each in its own window, and answers them in the order asked', async () => {
    const hits = [
      { key: 'multi-test:ip', windowMs: 15 * 60_000 },
      { key: 'multi-test:mail', windowMs: 3_600_000 },
    ];
    const before = Date.now();
    const first = await countHits(db.db, hits);
    await countHits(db.db, [hits[1]]);
    const third = await countHits(db.db, [...hits].reverse());
    expect(first.map((c) => c.totalHits)).toEqual([1, 1]);
    // Asked in the other order, answered in that order: the mail's key has 3 hits, the address's 2.
    expect(third.map((c) => c.totalHits)).toEqual([3, 2]);
    expect(first[0].resetTime.getTime()).toBeGreaterThanOrEqual(before + 15 * 60_000 - 5);
    expect(first[1].resetTime.getTime()).toBeGreaterThanOrEqual(before + 3_600_000 - 5);
    expect(third[1].resetTime.getTime()).toBe(first[0].resetTime.getTime());
    const [rows] = (await db.db.execute(
      sql`SELECT COUNT(*) AS n FROM ${rateLimits} WHERE ${rateLimits.key} LIKE 'multi-test:%'`,
    )) as unknown as [{ n: number }[]];
    expect(Number(rows[0].n)).toBe(2);
  });
});
