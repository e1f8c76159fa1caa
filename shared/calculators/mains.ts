/**
 * The DC on the reservoir capacitor after a bridge rectifier: the mains peak, Vrms × √2 (derived). Mains voltages
 * from 100 V to 253 V (230 V + 10 %) are covered; anything else is refused rather than guessed.
 */
import { refuse } from './said';

export const MAINS_MIN_V = 100;
export const MAINS_MAX_V = 253;
export const MAINS_PEAK_SOURCE =
  'Derived: peak = Vrms × √2; "multiply by 1.414" is common practice, no published source';
export const RULE_OF_THUMB_FACTOR = 1.414;
export const MAINS_PEAK_NOTE =
  'Rule of thumb: multiply the mains voltage by 1.414 for the DC on the reservoir capacitor after a bridge rectifier. A meter reads a volt or two less (two diode drops) and follows the mains of the moment.';

export interface MainsPeak {
  vrms: number;
  /** Vrms × √2. */
  peakV: number;
  /** Vrms × 1.414, what the bench shorthand gives. */
  ruleOfThumbV: number;
  note: string;
}

export function rectifiedPeak(vrms: number): MainsPeak {
  if (!Number.isFinite(vrms) || vrms < MAINS_MIN_V || vrms > MAINS_MAX_V) {
    const range = { min: MAINS_MIN_V, max: MAINS_MAX_V };
    throw Number.isFinite(vrms)
      ? refuse('calc.mp.range', { ...range, v: vrms })
      : refuse('calc.mp.rangeNotNumber', range);
  }
  return {
    vrms,
    peakV: vrms * Math.SQRT2,
    ruleOfThumbV: Number((vrms * RULE_OF_THUMB_FACTOR).toPrecision(12)),
    note: MAINS_PEAK_NOTE,
  };
}
