import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { translate } from '../../server/src/i18n';
import { LANGUAGES } from '../../shared/i18n/languages';
import { RETENTION_MONTHS } from '../../shared/privacy/scrub';
import { resetConfirmSchema } from '../../shared/schemas/auth';
import { groupSettingsSchema, venueSchema } from '../../shared/schemas/events';

/**
 * The shared zod schemas' messages are catalog keys (`validation.*` and a few of a feature's namespace), so the server
 * answers them in the request's language and the client shows them in the reader's. This check reads every schema
 * file and fails on a message that is an English sentence, a template, or a key the English catalogs lack.
 */
const DIR = 'shared/schemas';

/** Where a zod method takes its message: the argument's index (an object there is read for error/message). */
const MESSAGE_ARG: Record<string, number> = {
  min: 1,
  max: 1,
  length: 1,
  gt: 1,
  gte: 1,
  lt: 1,
  lte: 1,
  multipleOf: 1,
  regex: 1,
  refine: 1,
  startsWith: 1,
  endsWith: 1,
  includes: 1,
  positive: 0,
  negative: 0,
  nonnegative: 0,
  nonpositive: 0,
  int: 0,
  finite: 0,
  nonempty: 0,
  email: 0,
  url: 0,
  uuid: 0,
};
const MESSAGE_PROPS = new Set(['error', 'message']);
const KEY = /^[a-z]+(\.[\w-]+)+$/;

type Found = { text: string; why: 'not-a-key' | 'template' | 'sentence' };

/** The messages of one file that are not plain keys, and the keys it uses as messages. */
function schemaMessages(source: string, file = 'schema.ts'): { bad: Found[]; keys: string[] } {
  const sf = ts.createSourceFile(file, source, ts.ScriptTarget.Latest, true);
  const bad: Found[] = [];
  const keys: string[] = [];
  const message = (e: ts.Expression | undefined) => {
    if (!e) return;
    if (ts.isStringLiteral(e) || ts.isNoSubstitutionTemplateLiteral(e)) {
      if (KEY.test(e.text)) keys.push(e.text);
      else bad.push({ text: e.text, why: 'not-a-key' });
    } else if (ts.isTemplateExpression(e)) bad.push({ text: e.getText(sf), why: 'template' });
    else if (ts.isConditionalExpression(e)) [e.whenTrue, e.whenFalse].forEach(message);
    else if (ts.isParenthesizedExpression(e)) message(e.expression);
    else if (ts.isObjectLiteralExpression(e))
      for (const p of e.properties)
        if (ts.isPropertyAssignment(p) && MESSAGE_PROPS.has(p.name.getText(sf))) message(p.initializer);
  };
  const visit = (n: ts.Node) => {
    if (ts.isCallExpression(n)) {
      const callee = n.expression;
      const name = ts.isPropertyAccessExpression(callee) ? callee.name.text : callee.getText(sf);
      if (name in MESSAGE_ARG) message(n.arguments[MESSAGE_ARG[name]]);
      // Params objects of any call (z.string({ error }), ctx.addIssue({ message }), z.enum(v, { error })).
      for (const a of n.arguments) if (ts.isObjectLiteralExpression(a)) message(a);
    }
    // A sentence anywhere (e.g. a helper's argument that becomes a message) is refused too.
    if ((ts.isStringLiteral(n) || ts.isNoSubstitutionTemplateLiteral(n)) && /^[A-Z].* .*[.?!]$/.test(n.text))
      bad.push({ text: n.text, why: 'sentence' });
    ts.forEachChild(n, visit);
  };
  visit(sf);
  return { bad, keys };
}

const english = new Set(
  readdirSync(path.resolve('locales/en'))
    .filter((f) => f.endsWith('.json'))
    .flatMap((f) => Object.keys(JSON.parse(readFileSync(path.resolve('locales/en', f), 'utf8')) as object)),
);
const schemaFiles = readdirSync(path.resolve(DIR)).filter((f) => f.endsWith('.ts'));

describe("the shared schemas' messages", () => {
  it('are catalog keys that English has, never English sentences', { timeout: 30_000 }, () => {
    const problems: string[] = [];
    let used = 0;
    for (const f of schemaFiles) {
      const { bad, keys } = schemaMessages(readFileSync(path.resolve(DIR, f), 'utf8'), f);
      problems.push(...bad.map((b) => `${f}: ${b.why}: ${b.text}`));
      problems.push(...keys.filter((k) => !english.has(k)).map((k) => `${f}: unknown key: ${k}`));
      used += keys.length;
    }
    expect(problems).toEqual([]);
    expect(schemaFiles.length).toBeGreaterThan(10);
    expect(used).toBeGreaterThan(100);
  });

  it('finds planted English messages and unknown keys (the check can fail)', () => {
    const planted = `
      const a = z.string({ error: 'Enter a thing.' }).min(1, 'Too short.').max(9, 'validation.name.tooLong');
      const b = z.number().int('Whole.').positive(\`The \${label} is above 0.\`).regex(/x/, 'validation.nope.missing');
      const c = z.object({}).refine(f, { path: ['x'], message: 'They differ.' }).refine(g, 'Not good.');
      const d = z.object({}).superRefine((v, ctx) => ctx.addIssue({ code: 'custom', message: 'Read it again.' }));
      const e = helper('Choose a thing, please.');
      const ok = z.enum(['NPN', 'PNP'], { error: 'validation.name.required' }).default('NPN');`;
    const { bad, keys } = schemaMessages(planted);
    expect(bad.map((b) => b.text)).toEqual(
      expect.arrayContaining([
        'Enter a thing.',
        'Too short.',
        'Whole.',
        '`The ${label} is above 0.`',
        'They differ.',
        'Not good.',
        'Read it again.',
        'Choose a thing, please.',
      ]),
    );
    expect(bad.some((b) => b.why === 'template')).toBe(true);
    expect(keys.filter((k) => !english.has(k))).toEqual(['validation.nope.missing']);
    expect(keys).toContain('validation.name.required');
    expect(bad.map((b) => b.text)).not.toContain('NPN');
  });
});

describe('schema messages in the reader’s language', () => {
  it('answers a failed check in English word for word and in nl, de and fr', () => {
    const r = resetConfirmSchema.safeParse({ token: 'x'.repeat(24), password: 'a-long-password', confirm: 'other' });
    const key = r.error?.issues.find((i) => i.path.join('.') === 'confirm')?.message ?? '';
    expect(key).toBe('validation.password.differ');
    expect(translate('en', key)).toBe('The two passwords differ.');
    expect(translate('nl', key)).toBe('De twee wachtwoorden zijn niet gelijk.');
    expect(translate('de', key)).toBe('Die beiden Passwörter stimmen nicht überein.');
    expect(translate('fr', key)).toBe('Les deux mots de passe sont différents.');
    const venue = venueSchema.safeParse({ groupId: 1, name: 'x', address: 'Main Street 1', town: 'Delft' });
    const name = venue.error?.issues[0]?.message ?? '';
    expect(translate('en', name)).toBe('Give the venue a name.');
    expect(translate('de', name)).toBe('Geben Sie dem Veranstaltungsort einen Namen.');
  });

  it('keeps the retention range of the settings in step with RETENTION_MONTHS in every language', () => {
    const r = groupSettingsSchema.safeParse({ retentionMonths: RETENTION_MONTHS.max + 1 });
    const key = r.error?.issues[0]?.message ?? '';
    expect(translate('en', key)).toBe(`Keep details for ${RETENTION_MONTHS.min} to ${RETENTION_MONTHS.max} months.`);
    for (const lang of LANGUAGES) {
      const text = translate(lang, key);
      expect(text, lang).toContain(String(RETENTION_MONTHS.min));
      expect(text, lang).toContain(String(RETENTION_MONTHS.max));
    }
  });
});
