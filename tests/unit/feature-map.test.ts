import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * The feature map in DEVELOPERS.md (between `<!-- feature-map -->` and `<!-- /feature-map -->`) is the contributor's
 * way in: for each feature, where its screens, client API, server slice, request schemas and shared rules live.
 * This keeps it true: every path it names exists, and every feature folder on either side has a row.
 */
const root = path.resolve(__dirname, '../..');
const columns = [
  { name: 'screens', base: 'client/src/routes' },
  { name: 'client', base: 'client/src/features' },
  { name: 'server', base: 'server/src/features' },
  { name: 'schemas', base: 'shared/schemas' },
  { name: 'rules', base: 'shared' },
] as const;
const repoDirs = ['client/', 'server/', 'shared/', 'tests/', 'docs/', 'drizzle/'];

/** `a/{b,c}.ts` → `a/b.ts`, `a/c.ts` (one level of braces, as written in the map). */
export function expandBraces(p: string): string[] {
  const m = /^(.*?)\{([^}]*)\}(.*)$/.exec(p);
  if (!m) return [p];
  return m[2].split(',').flatMap((part) => expandBraces(m[1] + part.trim() + m[3]));
}

function mapRows(): { feature: string; cells: string[][] }[] {
  const text = readFileSync(path.join(root, 'DEVELOPERS.md'), 'utf8');
  const start = text.indexOf('<!-- feature-map -->');
  const end = text.indexOf('<!-- /feature-map -->');
  if (start < 0 || end < start) throw new Error('DEVELOPERS.md has no feature map');
  return text
    .slice(start, end)
    .split('\n')
    .filter((l) => l.startsWith('| `'))
    .map((line) => {
      const cells = line
        .split('|')
        .slice(1, -1)
        .map((c) => [...c.matchAll(/`([^`]+)`/g)].map((m) => m[1]));
      return { feature: cells[0][0], cells: cells.slice(1) };
    });
}

function resolve(column: (typeof columns)[number], p: string): string[] {
  return expandBraces(p).map((one) =>
    repoDirs.some((d) => one.startsWith(d)) ? path.join(root, one) : path.join(root, column.base, one),
  );
}

const folders = (dir: string) =>
  readdirSync(path.join(root, dir)).filter((f) => statSync(path.join(root, dir, f)).isDirectory());

describe('the feature map in DEVELOPERS.md', () => {
  const rows = mapRows();

  it('expands braces the way the map writes them', () => {
    expect(expandBraces('x/{a,b}.ts')).toEqual(['x/a.ts', 'x/b.ts']);
    expect(expandBraces('x/a.ts')).toEqual(['x/a.ts']);
  });

  it('names only paths that exist', () => {
    expect(rows.length).toBeGreaterThan(5);
    const missing: string[] = [];
    for (const row of rows)
      columns.forEach((column, i) => {
        for (const p of row.cells[i] ?? [])
          for (const file of resolve(column, p))
            if (!existsSync(file)) missing.push(`${row.feature} → ${column.name}: ${path.relative(root, file)}`);
      });
    expect(missing).toEqual([]);
  });

  it('has a row for every client and server feature, and every screen folder', () => {
    const named = (i: number) =>
      new Set(rows.flatMap((r) => (r.cells[i] ?? []).flatMap((p) => resolve(columns[i], p))).map((p) => path.relative(root, p).replace(/\/$/, '')));
    const clientNamed = named(1);
    const serverNamed = named(2);
    const screensNamed = named(0);
    const unmapped = [
      ...folders('client/src/features')
        .map((f) => `client/src/features/${f}`)
        .filter((f) => !clientNamed.has(f)),
      ...folders('server/src/features')
        .map((f) => `server/src/features/${f}`)
        .filter((f) => !serverNamed.has(f)),
      ...readdirSync(path.join(root, 'client/src/routes'))
        .map((f) => `client/src/routes/${f}`)
        .filter((f) => !screensNamed.has(f) && ![...screensNamed].some((s) => s.startsWith(f + '/'))),
    ];
    expect(unmapped).toEqual([]);
  });
});
