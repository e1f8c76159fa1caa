import { publicListFrom } from '../../../shared/booking/list-window';

/** Vite's build manifest (build.manifest in vite.config.ts): each chunk with its static imports. */
export type Manifest = Record<string, { file: string; isEntry?: boolean; imports?: string[] }>;

/** What a public page's HTML can ask for at once: its screen's module and the API reads its loader makes. */
export interface PageHints {
  module: string;
  fetches: string[];
}

/**
 * The public pages a visitor lands on, with the module each one loads and the exact URLs its loader and the app
 * shell read (the same URLs, or the browser fetches twice). Other pages get no hints: they are signed in, or rare.
 */
export function pageHints(pathname: string, search: URLSearchParams, now: number): PageHints | null {
  const me = '/api/auth/me';
  if (pathname === '/') return { module: 'src/routes/home.tsx', fetches: [me, '/api/public/groups'] };
  if (pathname === '/events') {
    // A filtered list asks for other URLs; the screen's code is still worth having early.
    const filtered = search.has('group') || search.has('category');
    const list = `/api/events?${new URLSearchParams({ from: publicListFrom(now) })}`;
    return {
      module: 'src/routes/events/list.tsx',
      fetches: filtered ? [me] : [me, list, '/api/public/groups', '/api/categories'],
    };
  }
  const event = /^\/events\/([1-9]\d{0,9})(\/book)?$/.exec(pathname);
  if (event)
    return {
      module: event[2] ? 'src/routes/events/book.tsx' : 'src/routes/events/detail.tsx',
      fetches: [me, `/api/events/${event[1]}`, '/api/categories'],
    };
  const impact = /^\/impact(?:\/groups\/([1-9]\d{0,9}))?$/.exec(pathname);
  if (impact)
    return {
      module: 'src/routes/impact/public.tsx',
      fetches: [me, `/api/public/impact${impact[1] ? `?groupId=${impact[1]}` : ''}`],
    };
  return null;
}

/** API reads whose answer is the same in every language (who is signed in), so worth starting whatever the page's. */
export const wordless = (url: string) => url === '/api/auth/me';

/** The language a visitor chose on this device, from the cookie the client keeps beside its own storage. */
export function chosenLanguageCookie(header: string | undefined): string | null {
  const m = /(?:^|;\s*)mendery\.language=([^;]*)/.exec(header ?? '');
  if (!m) return null;
  try {
    return decodeURIComponent(m[1]);
  } catch {
    return null;
  }
}

/** The chunks a browser must fetch before `keys` run: the keys and everything they import statically. */
export function staticClosure(manifest: Manifest, keys: string[]): string[] {
  const seen = new Set<string>();
  const walk = (k: string) => {
    if (seen.has(k) || !manifest[k]) return;
    seen.add(k);
    for (const i of manifest[k].imports ?? []) walk(i);
  };
  keys.forEach(walk);
  return [...seen];
}

/**
 * `<link>` tags for the page's head: its screen's chunks that the entry does not already bring, as module preloads,
 * and its API reads as early fetches. The browser then loads them beside the entry instead of after it has run.
 */
export function hintTags(manifest: Manifest, hints: PageHints): string {
  const entry = Object.keys(manifest).filter((k) => manifest[k].isEntry);
  const shipped = new Set(staticClosure(manifest, entry));
  const chunks = staticClosure(manifest, [hints.module]).filter((k) => !shipped.has(k));
  return [
    ...chunks.map((k) => `<link rel="modulepreload" crossorigin href="/${manifest[k].file}">`),
    ...hints.fetches.map((u) => `<link rel="preload" as="fetch" crossorigin href="${u.replaceAll('&', '&amp;')}">`),
  ].join('\n    ');
}
