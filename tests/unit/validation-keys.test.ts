import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

/** Every validation.* key the shared schemas use has an English message (else a visitor would read the key). */
describe('validation keys in shared/schemas', () => {
  it('each one is in locales/en/validation.json', () => {
    const en = JSON.parse(readFileSync(path.resolve('locales/en/validation.json'), 'utf8')) as Record<string, string>;
    const dir = path.resolve('shared/schemas');
    const missing: string[] = [];
    let used = 0;
    for (const f of readdirSync(dir).filter((n) => n.endsWith('.ts'))) {
      for (const [, key] of readFileSync(path.join(dir, f), 'utf8').matchAll(/'(validation\.[A-Za-z0-9_.]+)'/g)) {
        used++;
        if (!(key in en)) missing.push(`${f}: ${key}`);
      }
    }
    expect(used).toBeGreaterThan(0);
    expect(missing).toEqual([]);
  });
});
