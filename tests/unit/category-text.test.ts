import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { CATEGORY_SEEDS } from '../../shared/categories/seeds';
import { categoryTextKey } from '../../shared/i18n/category-text';
import { LANGUAGES } from '../../shared/i18n/languages';

const catalog = (lang: string) =>
  JSON.parse(readFileSync(path.resolve(`locales/${lang}/categories.json`), 'utf8')) as Record<string, string>;

describe('the seeded kinds of item in the catalogs', () => {
  it('has each seed’s English name and refusal texts word for word in locales/en, so English reads as before', () => {
    const en = catalog('en');
    for (const c of CATEGORY_SEEDS) {
      expect(en[categoryTextKey(c.slug, 'name', c.name)!], c.slug).toBe(c.name);
      if (c.refusal) {
        expect(en[categoryTextKey(c.slug, 'reason', c.refusal.reason)!]).toBe(c.refusal.reason);
        expect(en[categoryTextKey(c.slug, 'suggestion', c.refusal.suggestion)!]).toBe(c.refusal.suggestion);
      }
    }
    expect(Object.keys(en)).toHaveLength(CATEGORY_SEEDS.length + 2 * CATEGORY_SEEDS.filter((c) => c.refusal).length);
  });

  it('gives every language its own word for every seeded kind', () => {
    for (const lang of LANGUAGES.filter((l) => l !== 'en')) {
      const own = catalog(lang);
      const same = CATEGORY_SEEDS.filter((c) => own[`categories.${c.slug}`] === c.name).map((c) => c.slug);
      // "Laptop" and "Tablet" are the everyday words in Dutch and German too (from memory).
      expect(
        same.filter((s) => !['laptop', 'tablet'].includes(s)),
        lang,
      ).toEqual([]);
    }
  });

  it('has no key for an admin’s own wording or an unknown kind', () => {
    expect(categoryTextKey('kettle', 'name', 'Kettle')).toBe('categories.kettle');
    expect(categoryTextKey('kettle', 'name', 'Electric kettle')).toBeNull();
    expect(categoryTextKey('kettle', 'reason', 'Anything')).toBeNull();
    expect(categoryTextKey('no-such-kind', 'name', 'Kettle')).toBeNull();
    const microwave = CATEGORY_SEEDS.find((c) => c.slug === 'microwave')!;
    expect(categoryTextKey('microwave', 'reason', microwave.refusal!.reason)).toBe('categories.microwave.reason');
  });
});
