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
  { name: 'routes', base: 'server/src/features' },
  { name: 'service', base: 'server/src/features' },
  { name: 'queries', base: 'server/src/features' },
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

const files = (dir: string): string[] =>
  readdirSync(path.join(root, dir), { withFileTypes: true }).flatMap((d) =>
    d.isDirectory() ? files(`${dir}/${d.name}`) : [`${dir}/${d.name}`],
  );

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

  it('has a row for every client and server feature, and every screen', () => {
    const named = (...cols: number[]) =>
      rows.flatMap((r) =>
        cols.flatMap((i) =>
          (r.cells[i] ?? []).flatMap((p) => resolve(columns[i], p)).map((f) => path.relative(root, f)),
        ),
      );
    const covered = (names: string[]) => (dir: string) => names.some((n) => n === dir || n.startsWith(dir + '/'));
    const unmapped = [
      ...folders('client/src/features')
        .map((f) => `client/src/features/${f}`)
        .filter((f) => !covered(named(1))(f)),
      ...folders('server/src/features')
        .map((f) => `server/src/features/${f}`)
        .filter((f) => !covered(named(2, 3, 4))(f)),
      ...files('client/src/routes').filter((f) => !named(0).some((n) => f === n || f.startsWith(n + '/'))),
    ];
    expect(unmapped).toEqual([]);
  });
});
