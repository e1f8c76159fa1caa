import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { compression } from 'vite-plugin-compression2';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { compileCatalog, mergeNamespaces, type RawCatalog } from './shared/i18n/catalog.js';
import { LANGUAGES } from './shared/i18n/languages.js';
import { ON_DEMAND_NAMESPACES, SERVER_ONLY_NAMESPACES } from './shared/i18n/namespaces.js';
import { PSEUDO_LANGUAGE, pseudoText } from './shared/i18n/pseudo.js';

/**
 * The message catalogs for the browser: `virtual:mendery-catalogs` exports one loader per language (`catalogs`), each
 * a chunk of its own with that language's messages precompiled (so Lingui's compiler never ships);
 * `virtual:mendery-catalogs-on-demand` exports one loader per language and on-demand namespace (`onDemand`). The server's own namespaces
 * (shared/i18n/namespaces.ts) stay out. The pseudo-locale is English run through pseudoText.
 */
function catalogs(): Plugin {
  const dir = path.resolve('locales');
  const onDemand = new Set<string>(ON_DEMAND_NAMESPACES);
  const leftOut = new Set([...SERVER_ONLY_NAMESPACES, ...ON_DEMAND_NAMESPACES]);
  const list = 'virtual:mendery-catalogs';
  // The on-demand loaders are a module of their own, fetched with the first page that needs one: not in the entry.
  const byNamespaceList = 'virtual:mendery-catalogs-on-demand';
  const one = 'virtual:mendery-catalog/';
  /** The language's first chunk (no namespace) or one on-demand namespace. */
  const read = (lang: string, only?: string) => {
    const files: Record<string, RawCatalog> = {};
    for (const f of readdirSync(path.join(dir, lang))
      .filter((f) => f.endsWith('.json'))
      .sort()) {
      const namespace = f.slice(0, -'.json'.length);
      if (only ? namespace === only : !leftOut.has(namespace))
        files[namespace] = JSON.parse(readFileSync(path.join(dir, lang, f), 'utf8'));
    }
    return mergeNamespaces(files);
  };
  return {
    name: 'mendery:catalogs',
    resolveId: (id) => (id === list || id === byNamespaceList || id.startsWith(one) ? `\0${id}` : undefined),
    load(id) {
      const languages = [...LANGUAGES, PSEUDO_LANGUAGE];
      if (id === `\0${list}`) {
        const loaders = languages.map((l) => `${JSON.stringify(l)}: () => import('${one}${l}')`);
        return `export const catalogs = {${loaders.join(',')}};`;
      }
      if (id === `\0${byNamespaceList}`) {
        const byNamespace = languages.map(
          (l) =>
            `${JSON.stringify(l)}: {${ON_DEMAND_NAMESPACES.map((ns) => `${ns}: () => import('${one}${l}/${ns}')`).join(',')}}`,
        );
        return `export const onDemand = {${byNamespace.join(',')}};`;
      }
      if (!id.startsWith(`\0${one}`)) return undefined;
      const [lang, namespace] = id.slice(one.length + 1).split('/');
      if (namespace && !onDemand.has(namespace)) throw new Error(`${namespace} is not an on-demand namespace`);
      for (const l of LANGUAGES) this.addWatchFile(path.join(dir, l));
      const messages =
        lang === PSEUDO_LANGUAGE
          ? compileCatalog(read('en', namespace), pseudoText)
          : compileCatalog(read(lang, namespace));
      return `export const messages = ${JSON.stringify(messages)};`;
    },
  };
}

/** Asks for the body text's face (Nunito 400, latin) with the HTML, instead of after the CSS has arrived. */
function preloadBodyFont(): Plugin {
  let base = '/';
  return {
    name: 'mendery:preload-body-font',
    apply: 'build',
    configResolved(config) {
      base = config.base;
    },
    transformIndexHtml: {
      order: 'post',
      handler(_html, ctx) {
        const file = Object.keys(ctx.bundle ?? {}).find((f) => /nunito-latin-400-normal-[\w-]+\.woff2$/.test(f));
        if (!file) throw new Error('the body font (nunito-latin-400-normal.woff2) is missing from the build');
        const attrs = { rel: 'preload', href: base + file, as: 'font', type: 'font/woff2', crossorigin: '' };
        return [{ tag: 'link', attrs, injectTo: 'head' }];
      },
    },
  };
}

/**
 * Puts the early-language entry (client/src/early-language.ts, a second build input) before the app's entry in
 * index.html: module scripts run in the order they are written, and that one is small, so the reader's language and
 * Lingui are asked for beside the entry instead of after it has run.
 */
function earlyLanguageFirst(): Plugin {
  let base = '/';
  return {
    name: 'mendery:early-language-first',
    apply: 'build',
    configResolved(config) {
      base = config.base;
    },
    transformIndexHtml: {
      order: 'post',
      handler(html, ctx) {
        const chunk = Object.values(ctx.bundle ?? {}).find(
          (c) => c.type === 'chunk' && c.isEntry && c.facadeModuleId?.endsWith('/client/src/early-language.ts'),
        );
        if (!chunk)
          throw new Error('the early-language entry (client/src/early-language.ts) is missing from the build');
        const entry = html.indexOf('<script type="module"');
        if (entry < 0) throw new Error('index.html has no entry script to put the early-language one before');
        const tag = `<script type="module" crossorigin src="${base}${chunk.fileName}"></script>\n    `;
        return html.slice(0, entry) + tag + html.slice(entry);
      },
    },
  };
}

// The client lives in client/; the API server serves the build from dist/client, each text file also as .br and .gz.
export default defineConfig({
  root: 'client',
  plugins: [
    catalogs(),
    react(),
    tailwindcss(),
    preloadBodyFont(),
    earlyLanguageFirst(),
    compression({ algorithms: ['brotliCompress', 'gzip'] }),
  ],
  // No source maps in the build: they would be served to anyone.
  build: {
    outDir: '../dist/client',
    emptyOutDir: true,
    sourcemap: false,
    // The manifest (in .vite/, never served) lets tests weigh what each page loads.
    manifest: true,
    // Every browser the app supports knows <link rel="modulepreload">: the entry need not carry a polyfill for it.
    modulePreload: { polyfill: false },
    // Brotli at its best quality is the slow step on purpose; the bundler's note about slow plugins is noise here.
    rolldownOptions: {
      checks: { bundlerTimings: false },
      // The page (index.html and its entry) and the early start of its language, run first (earlyLanguageFirst).
      input: {
        index: path.resolve('client/index.html'),
        'early-language': path.resolve('client/src/early-language.ts'),
      },
    },
  },
  server: {
    host: '127.0.0.1',
    port: Number(process.env.VITE_PORT ?? 5173),
    proxy: { '/api': `http://127.0.0.1:${process.env.API_PORT ?? 3001}` },
  },
});
