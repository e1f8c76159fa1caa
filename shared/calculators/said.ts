/**
 * What the shared calculators and the salvage match say, as a code and its values (as shared/safety's
 * `safetyFaults`): a screen words it in the reader's language from the bench catalog (`bench.<code>`, see the
 * client's toolkit `saidIn`), and `english` gives the English that the API, the logs and the tests read. A value
 * is a figure (a number, a quantity with its unit, a resistance), a word said in the reader's language (a term:
 * `bench.<term>`, with its English), or text that is the same in every language (a package name, a code typed).
 */
export interface Term {
  term: string;
  en: string;
}
/** A figure with its unit: "+5 %" (sign '+': a plus when above 0), "±5 %", "0.65 V". */
export interface Quantity {
  n: number;
  unit?: string;
  sign?: '+' | '±';
}
export interface Ohms {
  ohms: number;
}
export type SaidValue = string | number | Term | Quantity | Ohms;
export interface Said {
  code: SentenceCode;
  values: Record<string, SaidValue>;
}

/** "4.7 kΩ", "0.47 Ω", "1 MΩ": at most four significant digits, trailing zeros dropped. */
export function ohmsText(value: number): string {
  const abs = Math.abs(value);
  const [scale, prefix] = abs >= 1e9 ? [1e9, 'G'] : abs >= 1e6 ? [1e6, 'M'] : abs >= 1e3 ? [1e3, 'k'] : [1, ''];
  return `${Number((value / scale).toPrecision(4))} ${prefix}Ω`;
}

/** Every sentence by its code, in English; `bench.<code>` holds it in each language (tests/unit/calculator-said). */
export const SENTENCES = {
  // the diode test of a bipolar transistor (transistors.ts)
  'calc.dt.negative': 'The reading with red on {red} and black on {black} must be a voltage of 0 or more, or OL.',
  'calc.dt.millivolts':
    'The reading with red on {red} and black on {black} is {r} V: enter volts (0.65, not 650), or OL.',
  'calc.dt.shortResistor':
    'The {pair} pair reads short both ways ({a}, {b}): the transistor has failed (unless its datasheet shows a built-in base–emitter resistor).',
  'calc.dt.short': 'The {pair} pair reads short both ways ({a}, {b}): the transistor has failed.',
  'calc.dt.leakyResistor':
    'The {pair} pair conducts both ways ({a}, {b}): leaky or shorted, the transistor has failed (unless its datasheet shows a built-in base–emitter resistor).',
  'calc.dt.leaky': 'The {pair} pair conducts both ways ({a}, {b}): leaky or shorted, the transistor has failed.',
  'calc.dt.open': 'The {pair} junction is open both ways: the transistor has failed.',
  'calc.dt.opposite':
    'The base–emitter and base–collector junctions point opposite ways: check which lead is the base and measure again.',
  'calc.dt.damper':
    'Collector–emitter conducts one way ({v}): a built-in damper diode (common in line-output and some switching transistors) reads like this — check the datasheet; without one, the transistor has failed.',
  'calc.dt.ceConducts':
    'Collector–emitter conducts ({v}) where it should be open both ways: the transistor has failed.',
  'calc.dt.low':
    '{pair} reads {v} V, low for a silicon junction: a germanium part, a leaky junction, or other parts in circuit.',
  'calc.dt.high':
    '{pair} reads {v} V, high for a single junction: a Darlington reads about twice a junction base–emitter; otherwise suspect it.',
  'calc.dt.good':
    '{polarity}: base–emitter {be} V and base–collector {bc} V one way only, collector–emitter open both ways. The junctions test good; this does not prove gain or breakdown voltage.',
  'calc.dt.swapped':
    'Base–collector reads higher than base–emitter, usually the other way round: check collector and emitter are not swapped.',
  // a measured resistance (measure.ts)
  'calc.m.open': 'The meter reads OL: the resistor is open circuit (or the leads are not touching it).',
  'calc.m.edge': '{net} Ω is {signed} from {nominal} Ω: within ±{tol} %, at the edge.',
  'calc.m.within': '{net} Ω is {signed} from {nominal} Ω: within ±{tol} %.',
  'calc.m.uncertain':
    "{net} Ω is {signed} from {nominal} Ω: outside ±{tol} %, but within the meter's ±{u} Ω — in the right range; this meter cannot prove the tolerance.",
  'calc.m.short':
    '{net} Ω is {signed} from {nominal} Ω: outside ±{tol} %. It reads no more than the shorted leads: a short. Measure it out of circuit before replacing it: parts in parallel read low.',
  'calc.m.outside':
    '{net} Ω is {signed} from {nominal} Ω: outside ±{tol} %. Measure it out of circuit before replacing it: parts in parallel read low.',
  'calc.m.e.leads': 'The leads reading must be zero or more ohms.',
  'calc.m.e.reading': 'A resistance reading is zero or more ohms, or OL.',
  'calc.m.e.nominal':
    'The nominal value must be above 0 Ω. For a 0 Ω link, check that it reads the same as the shorted leads.',
  'calc.m.e.tolerance': 'The tolerance is a percentage above 0 and below 100.',
  'calc.m.e.uncertainty': 'The meter uncertainty must be zero or more ohms.',
  // a transistor substitute (transistors.ts); a1 and a2 are the English articles, for the English sentence only
  'calc.t.e.type': 'The {which} type must be one of {list}.',
  'calc.t.e.number': 'The {which} {what} must be a number above 0.',
  'calc.t.e.optional': 'The {which} {what}, when given, must be a number above 0.',
  'calc.t.e.package': 'Give the {which} package, e.g. TO-220.',
  'calc.t.e.pinout': 'The {which} pin-out uses the letters {letters}, e.g. {ex}.',
  'calc.t.sameType': 'Same type ({t}).',
  'calc.t.mosfetBipolar':
    '{a1} {cand} cannot replace {a2} {orig}: a MOSFET is driven by gate voltage, a bipolar transistor by base current.',
  'calc.t.polarity': 'Opposite polarity: {a1} {cand} cannot replace {a2} {orig}.',
  'calc.t.ratingOk': '{name} {c} {unit} ≥ {o} {unit2}.',
  'calc.t.below': "{name} {c} {unit} is below the original's {o} {unit2}.",
  'calc.t.samePackage': 'Same package ({p}).',
  'calc.t.unknownPackages':
    'Packages {a} and {b} cannot be compared here: check size, mounting and pin-out against both datasheets.',
  'calc.t.mount': 'A {mc} {pc} does not fit the board made for a {mo} {po}.',
  'calc.t.larger':
    'Larger package ({pc} for {po}): check it fits the space and the heatsink, that the mounting hole lines up and the leads reach, and check the pin-out — it often differs between packages.',
  'calc.t.smaller':
    'Smaller package ({pc} for {po}): it sheds heat through a smaller face; check it sits flat on the heatsink and the clamp or screw holds it, and check the pin-out.',
  'calc.t.similar':
    'Different package of similar size ({pc} for {po}): check the mounting hole, the heatsink contact and the pin-out.',
  'calc.t.liveTab':
    "The {pc}'s tab or case is connected to the {lead}, the original's was not: if it touches a heatsink or the chassis, fit an insulating pad and bush and check the insulation.",
  'calc.t.pinoutUnknown': 'Pin-out not compared: check it on both datasheets before fitting.',
  'calc.t.samePinout': 'Same pin-out ({p}).',
  'calc.t.differentPinout':
    'Different pin-out ({pc} for {po}): the leads must be re-formed or crossed — mark each one, keep them apart, and check against both datasheets before power goes on.',
  'calc.t.gainOk': 'Gain hFE {c} ≥ {o}.',
  'calc.t.gainLow':
    'Lower gain (hFE {c} for {o}): it may not switch fully on with the same base drive and would then run hot.',
  'calc.t.ftOk': 'fT {c} MHz ≥ {o} MHz.',
  'calc.t.slower':
    'Slower part (fT {c} MHz for {o} MHz): in a switching or high-frequency stage it can run hot or fail.',
  'calc.t.gateOk': 'Gate threshold {c} V ≤ {o} V.',
  'calc.t.gateHigh':
    'Higher gate threshold ({c} V for {o} V): the same gate drive may not turn it fully on; check the drive voltage.',
  'calc.t.fallOk': 'Fall time {c} ns ≤ {o} ns.',
  'calc.t.fallSlow':
    'Slower switching (fall time {c} ns for {o} ns): in a switch-mode supply it runs hotter and may fail.',
  // a salvaged part judged as a substitute (shared/salvage/match.ts)
  'tool.sub.giveNeeded': 'Give the polarity, voltage and current needed to check a substitute.',
  'tool.sub.notAllRecorded': 'This part’s ratings are not all recorded: look up its datasheet before fitting it.',
  'tool.sub.powerUnknown': 'The power rating is not recorded on both: check it on the datasheet.',
  'tool.sub.otherKind': 'It is a {cand}, not a {need}.',
  'tool.sub.notRecorded': 'Its {what} is not recorded; check it on the part.',
  'tool.sub.below': 'Its {what} of {c} {unit} is below the {n} {unit2} needed.',
  'tool.sub.valueOff': 'Its value of {c} Ω is not within ±{tol} % of {n} Ω.',
  'tool.sub.valueUnknown': 'Its value is unknown and is not within ±{tol} % of {n} Ω.',
  'tool.sub.capacitance': 'Its capacitance is not within ±20 % of the one needed.',
  'tool.sub.fuseGive': 'Give the current rating of the fuse needed: a fuse is replaced only by one of the same rating.',
  'tool.sub.fuseUnknown': 'Its current rating is not recorded: a fuse is replaced only by one of the same rating.',
  'tool.sub.fuseHigher': 'A {c} A fuse would not protect what a {n} A fuse protects.',
  'tool.sub.fuseLower': 'A {c} A fuse is not the {n} A needed: it would blow in normal use.',
  'tool.sub.cutout': 'A cut-out must trip at the same temperature ({t} °C); never fit a different one.',
  'tool.sub.output': 'Its output of {c} V is not the {n} V needed.',
  'tool.sub.package': 'It comes in {c}, not {n}: check that it fits and how it is mounted.',
  // resistor bands and codes (resistors.ts)
  'calc.r.singleBlack': 'A single black band is a 0 Ω link.',
  'calc.r.bandCount': 'A resistor has 3, 4 or 5 bands; {n} were given.',
  'calc.r.firstGold':
    'The first band is never gold or silver: that is the tolerance end — read the resistor from the other end.',
  'calc.r.fiveBand': 'A five-band resistor always has a tolerance band; check the band count.',
  'calc.r.digitBand': 'Band {i} is a digit and cannot be {c}.',
  'calc.r.firstBlack':
    'The first band is never black; read the resistor from the other end, or check the colours in daylight.',
  'calc.r.multiplier': 'The multiplier band cannot be {c}.',
  'calc.r.toleranceBand': 'The tolerance band cannot be {c}; tolerance colours are {list}.',
  'calc.r.notFinite': 'A resistance must be a finite number of ohms.',
  'calc.r.empty': 'Type the code printed on the resistor, e.g. 103, 4R7 or 1002.',
  'calc.r.zeros': 'A code of zeros is a 0 Ω link (a jumper).',
  'calc.r.threeDigits': 'Three-digit codes are usually ±5 % parts (common practice, not a rule).',
  'calc.r.fourDigits': 'Four-digit codes are usually ±1 % parts (common practice, not a rule).',
  'calc.r.eia96Note':
    'On a 1 % SMD part, two digits and a letter may be an EIA-96 code instead; check the EIA-96 table.',
  'calc.r.either': 'Read as {a}; if "{l}" is a tolerance letter instead, it is {b} {pct}.',
  'calc.r.eia96':
    '"{code}" looks like an EIA-96 code (two digits and a letter), which this calculator does not decode; look it up in the EIA-96 table.',
  'calc.r.notCode':
    '"{code}" is not a resistor code: use 3 or 4 digits (103, 1002), R/K/M notation (4R7, R47, 4K7, 2M2), optionally with a tolerance letter (B C D F G J K M).',
  'calc.r.notLetter': '"{l}" is not a tolerance letter; they are {list}.',
  // E-series, mains peak, capacitor discharge (e-series.ts, mains.ts, capacitors.ts), earth limit (safety/limits.ts)
  'calc.es.above0': 'Enter a resistance above 0 Ω.',
  'calc.es.series': 'Unknown series "{series}"; use E6, E12 or E24.',
  'calc.mp.range':
    'Enter a mains voltage from {min} V to {max} V rms (230 V + 10 %); {v} V is outside the range this calculator covers.',
  'calc.mp.rangeNotNumber':
    'Enter a mains voltage from {min} V to {max} V rms (230 V + 10 %); that is outside the range this calculator covers.',
  'calc.c.above0': '{what} must be a number above 0.',
  'calc.c.zeroOrMore': '{what} must be zero or more.',
  'calc.c.voltage': 'The voltage must be a number.',
  'calc.el.cord': 'Cord length must be zero or more metres.',
} as const;
export type SentenceCode = keyof typeof SENTENCES;

/** A word said in the reader's language: `bench.<term>`, `en` in English. */
export const term = (key: string, en: string): Term => ({ term: key, en });

export const isTerm = (v: SaidValue): v is Term => typeof v === 'object' && 'term' in v;
export const isOhms = (v: SaidValue): v is Ohms => typeof v === 'object' && 'ohms' in v;

/** A quantity with its sign and unit, its figure written by `figure` (String in English). */
export function quantityText(q: Quantity, figure: (n: number) => string = String): string {
  const sign = q.sign === '±' ? '±' : q.sign === '+' && q.n > 0 ? '+' : '';
  return `${sign}${figure(q.n)}${q.unit ? ` ${q.unit}` : ''}`;
}

/** A value as the English sentence has it. */
export function englishValue(v: SaidValue): string {
  if (typeof v === 'string') return v;
  if (typeof v === 'number') return String(v);
  if (isTerm(v)) return v.en;
  if (isOhms(v)) return ohmsText(v.ohms);
  return quantityText(v);
}

/** The sentence in English, as the API and the tests read it. */
export const english = (s: Said): string =>
  SENTENCES[s.code].replace(/\{(\w+)\}/g, (whole, name: string) =>
    name in s.values ? englishValue(s.values[name]) : whole,
  );

export const said = (code: SentenceCode, values: Record<string, SaidValue> = {}): Said => ({ code, values });

/** The shared calculators' refusal of their input: a RangeError whose message is the English of `said`. */
export class CalcError extends RangeError {
  constructor(public said: Said) {
    super(english(said));
  }
}
export const refuse = (code: SentenceCode, values: Record<string, SaidValue> = {}): CalcError =>
  new CalcError(said(code, values));
