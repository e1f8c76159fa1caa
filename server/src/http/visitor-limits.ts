import type { Request, RequestHandler, Response } from 'express';
import { ipKeyGenerator } from 'express-rate-limit';
import type { AppContext } from '../context';
import { mailAllowance, MAIL_KEY_PREFIX, MAIL_WINDOW_MS } from '../mail/allowance';
import { HttpError } from './errors';
import { countHits, storedKey } from './rate-limit-store';

/** The e-mail address a visitor's form names, folded to lower case; undefined when it names none. */
export const visitorEmailOf = (req: Request): string | undefined => {
  const b = req.body as { visitor?: { email?: unknown }; email?: unknown } | undefined;
  const e = b?.visitor?.email ?? b?.email;
  return typeof e === 'string' && e.trim() ? e.trim().toLowerCase() : undefined;
};

/** The request's mail as its limits counted it: within the address's hourly allowance or not, and how to give it
 * back when no mail comes of the request (once, however often it is called). */
export interface CountedMail {
  within: boolean;
  giveBack: () => Promise<void>;
}
export const countedMail = (res: Response): CountedMail | undefined => res.locals.countedMail;

/**
 * Limits on an anonymous form that writes and sends mail (a booking, a waiting-list place, a fresh link): `perAddress`
 * requests per source address and `perEmail` per e-mail address in the sign-in window, counted in MariaDB so every
 * app process shares them. Routes that give the same `name` share one count. Both counts (and, with `countsMail`, the
 * address's hourly mail allowance of mail/allowance.ts) move in one statement; the handler then finds the mail's
 * verdict with `countedMail(res)` and gives the mail back if none is sent, a refused form included. Answers with the IETF draft's RateLimit
 * headers for the address's count, and Retry-After on a refusal.
 */
export function visitorLimits(
  ctx: AppContext,
  name: string,
  limits: { perAddress: number; perEmail: number },
  opts: { countsMail?: boolean } = {},
): RequestHandler[] {
  const minutes = ctx.env.LOGIN_RATE_WINDOW_MINUTES;
  const windowMs = minutes * 60_000;
  const refuse = (res: Response, resetTime: Date, what: 'connection' | 'e-mail address') => {
    res.setHeader('Retry-After', String(Math.max(1, Math.ceil((resetTime.getTime() - Date.now()) / 1000))));
    return new HttpError(
      429,
      'rate-limited',
      what === 'connection'
        ? `Too many requests from this connection. Wait ${minutes} minutes and try again.`
        : `Too many requests for this e-mail address. Wait ${minutes} minutes and try again.`,
    );
  };
  const handler: RequestHandler = async (req, res, next) => {
    const email = visitorEmailOf(req);
    const hits = [{ key: storedKey(`${name}-ip:`, ipKeyGenerator(req.ip ?? '0.0.0.0')), windowMs }];
    if (email) hits.push({ key: storedKey(`${name}-email:`, email), windowMs });
    const mail = Boolean(email && opts.countsMail);
    if (mail) hits.push({ key: storedKey(MAIL_KEY_PREFIX, email!), windowMs: MAIL_WINDOW_MS });
    const [address, byEmail, mails] = await countHits(ctx.database.db, hits);
    const reset = Math.max(0, Math.ceil((address.resetTime.getTime() - Date.now()) / 1000));
    res.setHeader('RateLimit-Policy', `"${name}";q=${limits.perAddress};w=${windowMs / 1000}`);
    res.setHeader('RateLimit', `"${name}";r=${Math.max(0, limits.perAddress - address.totalHits)};t=${reset}`);
    let refusal: HttpError | null = null;
    if (address.totalHits > limits.perAddress) refusal = refuse(res, address.resetTime, 'connection');
    else if (byEmail && byEmail.totalHits > limits.perEmail) refusal = refuse(res, byEmail.resetTime, 'e-mail address');
    if (refusal) {
      // No mail comes of a refused request: its count goes back at once.
      if (mail) await mailAllowance(ctx).giveBack(email!);
      return next(refusal);
    }
    if (mail) {
      let given = false;
      const counted: CountedMail = {
        within: mails.totalHits <= ctx.env.VISITOR_MAIL_MAX_PER_HOUR,
        giveBack: async () => {
          if (given) return;
          given = true;
          await mailAllowance(ctx).giveBack(email!);
        },
      };
      res.locals.countedMail = counted;
    }
    next();
  };
  return [handler];
}
