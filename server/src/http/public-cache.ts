import { createHash } from 'node:crypto';
import { eq, sql } from 'drizzle-orm';
import type { Request, RequestHandler, Response } from 'express';
import type { Db } from '../db/client';
import { readGeneration } from '../db/schema/index';

/**
 * Public reads (the session list, one session, groups, impact, config) answered from memory, with an ETag.
 *
 * Correct with several app processes (docs/decisions/009-public-read-cache.md):
 * - every successful write through the API (any POST, PUT, PATCH or DELETE that answers below 400) empties this
 *   process's cache at once and moves the shared `read_generation` row;
 * - every process reads that row every `pollMs` and empties its cache when it moved;
 * - an entry also lives at most `maxAgeMs`, which bounds changes made by scheduled jobs, not by a request.
 * So a booking made through one process shows in another within pollMs (plus one query), and in its own at once.
 * An answer computed while a write finished is not kept: entries carry the local generation they started in.
 */
export const PUBLIC_CACHE_CONTROL = 'public, max-age=5, stale-while-revalidate=30';

interface Entry {
  body: Buffer;
  etag: string;
  at: number;
}

export class PublicReadCache {
  private entries = new Map<string, Entry>();
  private local = 0;
  private shared: number | null = null;
  private timer: NodeJS.Timeout | null = null;
  private polling: Promise<void> | null = null;
  /** The move of the shared row under way, and the one queued behind it for writes that finished meanwhile. */
  private moving: Promise<void> | null = null;
  private queued: Promise<void> | null = null;

  constructor(
    private db: Db,
    private opts: { pollMs: number; maxAgeMs: number; maxEntries?: number },
  ) {
    // Without polling (one process only), nothing else writes: the generation is known from the start.
    if (opts.pollMs <= 0) this.shared = 0;
  }

  start() {
    if (this.opts.pollMs > 0 && !this.timer) {
      void this.poll();
      this.timer = setInterval(() => void this.poll(), this.opts.pollMs);
      this.timer.unref();
    }
  }

  async stop() {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await Promise.all([this.polling, this.queued, this.moving]);
  }

  /** Reads the shared generation; a move means another process wrote. */
  poll(): Promise<void> {
    this.polling ??= (async () => {
      try {
        const [row] = await this.db
          .select({ g: readGeneration.generation })
          .from(readGeneration)
          .where(eq(readGeneration.id, 1));
        const g = Number(row?.g ?? 0);
        // Unknown before (first poll, or the last one failed) counts as a move: an entry kept meanwhile may predate
        // another process's write, and nothing else would ever drop it before maxAgeMs.
        if (g !== this.shared) this.clear();
        this.shared = g;
      } catch {
        // The database is away: keep serving until maxAgeMs, as a cache should, and try again next tick.
        this.clear();
        this.shared = null;
      } finally {
        this.polling = null;
      }
    })();
    return this.polling;
  }

  clear() {
    this.local++;
    this.entries.clear();
  }

  /**
   * After a write in this process: empty the cache now, and tell the other processes. Writes that finish while a
   * move of the shared row is under way share one more move, started once that one has ended: each write is still
   * followed by a move that starts after it, and a burst of bookings costs two statements, not one each (all of them
   * would wait in turn on the same row).
   */
  written(): Promise<void> {
    this.clear();
    this.queued ??= (async () => {
      await this.moving;
      this.queued = null;
      const move = this.moveShared();
      this.moving = move;
      await move;
      if (this.moving === move) this.moving = null;
    })();
    return this.queued;
  }

  private async moveShared() {
    for (let attempt = 0; attempt < 3; attempt++) {
      try {
        await this.db
          .insert(readGeneration)
          .values({ id: 1, generation: 1 })
          .onDuplicateKeyUpdate({ set: { generation: sql`${readGeneration.generation} + 1` } });
        return;
      } catch {
        // A busy moment (lock wait, lost connection): try again; if the row never moves, the other processes
        // still drop their entries within maxAgeMs.
        await new Promise((r) => setTimeout(r, 20 * (attempt + 1)));
      }
    }
  }

  /** Middleware: a successful API write empties the cache once its answer has gone. */
  invalidateOnWrite: RequestHandler = (req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD')
      res.on('finish', () => {
        if (res.statusCode < 400) void this.written();
      });
    next();
  };

  /** Answers from memory when it can, with 304 for a matching If-None-Match; else computes, keeps and answers. */
  async send(req: Request, res: Response, produce: () => Promise<unknown>) {
    const key = req.originalUrl;
    let entry = this.entries.get(key);
    if (!entry || Date.now() - entry.at > this.opts.maxAgeMs) {
      const started = this.local;
      const body = Buffer.from(JSON.stringify(await produce()));
      entry = { body, etag: `"${createHash('sha1').update(body).digest('base64url')}"`, at: Date.now() };
      // Kept only while the shared generation is known: an answer read while it is not (before the first poll, or
      // while the database is away) cannot be tied to the other processes' writes.
      if (started === this.local && this.shared !== null) {
        if (this.entries.size >= (this.opts.maxEntries ?? 500)) this.entries.clear();
        this.entries.set(key, entry);
      }
    }
    res.set('Cache-Control', PUBLIC_CACHE_CONTROL);
    res.set('ETag', entry.etag);
    // RFC 9110 §13.1.2, weak comparison. Not `req.fresh`: it ignores validators whenever the request says
    // `Cache-Control: no-cache`, which fetch adds to every conditional request; the origin still answers 304.
    const match = req.get('if-none-match');
    if (match && (match.trim() === '*' || match.split(',').some((t) => t.trim().replace(/^W\//, '') === entry.etag)))
      return void res.status(304).end();
    res.type('application/json').send(entry.body);
  }
}
