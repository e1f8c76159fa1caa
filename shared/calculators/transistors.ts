/**
 * Transistor substitution and the diode test of a bipolar transistor (common practice, no published source).
 * Invalid input throws a RangeError.
 *
 * Substitution: a wrong type or polarity, or any of Vceo/Vds, Ic/Id, Ptot below the original's, refuses; a
 * different mounting (surface-mount for through-hole) refuses, because it does not fit the board. A larger or
 * otherwise different package, a different pin-out, lower gain, a higher gate threshold or a slower part is
 * accepted with a warning: the fixer can fit it with care, and must be told what to check. A different pin-out is
 * not refused because a larger package usually means re-formed leads anyway; the warning says to mark each lead.
 */
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

function checkSpec(s: TransistorSpec, which: string) {
  if (!(TRANSISTOR_TYPES as readonly string[]).includes(s.type))
    throw new RangeError(`The ${which} type must be one of ${TRANSISTOR_TYPES.join(', ')}.`);
  for (const [v, what] of [
    [s.vMaxV, 'voltage rating'],
    [s.iMaxA, 'current rating'],
    [s.ptotW, 'power rating'],
  ] as const) {
    if (!Number.isFinite(v) || v <= 0) throw new RangeError(`The ${which} ${what} must be a number above 0.`);
  }
  for (const [v, what] of [
    [s.hfeMin, 'gain'],
    [s.ftMHz, 'transition frequency'],
    [s.vgsThMaxV, 'gate threshold'],
    [s.fallTimeNs, 'fall time'],
  ] as const) {
    if (v !== undefined && (!Number.isFinite(v) || v <= 0))
      throw new RangeError(`The ${which} ${what}, when given, must be a number above 0.`);
  }
  if (s.package.trim() === '') throw new RangeError(`Give the ${which} package, e.g. TO-220.`);
  if (s.pinout !== undefined && s.pinout.trim() !== '') {
    const letters = isBipolar(s.type) ? /^[BCE]{2,3}$/ : /^[GDS]{2,3}$/;
    if (!letters.test(normalisePinout(s.pinout)))
      throw new RangeError(
        `The ${which} pin-out uses the letters ${isBipolar(s.type) ? 'B, C and E' : 'G, D and S'}, e.g. ${isBipolar(s.type) ? 'BCE' : 'GDS'}.`,
      );
  }
}

const normalisePinout = (p: string) => p.toUpperCase().replace(/[^A-Z]/g, '');

/** Whether `candidate` can replace `original`, and what to check when fitting it. */
export function checkSubstitution(original: TransistorSpec, candidate: TransistorSpec): SubstitutionResult {
  checkSpec(original, 'original');
  checkSpec(candidate, 'replacement');
  const refusals: string[] = [];
  const warnings: string[] = [];
  const passed: string[] = [];
  const bipolar = isBipolar(original.type);
  const [vName, iName, lead] = bipolar ? ['Vceo', 'Ic', 'collector'] : ['Vds', 'Id', 'drain'];

  if (original.type === candidate.type) passed.push(`Same type (${original.type}).`);
  else if (isBipolar(original.type) !== isBipolar(candidate.type))
    refusals.push(
      `${article(candidate.type, true)} ${candidate.type} cannot replace ${article(original.type)} ${original.type}: a MOSFET is driven by gate voltage, a bipolar transistor by base current.`,
    );
  else
    refusals.push(
      `Opposite polarity: ${article(candidate.type)} ${candidate.type} cannot replace ${article(original.type)} ${original.type}.`,
    );

  const ratings = [
    [vName, original.vMaxV, candidate.vMaxV, 'V'],
    [iName, original.iMaxA, candidate.iMaxA, 'A'],
    ['Ptot', original.ptotW, candidate.ptotW, 'W'],
  ] as const;
  for (const [name, o, c, unit] of ratings) {
    if (c >= o) passed.push(`${name} ${c} ${unit} ≥ ${o} ${unit}.`);
    else refusals.push(`${name} ${c} ${unit} is below the original's ${o} ${unit}.`);
  }

  const po = knownPackage(original.package);
  const pc = knownPackage(candidate.package);
  const nameO = po ?? original.package.trim();
  const nameC = pc ?? candidate.package.trim();
  if (normalisePackage(nameO) === normalisePackage(nameC)) passed.push(`Same package (${nameO}).`);
  else if (!po || !pc)
    warnings.push(
      `Packages ${nameO} and ${nameC} cannot be compared here: check size, mounting and pin-out against both datasheets.`,
    );
  else {
    const o = PACKAGES[po];
    const c = PACKAGES[pc];
    if (o.mount !== c.mount)
      refusals.push(
        `A ${c.mount === 'surface' ? 'surface-mount' : 'through-hole'} ${pc} does not fit the board made for a ${o.mount === 'surface' ? 'surface-mount' : 'through-hole'} ${po}.`,
      );
    else if (c.size > o.size)
      warnings.push(
        `Larger package (${pc} for ${po}): check it fits the space and the heatsink, that the mounting hole lines up and the leads reach, and check the pin-out — it often differs between packages.`,
      );
    else if (c.size < o.size)
      warnings.push(
        `Smaller package (${pc} for ${po}): it sheds heat through a smaller face; check it sits flat on the heatsink and the clamp or screw holds it, and check the pin-out.`,
      );
    else
      warnings.push(
        `Different package of similar size (${pc} for ${po}): check the mounting hole, the heatsink contact and the pin-out.`,
      );
    if (o.mount === c.mount && c.liveTab && !o.liveTab)
      warnings.push(
        `The ${pc}'s tab or case is connected to the ${lead}, the original's was not: if it touches a heatsink or the chassis, fit an insulating pad and bush and check the insulation.`,
      );
  }

  const pinO = original.pinout ? normalisePinout(original.pinout) : '';
  const pinC = candidate.pinout ? normalisePinout(candidate.pinout) : '';
  if (!pinO || !pinC) warnings.push('Pin-out not compared: check it on both datasheets before fitting.');
  else if (pinO === pinC) passed.push(`Same pin-out (${pinO}).`);
  else
    warnings.push(
      `Different pin-out (${pinC} for ${pinO}): the leads must be re-formed or crossed — mark each one, keep them apart, and check against both datasheets before power goes on.`,
    );

  if (bipolar && original.hfeMin !== undefined && candidate.hfeMin !== undefined) {
    if (candidate.hfeMin >= original.hfeMin) passed.push(`Gain hFE ${candidate.hfeMin} ≥ ${original.hfeMin}.`);
    else
      warnings.push(
        `Lower gain (hFE ${candidate.hfeMin} for ${original.hfeMin}): it may not switch fully on with the same base drive and would then run hot.`,
      );
  }
  if (bipolar && original.ftMHz !== undefined && candidate.ftMHz !== undefined) {
    if (candidate.ftMHz >= original.ftMHz) passed.push(`fT ${candidate.ftMHz} MHz ≥ ${original.ftMHz} MHz.`);
    else
      warnings.push(
        `Slower part (fT ${candidate.ftMHz} MHz for ${original.ftMHz} MHz): in a switching or high-frequency stage it can run hot or fail.`,
      );
  }
  if (!bipolar && original.vgsThMaxV !== undefined && candidate.vgsThMaxV !== undefined) {
    if (candidate.vgsThMaxV <= original.vgsThMaxV)
      passed.push(`Gate threshold ${candidate.vgsThMaxV} V ≤ ${original.vgsThMaxV} V.`);
    else
      warnings.push(
        `Higher gate threshold (${candidate.vgsThMaxV} V for ${original.vgsThMaxV} V): the same gate drive may not turn it fully on; check the drive voltage.`,
      );
  }
  if (original.fallTimeNs !== undefined && candidate.fallTimeNs !== undefined) {
    if (candidate.fallTimeNs <= original.fallTimeNs)
      passed.push(`Fall time ${candidate.fallTimeNs} ns ≤ ${original.fallTimeNs} ns.`);
    else
      warnings.push(
        `Slower switching (fall time ${candidate.fallTimeNs} ns for ${original.fallTimeNs} ns): in a switch-mode supply it runs hotter and may fail.`,
      );
  }

  const verdict: SubstitutionVerdict = refusals.length ? 'refuse' : warnings.length ? 'accept-with-warnings' : 'accept';
  return { verdict, refusals, warnings, passed };
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
}

const show = (r: DiodeReading) => (r === 'OL' ? 'OL' : `${r} V`);
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
    if (r !== 'OL' && (!Number.isFinite(r) || r < 0))
      throw new RangeError(
        `The reading with red on ${p[0]} and black on ${p[1]} must be a voltage of 0 or more, or OL.`,
      );
    // A meter's diode test shows at most about 2–3 V before it reads OL; 650 is millivolts typed as volts.
    if (r !== 'OL' && r > 5)
      throw new RangeError(
        `The reading with red on ${p[0]} and black on ${p[1]} is ${r} V: enter volts (0.65, not 650), or OL.`,
      );
  }
  const pairs = [
    ['BE', 'EB', 'base–emitter'],
    ['BC', 'CB', 'base–collector'],
    ['CE', 'EC', 'collector–emitter'],
  ] as const;
  const failed: string[] = [];
  for (const [to, from, name] of pairs) {
    const there = readings[to];
    const back = readings[from];
    const junction = to[0] === 'B';
    const resistorNote = to === 'BE' ? ' (unless its datasheet shows a built-in base–emitter resistor)' : '';
    if (isShort(there) && isShort(back))
      failed.push(
        `The ${name} pair reads short both ways (${show(there)}, ${show(back)}): the transistor has failed${resistorNote}.`,
      );
    else if (conducts(there) && conducts(back))
      failed.push(
        `The ${name} pair conducts both ways (${show(there)}, ${show(back)}): leaky or shorted, the transistor has failed${resistorNote}.`,
      );
    else if (junction && !conducts(there) && !conducts(back))
      failed.push(`The ${name} junction is open both ways: the transistor has failed.`);
  }
  if (failed.length) return { verdict: 'failed', polarity: null, reasons: failed };

  // Each junction now conducts exactly one way; the base is positive in both for an NPN, negative for a PNP.
  const be = conducts(readings.BE) ? 'NPN' : 'PNP';
  const bc = conducts(readings.BC) ? 'NPN' : 'PNP';
  if (be !== bc)
    return {
      verdict: 'unclear',
      polarity: null,
      reasons: [
        'The base–emitter and base–collector junctions point opposite ways: check which lead is the base and measure again.',
      ],
    };
  const polarity = be;
  const vBE = (polarity === 'NPN' ? readings.BE : readings.EB) as number;
  const vBC = (polarity === 'NPN' ? readings.BC : readings.CB) as number;

  const ceThere = readings.CE;
  const ceBack = readings.EC;
  if (conducts(ceThere) || conducts(ceBack)) {
    // A damper diode across C–E conducts from emitter to collector in an NPN (red on E), the reverse in a PNP.
    const damperWay = polarity === 'NPN' ? conducts(ceBack) : conducts(ceThere);
    const value = show(conducts(ceThere) ? ceThere : ceBack);
    if (damperWay)
      return {
        verdict: 'unclear',
        polarity,
        reasons: [
          `Collector–emitter conducts one way (${value}): a built-in damper diode (common in line-output and some switching transistors) reads like this — check the datasheet; without one, the transistor has failed.`,
        ],
      };
    return {
      verdict: 'failed',
      polarity,
      reasons: [`Collector–emitter conducts (${value}) where it should be open both ways: the transistor has failed.`],
    };
  }

  const odd: string[] = [];
  for (const [v, name] of [
    [vBE, 'Base–emitter'],
    [vBC, 'Base–collector'],
  ] as const) {
    if (v < JUNCTION_MIN_V)
      odd.push(
        `${name} reads ${v} V, low for a silicon junction: a germanium part, a leaky junction, or other parts in circuit.`,
      );
    else if (v > JUNCTION_MAX_V)
      odd.push(
        `${name} reads ${v} V, high for a single junction: a Darlington reads about twice a junction base–emitter; otherwise suspect it.`,
      );
  }
  if (odd.length) return { verdict: 'unclear', polarity, reasons: odd };

  const reasons = [
    `${polarity}: base–emitter ${vBE} V and base–collector ${vBC} V one way only, collector–emitter open both ways. The junctions test good; this does not prove gain or breakdown voltage.`,
  ];
  if (vBC > vBE)
    reasons.push(
      'Base–collector reads higher than base–emitter, usually the other way round: check collector and emitter are not swapped.',
    );
  return { verdict: 'good', polarity, reasons };
}
