import { sql } from 'drizzle-orm';
import { createHash } from 'node:crypto';
import type { Store, IncrementResponse, Options } from 'express-rate-limit';
import type { Db } from '../db/client';
import { withDeadlockRetry } from '../db/retry';
import { rateLimits } from '../db/schema/index';

/**
 * An express-rate-limit store in MariaDB, so the limit holds across app processes. One upsert per hit, which
 * returns the count: a window that has ended starts again at 1.
 */
/** The stored key: as given when it fits the column (191), else the prefix and a SHA-256 of the rest. */
export const storedKey = (prefix: string, key: string) =>
  prefix.length + key.length <= 191 ? prefix + key : prefix + createHash('sha256').update(key).digest('hex');

/**
 * Counts one hit on each stored key in one statement, each in its own window; answers each key's count and window
 * end, in the order given. MariaDB's INSERT … ON DUPLICATE KEY UPDATE … RETURNING (10.5+) gives each row as it is
 * after the upsert, so no second SELECT. Callers list keys in one fixed order (address, then e-mail, then mail), so
 * two requests sharing keys take their row locks in the same order.
 */
export async function countHits(
  db: Db,
  hits: { key: string; windowMs: number }[],
): Promise<{ totalHits: number; resetTime: Date }[]> {
  const now = Date.now();
  const values = hits.map((h) => sql`(${h.key}, 1, ${new Date(now + h.windowMs)})`);
  const [rows] = (await withDeadlockRetry(() =>
    db.execute(sql`
      INSERT INTO ${rateLimits} (${sql.identifier('rate_key')}, ${sql.identifier('hits')}, ${sql.identifier('reset_at')})
      VALUES ${sql.join(values, sql`, `)}
      ON DUPLICATE KEY UPDATE
        ${sql.identifier('hits')} = IF(${sql.identifier('reset_at')} <= NOW(3), 1, ${sql.identifier('hits')} + 1),
        ${sql.identifier('reset_at')} = IF(${sql.identifier('reset_at')} <= NOW(3), VALUES(${sql.identifier('reset_at')}), ${sql.identifier('reset_at')})
      RETURNING ${sql.identifier('rate_key')}, ${sql.identifier('hits')}, ${sql.identifier('reset_at')}`),
  )) as unknown as [{ rate_key: string; hits: number; reset_at: Date | string }[]];
  const byKey = new Map(rows.map((r) => [r.rate_key, r]));
  return hits.map((h) => {
    const row = byKey.get(h.key);
    return row
      ? { totalHits: Number(row.hits), resetTime: new Date(row.reset_at) }
      : { totalHits: 1, resetTime: new Date(now + h.windowMs) };
  });
}

export class MariadbRateLimitStore implements Store {
  windowMs = 60_000;
  prefix: string;
  constructor(
    private db: Db,
    prefix: string,
  ) {
    this.prefix = prefix;
  }
  init(options: Options) {
    this.windowMs = options.windowMs;
  }
  async increment(key: string): Promise<IncrementResponse> {
    const [count] = await countHits(this.db, [{ key: storedKey(this.prefix, key), windowMs: this.windowMs }]);
    return count;
  }
  private pending = new Set<Promise<unknown>>();
  /** express-rate-limit decrements after the response has gone; shutdown waits for those writes. */
  async flush() {
    await Promise.allSettled([...this.pending]);
  }
  decrement(key: string) {
    const p = this.doDecrement(key);
    this.pending.add(p);
    return p.finally(() => this.pending.delete(p));
  }
  private async doDecrement(key: string) {
    await this.db
      .update(rateLimits)
      .set({ hits: sql`GREATEST(${rateLimits.hits} - 1, 0)` })
      .where(sql`${rateLimits.key} = ${storedKey(this.prefix, key)}`);
  }
  async resetKey(key: string) {
    await this.db.delete(rateLimits).where(sql`${rateLimits.key} = ${storedKey(this.prefix, key)}`);
  }
}
