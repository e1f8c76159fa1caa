/**
 * Transistor substitution and the diode test of a bipolar transistor (common practice, no published source).
 * Invalid input throws a CalcError (./said).
 *
 * Substitution: a wrong type or polarity, or any of Vceo/Vds, Ic/Id, Ptot below the original's, refuses; a
 * different mounting (surface-mount for through-hole) refuses, because it does not fit the board. A larger or
 * otherwise different package, a different pin-out, lower gain, a higher gate threshold or a slower part is
 * accepted with a warning: the fixer can fit it with care, and must be told what to check. A different pin-out is
 * not refused because a larger package usually means re-formed leads anyway; the warning says to mark each lead.
 */
import { english, refuse, said, term, type Said, type SaidValue } from './said';

export const TRANSISTOR_SOURCE = 'Common practice, no published source';

export const TRANSISTOR_TYPES = ['NPN', 'PNP', 'N-MOSFET', 'P-MOSFET'] as const;
export type TransistorType = (typeof TRANSISTOR_TYPES)[number];

interface PackageInfo {
  mount: 'through-hole' | 'surface';
  /** Rough size order within a mounting: larger numbers are bigger bodies and bigger heatsink faces. */
  size: number;
  /** The tab, back or case is connected to the collector or drain. */
  liveTab: boolean;
}

/** Common packages, from memory; TO-220F is the insulated "full pack" TO-220. */
export const PACKAGES = {
  'TO-92': { mount: 'through-hole', size: 1, liveTab: false },
  'TO-126': { mount: 'through-hole', size: 2, liveTab: true },
  'TO-220': { mount: 'through-hole', size: 3, liveTab: true },
  'TO-220F': { mount: 'through-hole', size: 3, liveTab: false },
  'TO-247': { mount: 'through-hole', size: 4, liveTab: true },
  'TO-3P': { mount: 'through-hole', size: 4, liveTab: true },
  'TO-3': { mount: 'through-hole', size: 5, liveTab: true },
  'SOT-23': { mount: 'surface', size: 1, liveTab: false },
  'SOT-223': { mount: 'surface', size: 2, liveTab: true },
  DPAK: { mount: 'surface', size: 3, liveTab: true },
  D2PAK: { mount: 'surface', size: 4, liveTab: true },
} as const satisfies Record<string, PackageInfo>;
export type KnownPackage = keyof typeof PACKAGES;

export interface TransistorSpec {
  type: TransistorType;
  /** Vceo for a bipolar transistor, Vds for a MOSFET. */
  vMaxV: number;
  /** Ic for a bipolar transistor, Id for a MOSFET. */
  iMaxA: number;
  ptotW: number;
  /** A known package name or any other text; unknown names are compared as text. */
  package: string;
  /** Leads left to right, front view: "BCE", "ECB", "GDS"; optional. */
  pinout?: string;
  /** Minimum current gain hFE (bipolar), optional. */
  hfeMin?: number;
  /** Transition frequency fT in MHz (bipolar), optional. */
  ftMHz?: number;
  /** Highest gate threshold voltage Vgs(th) in V (MOSFET), optional. */
  vgsThMaxV?: number;
  /** Fall time in ns from the datasheet's switching table, optional. */
  fallTimeNs?: number;
}

export type SubstitutionVerdict = 'accept' | 'accept-with-warnings' | 'refuse';
export interface SubstitutionResult {
  verdict: SubstitutionVerdict;
  /** Why it is refused; empty unless the verdict is 'refuse'. */
  refusals: string[];
  /** What to check when fitting it. */
  warnings: string[];
  /** The checks it passed, for the record. */
  passed: string[];
  /** The same three lists as codes and values, for a screen to word in the reader's language. */
  said: { refusals: Said[]; warnings: Said[]; passed: Said[] };
}

/** "an NPN", "an N-MOSFET", "a PNP", "a P-MOSFET": the article follows how the letters are said. */
const article = (t: TransistorType, capital = false) =>
  t.startsWith('N') ? (capital ? 'An' : 'an') : capital ? 'A' : 'a';
const isBipolar = (t: TransistorType) => t === 'NPN' || t === 'PNP';
const normalisePackage = (p: string) =>
  p
    .trim()
    .toUpperCase()
    .replace(/\s+/g, '')
    .replace(/^TO(\d)/, 'TO-$1')
    .replace(/^SOT(\d)/, 'SOT-$1');
const knownPackage = (p: string): KnownPackage | null => {
  const n = normalisePackage(p);
  return (Object.keys(PACKAGES) as KnownPackage[]).find((k) => k.toUpperCase() === n) ?? null;
};

function checkSpec(s: TransistorSpec, side: 'original' | 'replacement') {
  const which = term(`calc.term.${side}`, side);
  if (!(TRANSISTOR_TYPES as readonly string[]).includes(s.type))
    throw refuse('calc.t.e.type', { which, list: TRANSISTOR_TYPES.join(', ') });
  for (const [v, key, en] of [
    [s.vMaxV, 'voltage', 'voltage rating'],
    [s.iMaxA, 'current', 'current rating'],
    [s.ptotW, 'power', 'power rating'],
  ] as const) {
    if (!Number.isFinite(v) || v <= 0) throw refuse('calc.t.e.number', { which, what: term(`calc.term.${key}`, en) });
  }
  for (const [v, key, en] of [
    [s.hfeMin, 'gain', 'gain'],
    [s.ftMHz, 'ft', 'transition frequency'],
    [s.vgsThMaxV, 'vgs', 'gate threshold'],
    [s.fallTimeNs, 'fall', 'fall time'],
  ] as const) {
    if (v !== undefined && (!Number.isFinite(v) || v <= 0))
      throw refuse('calc.t.e.optional', { which, what: term(`calc.term.${key}`, en) });
  }
  if (s.package.trim() === '') throw refuse('calc.t.e.package', { which });
  if (s.pinout !== undefined && s.pinout.trim() !== '') {
    const bipolar = isBipolar(s.type);
    const letters = bipolar ? /^[BCE]{2,3}$/ : /^[GDS]{2,3}$/;
    if (!letters.test(normalisePinout(s.pinout)))
      throw refuse('calc.t.e.pinout', {
        which,
        letters: bipolar ? term('calc.term.bce', 'B, C and E') : term('calc.term.gds', 'G, D and S'),
        ex: bipolar ? 'BCE' : 'GDS',
      });
  }
}

const normalisePinout = (p: string) => p.toUpperCase().replace(/[^A-Z]/g, '');

/** Whether `candidate` can replace `original`, and what to check when fitting it. */
export function checkSubstitution(original: TransistorSpec, candidate: TransistorSpec): SubstitutionResult {
  checkSpec(original, 'original');
  checkSpec(candidate, 'replacement');
  const refusals: Said[] = [];
  const warnings: Said[] = [];
  const passed: Said[] = [];
  const bipolar = isBipolar(original.type);
  const [vName, iName, lead] = bipolar ? ['Vceo', 'Ic', 'collector'] : ['Vds', 'Id', 'drain'];
  const pkgs = (pc: string, po: string): Record<string, SaidValue> => ({ pc, po });

  if (original.type === candidate.type) passed.push(said('calc.t.sameType', { t: original.type }));
  else {
    const values = { cand: candidate.type, orig: original.type };
    refusals.push(
      isBipolar(original.type) !== isBipolar(candidate.type)
        ? said('calc.t.mosfetBipolar', { ...values, a1: article(candidate.type, true), a2: article(original.type) })
        : said('calc.t.polarity', { ...values, a1: article(candidate.type), a2: article(original.type) }),
    );
  }

  const ratings = [
    [vName, original.vMaxV, candidate.vMaxV, 'V'],
    [iName, original.iMaxA, candidate.iMaxA, 'A'],
    ['Ptot', original.ptotW, candidate.ptotW, 'W'],
  ] as const;
  for (const [name, o, c, unit] of ratings) {
    const values = { name, c, o, unit, unit2: unit };
    if (c >= o) passed.push(said('calc.t.ratingOk', values));
    else refusals.push(said('calc.t.below', values));
  }

  const po = knownPackage(original.package);
  const pc = knownPackage(candidate.package);
  const nameO = po ?? original.package.trim();
  const nameC = pc ?? candidate.package.trim();
  if (normalisePackage(nameO) === normalisePackage(nameC)) passed.push(said('calc.t.samePackage', { p: nameO }));
  else if (!po || !pc) warnings.push(said('calc.t.unknownPackages', { a: nameO, b: nameC }));
  else {
    const o = PACKAGES[po];
    const c = PACKAGES[pc];
    const mount = (m: PackageInfo['mount']) =>
      m === 'surface' ? term('calc.term.smd', 'surface-mount') : term('calc.term.tht', 'through-hole');
    if (o.mount !== c.mount)
      refusals.push(said('calc.t.mount', { ...pkgs(pc, po), mc: mount(c.mount), mo: mount(o.mount) }));
    else if (c.size > o.size) warnings.push(said('calc.t.larger', pkgs(pc, po)));
    else if (c.size < o.size) warnings.push(said('calc.t.smaller', pkgs(pc, po)));
    else warnings.push(said('calc.t.similar', pkgs(pc, po)));
    if (o.mount === c.mount && c.liveTab && !o.liveTab)
      warnings.push(said('calc.t.liveTab', { ...pkgs(pc, po), lead: term(`calc.term.${lead}`, lead) }));
  }

  const pinO = original.pinout ? normalisePinout(original.pinout) : '';
  const pinC = candidate.pinout ? normalisePinout(candidate.pinout) : '';
  if (!pinO || !pinC) warnings.push(said('calc.t.pinoutUnknown'));
  else if (pinO === pinC) passed.push(said('calc.t.samePinout', { p: pinO }));
  else warnings.push(said('calc.t.differentPinout', pkgs(pinC, pinO)));

  /** A figure the candidate must reach (at least, or at most for `lower`), passed or warned about. */
  const compare = (
    c: number | undefined,
    o: number | undefined,
    ok: Said['code'],
    warn: Said['code'],
    lower = false,
  ) => {
    if (c === undefined || o === undefined) return;
    if (lower ? c <= o : c >= o) passed.push(said(ok, { c, o }));
    else warnings.push(said(warn, { c, o }));
  };
  if (bipolar) {
    compare(candidate.hfeMin, original.hfeMin, 'calc.t.gainOk', 'calc.t.gainLow');
    compare(candidate.ftMHz, original.ftMHz, 'calc.t.ftOk', 'calc.t.slower');
  } else compare(candidate.vgsThMaxV, original.vgsThMaxV, 'calc.t.gateOk', 'calc.t.gateHigh', true);
  compare(candidate.fallTimeNs, original.fallTimeNs, 'calc.t.fallOk', 'calc.t.fallSlow', true);

  const verdict: SubstitutionVerdict = refusals.length ? 'refuse' : warnings.length ? 'accept-with-warnings' : 'accept';
  return {
    verdict,
    refusals: refusals.map(english),
    warnings: warnings.map(english),
    passed: passed.map(english),
    said: { refusals, warnings, passed },
  };
}

/** Diode-test probe placements: the first letter has the red (+) probe, the second the black (−). */
export const PROBE_PAIRS = ['BE', 'EB', 'BC', 'CB', 'CE', 'EC'] as const;
export type ProbePair = (typeof PROBE_PAIRS)[number];
export type DiodeReading = number | 'OL';
export type DiodeReadings = Record<ProbePair, DiodeReading>;

/** At or below this a diode test reads a short (common practice, no published source). */
export const SHORT_MAX_V = 0.1;
/** A silicon junction reads about 0.5–0.7 V; widened a little for the spread between meters and transistor sizes. */
export const JUNCTION_MIN_V = 0.45;
export const JUNCTION_MAX_V = 0.8;

export type DiodeTestVerdict = 'good' | 'failed' | 'unclear';
export interface DiodeTestResult {
  /** 'unclear' when the readings fit neither a good nor a clearly failed transistor. */
  verdict: DiodeTestVerdict;
  polarity: 'NPN' | 'PNP' | null;
  reasons: string[];
  /** The reasons as codes and values, for a screen to word in the reader's language. */
  said: Said[];
}

const show = (r: DiodeReading): SaidValue => (r === 'OL' ? 'OL' : { n: r, unit: 'V' });
const JUNCTION = { BE: 'be', BC: 'bc', CE: 'ce' } as const;
const junction = (to: 'BE' | 'BC' | 'CE', en: string) => term(`calc.junction.${JUNCTION[to]}`, en);
const result = (
  verdict: DiodeTestVerdict,
  polarity: DiodeTestResult['polarity'],
  reasons: Said[],
): DiodeTestResult => ({
  verdict,
  polarity,
  reasons: reasons.map(english),
  said: reasons,
});
const conducts = (r: DiodeReading) => r !== 'OL';
const isShort = (r: DiodeReading) => r !== 'OL' && r <= SHORT_MAX_V;

/**
 * Reads the six diode-test readings of a bipolar transistor out of circuit: base–emitter and base–collector
 * conduct one way only (about 0.5–0.7 V), collector–emitter is open both ways, and a short both ways between any
 * pair means it has failed. A good result does not prove gain or breakdown voltage.
 */
export function interpretDiodeTest(readings: DiodeReadings): DiodeTestResult {
  for (const p of PROBE_PAIRS) {
    const r = readings[p];
    if (r !== 'OL' && (!Number.isFinite(r) || r < 0)) throw refuse('calc.dt.negative', { red: p[0], black: p[1] });
    // A meter's diode test shows at most about 2–3 V before it reads OL; 650 is millivolts typed as volts.
    if (r !== 'OL' && r > 5) throw refuse('calc.dt.millivolts', { red: p[0], black: p[1], r });
  }
  const pairs = [
    ['BE', 'EB', 'base–emitter'],
    ['BC', 'CB', 'base–collector'],
    ['CE', 'EC', 'collector–emitter'],
  ] as const;
  const failed: Said[] = [];
  for (const [to, from, name] of pairs) {
    const there = readings[to];
    const back = readings[from];
    const isJunction = to[0] === 'B';
    // Unless its datasheet shows a built-in base–emitter resistor.
    const resistor = to === 'BE';
    const values = { pair: junction(to, name), a: show(there), b: show(back) };
    if (isShort(there) && isShort(back))
      failed.push(said(resistor ? 'calc.dt.shortResistor' : 'calc.dt.short', values));
    else if (conducts(there) && conducts(back))
      failed.push(said(resistor ? 'calc.dt.leakyResistor' : 'calc.dt.leaky', values));
    else if (isJunction && !conducts(there) && !conducts(back))
      failed.push(said('calc.dt.open', { pair: junction(to, name) }));
  }
  if (failed.length) return result('failed', null, failed);

  // Each junction now conducts exactly one way; the base is positive in both for an NPN, negative for a PNP.
  const be = conducts(readings.BE) ? 'NPN' : 'PNP';
  const bc = conducts(readings.BC) ? 'NPN' : 'PNP';
  if (be !== bc) return result('unclear', null, [said('calc.dt.opposite')]);
  const polarity = be;
  const vBE = (polarity === 'NPN' ? readings.BE : readings.EB) as number;
  const vBC = (polarity === 'NPN' ? readings.BC : readings.CB) as number;

  const ceThere = readings.CE;
  const ceBack = readings.EC;
  if (conducts(ceThere) || conducts(ceBack)) {
    // A damper diode across C–E conducts from emitter to collector in an NPN (red on E), the reverse in a PNP.
    const damperWay = polarity === 'NPN' ? conducts(ceBack) : conducts(ceThere);
    const value = show(conducts(ceThere) ? ceThere : ceBack);
    if (damperWay) return result('unclear', polarity, [said('calc.dt.damper', { v: value })]);
    return result('failed', polarity, [said('calc.dt.ceConducts', { v: value })]);
  }

  const odd: Said[] = [];
  for (const [v, to, name] of [
    [vBE, 'BE', 'Base–emitter'],
    [vBC, 'BC', 'Base–collector'],
  ] as const) {
    if (v < JUNCTION_MIN_V) odd.push(said('calc.dt.low', { pair: junction(to, name), v }));
    else if (v > JUNCTION_MAX_V) odd.push(said('calc.dt.high', { pair: junction(to, name), v }));
  }
  if (odd.length) return result('unclear', polarity, odd);

  const reasons = [said('calc.dt.good', { polarity, be: vBE, bc: vBC })];
  if (vBC > vBE) reasons.push(said('calc.dt.swapped'));
  return result('good', polarity, reasons);
}
