/**
 * What the shared calculators and the salvage match say is a code and its values (shared/calculators/said); the
 * screens word it from the bench catalog. Every code has a message in every language, every word a value names has
 * one too, and a few are worded right in nl, de and fr with the language's decimal comma (CLDR: nl, de, fr).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it, vi } from 'vitest';
import type { Language } from '../../shared/i18n/languages';

const state = vi.hoisted(() => ({ lang: 'en' as Language }));
vi.mock('../../client/src/lib/i18n', async () => {
  const { translate } = await import('../../server/src/i18n');
  return { tr: (key: string, values?: Record<string, string>) => translate(state.lang, key, values) };
});
import { saidIn } from '../../client/src/features/toolkit/components/said';
import { CalcError, english, isTerm, SENTENCES, type Said } from '../../shared/calculators/said';
import { checkSubstitution, interpretDiodeTest, type TransistorSpec } from '../../shared/calculators/transistors';
import { judgeResistance } from '../../shared/calculators/measure';
import { decodeBands, decodePrintedCode } from '../../shared/calculators/resistors';
import { rectifiedPeak } from '../../shared/calculators/mains';
import { dischargeAdvice, voltageAfter } from '../../shared/calculators/capacitors';
import { protectiveConductorLimitOhm } from '../../shared/safety/limits';
import { judgeSubstitute, type Needed } from '../../shared/salvage/match';

const LANGS = ['en', 'nl', 'de', 'fr'] as const;
const bench = Object.fromEntries(
  LANGS.map((l) => [l, JSON.parse(readFileSync(`locales/${l}/bench.json`, 'utf8')) as Record<string, string>]),
);
const holes = (text: string) => new Set([...text.matchAll(/\{(\w+)/g)].map((m) => m[1]));
const inLang = (lang: Language, s: Said) => {
  state.lang = lang;
  return saidIn(s, lang);
};
const refusal = (fn: () => unknown): Said => {
  try {
    fn();
  } catch (e) {
    if (e instanceof CalcError) return e.said;
    throw e;
  }
  throw new Error('did not throw');
};

const npn: TransistorSpec = { type: 'NPN', vMaxV: 400, iMaxA: 4, ptotW: 75, package: 'TO-220', pinout: 'BCE' };
const part = (type: Needed['type'], ratings: Needed['ratings'], pkg?: string): Needed => ({
  type,
  ratings,
  package: pkg,
});
/** A spread of what the calculators say, with the words their values name. */
const samples: Said[] = [
  ...interpretDiodeTest({ BE: 0.001, EB: 0.001, BC: 0.62, CB: 'OL', CE: 'OL', EC: 'OL' }).said,
  ...interpretDiodeTest({ BE: 0.2, EB: 'OL', BC: 1.3, CB: 'OL', CE: 'OL', EC: 'OL' }).said,
  ...Object.values(checkSubstitution(npn, { ...npn, type: 'N-MOSFET', pinout: 'GDS', package: 'D2PAK' }).said).flat(),
  ...Object.values(checkSubstitution({ ...npn, package: 'TO-220F' }, { ...npn, ptotW: 40 }).said).flat(),
  ...judgeSubstitute(part('fuse', { currentA: 3 }), part('resistor', {})).said.reasons,
  ...judgeSubstitute(part('capacitor', { voltageV: 400 }), part('capacitor', {})).said.warnings,
  ...judgeSubstitute(part('power-supply', { voltageV: 12 }), part('power-supply', {})).said.reasons,
  judgeResistance({ reading: 1.055, nominalOhm: 1, tolerancePct: 5 }).said,
  ...decodePrintedCode('100K').notesSaid,
  refusal(() => decodeBands(['red', 'gold', 'red', 'gold'])),
  refusal(() => checkSubstitution(npn, { ...npn, pinout: 'GDS' })),
  refusal(() => checkSubstitution(npn, { ...npn, fallTimeNs: -1 })),
  refusal(() => voltageAfter(-1, 1, 1, 1)),
  refusal(() => dischargeAdvice({ voltageV: 300, capacitanceF: 1e-4, resistanceOhm: 0 })),
  refusal(() => rectifiedPeak(Number.NaN)),
  refusal(() => protectiveConductorLimitOhm(-1)),
];

describe('what the shared calculators say, in every language', () => {
  it('has a message for every code in every language, asking for no value the calculators do not give', () => {
    expect(Object.keys(SENTENCES).length).toBeGreaterThan(90);
    for (const [code, en] of Object.entries(SENTENCES))
      for (const l of LANGS) {
        const text = bench[l][`bench.${code}`];
        expect(text, `${l} bench.${code}`).toBeTruthy();
        for (const h of holes(text)) expect(holes(en), `${l} bench.${code} {${h}}`).toContain(h);
      }
  });

  it('has every word a value names in every language, and the English the API reads', () => {
    const terms = samples.flatMap((s) => Object.values(s.values).filter(isTerm));
    expect(terms.length).toBeGreaterThan(12);
    for (const t of terms) for (const l of LANGS) expect(bench[l][`bench.${t.term}`], `${l} ${t.term}`).toBeTruthy();
    expect(english(samples[0])).toBe(
      'The base–emitter pair reads short both ways (0.001 V, 0.001 V): the transistor has failed (unless its datasheet shows a built-in base–emitter resistor).',
    );
    for (const s of samples) for (const l of LANGS) expect(inLang(l, s), `${l} ${s.code}`).not.toMatch(/\{|bench\./);
  });

  it('words a diode test, a measured resistance and a resistor code with the language’s decimal comma', () => {
    const low = interpretDiodeTest({ BE: 0.65, EB: 'OL', BC: 0.62, CB: 'OL', CE: 'OL', EC: 0.5 }).said[0];
    expect(inLang('nl', low)).toBe(
      'Collector–emitter geleidt in één richting (0,5 V): een ingebouwde dempdiode (gebruikelijk in lijneindtrap- en sommige schakeltransistors) meet zo — kijk in de datasheet; zonder zo’n diode is de transistor defect.',
    );
    const measured = judgeResistance({ reading: 1.055, nominalOhm: 1, tolerancePct: 5 }).said;
    expect(inLang('de', measured)).toBe(
      bench.de['bench.calc.m.outside']
        .replace('{net}', '1,055')
        .replace('{signed}', '+5,5 %')
        .replace('{nominal}', '1')
        .replace('{tol}', '5'),
    );
    const either = decodePrintedCode('4R7J').notesSaid;
    expect(either).toEqual([]);
    const hundredK = decodePrintedCode('100K').notesSaid[0];
    expect(inLang('fr', hundredK)).toBe(
      'Lu comme 100 kΩ ; si « K » est plutôt une lettre de tolérance, c’est 10 Ω ±10 %.',
    );
    expect(inLang('en', hundredK)).toBe('Read as 100 kΩ; if "K" is a tolerance letter instead, it is 10 Ω ±10 %.');
  });

  it('words a salvage verdict and a refusal of the input in French and German', () => {
    const fuse = judgeSubstitute(part('fuse', { currentA: 3.15 }), part('fuse', { currentA: 13 })).said.reasons[0];
    expect(inLang('fr', fuse)).toContain('13');
    expect(inLang('fr', fuse)).toContain('3,15');
    const range = refusal(() => rectifiedPeak(99.5));
    expect(inLang('de', range)).toBe(
      'Geben Sie eine Netzspannung von 100 V bis 253 V eff. ein (230 V + 10 %); 99,5 V liegt außerhalb des Bereichs dieses Rechners.',
    );
    // A package not recorded is compared as "unknown", and said so in the reader's language.
    const npnPart = part('bipolar-transistor', { polarity: 'NPN', voltageV: 400, currentA: 4 }, 'TO-220');
    const unknown = judgeSubstitute(npnPart, { ...npnPart, package: undefined }).said.warnings[0];
    expect(inLang('fr', unknown)).toContain(bench.fr['bench.calc.term.unknown']);
    expect(english(unknown)).toMatch(/^Packages TO-220 and unknown cannot be compared/);
    const kind = judgeSubstitute(part('bipolar-transistor', {}), part('mosfet', {})).said.reasons[0];
    expect(inLang('de', kind)).toBe(
      bench.de['bench.tool.sub.otherKind']
        .replace('{cand}', bench.de['bench.tool.part.mosfet'])
        .replace('{need}', bench.de['bench.tool.part.bipolar-transistor']),
    );
  });
});
