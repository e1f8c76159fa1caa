import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import type { Pool } from 'mysql2/promise';
import type { Env } from '../config/env';

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
export function sessionMiddleware(env: Env, pool: Pool) {
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
  const cookie = sessionCookie(env);
  const middleware = session({
    name: cookie.name,
    secret: env.SESSION_SECRET,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: env.TRUST_PROXY ? true : undefined,
    cookie: { ...cookie.options, maxAge: idleMs },
  });
  return { middleware, store: store as unknown as { close(): Promise<void> } };
}
