import express from 'express';
import expressStaticGzip from 'express-static-gzip';
import path from 'node:path';
import { notFound } from './errors';

/** The build holds each text file also as .br and .gz; brotli goes out when the browser takes it, else gzip. */
const precompressed: expressStaticGzip.ExpressStaticGzipOptions = {
  enableBrotli: true,
  orderPreference: ['br', 'gzip'],
  index: false,
};

/**
 * Serves the built client from `dist`: hashed files under /assets for a year, everything else (index.html, the
 * favicon, robots.txt) revalidated on every use, and index.html for any other page address.
 */
export function clientFiles(dist: string): express.Router {
  const router = express.Router();
  // A hashed file name changes with its content, so a browser may keep the file without asking again.
  router.use(
    '/assets',
    expressStaticGzip(path.join(dist, 'assets'), {
      ...precompressed,
      serveStatic: { index: false, immutable: true, maxAge: '1y' },
    }),
    (_req, _res, next) => next(notFound('That file')),
  );
  const unhashed = expressStaticGzip(dist, {
    ...precompressed,
    serveStatic: {
      index: false,
      cacheControl: false,
      setHeaders: (res) => res.setHeader('Cache-Control', 'no-cache'),
    },
  });
  router.use(unhashed);
  router.use((req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    req.url = '/index.html';
    unhashed(req, res, next);
  });
  return router;
}
