import { defineConfig, type Plugin } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { compression } from 'vite-plugin-compression2';

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

// The client lives in client/; the API server serves the build from dist/client, each text file also as .br and .gz.
export default defineConfig({
  root: 'client',
  plugins: [react(), tailwindcss(), preloadBodyFont(), compression({ algorithms: ['brotliCompress', 'gzip'] })],
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
    rolldownOptions: { checks: { bundlerTimings: false } },
  },
  server: {
    host: '127.0.0.1',
    port: Number(process.env.VITE_PORT ?? 5173),
    proxy: { '/api': `http://127.0.0.1:${process.env.API_PORT ?? 3001}` },
  },
});
