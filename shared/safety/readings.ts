/**
 * Which readings a safety check needs for each appliance class: the one list behind the check's form, its zod
 * schema, the verdict (limits.ts) and the outcome service. Class I is earthed: the protective conductor is measured
 * against a limit that grows with the cord. Class II is double-insulated. Class III runs on safety extra-low
 * voltage, so no mains reading is required (one taken is still judged).
 */
export const APPLIANCE_CLASSES = ['I', 'II', 'III'] as const;
export type ApplianceClass = (typeof APPLIANCE_CLASSES)[number];

export const REQUIRED_READINGS = {
  I: ['cordLengthM', 'protectiveConductorOhm', 'insulationMOhm'],
  II: ['insulationMOhm'],
  III: [],
} as const satisfies Record<ApplianceClass, readonly string[]>;
export type RequiredReading = (typeof REQUIRED_READINGS)['I'][number];

/** The reading's name in a sentence ("Missing: cord length."). */
export const READING_NAMES: Record<RequiredReading, string> = {
  cordLengthM: 'cord length',
  protectiveConductorOhm: 'protective conductor resistance',
  insulationMOhm: 'insulation resistance',
};

/** Catalog keys (locales/<language>/bench.json), answered in the reader's language. */
const MISSING_MESSAGES: Record<RequiredReading, string> = {
  cordLengthM: 'bench.v.missing.cordLengthM',
  protectiveConductorOhm: 'bench.v.missing.protectiveConductorOhm',
  insulationMOhm: 'bench.v.missing.insulationMOhm',
};

/** Stable codes the client matches on (never on wording); a zod issue carries one in `params.code`. */
export const SAFETY_ISSUES = { readingMissing: 'reading-missing' } as const;

export interface MissingReading {
  /** The form field, also the zod issue's path. */
  field: RequiredReading;
  code: typeof SAFETY_ISSUES.readingMissing;
  name: string;
  message: string;
}

export const requiredReadings = (cls: ApplianceClass): readonly RequiredReading[] => REQUIRED_READINGS[cls];

/** The readings the class needs that were not given, in the order the form asks for them. */
export function missingReadings(
  r: { applianceClass: ApplianceClass } & Partial<Record<RequiredReading, number | undefined>>,
): MissingReading[] {
  return requiredReadings(r.applianceClass)
    .filter((field) => r[field] === undefined)
    .map((field) => ({
      field,
      code: SAFETY_ISSUES.readingMissing,
      name: READING_NAMES[field],
      message: MISSING_MESSAGES[field],
    }));
}
