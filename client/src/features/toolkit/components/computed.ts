import type { Language } from '../../../../../shared/i18n/languages';
import { PART_TYPES } from '../../../../../shared/salvage/constants';
import { tr } from '../../../lib/i18n';
import { decimalsIn } from './numbers';

/**
 * The English sentences the shared calculators write (shared/calculators/measure.ts, and the diode test and the
 * substitute check in transistors.ts, resistors.ts, e-series.ts, mains.ts, capacitors.ts, shared/safety/limits.ts;
 * the salvage match in shared/salvage/match.ts), each with its catalog key: a sentence is found by its words, its {placeholders} give the figures
 * back, and the reader's language puts them in its own place with its own decimal sign. A sentence not listed stays
 * in English. Junction names and the words in TERMS are said in the reader's language too.
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
  // transistor substitute
  ['Same type ({t}).', 'bench.calc.t.sameType'],
  [
    '{a1} {cand} cannot replace {a2} {orig}: a MOSFET is driven by gate voltage, a bipolar transistor by base current.',
    'bench.calc.t.mosfetBipolar',
  ],
  ['Opposite polarity: {a1} {cand} cannot replace {a2} {orig}.', 'bench.calc.t.polarity'],
  ["{name} {c} {unit} is below the original's {o} {unit2}.", 'bench.calc.t.below'],
  // No words, but figures: said again for the language's decimal sign.
  ['fT {c} MHz ≥ {o} MHz.', 'bench.calc.t.ftOk'],
  ['{name} {c} {unit} ≥ {o} {unit2}.', 'bench.calc.t.ratingOk'],
  ['Same package ({p}).', 'bench.calc.t.samePackage'],
  [
    'Packages {a} and {b} cannot be compared here: check size, mounting and pin-out against both datasheets.',
    'bench.calc.t.unknownPackages',
  ],
  ['A {mc} {pc} does not fit the board made for a {mo} {po}.', 'bench.calc.t.mount'],
  [
    'Larger package ({pc} for {po}): check it fits the space and the heatsink, that the mounting hole lines up and the leads reach, and check the pin-out — it often differs between packages.',
    'bench.calc.t.larger',
  ],
  [
    'Smaller package ({pc} for {po}): it sheds heat through a smaller face; check it sits flat on the heatsink and the clamp or screw holds it, and check the pin-out.',
    'bench.calc.t.smaller',
  ],
  [
    'Different package of similar size ({pc} for {po}): check the mounting hole, the heatsink contact and the pin-out.',
    'bench.calc.t.similar',
  ],
  [
    "The {pc}'s tab or case is connected to the {lead}, the original's was not: if it touches a heatsink or the chassis, fit an insulating pad and bush and check the insulation.",
    'bench.calc.t.liveTab',
  ],
  ['Pin-out not compared: check it on both datasheets before fitting.', 'bench.calc.t.pinoutUnknown'],
  ['Same pin-out ({p}).', 'bench.calc.t.samePinout'],
  [
    'Different pin-out ({pc} for {po}): the leads must be re-formed or crossed — mark each one, keep them apart, and check against both datasheets before power goes on.',
    'bench.calc.t.differentPinout',
  ],
  ['Gain hFE {c} ≥ {o}.', 'bench.calc.t.gainOk'],
  [
    'Lower gain (hFE {c} for {o}): it may not switch fully on with the same base drive and would then run hot.',
    'bench.calc.t.gainLow',
  ],
  [
    'Slower part (fT {c} MHz for {o} MHz): in a switching or high-frequency stage it can run hot or fail.',
    'bench.calc.t.slower',
  ],
  ['Gate threshold {c} V ≤ {o} V.', 'bench.calc.t.gateOk'],
  [
    'Higher gate threshold ({c} V for {o} V): the same gate drive may not turn it fully on; check the drive voltage.',
    'bench.calc.t.gateHigh',
  ],
  ['Fall time {c} ns ≤ {o} ns.', 'bench.calc.t.fallOk'],
  [
    'Slower switching (fall time {c} ns for {o} ns): in a switch-mode supply it runs hotter and may fail.',
    'bench.calc.t.fallSlow',
  ],
  ['The {which} {what}, when given, must be a number above 0.', 'bench.calc.t.e.optional'],
  ['The {which} {what} must be a number above 0.', 'bench.calc.t.e.number'],
  ['Give the {which} package, e.g. TO-220.', 'bench.calc.t.e.package'],
  ['The {which} pin-out uses the letters {letters}, e.g. {ex}.', 'bench.calc.t.e.pinout'],
  // a salvaged part judged as a substitute (shared/salvage/match.ts), on the item page
  ['Give the polarity, voltage and current needed to check a substitute.', 'bench.tool.sub.giveNeeded'],
  [
    'This part’s ratings are not all recorded: look up its datasheet before fitting it.',
    'bench.tool.sub.notAllRecorded',
  ],
  ['The power rating is not recorded on both: check it on the datasheet.', 'bench.tool.sub.powerUnknown'],
  ['It is a {cand}, not a {need}.', 'bench.tool.sub.otherKind'],
  ['Its {what} is not recorded; check it on the part.', 'bench.tool.sub.notRecorded'],
  ['Its {what} of {c} {unit} is below the {n} {unit2} needed.', 'bench.tool.sub.below'],
  ['Its value of {c} Ω is not within ±{tol} % of {n} Ω.', 'bench.tool.sub.valueOff'],
  ['Its value is unknown and is not within ±{tol} % of {n} Ω.', 'bench.tool.sub.valueUnknown'],
  ['Its capacitance is not within ±20 % of the one needed.', 'bench.tool.sub.capacitance'],
  [
    'Give the current rating of the fuse needed: a fuse is replaced only by one of the same rating.',
    'bench.tool.sub.fuseGive',
  ],
  [
    'Its current rating is not recorded: a fuse is replaced only by one of the same rating.',
    'bench.tool.sub.fuseUnknown',
  ],
  ['A {c} A fuse would not protect what a {n} A fuse protects.', 'bench.tool.sub.fuseHigher'],
  ['A {c} A fuse is not the {n} A needed: it would blow in normal use.', 'bench.tool.sub.fuseLower'],
  ['A cut-out must trip at the same temperature ({t} °C); never fit a different one.', 'bench.tool.sub.cutout'],
  ['Its output of {c} V is not the {n} V needed.', 'bench.tool.sub.output'],
  ['It comes in {c}, not {n}: check that it fits and how it is mounted.', 'bench.tool.sub.package'],
  // resistor codes and bands, E-series, mains peak, capacitor discharge, earth limit
  [
    'The first band is never black; read the resistor from the other end, or check the colours in daylight.',
    'bench.calc.r.firstBlack',
  ],
  ['A code of zeros is a 0 Ω link (a jumper).', 'bench.calc.r.zeros'],
  ['Three-digit codes are usually ±5 % parts (common practice, not a rule).', 'bench.calc.r.threeDigits'],
  ['Four-digit codes are usually ±1 % parts (common practice, not a rule).', 'bench.calc.r.fourDigits'],
  [
    'On a 1 % SMD part, two digits and a letter may be an EIA-96 code instead; check the EIA-96 table.',
    'bench.calc.r.eia96Note',
  ],
  ['Read as {a}; if "{l}" is a tolerance letter instead, it is {b} {pct}.', 'bench.calc.r.either'],
  [
    '"{code}" looks like an EIA-96 code (two digits and a letter), which this calculator does not decode; look it up in the EIA-96 table.',
    'bench.calc.r.eia96',
  ],
  [
    '"{code}" is not a resistor code: use 3 or 4 digits (103, 1002), R/K/M notation (4R7, R47, 4K7, 2M2), optionally with a tolerance letter (B C D F G J K M).',
    'bench.calc.r.notCode',
  ],
  ['"{l}" is not a tolerance letter; they are {list}.', 'bench.calc.r.notLetter'],
  ['Enter a resistance above 0 Ω.', 'bench.calc.es.above0'],
  [
    'Enter a mains voltage from {min} V to {max} V rms (230 V + 10 %); {v} V is outside the range this calculator covers.',
    'bench.calc.mp.range',
  ],
  ['{what} must be a number above 0.', 'bench.calc.c.above0'],
  ['{what} must be zero or more.', 'bench.calc.c.zeroOrMore'],
  ['Cord length must be zero or more metres.', 'bench.calc.el.cord'],
];

const JUNCTIONS: Record<string, string> = {
  'base–emitter': 'be',
  'base–collector': 'bc',
  'collector–emitter': 'ce',
  'Base–emitter': 'be',
  'Base–collector': 'bc',
};
/** Words the transistor check puts into its sentences, said in the reader's language. */
const TERMS: Record<string, string> = {
  'surface-mount': 'smd',
  'through-hole': 'tht',
  collector: 'collector',
  drain: 'drain',
  original: 'original',
  replacement: 'replacement',
  'voltage rating': 'voltage',
  'current rating': 'current',
  'power rating': 'power',
  gain: 'gain',
  'transition frequency': 'ft',
  'gate threshold': 'vgs',
  'fall time': 'fall',
  'B, C and E': 'bce',
  'G, D and S': 'gds',
  unknown: 'unknown',
  'The capacitance': 'theCapacitance',
  'The discharge resistor': 'theResistor',
  'The capacitor voltage': 'theVoltage',
};
/** The kinds of part as match.ts writes them ('bipolar transistor'), by their keys. */
const PART_KINDS = new Set<string>(PART_TYPES);
const valueIn = (name: string, v: string) =>
  (name === 'cand' || name === 'need') && PART_KINDS.has(v.replace(' ', '-'))
    ? tr(`bench.tool.part.${v.replace(' ', '-')}`)
    : name === 'pair' && v in JUNCTIONS
      ? tr(`bench.calc.junction.${JUNCTIONS[v]}`)
      : name !== 'name' && Object.hasOwn(TERMS, v)
        ? tr(`bench.calc.term.${TERMS[v]}`)
        : v;

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
    const values = Object.fromEntries(names.map((n, i) => [n, valueIn(n, m[i + 1])]));
    return decimalsIn(tr(key, values), lang);
  }
  return text;
}
