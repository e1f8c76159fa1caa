import { describe, expect, it } from 'vitest';
import { CATEGORY_SEEDS } from '../../shared/categories/seeds';
import { DISPLACEMENT_NOTE, DISPLACEMENT_SOURCE, FACTOR_SOURCE } from '../../shared/impact/factors';
import { sourceForReaders } from '../../shared/impact/for-readers';
import { factorSourceWords, methodLines, weightSourceWords, type Words } from '../../shared/impact/method-words';
import { translate } from '../../server/src/i18n';
import type { Language } from '../../shared/i18n/languages';

const say = (lang: Language, w: Words | null) => (w ? translate(lang, w.key, w.values) : null);
const kettle = CATEGORY_SEEDS.find((c) => c.slug === 'kettle')!;

describe('the impact method in words', () => {
  it('says every seeded source in English word for word as seeded, so English reads as before', () => {
    for (const c of CATEGORY_SEEDS) {
      expect(say('en', weightSourceWords(c.slug, c.weightSource)), c.slug).toBe(c.weightSource);
      expect(say('en', weightSourceWords(c.slug, c.weightSource, true)), c.slug).toBe(sourceForReaders(c.weightSource));
    }
    expect(say('en', factorSourceWords('kettle', `Electrical items, small: ${FACTOR_SOURCE}`))).toBe(
      `Electrical items, small: ${FACTOR_SOURCE}`,
    );
    expect(translate('en', 'figures.source.factors')).toBe(FACTOR_SOURCE);
    expect(translate('en', 'figures.method.displacementNote', { shipped: '0.5' })).toBe(DISPLACEMENT_NOTE);
    expect(translate('en', 'figures.method.displacementSource')).toBe(DISPLACEMENT_SOURCE);
  });

  it('keeps the publication’s title and words the sentence around it in German, Dutch and French', () => {
    expect(say('de', weightSourceWords('kettle', kettle.weightSource))).toBe(
      'Durchschnittsgewicht für UNU-KEY 0203 aus dem E-Waste-Datensatz von Statistics Netherlands (2020)',
    );
    expect(say('nl', factorSourceWords('laptop', `Electrical items, IT: ${FACTOR_SOURCE}`))).toBe(
      'Electrical items, IT: uit de UK Government GHG conversion factors, “material use”, primary production (secundaire bron)',
    );
    expect(
      say('fr', weightSourceWords('clothing', CATEGORY_SEEDS.find((c) => c.slug === 'clothing')!.weightSource, true)),
    ).toBe(
      'Estimation : un poids courant, pas un chiffre publié ; entre un t-shirt (≈ 0,2 kg) et un jean (≈ 0,7 kg) ; pesez les textiles à l’accueil',
    );
    expect(translate('de', 'figures.method.displacementSource')).toMatch(/^Die Idee .*„Circular economy rebound“/);
  });

  it('gives each method line in the reader’s language, with the displacement factor as written there', () => {
    const de = methodLines('0,5').map((w) => say('de', w));
    expect(de).toHaveLength(6);
    expect(de[2]).toBe(
      'Vermiedene Emissionen (kg CO2e): repariertes Gewicht × Emissionsfaktor der Herstellung dieser Art × Ersetzungsfaktor (0,5).',
    );
    expect(say('en', methodLines('0.5')[3])).toBe('Fix rate: items fixed ÷ items with a recorded outcome.');
  });

  it('has no words for a source an admin typed: it is shown as typed', () => {
    expect(weightSourceWords('kettle', 'Weighed ten of ours')).toBeNull();
    expect(weightSourceWords('no-such-kind', kettle.weightSource)).toBeNull();
    expect(factorSourceWords('kettle', 'A test source')).toBeNull();
    expect(factorSourceWords('wooden-chair', null)).toBeNull();
    expect(sourceForReaders('Our guess, from memory', 'Schätzung')).toBe('Schätzung; our guess');
  });
});
