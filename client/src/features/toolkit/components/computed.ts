import type { Language } from '../../../../../shared/i18n/languages';
import { tr } from '../../../lib/i18n';
import { decimalsIn } from './numbers';

/**
 * The English sentences the shared calculators write (shared/calculators/measure.ts and the diode test in
 * transistors.ts), each with its catalog key: a sentence is found by its words, its {placeholders} give the figures
 * back, and the reader's language puts them in its own place with its own decimal sign. A sentence not listed stays
 * in English. Placeholders named in JUNCTIONS are junction names, said in the reader's language too.
 */
const RULES: [string, string][] = [
  // diode test
  [
    'The reading with red on {red} and black on {black} must be a voltage of 0 or more, or OL.',
    'bench.calc.dt.negative',
  ],
  [
    'The reading with red on {red} and black on {black} is {r} V: enter volts (0.65, not 650), or OL.',
    'bench.calc.dt.millivolts',
  ],
  [
    'The {pair} pair reads short both ways ({a}, {b}): the transistor has failed (unless its datasheet shows a built-in base–emitter resistor).',
    'bench.calc.dt.shortResistor',
  ],
  ['The {pair} pair reads short both ways ({a}, {b}): the transistor has failed.', 'bench.calc.dt.short'],
  [
    'The {pair} pair conducts both ways ({a}, {b}): leaky or shorted, the transistor has failed (unless its datasheet shows a built-in base–emitter resistor).',
    'bench.calc.dt.leakyResistor',
  ],
  [
    'The {pair} pair conducts both ways ({a}, {b}): leaky or shorted, the transistor has failed.',
    'bench.calc.dt.leaky',
  ],
  ['The {pair} junction is open both ways: the transistor has failed.', 'bench.calc.dt.open'],
  [
    'The base–emitter and base–collector junctions point opposite ways: check which lead is the base and measure again.',
    'bench.calc.dt.opposite',
  ],
  [
    'Collector–emitter conducts one way ({v}): a built-in damper diode (common in line-output and some switching transistors) reads like this — check the datasheet; without one, the transistor has failed.',
    'bench.calc.dt.damper',
  ],
  [
    'Collector–emitter conducts ({v}) where it should be open both ways: the transistor has failed.',
    'bench.calc.dt.ceConducts',
  ],
  [
    '{pair} reads {v} V, low for a silicon junction: a germanium part, a leaky junction, or other parts in circuit.',
    'bench.calc.dt.low',
  ],
  [
    '{pair} reads {v} V, high for a single junction: a Darlington reads about twice a junction base–emitter; otherwise suspect it.',
    'bench.calc.dt.high',
  ],
  [
    '{polarity}: base–emitter {be} V and base–collector {bc} V one way only, collector–emitter open both ways. The junctions test good; this does not prove gain or breakdown voltage.',
    'bench.calc.dt.good',
  ],
  [
    'Base–collector reads higher than base–emitter, usually the other way round: check collector and emitter are not swapped.',
    'bench.calc.dt.swapped',
  ],
  // measured resistance
  ['The meter reads OL: the resistor is open circuit (or the leads are not touching it).', 'bench.calc.m.open'],
  ['{net} Ω is {signed} from {nominal} Ω: within ±{tol} %, at the edge.', 'bench.calc.m.edge'],
  ['{net} Ω is {signed} from {nominal} Ω: within ±{tol} %.', 'bench.calc.m.within'],
  [
    "{net} Ω is {signed} from {nominal} Ω: outside ±{tol} %, but within the meter's ±{u} Ω — in the right range; this meter cannot prove the tolerance.",
    'bench.calc.m.uncertain',
  ],
  [
    '{net} Ω is {signed} from {nominal} Ω: outside ±{tol} %. It reads no more than the shorted leads: a short. Measure it out of circuit before replacing it: parts in parallel read low.',
    'bench.calc.m.short',
  ],
  [
    '{net} Ω is {signed} from {nominal} Ω: outside ±{tol} %. Measure it out of circuit before replacing it: parts in parallel read low.',
    'bench.calc.m.outside',
  ],
  ['The leads reading must be zero or more ohms.', 'bench.calc.m.e.leads'],
  ['A resistance reading is zero or more ohms, or OL.', 'bench.calc.m.e.reading'],
  [
    'The nominal value must be above 0 Ω. For a 0 Ω link, check that it reads the same as the shorted leads.',
    'bench.calc.m.e.nominal',
  ],
  ['The tolerance is a percentage above 0 and below 100.', 'bench.calc.m.e.tolerance'],
  ['The meter uncertainty must be zero or more ohms.', 'bench.calc.m.e.uncertainty'],
];

const JUNCTIONS: Record<string, string> = {
  'base–emitter': 'be',
  'base–collector': 'bc',
  'collector–emitter': 'ce',
  'Base–emitter': 'be',
  'Base–collector': 'bc',
};

const escape = (s: string) => s.replace(/[.*+?^$()|[\]\\]/g, '\\$&');
const COMPILED = RULES.map(([en, key]) => ({
  key,
  names: [...en.matchAll(/\{(\w+)\}/g)].map((m) => m[1]),
  re: new RegExp(`^${escape(en).replace(/\\?\{(\w+)\\?\}/g, '(.+?)')}$`),
}));

/** A sentence of the shared calculators in the reader's language; English (and an unknown sentence) as it came. */
export function computedText(text: string, lang: Language): string {
  if (lang === 'en') return text;
  for (const { key, names, re } of COMPILED) {
    const m = re.exec(text);
    if (!m) continue;
    const values = Object.fromEntries(
      names.map((n, i) => [
        n,
        n === 'pair' && m[i + 1] in JUNCTIONS ? tr(`bench.calc.junction.${JUNCTIONS[m[i + 1]]}`) : m[i + 1],
      ]),
    );
    return decimalsIn(tr(key, values), lang);
  }
  return text;
}
