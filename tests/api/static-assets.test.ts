import http from 'node:http';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import robotsParser from 'robots-parser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../server/src/server';
import { createTestDatabase, type TestDatabase } from '../support/db';
import { startTestServer } from '../support/server';

const dist = path.resolve('dist/client');

let db: TestDatabase;
let server: RunningServer;
beforeAll(async () => {
  db = await createTestDatabase();
  server = await startTestServer(db.url);
});
afterAll(async () => {
  await server.stop();
  await db.drop();
});

/** A plain GET that sends exactly the headers given (fetch would add its own Accept-Encoding and decode). */
function get(url: string, headers: Record<string, string> = {}) {
  return new Promise<{ status: number; headers: http.IncomingHttpHeaders; body: Buffer }>((resolve, reject) => {
    http
      .get(server.url + url, { headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => resolve({ status: res.statusCode!, headers: res.headers, body: Buffer.concat(chunks) }));
      })
      .on('error', reject);
  });
}

async function builtHtml() {
  return (await get('/', { 'accept-encoding': 'identity' })).body.toString('utf8');
}

async function mainScript() {
  const html = await builtHtml();
  const scripts = [...html.matchAll(/<script type="module" crossorigin src="([^"]+)"/g)].map((m) => m[1]);
  // The early start of the reader's language runs first (module scripts run in the order written), then the entry.
  expect(scripts).toHaveLength(2);
  expect(scripts[0]).toMatch(/^\/assets\/early-language-[\w-]+\.js$/);
  const src = scripts[1];
  expect(src).toMatch(/^\/assets\/index-[\w-]+\.js$/);
  return src;
}

describe('Static files for a phone on mobile data', () => {
  it('sends a script as brotli when the browser takes it, as gzip when it only takes gzip, and plain otherwise', async () => {
    const src = await mainScript();
    const onDisk = readFileSync(path.join(dist, src));

    const br = await get(src, { 'accept-encoding': 'gzip, deflate, br, zstd' });
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['content-type']).toMatch(/^(text|application)\/javascript/);
    expect(br.headers.vary).toMatch(/Accept-Encoding/i);
    expect(br.body.length).toBeLessThan(onDisk.length / 2);
    expect(brotliDecompressSync(br.body).equals(onDisk)).toBe(true);

    const gz = await get(src, { 'accept-encoding': 'gzip' });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.headers.vary).toMatch(/Accept-Encoding/i);
    expect(gunzipSync(gz.body).equals(onDisk)).toBe(true);

    for (const accept of [undefined, 'identity', 'deflate']) {
      const plain = await get(src, accept ? { 'accept-encoding': accept } : {});
      expect(plain.headers['content-encoding'], `Accept-Encoding: ${accept}`).toBeUndefined();
      expect(plain.headers.vary).toMatch(/Accept-Encoding/i);
      expect(plain.body.equals(onDisk)).toBe(true);
    }
  });

  it('compresses the stylesheet and the page itself too', async () => {
    const html = await builtHtml();
    const css = /<link rel="stylesheet" crossorigin href="([^"]+)"/.exec(html)![1];
    const r = await get(css, { 'accept-encoding': 'br' });
    expect(r.headers['content-encoding']).toBe('br');
    expect(r.headers['content-type']).toMatch(/^text\/css/);
    expect(brotliDecompressSync(r.body).equals(readFileSync(path.join(dist, css)))).toBe(true);

    for (const url of ['/events', '/admin']) {
      const plain = (await get(url, { 'accept-encoding': 'identity' })).body.toString('utf8');
      const page = await get(url, { 'accept-encoding': 'gzip, br' });
      expect(page.headers['content-encoding'], url).toBe('br');
      expect(page.headers['content-type']).toMatch(/^text\/html/);
      expect(brotliDecompressSync(page.body).toString('utf8'), url).toBe(plain);
      const gz = await get(url, { 'accept-encoding': 'gzip' });
      expect(gz.headers['content-encoding'], url).toBe('gzip');
      expect(gunzipSync(gz.body).toString('utf8'), url).toBe(plain);
    }
  });

  it('names the screen chunks and API reads of a public page in its head, so the browser fetches them beside the entry', async () => {
    const manifest = JSON.parse(readFileSync(path.join(dist, '.vite/manifest.json'), 'utf8')) as Record<
      string,
      { file: string }
    >;
    const head = async (url: string) => (await get(url, { 'accept-encoding': 'identity' })).body.toString('utf8');
    const preloads = (html: string) =>
      [...html.matchAll(/<link rel="modulepreload" crossorigin href="([^"]+)">/g)].map((m) => m[1]);
    const fetches = (html: string) =>
      [...html.matchAll(/<link rel="preload" as="fetch" crossorigin href="([^"]+)">/g)].map((m) =>
        m[1].replaceAll('&amp;', '&'),
      );

    const list = await head('/events');
    expect(preloads(list)).toContain(`/${manifest['src/routes/events/list.tsx'].file}`);
    const [listRead] = fetches(list).filter((u) => u.startsWith('/api/events?'));
    // The same URL the page's code asks for (from a day back, on the hour), so the browser uses the early answer.
    const from = new URL(listRead, server.url).searchParams.get('from')!;
    const hour = 3600_000;
    expect(Date.parse(from)).toBe(Math.floor((Date.now() - 24 * hour) / hour) * hour);
    expect(fetches(list)).toEqual(expect.arrayContaining(['/api/auth/me', '/api/public/groups', '/api/categories']));
    expect((await fetch(server.url + listRead)).status).toBe(200);

    const book = await head('/events/12/book');
    expect(preloads(book)).toContain(`/${manifest['src/routes/events/book.tsx'].file}`);
    expect(fetches(book)).toEqual(['/api/auth/me', '/api/events/12', '/api/categories']);
    expect(fetches(await head('/impact/groups/3'))).toContain('/api/public/impact?groupId=3');
    // The entry's own chunks are not named twice, and a page that is not public gets the plain index.html.
    expect(preloads(list).some((u) => u.includes('/index-'))).toBe(false);
    expect(await head('/admin')).toBe(readFileSync(path.join(dist, 'index.html'), 'utf8'));
    expect(fetches(await head('/events/abc'))).toEqual([]);

    // A visitor who chose German on a browser that asks for English: the page is German, and the reads that hold
    // words are not started early (they would come back in English and be used as they are).
    const chosen = async (url: string, headers: Record<string, string>) =>
      (await get(url, { 'accept-encoding': 'identity', 'accept-language': 'en-GB', ...headers })).body.toString('utf8');
    const german = await chosen('/events/12/book', { cookie: 'other=1; mendery.language=de' });
    expect(german).toMatch(/<html lang="de">/);
    expect(fetches(german)).toEqual(['/api/auth/me']);
    expect(preloads(german)).toContain(`/${manifest['src/routes/events/book.tsx'].file}`);
    expect(fetches(await chosen('/events/12/book', { cookie: 'mendery.language=en' }))).toHaveLength(3);
    const asked = await chosen('/impact', { cookie: 'mendery.language=en' });
    expect(fetches(asked)).toContain('/api/public/impact');
    const french = await chosen('/impact?lang=fr', {});
    expect(french).toMatch(/<html lang="fr">/);
    expect(fetches(french)).toEqual(['/api/auth/me']);
  });

  it('lets browsers keep hashed files for a year and makes them revalidate every page', async () => {
    const asset = await get(await mainScript(), { 'accept-encoding': 'br' });
    expect(asset.headers['cache-control']).toBe('public, max-age=31536000, immutable');

    for (const page of ['/', '/index.html', '/events', '/events/12/book', '/admin', '/no/such/page']) {
      for (const accept of ['br', 'gzip', 'identity']) {
        const r = await get(page, { 'accept-encoding': accept });
        expect(r.status, page).toBe(200);
        expect(r.headers['content-type'], page).toMatch(/^text\/html/);
        expect(r.headers['cache-control'], `${page} (${accept})`).toBe('no-cache');
      }
    }
  });

  it('serves no source map and names none in any script', async () => {
    const scripts = readdirSync(path.join(dist, 'assets')).filter((f) => f.endsWith('.js'));
    expect(scripts.length).toBeGreaterThan(5);
    for (const f of scripts) {
      const r = await get(`/assets/${f}`);
      expect(r.status).toBe(200);
      expect(r.body.toString('utf8'), f).not.toContain('sourceMappingURL');
      const map = await get(`/assets/${f}.map`);
      expect(map.status, `${f}.map`).toBe(404);
    }
    expect(readdirSync(path.join(dist, 'assets')).filter((f) => /\.map(\.|$)/.test(f))).toEqual([]);
    // A missing asset is a plain 404, never the page or a server error.
    expect((await get('/assets/no-such-file-abc123.js')).status).toBe(404);
  });

  it('keeps the build manifest to itself', async () => {
    const r = await get('/.vite/manifest.json');
    expect(r.headers['content-type']).toMatch(/^text\/html/);
  });

  it('serves a robots.txt that opens the public pages and closes the API, admin and private screens', async () => {
    const r = await get('/robots.txt');
    expect(r.status).toBe(200);
    expect(r.headers['content-type']).toMatch(/^text\/plain/);
    const robots = robotsParser(`${server.url}/robots.txt`, r.body.toString('utf8'));
    const allowed = (p: string) => robots.isAllowed(server.url + p, 'AnyBot');
    for (const p of ['/', '/events', '/events/12', '/events/12/book', '/impact', '/impact/groups/3', '/safety'])
      expect(allowed(p), p).toBe(true);
    for (const p of [
      '/api/events',
      '/admin',
      '/admin/mailbox',
      '/desk/12',
      '/bench',
      '/items/40',
      '/me/skills',
      '/groups/3/people',
      '/bookings/T5N-9WZ?token=x',
      '/events/12/manage',
      '/events/12/board',
      '/events/12/live',
    ])
      expect(allowed(p), p).toBe(false);
  });

  it('ships Nunito in latin and latin-ext only, in the weights used, and preloads the body weight', async () => {
    const html = await builtHtml();
    const preload = /<link rel="preload" href="([^"]+)" as="font" type="font\/woff2" crossorigin[^>]*>/.exec(html);
    expect(preload?.[1]).toMatch(/^\/assets\/nunito-latin-400-normal-[\w-]+\.woff2$/);
    const font = await get(preload![1]);
    expect(font.status).toBe(200);
    expect(font.headers['content-type']).toBe('font/woff2');
    expect(font.headers['cache-control']).toContain('immutable');

    const css = (await get(/<link rel="stylesheet" crossorigin href="([^"]+)"/.exec(html)![1])).body.toString('utf8');
    const faces = [...css.matchAll(/@font-face\s*\{([^}]*)\}/g)].map((m) => m[1]);
    const nunito = faces.filter((f) => /font-family:\s*["']?Nunito/.test(f));
    const urls = nunito.flatMap((f) => [...f.matchAll(/url\(([^)]+)\)/g)].map((m) => m[1]));
    const weights = new Set(nunito.map((f) => /font-weight:\s*(\d+)/.exec(f)![1]));
    expect([...weights].sort()).toEqual(['400', '600', '700', '800']);
    expect(urls).toHaveLength(8);
    for (const u of urls) expect(u).toMatch(/\/assets\/nunito-latin(-ext)?-(400|600|700|800)-normal-[\w-]+\.woff2$/);
    expect(urls).toContain(preload![1]);
    // Every face says which characters it covers, so a page in English fetches the latin files alone.
    for (const f of nunito) expect(f).toMatch(/unicode-range:/);
    const fontFiles = readdirSync(path.join(dist, 'assets')).filter((f) => /\.(woff2?|ttf)$/.test(f));
    expect(fontFiles.filter((f) => /cyrillic|vietnamese|greek/.test(f) || !f.endsWith('.woff2'))).toEqual([]);
  });
});
