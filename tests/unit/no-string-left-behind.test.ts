import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { SERVER_ONLY_NAMESPACES } from '../../shared/i18n/namespaces';

/**
 * No string left behind: every client file is in the catalogs, so a word a person reads written straight into one
 * fails here: JSX text with letters, and a literal with letters in a prop a person reads or hears (aria-label,
 * placeholder, title, alt, and the label/legend/lead/hint props of our own components). Every key a file names
 * exists in English.
 */

function clientFiles(dir = 'client/src'): string[] {
  return readdirSync(path.resolve(dir), { withFileTypes: true }).flatMap((d) =>
    d.isDirectory()
      ? clientFiles(`${dir}/${d.name}`)
      : /\.tsx?$/.test(d.name) && !d.name.endsWith('.d.ts')
        ? [`${dir}/${d.name}`]
        : [],
  );
}
const CONVERTED = clientFiles().sort();
const READ_PROPS = new Set(['aria-label', 'placeholder', 'title', 'alt', 'label', 'legend', 'lead', 'hint']);
const WORDS = /\p{L}{2,}/u;

/** The English words written outside the catalogs in one file's source, with their lines. */
function strayStrings(source: string, file = 'file.tsx'): string[] {
  const sf = ts.createSourceFile(file, source, ts.ScriptTarget.Latest, true, ts.ScriptKind.TSX);
  const found: string[] = [];
  const at = (n: ts.Node) => `${file}:${sf.getLineAndCharacterOfPosition(n.getStart()).line + 1}`;
  const literalText = (e: ts.Expression | undefined): string[] => {
    if (!e) return [];
    if (ts.isStringLiteral(e) || ts.isNoSubstitutionTemplateLiteral(e)) return [e.text];
    if (ts.isTemplateExpression(e)) return [e.head.text, ...e.templateSpans.map((s) => s.literal.text)];
    if (ts.isConditionalExpression(e)) return [...literalText(e.whenTrue), ...literalText(e.whenFalse)];
    if (ts.isBinaryExpression(e)) {
      const op = e.operatorToken.kind;
      // Joined text shows both sides; `a && 'x'`, `a || 'x'` and `a ?? 'x'` show the right; a comparison shows neither.
      if (op === ts.SyntaxKind.PlusToken) return [...literalText(e.left), ...literalText(e.right)];
      const shown = [
        ts.SyntaxKind.AmpersandAmpersandToken,
        ts.SyntaxKind.BarBarToken,
        ts.SyntaxKind.QuestionQuestionToken,
      ];
      return shown.includes(op) ? literalText(e.right) : [];
    }
    if (ts.isParenthesizedExpression(e)) return literalText(e.expression);
    return [];
  };
  const visit = (n: ts.Node) => {
    if (ts.isJsxText(n) && WORDS.test(n.text)) found.push(`${at(n)} text "${n.text.trim()}"`);
    if (ts.isJsxExpression(n) && n.parent && (ts.isJsxElement(n.parent) || ts.isJsxFragment(n.parent)))
      for (const text of literalText(n.expression)) if (WORDS.test(text)) found.push(`${at(n)} text "${text}"`);
    if (ts.isJsxAttribute(n) && READ_PROPS.has(n.name.getText(sf))) {
      const init = n.initializer;
      const texts = !init
        ? []
        : ts.isStringLiteral(init)
          ? [init.text]
          : ts.isJsxExpression(init)
            ? literalText(init.expression)
            : [];
      for (const text of texts) if (WORDS.test(text)) found.push(`${at(n)} ${n.name.getText(sf)}="${text}"`);
    }
    ts.forEachChild(n, visit);
  };
  visit(sf);
  return found;
}

/** The catalog keys a file names as literals in t('…'), tr('…') or trParts('…', …), and the prefixes of keys built with `${}`. */
function keysNamed(source: string): { keys: string[]; prefixes: string[] } {
  const keys = [...source.matchAll(/\b(?:t|tr|trParts)\(\s*'([a-z][\w.-]*)'/g)].map((m) => m[1]);
  const prefixes = [...source.matchAll(/\b(?:t|tr)\(\s*`([a-z][\w.-]*)\$\{/g)].map((m) => m[1]);
  return { keys, prefixes };
}

/** Every message the browser loads: English's namespaces but the server's own. */
const english: Record<string, string> = Object.assign(
  {},
  ...readdirSync(path.resolve('locales/en'))
    .map((f) => f.replace(/\.json$/, ''))
    .filter((ns) => !SERVER_ONLY_NAMESPACES.includes(ns))
    .map((ns) => JSON.parse(readFileSync(path.resolve(`locales/en/${ns}.json`), 'utf8'))),
);

describe('no string left behind in the translated screens', () => {
  it.each(CONVERTED)('%s has no words outside the catalogs', (file) => {
    expect(strayStrings(readFileSync(path.resolve(file), 'utf8'), file)).toEqual([]);
  });

  it.each(CONVERTED)('%s names only keys that English has', (file) => {
    const { keys, prefixes } = keysNamed(readFileSync(path.resolve(file), 'utf8'));
    for (const key of keys) expect(english, `${file}: ${key}`).toHaveProperty([key]);
    for (const prefix of prefixes)
      expect(
        Object.keys(english).some((k) => k.startsWith(prefix)),
        `${file}: ${prefix}…`,
      ).toBe(true);
  });

  it('reads the whole client', () => {
    // Every screen has its files under client/src (more than 200 .ts and .tsx files today).
    expect(CONVERTED.length).toBeGreaterThan(200);
    expect(CONVERTED).toContain('client/src/app/app-shell.tsx');
  });

  it('finds a planted English string (the check can fail)', () => {
    const planted = `export const X = () => (
      <div aria-label="Close the menu">
        <p>Book your slot</p>
        <input placeholder={'Your name'} title={ok ? t('common.language') : 'Language'} />
        <span>{t('common.language')} · {n}</span>
        <b>{flag ? 'Full' : t('events.places.full')}</b>
        {view === 'calendar' && <i>{count > 1 && 'Several'}</i>}
      </div>
    );`;
    expect(strayStrings(planted)).toEqual([
      'file.tsx:2 aria-label="Close the menu"',
      'file.tsx:3 text "Book your slot"',
      'file.tsx:4 placeholder="Your name"',
      'file.tsx:4 title="Language"',
      'file.tsx:6 text "Full"',
      'file.tsx:7 text "Several"',
    ]);
  });
});
