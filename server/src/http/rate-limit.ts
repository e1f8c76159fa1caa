import type { Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { AppContext } from '../context';
import { HttpError } from './errors';
import { MariadbRateLimitStore } from './rate-limit-store';

/**
 * A limit per source address on a public read that works without a session (a calendar feed): `max` requests in
 * the sign-in window, counted in MariaDB so every app process shares them.
 */
export function publicReadLimiter(ctx: AppContext, name: string, max: number) {
  const minutes = ctx.env.LOGIN_RATE_WINDOW_MINUTES;
  return rateLimit({
    windowMs: minutes * 60_000,
    limit: max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new MariadbRateLimitStore(ctx.database.db, `${name}:`),
    keyGenerator: (req: Request) => ipKeyGenerator(req.ip ?? '0.0.0.0'),
    handler: (_req, _res, next) =>
      next(new HttpError(429, 'rate-limited', `Too many requests. Wait ${minutes} minutes and try again.`)),
  });
}
