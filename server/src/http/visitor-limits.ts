import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { AppContext } from '../context';
import { HttpError } from './errors';
import { MariadbRateLimitStore } from './rate-limit-store';

/** The e-mail address a visitor's form names, folded to lower case; undefined when it names none. */
export const visitorEmailOf = (req: Request): string | undefined => {
  const b = req.body as { visitor?: { email?: unknown }; email?: unknown } | undefined;
  const e = b?.visitor?.email ?? b?.email;
  return typeof e === 'string' && e.trim() ? e.trim().toLowerCase() : undefined;
};

/**
 * Limits on an anonymous form that writes and sends mail (a booking, a waiting-list place, a fresh link): `perAddress`
 * requests per source address and `perEmail` per e-mail address in the sign-in window, counted in MariaDB so every
 * app process shares them. Routes that give the same `name` share one count.
 */
export function visitorLimits(
  ctx: AppContext,
  name: string,
  limits: { perAddress: number; perEmail: number },
): RequestHandler[] {
  const minutes = ctx.env.LOGIN_RATE_WINDOW_MINUTES;
  const common = {
    windowMs: minutes * 60_000,
    standardHeaders: 'draft-8' as const,
    legacyHeaders: false,
  };
  return [
    rateLimit({
      ...common,
      limit: limits.perAddress,
      store: new MariadbRateLimitStore(ctx.database.db, `${name}-ip:`),
      keyGenerator: (req: Request) => ipKeyGenerator(req.ip ?? '0.0.0.0'),
      handler: (_req, _res, next) =>
        next(
          new HttpError(
            429,
            'rate-limited',
            `Too many requests from this connection. Wait ${minutes} minutes and try again.`,
          ),
        ),
    }),
    rateLimit({
      ...common,
      limit: limits.perEmail,
      store: new MariadbRateLimitStore(ctx.database.db, `${name}-email:`),
      skip: (req: Request) => visitorEmailOf(req) === undefined,
      keyGenerator: (req: Request) => visitorEmailOf(req)!,
      handler: (_req, _res, next) =>
        next(
          new HttpError(
            429,
            'rate-limited',
            `Too many requests for this e-mail address. Wait ${minutes} minutes and try again.`,
          ),
        ),
    }),
  ];
}
