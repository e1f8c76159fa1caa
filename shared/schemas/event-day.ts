import { z } from 'zod';
import { isWebLink } from '../files/web-links';
import { HAZARDS } from '../constants';
import { ARRIVALS, BARRIERS, OUTCOMES } from '../event-day/constants';
import { bookingItemSchema, MAX_ITEMS_PER_BOOKING } from './bookings';
import { email } from './auth';
import { APPLIANCE_CLASSES, missingReadings } from '../safety/readings';

/** Empty means not given; a decimal comma is read as a point ("1,5" → 1.5). */
const optionalNumber = (schema: z.ZodType<number, unknown>) =>
  z.preprocess(
    (v) =>
      v === '' || v === null || v === undefined ? undefined : typeof v === 'string' ? v.trim().replace(',', '.') : v,
    schema.optional(),
  );

// The desk's messages are catalog keys (locales/<language>/desk.json), answered and shown in the reader's language.
/** Weight on the desk's scale, in kilograms; it overrides the category's average in the statistics. */
export const weightKg = optionalNumber(
  z.coerce.number({ error: 'desk.v.weight' }).positive('desk.v.weightPositive').max(500, 'desk.v.weightMax'),
);

export const checkInItemSchema = z.object({
  id: z.coerce.number().int().positive(),
  arrival: z.enum(ARRIVALS, { error: 'desk.v.arrival' }),
  categoryId: z.coerce.number().int().positive().optional(),
  weightKg,
  /** The screening questions, asked again at the desk when the kind is corrected (as when booking). */
  hazards: z.array(z.enum(HAZARDS)).max(HAZARDS.length).optional(),
});

/** Without a list, every item of the booking has arrived. */
export const checkInSchema = z.object({ items: z.array(checkInItemSchema).max(MAX_ITEMS_PER_BOOKING).optional() });
export type CheckInInput = z.input<typeof checkInSchema>;

export const walkInSchema = z.object({
  slotId: z.coerce.number().int().positive().optional(),
  visitor: z.object({
    name: z.string({ error: 'desk.v.name' }).trim().min(1, 'desk.v.name').max(120, 'validation.name.tooLong'),
    email: z.union([z.literal('').transform(() => undefined), email]).optional(),
    phone: z
      .string()
      .trim()
      .max(40)
      .regex(/^[+0-9 ()-]*$/, 'validation.phone.characters')
      .optional()
      .transform((v) => v || undefined),
  }),
  items: z
    .array(bookingItemSchema.extend({ weightKg }))
    .min(1, 'desk.v.items')
    .max(MAX_ITEMS_PER_BOOKING, 'validation.items.tooMany'),
  consent: z.literal(true, { error: 'desk.v.consent' }),
  consentName: z.string({ error: 'desk.v.consentName' }).trim().min(2, 'desk.v.consentName').max(120),
});
export type WalkInInput = z.input<typeof walkInSchema>;

// Messages of the safety check and the outcome are catalog keys (locales/<language>/bench.json): the server answers them in
// the request's language, the fixer's page shows them in the fixer's.
const reading = (max: number) =>
  optionalNumber(
    z.coerce
      .number({ error: 'bench.v.readingNotNumber' })
      .min(0, 'bench.v.readingNegative')
      .max(max, 'bench.v.readingRange'),
  );

export const safetyCheckSchema = z
  .object({
    visual: z.object({
      cord: z.boolean(),
      plug: z.boolean(),
      strainRelief: z.boolean(),
      casing: z.boolean(),
      noHeatDamage: z.boolean(),
    }),
    applianceClass: z.enum(APPLIANCE_CLASSES, { error: 'bench.v.chooseClass' }),
    heating: z.boolean().default(false),
    heatingKw: reading(30),
    cordLengthM: reading(100),
    protectiveConductorOhm: reading(1000),
    insulationMOhm: reading(10000),
    protectiveCurrentMA: reading(1000),
    touchCurrentMA: reading(1000),
    instrument: z
      .string()
      .trim()
      .max(120)
      .optional()
      .transform((v) => v || undefined),
  })
  .superRefine((v, ctx) => {
    for (const m of missingReadings(v))
      ctx.addIssue({ code: 'custom', path: [m.field], message: m.message, params: { code: m.code } });
  });
export type SafetyCheckInput = z.input<typeof safetyCheckSchema>;
export type SafetyCheckValues = z.output<typeof safetyCheckSchema>;

/** Stable codes of the outcome's cross-field rules (in each zod issue's `params.code`; paths as in the schema). */
export const OUTCOME_ISSUES = {
  barrierRequired: 'barrier-required',
  barrierNotAllowed: 'barrier-not-allowed',
  partRequired: 'part-required',
} as const;

export const outcomeSchema = z
  .object({
    outcome: z.enum(OUTCOMES, { error: 'bench.v.chooseOutcome' }),
    barrier: z.enum(BARRIERS, { error: 'bench.v.chooseReason' }).optional(),
    part: z
      .object({
        description: z.string({ error: 'bench.v.whichPart' }).trim().min(2, 'bench.v.whichPart').max(200),
        link: z
          .string()
          .trim()
          .max(300)
          .optional()
          .refine((v) => !v || isWebLink(v), 'bench.v.webLink')
          .transform((v) => v || undefined),
        cost: optionalNumber(
          z.coerce.number({ error: 'bench.v.costNumber' }).min(0, 'bench.v.costNegative').max(100000),
        ),
      })
      .optional(),
    minutes: optionalNumber(
      z.coerce
        .number({ error: 'bench.v.wholeMinutes' })
        .int('bench.v.wholeMinutes')
        .min(0)
        .max(600, 'bench.v.maxMinutes'),
    ),
    notes: z
      .string()
      .trim()
      .max(4000)
      .optional()
      .transform((v) => v || undefined),
    safety: safetyCheckSchema.optional(),
  })
  .superRefine((v, ctx) => {
    if (v.outcome === 'end-of-life' && !v.barrier)
      ctx.addIssue({
        code: 'custom',
        path: ['barrier'],
        message: 'bench.v.whyNotMended',
        params: { code: OUTCOME_ISSUES.barrierRequired },
      });
    if (v.outcome !== 'end-of-life' && v.barrier)
      ctx.addIssue({
        code: 'custom',
        path: ['barrier'],
        message: 'bench.v.reasonOnlyEnd',
        params: { code: OUTCOME_ISSUES.barrierNotAllowed },
      });
    if (v.outcome === 'parts-needed' && !v.part)
      ctx.addIssue({
        code: 'custom',
        path: ['part', 'description'],
        message: 'bench.v.whichPart',
        params: { code: OUTCOME_ISSUES.partRequired },
      });
  });
export type OutcomeInput = z.input<typeof outcomeSchema>;

/** The visual part of a check passes only when every point was looked at and found sound. */
export const visualOk = (v: SafetyCheckValues['visual']) =>
  v.cord && v.plug && v.strainRelief && v.casing && v.noHeatDamage;
