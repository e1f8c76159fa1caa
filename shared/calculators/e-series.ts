/**
 * Preferred values, IEC 60063 as remembered (not checked). Literal tables: rounding 10^(i/n) gets 27, 30, 33, 36,
 * 39, 43, 47 and 82 wrong, because the standard fixed these values before the formula was written down.
 */
import { refuse } from './said';

export const E_SERIES_SOURCE = 'IEC 60063 (from memory, not checked against the standard)';

export const E6 = [10, 15, 22, 33, 47, 68] as const;
export const E12 = [10, 12, 15, 18, 22, 27, 33, 39, 47, 56, 68, 82] as const;
export const E24 = [
  10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75, 82, 91,
] as const;

export const E_SERIES = { E6, E12, E24 } as const;
export type ESeriesName = keyof typeof E_SERIES;

export interface NearestStandard {
  series: ESeriesName;
  /** The standard value closest to the request by ratio (see nearestStandard). */
  nearest: number;
  /** The largest standard value at or below the request. */
  below: number;
  /** The smallest standard value at or above the request. */
  above: number;
  /** The request is itself a standard value. */
  exact: boolean;
  /** nearest ÷ request − 1, in percent. */
  errorPct: number;
}

/** Twelve significant digits removes binary noise such as 47 × 0.01 = 0.47000000000000003. */
const clean = (x: number) => Number(x.toPrecision(12));

/** Every value of the series in the decade starting at 10^exp ohms, e.g. exp 2 → 100, 150, 220, … for E6. */
export const decade = (series: ESeriesName, exp: number): number[] =>
  E_SERIES[series].map((v) => clean(v * 10 ** (exp - 1)));

/**
 * The standard value nearest to `ohms` over any decade, with the values either side of the request.
 * "Nearest" is by ratio, not by ohms: tolerances are relative, so 314 Ω goes to 300 Ω and 315 Ω to 330 Ω (the
 * geometric midpoint is √(300 × 330) ≈ 314.6 Ω). An exact tie goes to the higher value, which passes less current.
 */
export function nearestStandard(ohms: number, series: ESeriesName): NearestStandard {
  if (!Number.isFinite(ohms) || ohms <= 0) throw refuse('calc.es.above0');
  if (!(series in E_SERIES)) throw refuse('calc.es.series', { series });
  // log10 can land a hair off an exact power of ten, so look one decade either side as well.
  const exp = Math.floor(Math.log10(ohms));
  const candidates = [exp - 1, exp, exp + 1, exp + 2].flatMap((e) => decade(series, e));
  let below = candidates[0];
  let above = candidates[candidates.length - 1];
  for (const v of candidates) {
    if (v <= ohms && v > below) below = v;
    if (v >= ohms && v < above) above = v;
  }
  // Compare ohms/below with above/ohms without dividing: ohms² against below × above.
  const nearest = ohms * ohms < below * above ? below : above;
  return { series, nearest, below, above, exact: below === ohms, errorPct: clean((nearest / ohms - 1) * 100) };
}

/** Whether a value is in the series, in any decade (within floating-point noise). */
export function isStandard(ohms: number, series: ESeriesName): boolean {
  if (!(ohms > 0) || !Number.isFinite(ohms)) return false;
  return nearestStandard(ohms, series).exact;
}
