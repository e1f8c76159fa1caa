import { describe, expect, it } from 'vitest';
import { loadTranslations } from '../../server/src/i18n';
import type { Language } from '../../shared/i18n/languages';
import { summariseRun } from '../../shared/triage/run-summary';
import { kitNames, needText, ruleTexts, skillsText } from '../../client/src/features/triage/wording';

// A one-slot round as server/src/features/triage/service.ts stores it (input of shared/triage/engine.ts).
const input = {
  items: [
    { id: '1', skill: 'toys', minLevel: 1, equipment: ['soldering-station'], priority: 0 },
    { id: '2', skill: 'textiles', minLevel: 1, equipment: [], priority: 1 },
  ],
  volunteers: [{ id: '7', name: 'Ada', skills: { textiles: 3, toys: 0 }, capacity: 1, benchId: '5' }],
  benches: [{ id: '5', name: 'Sewing table', equipment: ['sewing-machine'], seats: 2 }],
};
const result = {
  assignments: [{ itemId: '2', volunteerId: '7', benchId: '5' }],
  unassigned: [{ itemId: '1', reason: 'no-skill', detail: 'Nobody here has toys.' }],
};

describe('a triage run in words', () => {
  it('names who took which item where, and why the rest wait', () => {
    const s = summariseRun(input, result, new Map([['2', 'Clothing · B9N-3HF']]), 0)!;
    expect(s.scope).toBe('slot');
    expect(s.placed).toEqual([
      { itemId: '2', item: 'Clothing · B9N-3HF', fixerId: '7', fixer: 'Ada', benchId: '5', bench: 'Sewing table' },
    ]);
    expect(s.given).toEqual({ items: ['2'], fixers: ['7'], benches: ['5'] });
    // An item with no label left (since deleted) keeps its number. A run stored before reasons kept their values
    // has them worked out again from its input, for the screen to word.
    expect(s.waiting).toEqual([
      {
        itemId: '1',
        item: 'Item 1',
        code: 'no-skill',
        reason: 'No fixer with the skill',
        detail: 'Nobody here has toys.',
        why: { reason: 'no-skill', skill: 'toys', level: 1 },
      },
    ]);
    expect(s.fixers[0]).toMatchObject({
      name: 'Ada',
      skills: 'Textiles (expert)',
      skillLevels: [{ skill: 'textiles', level: 3 }],
      seat: 'Sewing table',
      seatId: '5',
    });
    expect(s.items[0]).toMatchObject({
      needs: 'Toys, learning or better',
      kit: 'Soldering station',
      skill: 'toys',
      minLevel: 1,
      equipment: ['soldering-station'],
    });
    expect(s.benches[0]).toMatchObject({ kit: 'Sewing machine', equipment: ['sewing-machine'] });
    expect(s.rules.at(-1)).toBe('No placement was locked, so every item could move.');
    expect(s.lockedKept).toBe(0);
  });
  it('says it cannot read a run stored in another form', () => {
    expect(summariseRun({ nothing: true }, result, new Map(), 0)).toBeNull();
  });
});

const i18n = loadTranslations();
const t = (lang: Language) => (key: string, values?: Record<string, unknown>) => i18n[lang]._(key, values);
const skills = [
  { skill: 'jewellery', level: 2 },
  { skill: 'textiles', level: 3 },
];

describe('a triage run’s summary worded in four languages', () => {
  it('words the needs, kit, skills and rules in English as the run’s English fields have them', () => {
    const s = summariseRun(input, result, new Map(), 2)!;
    expect(needText(t('en'), 'toys', 1)).toBe(s.items[0].needs);
    expect(needText(t('en'), 'electrical', 3)).toBe('Electrical, expert');
    expect(kitNames(t('en'), 'en', ['soldering-station'])).toBe(s.items[0].kit);
    expect(skillsText(t('en'), 'en', skills)).toBe('Textiles (expert), Jewellery (capable)');
    expect(skillsText(t('en'), 'en', [])).toBe('no skills given');
    expect(ruleTexts(t('en'), s.scope, s.lockedKept)).toEqual(s.rules);
    expect(ruleTexts(t('en'), 'slot', 0).at(-1)).toBe('No placement was locked, so every item could move.');
  });
  it('words them in Dutch, German and French', () => {
    expect(needText(t('nl'), 'electrical', 2)).toBe('Elektrisch, bekwaam of beter');
    expect(needText(t('de'), 'electrical', 1)).toBe('Elektrogeräte, mindestens lernend');
    expect(needText(t('fr'), 'electrical', 3)).toBe('Électrique, expert');
    expect(skillsText(t('de'), 'de', skills)).toBe('Textilien (Experte), Schmuck (versiert)');
    expect(skillsText(t('fr'), 'fr', skills)).toBe('Textile (expert) et Bijoux (compétent)');
    expect(skillsText(t('nl'), 'nl', [])).toBe('geen vaardigheden opgegeven');
    expect(kitNames(t('nl'), 'nl', ['soldering-station', 'multimeter'])).toMatch(/^Soldeerstation, /);
    expect(ruleTexts(t('de'), 'day', 1)[2]).toMatch(/^Der Termin wird Zeitfenster für Zeitfenster geplant/);
    expect(ruleTexts(t('fr'), 'slot', 2).at(-1)).toMatch(/^2 placements étaient verrouillés/);
    expect(ruleTexts(t('nl'), 'slot', 0).at(-1)).toBe(
      'Geen plaatsing was vastgezet, dus elk voorwerp kon verschuiven.',
    );
    for (const lang of ['nl', 'de', 'fr'] as const) {
      const words = [...ruleTexts(t(lang), 'day', 3), needText(t(lang), 'toys', 1), skillsText(t(lang), lang, skills)];
      expect(words.join(' ')).not.toMatch(/\b(the|each|item|fixer|bench|better|capable|locked)\b/i);
    }
  });
});
