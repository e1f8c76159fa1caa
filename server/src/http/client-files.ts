import express from 'express';
import expressStaticGzip from 'express-static-gzip';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import { notFound } from './errors';
import { chosenLanguageCookie, hintTags, pageHints, wordless, type Manifest } from './page-hints';
import { acceptLanguageTags, pickLanguage } from '../../../shared/i18n/languages';

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
  let built: { html: string; manifest: Manifest } | null | undefined;
  const readBuild = () => {
    try {
      built ??= {
        html: readFileSync(path.join(dist, 'index.html'), 'utf8'),
        manifest: JSON.parse(readFileSync(path.join(dist, '.vite/manifest.json'), 'utf8')) as Manifest,
      };
    } catch {
      built = null;
    }
    return built;
  };
  router.use((req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    const hints = pageHints(req.path, new URLSearchParams(req.url.split('?')[1] ?? ''), Date.now());
    const build = hints && readBuild();
    if (!hints || !build) {
      req.url = '/index.html';
      return unhashed(req, res, next);
    }
    // A public landing page: index.html that also names its screen's chunks and API reads, compressed on the way.
    // The page starts in the language it will show: ?lang= first, then the choice kept on the device (its cookie),
    // then Accept-Language.
    const query = new URLSearchParams(req.url.split('?')[1] ?? '').get('lang');
    const browser = acceptLanguageTags(req.get('accept-language'));
    const lang = pickLanguage([query, chosenLanguageCookie(req.get('cookie')), ...browser]);
    // An early read goes out with the browser's Accept-Language and the app takes its answer as it is: when the page
    // will show another language, only the reads that hold no words are worth starting early.
    const early = lang === pickLanguage(browser) ? hints : { ...hints, fetches: hints.fetches.filter(wordless) };
    const html = Buffer.from(
      build.html
        .replace('<html lang="en">', `<html lang="${lang}">`)
        .replace('</head>', `  ${hintTags(build.manifest, early)}\n  </head>`),
    );
    // Brotli first when the browser takes both (as the static files do).
    const encoding = req.acceptsEncodings('br') ? 'br' : req.acceptsEncodings('gzip');
    res.set({
      'Content-Type': 'text/html; charset=utf-8',
      'Cache-Control': 'no-cache',
      Vary: 'Accept-Encoding, Accept-Language, Cookie',
    });
    if (encoding === 'br') {
      res.set('Content-Encoding', 'br');
      return res.send(brotliCompressSync(html, { params: { [constants.BROTLI_PARAM_QUALITY]: 5 } }));
    }
    if (encoding === 'gzip') {
      res.set('Content-Encoding', 'gzip');
      return res.send(gzipSync(html));
    }
    res.send(html);
  });
  return router;
}
