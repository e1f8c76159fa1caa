import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { compileMessageOrThrow, type CompiledMessage } from '@lingui/message-utils/compileMessage';
import { describe, expect, it } from 'vitest';
import { mergeNamespaces, type RawCatalog } from '../../shared/i18n/catalog';
import { LANGUAGES } from '../../shared/i18n/languages';

/**
 * The catalog check: every language has every namespace file and every key of English, none empty, each one valid
 * ICU MessageFormat (as Lingui's compiler reads it) with the same placeholders as English, and every plural or select
 * with an `other` case (ICU MessageFormat requires it).
 */
const root = path.resolve('locales');
const namespaces = (lang: string) =>
  readdirSync(path.join(root, lang))
    .filter((f) => f.endsWith('.json'))
    .map((f) => f.slice(0, -'.json'.length))
    .sort();
const load = (lang: string, ns: string): RawCatalog =>
  JSON.parse(readFileSync(path.join(root, lang, `${ns}.json`), 'utf8'));

/** Argument names a compiled message uses, and whether every plural/select in it has `other`. */
function argumentsOf(
  message: CompiledMessage,
  names = new Set<string>(),
): { names: Set<string>; missingOther: boolean } {
  let missingOther = false;
  for (const token of message) {
    if (typeof token === 'string') continue;
    const [name, type, format] = token;
    if (name !== '#') names.add(name);
    if ((type === 'plural' || type === 'select' || type === 'selectordinal') && format && typeof format === 'object') {
      const choices = format as Record<string, unknown>;
      if (!('other' in choices)) missingOther = true;
      for (const [k, v] of Object.entries(choices))
        if (k !== 'offset' && Array.isArray(v)) missingOther ||= argumentsOf(v as CompiledMessage, names).missingOther;
    }
  }
  return { names, missingOther };
}

describe('the message catalogs under locales/', () => {
  const english = namespaces('en');

  it('has a folder for every language, each with the namespace files of English', () => {
    expect(english.length).toBeGreaterThan(0);
    for (const lang of LANGUAGES) expect(namespaces(lang), lang).toEqual(english);
  });

  for (const ns of english) {
    it(`${ns}.json: every key in every language, not empty, valid ICU, same placeholders as English`, () => {
      const en = load('en', ns);
      const problems: string[] = [];
      for (const lang of LANGUAGES) {
        const catalog = load(lang, ns);
        expect(Object.keys(catalog).sort(), `${lang}/${ns}.json keys`).toEqual(Object.keys(en).sort());
        for (const [key, text] of Object.entries(catalog)) {
          if (typeof text !== 'string' || !text.trim()) {
            problems.push(`${lang} ${key}: empty`);
            continue;
          }
          let compiled: CompiledMessage;
          try {
            compiled = compileMessageOrThrow(text);
          } catch (e) {
            problems.push(`${lang} ${key}: ${(e as Error).message}`);
            continue;
          }
          const mine = argumentsOf(compiled);
          const theirs = argumentsOf(compileMessageOrThrow(en[key] ?? ''));
          if ([...mine.names].sort().join() !== [...theirs.names].sort().join())
            problems.push(
              `${lang} ${key}: placeholders {${[...mine.names].join(', ')}} differ from English {${[...theirs.names].join(', ')}}`,
            );
          if (mine.missingOther) problems.push(`${lang} ${key}: a plural or select without "other"`);
        }
      }
      expect(problems).toEqual([]);
    });
  }

  it('merges each language without a key outside its namespace or given twice', () => {
    for (const lang of LANGUAGES) {
      const files = Object.fromEntries(namespaces(lang).map((ns) => [ns, load(lang, ns)]));
      expect(() => mergeNamespaces(files), lang).not.toThrow();
    }
    expect(() => mergeNamespaces({ booking: { 'events.title': 'x' } })).toThrow(/must start with "booking\."/);
  });

  it('finds a broken translation (the check can fail)', () => {
    expect(() => compileMessageOrThrow('{count, plural, one {# item}')).toThrow();
    expect(argumentsOf(compileMessageOrThrow('{count, plural, one {# item}}')).missingOther).toBe(true);
    expect([...argumentsOf(compileMessageOrThrow('Hallo {naam}')).names]).toEqual(['naam']);
  });
});
