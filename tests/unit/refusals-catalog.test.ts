import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { translate } from '../../server/src/i18n';

/**
 * The API's refusals in the reader's language. A refusal is thrown in English (new HttpError(…), notFound('That
 * booking'), a feature's forbidden('…') or conflict(code, '…')); the server finds its English words in the
 * server-only `problems` catalog and answers in the language of the request. This check reads the server's code and
 * fails on a literal refusal the catalog does not have, so a new one cannot be left in English.
 */
const HELPERS = new Set(['forbidden', 'conflict']);

function serverFiles(dir = 'server/src'): string[] {
  return readdirSync(path.resolve(dir), { withFileTypes: true }).flatMap((d) =>
    d.isDirectory() ? serverFiles(`${dir}/${d.name}`) : d.name.endsWith('.ts') ? [`${dir}/${d.name}`] : [],
  );
}

/** The literal refusals of one file's source: message and field texts. */
function literalRefusals(source: string, file = 'file.ts'): string[] {
  const sf = ts.createSourceFile(file, source, ts.ScriptTarget.Latest, true);
  const found: string[] = [];
  const texts = (e: ts.Expression | undefined) => {
    if (!e) return;
    if (ts.isStringLiteral(e) || ts.isNoSubstitutionTemplateLiteral(e)) found.push(e.text);
    // A template's holes become {0}, {1}…: it must match a catalog message of the same shape.
    else if (ts.isTemplateExpression(e))
      found.push(e.head.text + e.templateSpans.map((s, i) => `{${i}}${s.literal.text}`).join(''));
    else if (ts.isConditionalExpression(e)) [e.whenTrue, e.whenFalse].forEach(texts);
    else if (ts.isParenthesizedExpression(e)) texts(e.expression);
    else if (ts.isObjectLiteralExpression(e))
      for (const p of e.properties) if (ts.isPropertyAssignment(p)) texts(p.initializer);
  };
  const visit = (n: ts.Node) => {
    if (ts.isNewExpression(n) && n.expression.getText(sf) === 'HttpError' && n.arguments)
      n.arguments.slice(2, 4).forEach(texts);
    if (ts.isCallExpression(n)) {
      const callee = n.expression.getText(sf);
      const first = n.arguments[0];
      if (callee === 'notFound')
        found.push(first && ts.isStringLiteral(first) ? `${first.text} was not found.` : 'That was not found.');
      if (HELPERS.has(callee) && n.arguments.length) texts(n.arguments[n.arguments.length - 1]);
    }
    ts.forEachChild(n, visit);
  };
  visit(sf);
  // Catalog keys (errors.invalid, validation.*) are translated as keys.
  return found.filter((t) => !/^[a-z]+\.[\w.-]+$/.test(t));
}

const english = JSON.parse(readFileSync(path.resolve('locales/en/problems.json'), 'utf8')) as Record<string, string>;
const known = new Set(Object.values(english));
/** A catalog message with its placeholders numbered in order, as a template's shape is written above. */
const shape = (text: string) => {
  let i = 0;
  return text.replace(/\{\w+\}/g, () => `{${i++}}`);
};
const knownShapes = new Set(Object.values(english).map(shape));
// notFound's own template; its callers' nouns are checked one by one.
const HELPER_TEMPLATES = new Set(['{0} was not found.']);
const isKnown = (t: string) => known.has(t) || knownShapes.has(t) || HELPER_TEMPLATES.has(t);

describe("the API's refusals", () => {
  // Parsing every server file takes about a second, several on a busy machine.
  it('has every literal refusal of the server in the problems catalog', { timeout: 30_000 }, () => {
    const missing = serverFiles().flatMap((f) =>
      literalRefusals(readFileSync(path.resolve(f), 'utf8'), f)
        .filter((t) => !isKnown(t))
        .map((t) => `${f}: ${t}`),
    );
    expect(missing).toEqual([]);
    expect(known.size).toBeGreaterThan(100);
  });

  it('finds a planted refusal (the check can fail)', () => {
    const planted = `throw new HttpError(409, 'x', 'Brand new refusal.', { a: 'A field refusal.' });
      throw notFound('That widget'); throw forbidden('Not you.'); throw new HttpError(400, 'invalid', 'errors.invalid');
      throw new HttpError(409, 'x', \`\${who} is already \${ROLE[r]} with \${g}.\`, undefined, { role: 'organise.role.fixer' });`;
    expect(literalRefusals(planted)).toEqual([
      'Brand new refusal.',
      'A field refusal.',
      'That widget was not found.',
      'Not you.',
      '{0} is already {1} with {2}.',
    ]);
    expect(isKnown('{0} is already {1} with {2}.')).toBe(false);
    expect(isKnown('Too many requests. Wait {0} minutes and try again.')).toBe(true);
  });

  it('answers an exact refusal in the reader language, and leaves English and unknown text alone', () => {
    const text = 'That e-mail and password do not match an account.';
    expect(translate('en', text)).toBe(text);
    expect(translate('nl', text)).toBe('Dit e-mailadres en wachtwoord horen niet bij een account.');
    expect(translate('de', 'That booking was not found.')).toBe('Diese Buchung wurde nicht gefunden.');
    expect(translate('fr', 'Some words no catalog has.')).toBe('Some words no catalog has.');
  });

  it('gives a refusal with numbers or names its values back, and the language its plural', () => {
    expect(translate('nl', 'Too many requests. Wait 15 minutes and try again.')).toBe(
      'Te veel verzoeken. Wacht 15 minuten en probeer het opnieuw.',
    );
    expect(translate('de', '“oma’s lamp.gif” is not a JPEG, PNG or WebP photo.')).toBe(
      '„oma’s lamp.gif“ ist kein JPEG-, PNG- oder WebP-Foto.',
    );
    expect(translate('fr', 'An item can have at most 6 photos; this one has 6.')).toBe(
      'Un objet peut avoir au plus 6 photos ; celui-ci en a 6.',
    );
    // A text that only looks like a pattern's start is not taken for it.
    expect(translate('de', 'Too many requests. Wait a bit.')).toBe('Too many requests. Wait a bit.');
  });
});
