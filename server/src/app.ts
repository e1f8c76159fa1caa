import express from 'express';
import helmet from 'helmet';
import { csrfSync } from 'csrf-sync';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { AppContext } from './context';
import { authRoutes, signIn } from './auth/routes';
import { loadUser } from './auth/guards';
import { sessionMiddleware } from './auth/session';
import { apiNotFound, errorHandler } from './http/errors';
import { publicRoutes } from './features/public/routes';
import { groupRoutes } from './features/groups/routes';
import { adminRoutes } from './features/admin/routes';
import { catalogueRoutes } from './features/catalogue/routes';
import { venueRoutes } from './features/venues/routes';
import { eventRoutes } from './features/events/routes';
import { bookingRoutes } from './features/bookings/routes';
import { volunteerRoutes } from './features/volunteers/routes';
import { triageRoutes } from './features/triage/routes';
import { eventDayPublicRoutes, eventDayRoutes } from './features/event-day/routes';
import { impactPublicRoutes, impactRoutes } from './features/impact/routes';
import { toolkitRoutes } from './features/toolkit/routes';

/** Builds the Express app: middleware → routers → 404 → error handler. `listen` is the caller's business. */
export function createApp(ctx: AppContext) {
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
  api.use(express.json({ limit: '100kb' }));
  api.use(express.urlencoded({ extended: false, limit: '100kb' }));
  api.use(publicRoutes(ctx));
  api.use(eventDayPublicRoutes(ctx));
  api.use(impactPublicRoutes(ctx));

  const { middleware: session, store } = sessionMiddleware(ctx.env, ctx.database.pool);
  const { csrfSynchronisedProtection, generateToken } = csrfSync({
    getTokenFromRequest: (req) => req.headers['x-csrf-token'] as string | undefined,
  });
  api.use(session);
  api.use(loadUser(ctx.database.db));
  api.use(csrfSynchronisedProtection);
  const auth = authRoutes(ctx, (req) => generateToken(req));
  api.use('/auth', auth.router);
  api.use(groupRoutes(ctx, (req, id) => signIn(req, ctx, id)));
  api.use(adminRoutes(ctx));
  api.use(catalogueRoutes(ctx));
  api.use(venueRoutes(ctx));
  api.use(eventRoutes(ctx));
  api.use(bookingRoutes(ctx));
  api.use(volunteerRoutes(ctx));
  api.use(triageRoutes(ctx));
  api.use(eventDayRoutes(ctx));
  api.use(impactRoutes(ctx));
  api.use(toolkitRoutes(ctx));
  api.use(apiNotFound);
  app.use('/api', api);

  const dist = path.resolve(ctx.env.CLIENT_DIST);
  if (existsSync(path.join(dist, 'index.html'))) {
    app.use(
      '/assets',
      express.static(path.join(dist, 'assets'), { immutable: true, maxAge: '1y', fallthrough: false }),
    );
    app.use(express.static(dist, { index: false }));
    app.use((req, res, next) => {
      if (req.method !== 'GET' && req.method !== 'HEAD') return next();
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(path.join(dist, 'index.html'));
    });
  }
  app.use(errorHandler((msg, err) => ctx.log(`${msg}: ${(err as Error)?.stack ?? err}`)));

  return {
    app,
    async close() {
      await auth.flush();
      await store.close();
    },
  };
}
