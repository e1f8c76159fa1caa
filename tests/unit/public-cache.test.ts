import type { Request, Response } from 'express';
import { describe, expect, it } from 'vitest';
import type { Db } from '../../server/src/db/client';
import { PublicReadCache } from '../../server/src/http/public-cache';

/**
 * The in-memory cache of public reads must never keep an answer it cannot tie to the shared write counter
 * (docs/decisions/009-public-read-cache.md). A fake database stands in for MariaDB: its `read_generation` value and
 * its failures are set by the test.
 */
function fakeDb() {
  const state = { generation: 1, failing: false };
  const db = {
    select: () => ({
      from: () => ({
        where: () =>
          state.failing ? Promise.reject(new Error('connection lost')) : Promise.resolve([{ g: state.generation }]),
      }),
    }),
  } as unknown as Db;
  return { db, state };
}

function call(cache: PublicReadCache, produce: () => Promise<unknown>) {
  const req = { originalUrl: '/api/events', get: () => undefined } as unknown as Request;
  let body = '';
  const res = {
    set: () => res,
    status: () => res,
    end: () => res,
    type: () => res,
    send: (b: Buffer) => ((body = b.toString()), res),
  } as unknown as Response;
  return cache.send(req, res, produce).then(() => body);
}

describe('public read cache', () => {
  it('drops an answer kept before the first read of the shared counter once that read lands', async () => {
    const { db, state } = fakeDb();
    const cache = new PublicReadCache(db, { pollMs: 250, maxAgeMs: 60_000 });
    let free = 12;
    const produce = async () => ({ free });
    expect(await call(cache, produce)).toBe('{"free":12}');
    free = 11; // another process books and moves the counter before this one has ever read it
    state.generation = 2;
    await cache.poll();
    expect(await call(cache, produce)).toBe('{"free":11}');
  });

  it('drops what it kept while the database was away, at the next good read', async () => {
    const { db, state } = fakeDb();
    const cache = new PublicReadCache(db, { pollMs: 250, maxAgeMs: 60_000 });
    await cache.poll();
    state.failing = true;
    await cache.poll();
    let free = 12;
    const produce = async () => ({ free });
    expect(await call(cache, produce)).toBe('{"free":12}');
    free = 11;
    state.generation = 2;
    state.failing = false;
    await cache.poll();
    expect(await call(cache, produce)).toBe('{"free":11}');
  });

  it('answers from memory once the counter is known and nothing moved', async () => {
    const { db } = fakeDb();
    const cache = new PublicReadCache(db, { pollMs: 250, maxAgeMs: 60_000 });
    await cache.poll();
    let calls = 0;
    const produce = async () => ({ n: ++calls });
    await call(cache, produce);
    await cache.poll();
    expect(await call(cache, produce)).toBe('{"n":1}');
    expect(calls).toBe(1);
  });

  it('moves the shared counter after every write, and once for all the writes that finish during a move', async () => {
    // Each move of the `read_generation` row waits until the test lets it end.
    const moves: { startedAfter: number; end: () => void }[] = [];
    let writes = 0;
    const db = {
      insert: () => ({
        values: () => ({
          onDuplicateKeyUpdate: () =>
            new Promise<void>((end) => moves.push({ startedAfter: writes, end: () => end() })),
        }),
      }),
    } as unknown as Db;
    const cache = new PublicReadCache(db, { pollMs: 0, maxAgeMs: 60_000 });
    const write = () => {
      writes++;
      return cache.written();
    };
    const first = write();
    await Promise.resolve();
    await Promise.resolve();
    expect(moves).toHaveLength(1);
    // A burst of 20 writes while the first move is under way: none may be left without a move that starts after it.
    const burst = Array.from({ length: 20 }, write);
    moves[0].end();
    await first;
    await new Promise((r) => setTimeout(r, 0));
    expect(moves).toHaveLength(2);
    expect(moves[1].startedAfter).toBe(21);
    moves[1].end();
    await Promise.all(burst);
    expect(moves).toHaveLength(2);
    // A write after everything settled starts its own move.
    const last = write();
    await new Promise((r) => setTimeout(r, 0));
    expect(moves).toHaveLength(3);
    moves[2].end();
    await last;
  });
});
