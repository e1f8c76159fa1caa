/**
 * Resistor markings: colour bands and printed (SMD / RKM) codes, per IEC 60062 as remembered — the standard was
 * not checked, so the tables below are the common ones every parts catalogue repeats. Invalid input throws a
 * CalcError (./said: a RangeError with a code and values a screen words for the fixer; English as its message).
 */
import { english, ohmsText, refuse, said, term, type Said } from './said';

export const RESISTOR_CODE_SOURCE = 'IEC 60062 (from memory, not checked against the standard)';

export const DIGIT_COLOURS = [
  'black',
  'brown',
  'red',
  'orange',
  'yellow',
  'green',
  'blue',
  'violet',
  'grey',
  'white',
] as const;
export type DigitColour = (typeof DIGIT_COLOURS)[number];
export const MULTIPLIER_COLOURS = [...DIGIT_COLOURS, 'gold', 'silver'] as const;
export type MultiplierColour = (typeof MULTIPLIER_COLOURS)[number];
export const TOLERANCE_COLOURS = ['brown', 'red', 'green', 'blue', 'violet', 'gold', 'silver', 'none'] as const;
export type ToleranceColour = (typeof TOLERANCE_COLOURS)[number];
export type BandColour = MultiplierColour | 'none';

/** Tolerance in ± percent by colour; 'none' is a missing fourth band. Grey (0.05 %) and others of newer editions are left out: not in our reference. */
export const TOLERANCE_BY_COLOUR: Record<ToleranceColour, number> = {
  brown: 1,
  red: 2,
  green: 0.5,
  blue: 0.25,
  violet: 0.1,
  gold: 5,
  silver: 10,
  none: 20,
};

/** Power of ten by multiplier colour. */
export const MULTIPLIER_EXPONENT: Record<MultiplierColour, number> = {
  black: 0,
  brown: 1,
  red: 2,
  orange: 3,
  yellow: 4,
  green: 5,
  blue: 6,
  violet: 7,
  grey: 8,
  white: 9,
  gold: -1,
  silver: -2,
};

/** Tolerance letters printed after a value code. */
export const TOLERANCE_BY_LETTER = { B: 0.1, C: 0.25, D: 0.5, F: 1, G: 2, J: 5, K: 10, M: 20 } as const;
export type ToleranceLetter = keyof typeof TOLERANCE_BY_LETTER;

export interface ResistorValue {
  ohms: number;
  /** ± percent; null when the marking carries none (a printed code without a letter). */
  tolerancePct: number | null;
  /** The band the tolerance allows, when it is known. */
  minOhms: number | null;
  maxOhms: number | null;
  /** e.g. "4.7 kΩ ±5 %". */
  text: string;
  /** Anything the fixer should know about reading this marking. */
  notes: string[];
  /** The notes as codes and values, for a screen to word in the reader's language. */
  notesSaid: Said[];
}

/** Twelve significant digits removes binary noise such as 47 × 0.01 = 0.47000000000000003. */
const clean = (x: number) => Number(x.toPrecision(12));

const isDigitColour = (c: string): c is DigitColour => (DIGIT_COLOURS as readonly string[]).includes(c);
const isMultiplierColour = (c: string): c is MultiplierColour => (MULTIPLIER_COLOURS as readonly string[]).includes(c);
const isToleranceColour = (c: string): c is ToleranceColour => (TOLERANCE_COLOURS as readonly string[]).includes(c);

/** "4.7 kΩ", "0.47 Ω", "1 MΩ": at most four significant digits, trailing zeros dropped. */
export function formatOhms(value: number): string {
  if (!Number.isFinite(value)) throw refuse('calc.r.notFinite');
  return ohmsText(value);
}

const formatPct = (pct: number) => `±${pct} %`;

function valueOf(ohms: number, tolerancePct: number | null, notes: Said[] = []): ResistorValue {
  const band = tolerancePct === null ? null : (ohms * tolerancePct) / 100;
  return {
    ohms,
    tolerancePct,
    minOhms: band === null ? null : clean(ohms - band),
    maxOhms: band === null ? null : clean(ohms + band),
    text: tolerancePct === null ? formatOhms(ohms) : `${formatOhms(ohms)} ${formatPct(tolerancePct)}`,
    notes: notes.map(english),
    notesSaid: notes,
  };
}

/**
 * Colour bands read from the end away from the tolerance band: 4 bands (digit, digit, multiplier, tolerance),
 * 3 bands or a 4th band of 'none' (±20 %), 5 bands (three digits, multiplier, tolerance), or one black band
 * (a 0 Ω link).
 */
export function decodeBands(bands: readonly BandColour[]): ResistorValue {
  if (bands.length === 1 && bands[0] === 'black') return valueOf(0, null, [said('calc.r.singleBlack')]);
  if (bands.length < 3 || bands.length > 5) throw refuse('calc.r.bandCount', { n: bands.length });
  const toleranceBand: BandColour = bands.length === 3 ? 'none' : bands[bands.length - 1];
  const valueBands = bands.length === 3 ? bands : bands.slice(0, -1);
  const digitBands = valueBands.slice(0, -1);
  const multiplier = valueBands[valueBands.length - 1];
  if (bands[0] === 'gold' || bands[0] === 'silver') throw refuse('calc.r.firstGold');
  if (bands.length === 5 && toleranceBand === 'none') throw refuse('calc.r.fiveBand');
  digitBands.forEach((c, i) => {
    if (!isDigitColour(c)) throw refuse('calc.r.digitBand', { i: i + 1, c: colour(c) });
  });
  if (digitBands[0] === 'black') throw refuse('calc.r.firstBlack');
  if (!isMultiplierColour(multiplier)) throw refuse('calc.r.multiplier', { c: colour(multiplier) });
  if (!isToleranceColour(toleranceBand))
    throw refuse('calc.r.toleranceBand', { c: colour(toleranceBand), list: TOLERANCE_COLOURS.join(', ') });
  const digits = Number(digitBands.map((c) => DIGIT_COLOURS.indexOf(c as DigitColour)).join(''));
  return valueOf(clean(digits * 10 ** MULTIPLIER_EXPONENT[multiplier]), TOLERANCE_BY_COLOUR[toleranceBand]);
}

/** A band's colour, said in the reader's language (bench.calc.colour.*). */
const colour = (c: string) => term(`calc.colour.${c}`, c);

const isToleranceLetter = (s: string): s is ToleranceLetter => Object.hasOwn(TOLERANCE_BY_LETTER, s);

export function toleranceFromLetter(letter: string): number {
  const up = letter.toUpperCase();
  if (!isToleranceLetter(up))
    throw refuse('calc.r.notLetter', { l: letter, list: Object.keys(TOLERANCE_BY_LETTER).join(' ') });
  return TOLERANCE_BY_LETTER[up];
}

const RKM_SCALE = { R: 1, K: 1e3, M: 1e6, G: 1e9 } as const;

/** The value part alone, or null when it is not a value code. */
function valueCode(code: string): { ohms: number; notes: Said[] } | null {
  if (/^0+$/.test(code) && code.length <= 4) return { ohms: 0, notes: [said('calc.r.zeros')] };
  if (/^\d{3}$/.test(code))
    return { ohms: clean(Number(code.slice(0, 2)) * 10 ** Number(code[2])), notes: [said('calc.r.threeDigits')] };
  if (/^\d{4}$/.test(code))
    return { ohms: clean(Number(code.slice(0, 3)) * 10 ** Number(code[3])), notes: [said('calc.r.fourDigits')] };
  // RKM: the letter stands where the decimal point would be and gives the scale (R ohms, K kilo, M mega, G giga).
  const m = /^(\d*)([RKMG])(\d*)$/.exec(code);
  if (m && m[1].length + m[3].length >= 1 && m[1].length + m[3].length <= 4) {
    const scale = RKM_SCALE[m[2] as keyof typeof RKM_SCALE];
    return { ohms: clean(Number(`${m[1] || '0'}.${m[3] || '0'}`) * scale), notes: [] };
  }
  return null;
}

/**
 * A printed code: "103" (two digits and a power of ten), "1002" (three digits and a power), "4R7", "R47", "4K7",
 * "2M2" (RKM), "000" (0 Ω link), each optionally followed by a tolerance letter ("4K7J", "1002F"). Where a trailing
 * K or M could be either a scale or a tolerance ("100K"), the RKM reading is taken — as resistor makers use it —
 * and the other reading is given in the notes.
 */
export function decodePrintedCode(input: string): ResistorValue {
  const code = input.trim().toUpperCase().replace(/\s+/g, '');
  if (code === '') throw refuse('calc.r.empty');
  const whole = valueCode(code);
  const last = code.slice(-1);
  const head = code.slice(0, -1);
  const withLetter = isToleranceLetter(last) && head !== '' ? valueCode(head) : null;
  // Two digits and a letter is also the shape of an EIA-96 code on 1 % SMD parts; say so rather than guess silently.
  const eia96 = /^\d{2}[A-Z]$/.test(code) ? [said('calc.r.eia96Note')] : [];
  if (whole) {
    const notes = [...whole.notes, ...eia96];
    if (withLetter)
      notes.push(
        said('calc.r.either', {
          a: { ohms: whole.ohms },
          l: last,
          b: { ohms: withLetter.ohms },
          pct: { n: toleranceFromLetter(last), unit: '%', sign: '±' },
        }),
      );
    return valueOf(whole.ohms, null, notes);
  }
  if (withLetter)
    return valueOf(
      withLetter.ohms,
      toleranceFromLetter(last),
      // The digits' usual tolerance is no news when the letter gives it.
      withLetter.notes.filter((n) => n.code !== 'calc.r.threeDigits' && n.code !== 'calc.r.fourDigits'),
    );
  if (eia96.length) throw refuse('calc.r.eia96', { code: input.trim() });
  throw refuse('calc.r.notCode', { code: input.trim() });
}

const SCALE = { k: 1e3, K: 1e3, M: 1e6, G: 1e9 } as const;

/**
 * Ohms as typed at the bench: a plain number of ohms ("319", "0,47 Ω"), a number with an SI prefix ("4.7k",
 * "1M"), or the letter-and-digit code where the letter stands for the decimal point ("4k7", "2R2", "R47", "2M2").
 * undefined when empty, NaN when it is not a resistance. Lower-case m is refused: milli or mega?
 */
export function parseOhms(text: string): number | undefined {
  const t = text
    .trim()
    .replace(',', '.')
    .replace(/\s*(Ω|ohms?)$/i, '')
    .trim();
  if (t === '') return undefined;
  const plain = Number(t);
  if (Number.isFinite(plain)) return plain;
  const scaled = /^(\d*\.?\d+)\s*([kKMG])$/.exec(t);
  if (scaled) return clean(Number(scaled[1]) * SCALE[scaled[2] as keyof typeof SCALE]);
  if (/^\d*[RrKkMG]\d*$/.test(t)) {
    try {
      return decodePrintedCode(t).ohms;
    } catch {
      return Number.NaN;
    }
  }
  return Number.NaN;
}
