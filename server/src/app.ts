import express from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { AppContext } from './context';
import { authRoutes } from './auth/routes';
import { loadUser } from './auth/guards';
import { csrfProtection } from './auth/csrf';
import { sessionMiddleware } from './auth/session';
import { apiNotFound, errorHandler, wellFormedText } from './http/errors';
import { clientFiles } from './http/client-files';
import { FEATURES } from './features';
import { languageMiddleware, loadTranslations } from './i18n';

/** Builds the Express app: middleware → routers → 404 → error handler. `listen` is the caller's business. */
export function createApp(ctx: AppContext) {
  loadTranslations();
  const app = express();
  app.disable('x-powered-by');
  if (ctx.env.TRUST_PROXY) {
    const v = ctx.env.TRUST_PROXY;
    app.set('trust proxy', /^\d+$/.test(v) ? Number(v) : v === 'true' ? true : v);
  }
  const headers = (embed: boolean) =>
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'", 'data:'],
          // The desk's QR reader decodes in a worker it starts from a blob URL.
          workerSrc: ["'self'", 'blob:'],
          connectSrc: ["'self'"],
          frameSrc: ["'self'"],
          // The impact widget is made to sit in an iframe on a group's own website; nothing else may be framed.
          frameAncestors: embed ? ['*'] : ["'self'"],
          upgradeInsecureRequests: null,
        },
      },
      frameguard: embed ? false : { action: 'sameorigin' },
      // HSTS only means something over HTTPS, which a reverse proxy provides in production.
      strictTransportSecurity: ctx.env.NODE_ENV === 'production',
    });
  const pageHeaders = headers(false);
  const embedHeaders = headers(true);
  app.use((req, res, next) => (req.path.startsWith('/embed/') ? embedHeaders : pageHeaders)(req, res, next));

  const api = express.Router();
  // API answers hold personal data unless a route says otherwise (public reads set their own caching).
  api.use((_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  api.use(languageMiddleware);
  api.use(express.json({ limit: '100kb' }));
  api.use(express.urlencoded({ extended: false, limit: '100kb' }));
  api.use(wellFormedText);
  api.use(ctx.publicCache.invalidateOnWrite);
  for (const f of FEATURES) if (f.publicRoutes) api.use(f.publicRoutes(ctx));

  const { middleware: session, store } = sessionMiddleware(ctx.env, ctx.database.pool, ctx.log);
  const { csrfSynchronisedProtection, token: csrfToken } = csrfProtection(ctx.env.SESSION_SECRET);
  api.use(session);
  api.use(loadUser(ctx.database.db, ctx.env.SESSION_ABSOLUTE_HOURS));
  api.use(csrfSynchronisedProtection);
  const auth = authRoutes(ctx, csrfToken);
  api.use('/auth', auth.router);
  for (const f of FEATURES) if (f.routes) api.use(f.routes(ctx));
  api.use(apiNotFound);
  app.use('/api', api);

  const dist = path.resolve(ctx.env.CLIENT_DIST);
  if (existsSync(path.join(dist, 'index.html'))) app.use(clientFiles(dist));
  // Drizzle wraps the driver's error: its code and number are in the cause, which the stack does not show.
  const causeOf = (err: unknown) => {
    const c = (err as { cause?: { code?: string; errno?: number; message?: string } })?.cause;
    return c ? `\n  cause: ${c.code ?? ''} ${c.errno ?? ''} ${c.message ?? ''}` : '';
  };
  app.use(errorHandler((msg, err) => ctx.log(`${msg}: ${(err as Error)?.stack ?? err}${causeOf(err)}`)));

  return {
    app,
    async close() {
      await auth.flush();
      await store.close();
    },
  };
}
