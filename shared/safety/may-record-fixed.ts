/**
 * "Fixed needs a passing safety check": a mains item goes home as fixed only when its latest electrical check
 * passed. The server refuses with these codes and words; the item page shows the same reason before submit.
 */
export const FIXED_REFUSALS = { checkRequired: 'safety-check-required', checkFailed: 'safety-check-failed' } as const;
export type FixedRefusalCode = (typeof FIXED_REFUSALS)[keyof typeof FIXED_REFUSALS];

export type FixedDecision =
  | { ok: true }
  | {
      ok: false;
      code: FixedRefusalCode;
      message: string;
      /** The form field the reason belongs to, and what to show beside it. */
      field: 'safety';
      fieldMessage: string;
    };

/** The latest check as stored (failures include "Missing: …") or as just judged (failures and missing apart). */
export interface CheckOutcome {
  pass: boolean;
  failures: readonly string[];
  missing?: readonly string[];
}

export function mayRecordFixed(item: { mains: boolean }, latest: CheckOutcome | null | undefined): FixedDecision {
  if (!item.mains) return { ok: true };
  if (!latest)
    return {
      ok: false,
      code: FIXED_REFUSALS.checkRequired,
      message: 'A mains item needs a passing electrical safety check before it can be recorded as fixed.',
      field: 'safety',
      fieldMessage: 'Record the safety check first.',
    };
  if (latest.pass) return { ok: true };
  const reasons = [...latest.failures, ...(latest.missing ?? []).map((m) => `Missing: ${m}.`)].join(' ');
  return {
    ok: false,
    code: FIXED_REFUSALS.checkFailed,
    message: `The latest safety check failed: ${reasons} It cannot go home as fixed; record it as needing a part or as beyond mending, or repair it and check again.`,
    field: 'safety',
    fieldMessage: reasons,
  };
}
