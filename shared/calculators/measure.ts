/**
 * Judging a resistance reading (common practice, no published source): short the meter leads and subtract what
 * they read; an open resistor reads as overload ("OL"). Invalid input throws a CalcError (./said).
 *
 * A handheld meter's last digit is not exact, and subtracting the leads adds a second reading's error. So besides
 * "within" and "outside" tolerance, the judgement has "within-uncertainty": outside the part's own tolerance,
 * but closer than the meter can tell apart — the reading is in the right range, it does not prove the tolerance.
 */
import { english, refuse, said, type Said } from './said';

export const MEASURE_SOURCE = 'Common practice, no published source: subtract the shorted-lead reading; OL means open';

export type ResistanceReading = number | 'OL';
export type MeasureVerdict = 'within' | 'within-uncertainty' | 'outside' | 'open';

/** "OL", "O.L", "open", "∞" or a number (a comma decimal is accepted); null when it is neither. */
export function parseReading(text: string): ResistanceReading | null {
  const t = text.trim().replace(/\s+/g, '').toUpperCase();
  if (t === '') return null;
  if (['OL', 'O.L', 'O.L.', '-OL', 'OPEN', '∞', 'INF'].includes(t)) return 'OL';
  // A meter's own display: "4.71k", "1.2M", or "4K7" as printed on the part, and an Ω sign or not.
  const m = /^(\d+(?:[.,]\d+)?)([KM])?(\d*)Ω?$/.exec(t.replace(/OHMS?$/, ''));
  if (!m) return null;
  const scale = m[2] === 'K' ? 1e3 : m[2] === 'M' ? 1e6 : 1;
  if (m[3] && (!m[2] || /[.,]/.test(m[1]))) return null;
  const n = Number(`${m[1].replace(',', '.')}${m[3] ? `.${m[3]}` : ''}`) * scale;
  return Number.isFinite(n) ? n : null;
}

export interface MeasureInput {
  reading: ResistanceReading;
  /** What the shorted leads read; 0 when not measured. */
  leadsOhm?: number;
  nominalOhm: number;
  tolerancePct: number;
  /** How far the reading can be off, in ohms: at least the meter's last digit, twice that when the leads were subtracted. */
  uncertaintyOhm?: number;
}

export interface MeasureResult {
  verdict: MeasureVerdict;
  /** The reading less the leads; null when open. */
  netOhm: number | null;
  /** (net − nominal) ÷ nominal, in percent to 0.01; null when open. */
  deviationPct: number | null;
  minOhm: number;
  maxOhm: number;
  /** True for 'within' and 'within-uncertainty'. */
  inRightRange: boolean;
  message: string;
  /** The message as a code and values, for a screen to word in the reader's language. */
  said: Said;
}

const told = (s: Said) => ({ message: english(s), said: s });
const clean = (x: number) => Number(x.toPrecision(12));
const round = (x: number, dp: number) => Math.round(x * 10 ** dp) / 10 ** dp;

/** The reading less the shorted-lead reading, never below 0 (a reading at or under the leads is a short). */
export function netResistance(reading: ResistanceReading, leadsOhm = 0): number | 'open' {
  if (!(Number.isFinite(leadsOhm) && leadsOhm >= 0)) throw refuse('calc.m.e.leads');
  if (reading === 'OL') return 'open';
  if (!Number.isFinite(reading) || reading < 0) throw refuse('calc.m.e.reading');
  return Math.max(0, clean(reading - leadsOhm));
}

export function judgeResistance({
  reading,
  leadsOhm = 0,
  nominalOhm,
  tolerancePct,
  uncertaintyOhm = 0,
}: MeasureInput): MeasureResult {
  if (!Number.isFinite(nominalOhm) || nominalOhm <= 0) throw refuse('calc.m.e.nominal');
  if (!Number.isFinite(tolerancePct) || tolerancePct <= 0 || tolerancePct >= 100) throw refuse('calc.m.e.tolerance');
  if (!Number.isFinite(uncertaintyOhm) || uncertaintyOhm < 0) throw refuse('calc.m.e.uncertainty');
  const band = (nominalOhm * tolerancePct) / 100;
  const minOhm = clean(nominalOhm - band);
  const maxOhm = clean(nominalOhm + band);
  const net = netResistance(reading, leadsOhm);
  if (net === 'open') {
    return {
      verdict: 'open',
      netOhm: null,
      deviationPct: null,
      minOhm,
      maxOhm,
      inRightRange: false,
      ...told(said('calc.m.open')),
    };
  }
  const deviationPct = round(((net - nominalOhm) / nominalOhm) * 100, 2);
  // Compared in rounded percent so a reading exactly at the edge (1.1 Ω for 1 Ω ±10 %) counts as within.
  const slackPct = round((uncertaintyOhm / nominalOhm) * 100, 6);
  const off = Math.abs(round(((net - nominalOhm) / nominalOhm) * 100, 6));
  const values = {
    net,
    signed: { n: deviationPct, unit: '%', sign: '+' as const },
    nominal: nominalOhm,
    tol: tolerancePct,
  };
  if (off <= tolerancePct) {
    return {
      verdict: 'within',
      netOhm: net,
      deviationPct,
      minOhm,
      maxOhm,
      inRightRange: true,
      ...told(said(off === tolerancePct ? 'calc.m.edge' : 'calc.m.within', values)),
    };
  }
  if (off <= tolerancePct + slackPct) {
    return {
      verdict: 'within-uncertainty',
      netOhm: net,
      deviationPct,
      minOhm,
      maxOhm,
      inRightRange: true,
      ...told(said('calc.m.uncertain', { ...values, u: uncertaintyOhm })),
    };
  }
  return {
    verdict: 'outside',
    netOhm: net,
    deviationPct,
    minOhm,
    maxOhm,
    inRightRange: false,
    // A reading no more than the shorted leads is a short.
    ...told(said(net === 0 ? 'calc.m.short' : 'calc.m.outside', values)),
  };
}
