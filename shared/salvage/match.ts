import { checkSubstitution, type TransistorSpec } from '../calculators/transistors';
import { english, said, term, CalcError, type Said, type SaidValue } from '../calculators/said';
import type { PartRatings, PartType } from './constants';

/**
 * Whether a part from the salvage stock can stand in for a needed one (common practice, no published source):
 * the same kind; the value that sets the circuit's behaviour equal (resistance within its tolerance, capacitance
 * within ±20 %, a fuse's current, a cut-out's trip temperature, a power supply's output voltage); every rating
 * that limits stress at least as high; a different package flagged, not refused. Transistors follow the rule in
 * shared/calculators/transistors.
 */
export interface Needed {
  type: PartType;
  ratings: PartRatings;
  package?: string;
  pinout?: string;
}
export type Candidate = Needed;
export interface SubstituteVerdict {
  verdict: 'accept' | 'accept-with-warnings' | 'refuse';
  reasons: string[];
  warnings: string[];
  /** The reasons and warnings as codes and values, for a screen to word in the reader's language. */
  said: { reasons: Said[]; warnings: Said[] };
}

/** A verdict with its reasons and warnings in English and as codes. */
const verdictOf = (verdict: SubstituteVerdict['verdict'], reasons: Said[], warnings: Said[]): SubstituteVerdict => ({
  verdict,
  reasons: reasons.map(english),
  warnings: warnings.map(english),
  said: { reasons, warnings },
});
/** A package not recorded, compared by the rule as this name and said as the word "unknown" in the reader's language. */
const UNKNOWN_PACKAGE = 'unknown';
const unknownSaid = (s: Said): Said => ({
  ...s,
  values: Object.fromEntries(
    Object.entries(s.values).map(([k, v]) => [k, v === UNKNOWN_PACKAGE ? term('calc.term.unknown', 'unknown') : v]),
  ),
});
const kind = (t: PartType) => term(`tool.part.${t}`, t.replace('-', ' '));
const RATING = { voltageV: 'voltage', currentA: 'current', powerW: 'power' } as const;

const near = (a: number, b: number, pct: number) => Math.abs(a - b) <= (Math.abs(b) * pct) / 100 + 1e-12;

/** A stock transistor against a needed one, through the bench calculator's rule when both have their ratings. */
function transistorVerdict(needed: Needed, cand: Candidate): SubstituteVerdict {
  const spec = (p: Needed): TransistorSpec | null => {
    const r = p.ratings;
    if (!r.polarity || r.voltageV === undefined || r.currentA === undefined) return null;
    const type =
      p.type === 'mosfet' ? (r.polarity === 'P' ? 'P-MOSFET' : 'N-MOSFET') : r.polarity === 'PNP' ? 'PNP' : 'NPN';
    return {
      type,
      vMaxV: r.voltageV,
      iMaxA: r.currentA,
      ptotW: r.powerW ?? Number.MIN_VALUE,
      package: p.package || UNKNOWN_PACKAGE,
      ...(p.pinout ? { pinout: p.pinout } : {}),
    };
  };
  const n = spec(needed);
  const c = spec(cand);
  if (!n) return verdictOf('accept-with-warnings', [], [said('tool.sub.giveNeeded')]);
  if (!c) return verdictOf('accept-with-warnings', [], [said('tool.sub.notAllRecorded')]);
  // Power unknown on either side is not checked by the rule: say so.
  const unknownPower = needed.ratings.powerW === undefined || cand.ratings.powerW === undefined;
  if (unknownPower) {
    n.ptotW = Number.MIN_VALUE;
    c.ptotW = Number.MIN_VALUE;
  }
  try {
    const r = checkSubstitution(n, c);
    return verdictOf(r.verdict, r.said.refusals.map(unknownSaid), [
      ...r.said.warnings.map(unknownSaid),
      ...(unknownPower ? [said('tool.sub.powerUnknown')] : []),
    ]);
  } catch (e) {
    if (e instanceof CalcError) return verdictOf('accept-with-warnings', [], [e.said]);
    throw e;
  }
}

export function judgeSubstitute(
  needed: Needed,
  cand: Candidate,
  transistor: (n: Needed, c: Candidate) => SubstituteVerdict = transistorVerdict,
): SubstituteVerdict {
  const reasons: Said[] = [];
  const warnings: Said[] = [];
  const n = needed.ratings;
  const c = cand.ratings;
  if (needed.type !== cand.type)
    return verdictOf('refuse', [said('tool.sub.otherKind', { cand: kind(cand.type), need: kind(needed.type) })], []);
  if (needed.type === 'bipolar-transistor' || needed.type === 'mosfet') return transistor(needed, cand);
  const atLeast = (key: 'voltageV' | 'currentA' | 'powerW', what: string, unit: string) => {
    if (n[key] === undefined) return;
    const rating = term(`calc.term.${RATING[key]}`, what);
    if (c[key] === undefined) warnings.push(said('tool.sub.notRecorded', { what: rating }));
    else if (c[key]! < n[key]!)
      reasons.push(said('tool.sub.below', { what: rating, c: c[key]!, n: n[key]!, unit, unit2: unit }));
  };
  switch (needed.type) {
    case 'resistor': {
      const tol = n.tolerancePct ?? 5;
      if (
        n.resistanceOhm !== undefined &&
        (c.resistanceOhm === undefined || !near(c.resistanceOhm, n.resistanceOhm, tol))
      )
        reasons.push(
          c.resistanceOhm !== undefined
            ? said('tool.sub.valueOff', { c: c.resistanceOhm, tol, n: n.resistanceOhm })
            : said('tool.sub.valueUnknown', { tol, n: n.resistanceOhm }),
        );
      atLeast('powerW', 'power rating', 'W');
      break;
    }
    case 'capacitor':
      if (n.capacitanceF !== undefined && (c.capacitanceF === undefined || !near(c.capacitanceF, n.capacitanceF, 20)))
        reasons.push(said('tool.sub.capacitance'));
      atLeast('voltageV', 'voltage rating', 'V');
      break;
    case 'fuse':
      if (n.currentA === undefined) warnings.push(said('tool.sub.fuseGive'));
      else if (c.currentA === undefined) reasons.push(said('tool.sub.fuseUnknown'));
      else if (c.currentA !== n.currentA)
        reasons.push(
          said(c.currentA > n.currentA ? 'tool.sub.fuseHigher' : 'tool.sub.fuseLower', {
            c: c.currentA,
            n: n.currentA,
          }),
        );
      atLeast('voltageV', 'voltage rating', 'V');
      break;
    case 'thermal-cutout':
      if (n.temperatureC !== undefined && c.temperatureC !== n.temperatureC)
        reasons.push(said('tool.sub.cutout', { t: n.temperatureC }));
      atLeast('currentA', 'current rating', 'A');
      atLeast('voltageV', 'voltage rating', 'V');
      break;
    case 'power-supply':
      if (n.voltageV !== undefined && c.voltageV !== n.voltageV)
        reasons.push(
          said('tool.sub.output', {
            c: c.voltageV ?? (term('calc.term.unknown', 'unknown') as SaidValue),
            n: n.voltageV,
          }),
        );
      atLeast('currentA', 'current rating', 'A');
      break;
    default:
      atLeast('voltageV', 'voltage rating', 'V');
      atLeast('currentA', 'current rating', 'A');
      atLeast('powerW', 'power rating', 'W');
  }
  if (needed.package && cand.package && needed.package.toUpperCase() !== cand.package.toUpperCase())
    warnings.push(said('tool.sub.package', { c: cand.package, n: needed.package }));
  return verdictOf(reasons.length ? 'refuse' : warnings.length ? 'accept-with-warnings' : 'accept', reasons, warnings);
}
