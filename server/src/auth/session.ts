import type { RequestHandler } from 'express';
import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import type { Pool } from 'mysql2/promise';
import type { Env } from '../config/env';
import { redactUrl } from '../http/redact';

declare module 'express-session' {
  interface SessionData {
    userId?: number;
    /** Milliseconds since the epoch at sign-in: the absolute lifetime counts from here, whatever `rolling` does. */
    signedInAt?: number;
    /** Password right, code still to come (two-step sign-in): who, since when, and how many wrong codes so far. */
    pendingUserId?: number;
    pendingAt?: number;
    pendingTries?: number;
  }
}

/** `__Host-` makes the browser refuse the cookie unless it is Secure, has Path=/ and no Domain (RFC 6265bis 4.1.3.2). */
export const sessionCookie = (env: Env) => ({
  name: env.hostPrefixCookie ? '__Host-mendery.sid' : 'mendery.sid',
  options: {
    httpOnly: true,
    sameSite: 'lax' as const,
    path: '/',
    // 'auto' marks the cookie Secure whenever the request came over HTTPS (directly or via a trusted proxy).
    secure: env.hostPrefixCookie ? true : ('auto' as const),
  },
});

/** A sign-in is over after `SESSION_ABSOLUTE_HOURS`, however active; one with no sign-in time is over too. */
export function signInExpired(signedInAt: unknown, absoluteHours: number, now: number): boolean {
  return typeof signedInAt !== 'number' || now - signedInAt >= absoluteHours * 3600_000 || signedInAt > now + 60_000;
}

/**
 * Sessions live in MariaDB so any app process can serve any request. The cookie's maxAge is the idle timeout:
 * `rolling` renews it on every response, so a session ends after that long without a request.
 */
export function sessionMiddleware(env: Env, pool: Pool, log: (line: string) => void = () => {}) {
  const MySQLStore = MySQLStoreFactory(session as never);
  const idleMs = env.SESSION_IDLE_MINUTES * 60_000;
  const store = new MySQLStore(
    {
      createDatabaseTable: false,
      clearExpired: true,
      checkExpirationInterval: 15 * 60_000,
      expiration: idleMs,
      schema: { tableName: 'sessions', columnNames: { session_id: 'session_id', expires: 'expires', data: 'data' } },
    },
    pool as never,
  );
  // The store clears expired rows on a timer and rethrows a failure, which would end the process while the
  // database is away: the next pass clears them instead.
  const timed = store as unknown as { clearExpiredSessions(): Promise<void> };
  const clearExpired = timed.clearExpiredSessions.bind(store);
  timed.clearExpiredSessions = () => clearExpired().catch(() => undefined);
  const cookie = sessionCookie(env);
  const inner = session({
    name: cookie.name,
    secret: env.SESSION_SECRET,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: env.TRUST_PROXY ? true : undefined,
    cookie: { ...cookie.options, maxAge: idleMs },
  });
  // The session is saved or touched while the answer is being sent, and a store failure then reaches `next` after
  // the answer has gone: passed on, it would skip the error handler and make Express destroy the keep-alive socket,
  // failing the client's next request on it. The answer stands; the failure is only logged.
  const middleware: RequestHandler = (req, res, next) =>
    inner(req, res, (err?: unknown) => {
      if (err && res.headersSent) {
        log(
          `session store failed after the answer to ${req.method} ${redactUrl(req.originalUrl)}: ${(err as Error)?.message}`,
        );
        return;
      }
      next(err);
    });
  return { middleware, store: store as unknown as { close(): Promise<void> } };
}
