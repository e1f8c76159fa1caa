import { sql } from 'drizzle-orm';
import { createHash } from 'node:crypto';
import type { Store, IncrementResponse, Options } from 'express-rate-limit';
import type { Db } from '../db/client';
import { rateLimits } from '../db/schema/index';

/**
 * An express-rate-limit store in MariaDB, so the limit holds across app processes. One upsert per hit, which
 * returns the count: a window that has ended starts again at 1.
 */
/** The stored key: as given when it fits the column (191), else the prefix and a SHA-256 of the rest. */
export const storedKey = (prefix: string, key: string) =>
  prefix.length + key.length <= 191 ? prefix + key : prefix + createHash('sha256').update(key).digest('hex');

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
    const k = storedKey(this.prefix, key);
    const reset = new Date(Date.now() + this.windowMs);
    // One round trip: MariaDB's INSERT … ON DUPLICATE KEY UPDATE … RETURNING (10.5+) gives the row as it is after
    // the upsert, so the count and the window's end need no second SELECT.
    const [rows] = (await this.db.execute(sql`
      INSERT INTO ${rateLimits} (${sql.identifier('rate_key')}, ${sql.identifier('hits')}, ${sql.identifier('reset_at')})
      VALUES (${k}, 1, ${reset})
      ON DUPLICATE KEY UPDATE
        ${sql.identifier('hits')} = IF(${sql.identifier('reset_at')} <= NOW(3), 1, ${sql.identifier('hits')} + 1),
        ${sql.identifier('reset_at')} = IF(${sql.identifier('reset_at')} <= NOW(3), VALUES(${sql.identifier('reset_at')}), ${sql.identifier('reset_at')})
      RETURNING ${sql.identifier('hits')}, ${sql.identifier('reset_at')}`)) as unknown as [
      { hits: number; reset_at: Date | string }[],
    ];
    const row = rows[0];
    return { totalHits: row ? Number(row.hits) : 1, resetTime: row ? new Date(row.reset_at) : reset };
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
