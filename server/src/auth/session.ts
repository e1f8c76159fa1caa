import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import type { Pool } from 'mysql2/promise';
import type { Env } from '../config/env';

declare module 'express-session' {
  interface SessionData {
    userId?: number;
  }
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
  const middleware = session({
    name: 'mendery.sid',
    secret: env.SESSION_SECRET,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: env.TRUST_PROXY ? true : undefined,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      // 'auto' marks the cookie Secure whenever the request came over HTTPS (directly or via a trusted proxy).
      secure: 'auto',
      maxAge: idleMs,
    },
  });
  return { middleware, store: store as unknown as { close(): Promise<void> } };
}
