import { Router, type Request } from 'express';
import { rateLimit, ipKeyGenerator } from 'express-rate-limit';
import {
  accountLanguageSchema,
  changePasswordSchema,
  firstAdminSchema,
  loginSchema,
  resetConfirmSchema,
  resetRequestSchema,
  signupSchema,
  tokenSchema,
  totpCodeSchema,
  turnOffTwoFactorSchema,
} from '../../../shared/schemas/auth';
import type { AppContext } from '../context';
import { HttpError } from '../http/errors';
import { publicReadLimiter } from '../http/rate-limit';
import { MariadbRateLimitStore } from '../http/rate-limit-store';
import { body } from '../http/validate';
import * as auth from './service';
import { loadSessionUser, setAccountLanguage } from './queries';
import { requireAdmin, requireUser } from './guards';
import * as twoFactor from './two-factor';
import { sessionCookie } from './session';
import { createFirstAdmin } from './setup';
import { languageOf, translate } from '../i18n';

const regenerate = (req: Request) =>
  new Promise<void>((res, rej) => req.session.regenerate((e) => (e ? rej(e) : res())));
const save = (req: Request) => new Promise<void>((res, rej) => req.session.save((e) => (e ? rej(e) : res())));

export async function signIn(req: Request, ctx: AppContext, userId: number) {
  // A new session id at sign-in defeats session fixation; it also drops the old CSRF token.
  await regenerate(req);
  req.session.userId = userId;
  req.session.signedInAt = Date.now();
  await save(req);
  return loadSessionUser(ctx.database.db, userId);
}

/** A password accepted for a two-step sign-in waits this long for its code, and takes this many wrong ones. */
const PENDING_MS = 5 * 60_000;
const PENDING_TRIES = 5;

/** The per-source budget for auth POSTs; invitation sign-ups use it too, so both count against one figure. */
export const authPostLimiter = (ctx: AppContext) => publicReadLimiter(ctx, 'auth-ip', ctx.env.AUTH_RATE_MAX);

function limiter(
  ctx: AppContext,
  stores: MariadbRateLimitStore[],
  name: string,
  max: number,
  key: (req: Request) => string,
  skipSuccessfulRequests = false,
) {
  const store = new MariadbRateLimitStore(ctx.database.db, `${name}:`);
  stores.push(store);
  return rateLimit({
    windowMs: ctx.env.LOGIN_RATE_WINDOW_MINUTES * 60_000,
    limit: max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests,
    store,
    keyGenerator: key,
    handler: (_req, _res, next) =>
      next(
        new HttpError(
          429,
          'rate-limited',
          `Too many attempts. Wait ${ctx.env.LOGIN_RATE_WINDOW_MINUTES} minutes and try again.`,
        ),
      ),
  });
}

export function authRoutes(ctx: AppContext, csrfToken: (req: Request) => string) {
  const r = Router();
  const stores: MariadbRateLimitStore[] = [];
  const ip = (req: Request) => ipKeyGenerator(req.ip ?? '0.0.0.0');
  const emailOf = (req: Request) =>
    String(req.body?.email ?? '')
      .trim()
      .toLowerCase()
      .slice(0, 254);
  // Failed sign-ins count per address and source, and more loosely per source alone (password spraying).
  const loginPerAccount = limiter(
    ctx,
    stores,
    'login',
    ctx.env.LOGIN_RATE_MAX,
    (req) => `${ip(req)}|${emailOf(req)}`,
    true,
  );
  const loginPerSource = limiter(ctx, stores, 'login-ip', ctx.env.LOGIN_RATE_MAX * 5, ip, true);
  const mailLinks = limiter(ctx, stores, 'mail-link', ctx.env.LOGIN_RATE_MAX, (req) => `${ip(req)}|${emailOf(req)}`);
  // Every auth POST but signing out counts against one budget per source address, whatever the e-mail: each may
  // cost a password hash, and a script that varies the address must not get more of them.
  const perSource = authPostLimiter(ctx);
  r.use((req, res, next) => (req.method === 'POST' && req.path !== '/logout' ? perSource(req, res, next) : next()));

  r.get('/csrf', (req, res) => {
    res.json({ token: csrfToken(req) });
  });

  r.post('/login', loginPerSource, loginPerAccount, async (req, res) => {
    const input = body(req, loginSchema);
    const userId = await auth.authenticate(ctx, input);
    if (!(await twoFactor.needsCode(ctx, userId))) return void res.json({ user: await signIn(req, ctx, userId) });
    // The password was right, but the session stays signed out until the code is: a new session holds who it is.
    await regenerate(req);
    Object.assign(req.session, { pendingUserId: userId, pendingAt: Date.now(), pendingTries: 0 });
    await save(req);
    res.json({ user: null, needsCode: true });
  });

  // Wrong codes count per source (with failed passwords) and per account across sources; 5 per password entry.
  const codesPerAccount = limiter(
    ctx,
    stores,
    'login-code',
    ctx.env.LOGIN_RATE_MAX,
    (req) => (req.session?.pendingUserId ? `user:${req.session.pendingUserId}` : ip(req)),
    true,
  );
  r.post('/login/code', loginPerSource, codesPerAccount, async (req, res) => {
    const { code } = body(req, totpCodeSchema);
    const { pendingUserId, pendingAt, pendingTries = 0 } = req.session;
    if (!pendingUserId || !pendingAt || Date.now() - pendingAt > PENDING_MS || pendingTries >= PENDING_TRIES) {
      delete req.session.pendingUserId;
      throw new HttpError(400, 'sign-in-again', 'Sign in again: enter your e-mail and password first.');
    }
    try {
      await twoFactor.takeCode(ctx, pendingUserId, code, 401);
    } catch (err) {
      req.session.pendingTries = pendingTries + 1;
      await save(req);
      throw err;
    }
    res.json({ user: await signIn(req, ctx, pendingUserId) });
  });

  r.get('/two-factor', requireUser, async (req, res) => {
    res.json(await twoFactor.twoFactorStatus(ctx, req.user!.id));
  });

  r.post('/two-factor/setup', requireAdmin, async (req, res) => {
    res.json(await twoFactor.startSetup(ctx, req.user!.id));
  });

  r.post('/two-factor/enable', requireAdmin, loginPerSource, async (req, res) => {
    await twoFactor.confirmSetup(ctx, req.user!.id, body(req, totpCodeSchema).code, languageOf(req, res.locals));
    res.json({ enabled: true, message: translate(languageOf(req, res.locals), 'account.server.twoStepOn') });
  });

  r.post('/two-factor/disable', requireUser, loginPerSource, async (req, res) => {
    await twoFactor.turnOff(ctx, req.user!.id, body(req, turnOffTwoFactorSchema), languageOf(req, res.locals));
    res.json({ enabled: false, message: translate(languageOf(req, res.locals), 'account.server.twoStepOff') });
  });

  // Signed out is an answer, not an error: a 401 here would log in every anonymous visitor's console.
  r.get('/me', (req, res) => {
    res.json({ user: req.user ?? null });
  });

  // The language picker of a signed-in person: the account keeps the choice for their next device.
  r.put('/me/language', requireUser, async (req, res) => {
    const { language } = body(req, accountLanguageSchema);
    await setAccountLanguage(ctx.database.db, req.user!.id, language);
    res.json({ language });
  });

  r.post('/logout', (req, res, next) => {
    req.session.destroy((err) => {
      if (err) return next(err);
      const cookie = sessionCookie(ctx.env);
      res.clearCookie(cookie.name, { ...cookie.options, secure: ctx.env.hostPrefixCookie });
      res.status(204).end();
    });
  });

  r.post('/signup', mailLinks, async (req, res) => {
    await auth.signup(ctx, body(req, signupSchema), languageOf(req, res.locals));
    res.status(202).json({ message: translate(languageOf(req, res.locals), 'account.server.signup') });
  });

  r.post('/verify-email', async (req, res) => {
    await auth.verifyEmail(ctx, body(req, tokenSchema).token);
    res.json({ message: translate(languageOf(req, res.locals), 'account.server.verified') });
  });

  r.post('/password-reset', mailLinks, async (req, res) => {
    await auth.requestPasswordReset(ctx, body(req, resetRequestSchema).email, languageOf(req, res.locals));
    res.status(202).json({ message: translate(languageOf(req, res.locals), 'account.server.resetSent') });
  });

  r.post('/password-reset/confirm', async (req, res) => {
    const input = body(req, resetConfirmSchema);
    await auth.confirmPasswordReset(ctx, input.token, input.password);
    res.json({ message: translate(languageOf(req, res.locals), 'account.server.resetDone') });
  });

  // A wrong current password counts as a failed sign-in from that source.
  r.post('/password', requireUser, loginPerSource, async (req, res) => {
    const input = body(req, changePasswordSchema);
    await auth.changePassword(ctx, req.user!.id, req.sessionID, input, languageOf(req, res.locals));
    res.json({ message: translate(languageOf(req, res.locals), 'account.server.passwordChanged') });
  });

  r.post('/first-admin', async (req, res) => {
    const input = body(req, firstAdminSchema);
    const id = await createFirstAdmin(ctx, input);
    res.status(201).json({ user: await signIn(req, ctx, id) });
  });

  return { router: r, flush: () => Promise.all(stores.map((s) => s.flush())) };
}
