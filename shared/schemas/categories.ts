import { z } from 'zod';
import { EQUIPMENT, SKILLS } from '../constants';

/** An admin's change to a kind of item. Numbers may come typed with a decimal comma, as people type them. */
const decimal = (schema: z.ZodNumber) =>
  z.preprocess(
    (v) => (typeof v === 'string' ? (v.trim() === '' ? undefined : Number(v.replace(',', '.'))) : v),
    schema,
  );

export const categoryPatchSchema = z
  .object({
    name: z.string().trim().min(2, 'Give the kind a name of at least 2 characters.').max(120),
    weeeCategory: z.number().int().min(1).max(6).nullable(),
    avgWeightKg: decimal(
      z.number({ error: 'Enter the average weight in kg, above 0.' }).positive('Weight must be above zero.').max(1000),
    ),
    weightSource: z.string().trim().min(3, 'Name the source of the weight.').max(255),
    skill: z.enum(SKILLS),
    equipment: z.array(z.enum(EQUIPMENT)).max(EQUIPMENT.length),
    repairMinutes: decimal(
      z
        .number({ error: 'Enter the usual repair time in minutes.' })
        .int('Enter whole minutes.')
        .min(5, 'At least 5 minutes.')
        .max(480, 'At most 480 minutes.'),
    ),
    mains: z.boolean(),
    co2ePerKg: z.preprocess(
      (v) => (typeof v === 'string' ? (v.trim() === '' ? null : Number(v.replace(',', '.'))) : v),
      z
        .number({ error: 'Enter kg CO2e per kg as a number, e.g. 5.65, or leave it empty for no factor.' })
        .min(0, 'A factor cannot be negative.')
        .max(1000)
        .nullable(),
    ),
    co2eSource: z.preprocess(
      (v) => (typeof v === 'string' && v.trim() === '' ? null : v),
      z.string().trim().min(3, 'Name the source of the factor.').max(255).nullable(),
    ),
  })
  .partial()
  .refine((p) => p.co2ePerKg === undefined || p.co2ePerKg === null || (p.co2eSource ?? '').length >= 3, {
    path: ['co2eSource'],
    message: 'Name the source of the factor.',
  });
export type CategoryPatch = z.output<typeof categoryPatchSchema>;
export type CategoryPatchInput = z.input<typeof categoryPatchSchema>;
