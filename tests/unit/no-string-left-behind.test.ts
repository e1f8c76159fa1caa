import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { SERVER_ONLY_NAMESPACES } from '../../shared/i18n/namespaces';

/**
 * No string left behind: every client file is in the catalogs but those still PENDING below, so a word a person reads
 * written straight into one fails here: JSX text with letters, and a literal with letters in a prop a person reads or
 * hears (aria-label, placeholder, title, alt, and the label/legend/lead/hint props of our own components). Every key a
 * file names exists in English. PENDING only shrinks: a file on it that has no stray words left fails too, so it comes
 * off the list the day it is translated.
 */
const PENDING = new Set([
  'client/src/app/route-error.tsx',
  'client/src/components/layouts/logo.tsx',
  'client/src/features/admin/components/merge-group.tsx',
  'client/src/features/benches/components/bench-layout-editor.tsx',
  'client/src/features/categories/components/category-edit-row.tsx',
  'client/src/features/categories/components/category-table.tsx',
  'client/src/features/event-day/components/check-in-panel.tsx',
  'client/src/features/event-day/components/desk-board.tsx',
  'client/src/features/event-day/components/desk-home.tsx',
  'client/src/features/event-day/components/desk-screening.tsx',
  'client/src/features/event-day/components/desk-slots.tsx',
  'client/src/features/event-day/components/hall-display.tsx',
  'client/src/features/event-day/components/issued-tags.tsx',
  'client/src/features/event-day/components/live-bench-card.tsx',
  'client/src/features/event-day/components/live-view.tsx',
  'client/src/features/event-day/components/qr-scan.tsx',
  'client/src/features/event-day/components/status-tallies.tsx',
  'client/src/features/event-day/components/tag-sheet.tsx',
  'client/src/features/event-day/components/walk-in-form.tsx',
  'client/src/features/groups/components/privacy-settings.tsx',
  'client/src/features/privacy/components/erase-booking-button.tsx',
  'client/src/features/rota/components/my-sessions.tsx',
  'client/src/features/rota/components/rota-gaps.tsx',
  'client/src/features/rota/components/shift-calendar-link.tsx',
  'client/src/features/rota/components/shift-table.tsx',
  'client/src/features/rota/components/skill-cover-chart.tsx',
  'client/src/features/toolkit/components/add-part-form.tsx',
  'client/src/features/toolkit/components/calculators-page.tsx',
  'client/src/features/toolkit/components/calculators/calculator-body.tsx',
  'client/src/features/toolkit/components/calculators/diode-test.tsx',
  'client/src/features/toolkit/components/calculators/discharge.tsx',
  'client/src/features/toolkit/components/calculators/e-series.tsx',
  'client/src/features/toolkit/components/calculators/earth-limit.tsx',
  'client/src/features/toolkit/components/calculators/mains-peak.tsx',
  'client/src/features/toolkit/components/calculators/measure.tsx',
  'client/src/features/toolkit/components/calculators/resistor-bands.tsx',
  'client/src/features/toolkit/components/calculators/resistor-code.tsx',
  'client/src/features/toolkit/components/calculators/transistor.tsx',
  'client/src/features/toolkit/components/calculators/ui.tsx',
  'client/src/features/toolkit/components/item-toolkit.tsx',
  'client/src/features/toolkit/components/knowledge-card.tsx',
  'client/src/features/toolkit/components/ratings.tsx',
  'client/src/features/triage/components/bench-columns.tsx',
  'client/src/features/triage/components/board-item-card.tsx',
  'client/src/features/triage/components/triage-run-bar.tsx',
  'client/src/features/triage/components/triage-run-history.tsx',
  'client/src/features/triage/components/triage-run-summary.tsx',
  'client/src/routes/admin/categories.tsx',
  'client/src/routes/admin/mailbox.tsx',
  'client/src/routes/admin/overview.tsx',
  'client/src/routes/event-day/tag.tsx',
  'client/src/routes/groups/people.tsx',
  'client/src/routes/groups/settings.tsx',
  'client/src/routes/rota/rota.tsx',
  'client/src/routes/skills/my-skills.tsx',
  'client/src/routes/skills/skills-matrix.tsx',
  'client/src/routes/toolkit/knowledge.tsx',
  'client/src/routes/toolkit/salvage.tsx',
  'client/src/routes/triage/board.tsx',
  'client/src/routes/triage/run.tsx',
]);

function clientFiles(dir = 'client/src'): string[] {
  return readdirSync(path.resolve(dir), { withFileTypes: true }).flatMap((d) =>
    d.isDirectory()
      ? clientFiles(`${dir}/${d.name}`)
      : /\.tsx?$/.test(d.name) && !d.name.endsWith('.d.ts')
        ? [`${dir}/${d.name}`]
        : [],
  );
}
const CONVERTED = clientFiles()
  .filter((f) => !PENDING.has(f))
  .sort();
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

  it.each([...PENDING])('%s (pending) still has words to move into the catalogs', (file) => {
    expect(
      strayStrings(readFileSync(path.resolve(file), 'utf8'), file),
      `translated: take ${file} off PENDING`,
    ).not.toEqual([]);
  });

  it('covers most of the client', () => {
    expect(CONVERTED.length).toBeGreaterThan(PENDING.size);
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
