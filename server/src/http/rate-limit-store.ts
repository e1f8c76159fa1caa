import { sql } from 'drizzle-orm';
import { createHash } from 'node:crypto';
import type { Store, IncrementResponse, Options } from 'express-rate-limit';
import type { Db } from '../db/client';
import { rateLimits } from '../db/schema/index';

/**
 * An express-rate-limit store in MariaDB, so the limit holds across app processes. One upsert per hit:
 * a window that has ended starts again at 1.
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
    await this.db
      .insert(rateLimits)
      .values({ key: k, hits: 1, resetAt: reset })
      .onDuplicateKeyUpdate({
        set: {
          hits: sql`IF(${rateLimits.resetAt} <= NOW(3), 1, ${rateLimits.hits} + 1)`,
          resetAt: sql`IF(${rateLimits.resetAt} <= NOW(3), VALUES(${rateLimits.resetAt}), ${rateLimits.resetAt})`,
        },
      });
    const [row] = await this.db
      .select()
      .from(rateLimits)
      .where(sql`${rateLimits.key} = ${k}`);
    return { totalHits: row?.hits ?? 1, resetTime: row?.resetAt ?? reset };
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
