import type { Server } from 'node:http';

interface Layer {
  rawPath?: string | string[];
  slash?: boolean;
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
}

const join = (a: string, b: string) => (a + (b === '/' ? '' : b)).replace(/\/+/g, '/') || '/';

/**
 * Every API route the running app answers, as `METHOD /path/:param`, read from Express's own router stacks
 * (Express 5 keeps each layer's path as `rawPath`), so a route added anywhere shows up here.
 */
export function listRoutes(server: Server): string[] {
  const app = server.listeners('request')[0] as unknown as { router: { stack: Layer[] } };
  const out = new Set<string>();
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const paths = ([] as string[]).concat(layer.route.path);
        for (const p of paths)
          for (const [m, on] of Object.entries(layer.route.methods))
            if (on && m !== '_all') out.add(`${m.toUpperCase()} ${join(prefix, p)}`);
      } else if (layer.handle?.stack) {
        const mount = layer.slash || layer.rawPath === undefined ? '/' : ([] as string[]).concat(layer.rawPath)[0];
        walk(layer.handle.stack, join(prefix, mount));
      }
    }
  };
  walk(app.router.stack, '');
  return [...out].filter((r) => r.split(' ')[1].startsWith('/api/')).sort();
}
