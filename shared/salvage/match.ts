import { checkSubstitution, type TransistorSpec } from '../calculators/transistors';
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
}

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
      package: p.package || 'unknown',
      ...(p.pinout ? { pinout: p.pinout } : {}),
    };
  };
  const n = spec(needed);
  const c = spec(cand);
  if (!n)
    return {
      verdict: 'accept-with-warnings',
      reasons: [],
      warnings: ['Give the polarity, voltage and current needed to check a substitute.'],
    };
  if (!c)
    return {
      verdict: 'accept-with-warnings',
      reasons: [],
      warnings: ['This part’s ratings are not all recorded: look up its datasheet before fitting it.'],
    };
  // Power unknown on either side is not checked by the rule: say so.
  const unknownPower = needed.ratings.powerW === undefined || cand.ratings.powerW === undefined;
  if (unknownPower) {
    n.ptotW = Number.MIN_VALUE;
    c.ptotW = Number.MIN_VALUE;
  }
  try {
    const r = checkSubstitution(n, c);
    return {
      verdict: r.verdict,
      reasons: r.refusals,
      warnings: [
        ...r.warnings,
        ...(unknownPower ? ['The power rating is not recorded on both: check it on the datasheet.'] : []),
      ],
    };
  } catch (e) {
    return { verdict: 'accept-with-warnings', reasons: [], warnings: [(e as Error).message] };
  }
}

export function judgeSubstitute(
  needed: Needed,
  cand: Candidate,
  transistor: (n: Needed, c: Candidate) => SubstituteVerdict = transistorVerdict,
): SubstituteVerdict {
  const reasons: string[] = [];
  const warnings: string[] = [];
  const n = needed.ratings;
  const c = cand.ratings;
  if (needed.type !== cand.type)
    return {
      verdict: 'refuse',
      reasons: [`It is a ${cand.type.replace('-', ' ')}, not a ${needed.type.replace('-', ' ')}.`],
      warnings,
    };
  if (needed.type === 'bipolar-transistor' || needed.type === 'mosfet') return transistor(needed, cand);
  const atLeast = (key: 'voltageV' | 'currentA' | 'powerW', what: string, unit: string) => {
    if (n[key] === undefined) return;
    if (c[key] === undefined) warnings.push(`Its ${what} is not recorded; check it on the part.`);
    else if (c[key]! < n[key]!) reasons.push(`Its ${what} of ${c[key]} ${unit} is below the ${n[key]} ${unit} needed.`);
  };
  switch (needed.type) {
    case 'resistor': {
      const tol = n.tolerancePct ?? 5;
      if (
        n.resistanceOhm !== undefined &&
        (c.resistanceOhm === undefined || !near(c.resistanceOhm, n.resistanceOhm, tol))
      )
        reasons.push(
          `Its value${c.resistanceOhm !== undefined ? ` of ${c.resistanceOhm} Ω` : ' is unknown and'} is not within ±${tol} % of ${n.resistanceOhm} Ω.`,
        );
      atLeast('powerW', 'power rating', 'W');
      break;
    }
    case 'capacitor':
      if (n.capacitanceF !== undefined && (c.capacitanceF === undefined || !near(c.capacitanceF, n.capacitanceF, 20)))
        reasons.push('Its capacitance is not within ±20 % of the one needed.');
      atLeast('voltageV', 'voltage rating', 'V');
      break;
    case 'fuse':
      if (n.currentA === undefined)
        warnings.push('Give the current rating of the fuse needed: a fuse is replaced only by one of the same rating.');
      else if (c.currentA === undefined)
        reasons.push('Its current rating is not recorded: a fuse is replaced only by one of the same rating.');
      else if (c.currentA !== n.currentA)
        reasons.push(
          c.currentA > n.currentA
            ? `A ${c.currentA} A fuse would not protect what a ${n.currentA} A fuse protects.`
            : `A ${c.currentA} A fuse is not the ${n.currentA} A needed: it would blow in normal use.`,
        );
      atLeast('voltageV', 'voltage rating', 'V');
      break;
    case 'thermal-cutout':
      if (n.temperatureC !== undefined && c.temperatureC !== n.temperatureC)
        reasons.push(`A cut-out must trip at the same temperature (${n.temperatureC} °C); never fit a different one.`);
      atLeast('currentA', 'current rating', 'A');
      atLeast('voltageV', 'voltage rating', 'V');
      break;
    case 'power-supply':
      if (n.voltageV !== undefined && c.voltageV !== n.voltageV)
        reasons.push(`Its output of ${c.voltageV ?? 'unknown'} V is not the ${n.voltageV} V needed.`);
      atLeast('currentA', 'current rating', 'A');
      break;
    default:
      atLeast('voltageV', 'voltage rating', 'V');
      atLeast('currentA', 'current rating', 'A');
      atLeast('powerW', 'power rating', 'W');
  }
  if (needed.package && cand.package && needed.package.toUpperCase() !== cand.package.toUpperCase())
    warnings.push(`It comes in ${cand.package}, not ${needed.package}: check that it fits and how it is mounted.`);
  return {
    verdict: reasons.length ? 'refuse' : warnings.length ? 'accept-with-warnings' : 'accept',
    reasons,
    warnings,
  };
}
