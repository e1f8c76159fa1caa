import { z } from 'zod';
import { EQUIPMENT, SKILLS } from '../constants';

/** An admin's change to a kind of item; its messages are catalog keys (locales/<language>/admin.json). Numbers may come typed with a decimal comma, as people type them. */
const decimal = (schema: z.ZodNumber) =>
  z.preprocess(
    (v) => (typeof v === 'string' ? (v.trim() === '' ? undefined : Number(v.replace(',', '.'))) : v),
    schema,
  );

export const categoryPatchSchema = z
  .object({
    name: z.string().trim().min(2, 'admin.v.name').max(120),
    weeeCategory: z.number().int().min(1).max(6).nullable(),
    avgWeightKg: decimal(z.number({ error: 'admin.v.weight' }).positive('admin.v.weightPositive').max(1000)),
    weightSource: z.string().trim().min(3, 'admin.v.weightSource').max(255),
    skill: z.enum(SKILLS),
    equipment: z.array(z.enum(EQUIPMENT)).max(EQUIPMENT.length),
    repairMinutes: decimal(
      z
        .number({ error: 'admin.v.minutes' })
        .int('admin.v.wholeMinutes')
        .min(5, 'admin.v.minutesMin')
        .max(480, 'admin.v.minutesMax'),
    ),
    mains: z.boolean(),
    co2ePerKg: z.preprocess(
      (v) => (typeof v === 'string' ? (v.trim() === '' ? null : Number(v.replace(',', '.'))) : v),
      z.number({ error: 'admin.v.factor' }).min(0, 'admin.v.factorNegative').max(1000).nullable(),
    ),
    co2eSource: z.preprocess(
      (v) => (typeof v === 'string' && v.trim() === '' ? null : v),
      z.string().trim().min(3, 'admin.v.factorSource').max(255).nullable(),
    ),
  })
  .partial()
  .refine((p) => p.co2ePerKg === undefined || p.co2ePerKg === null || (p.co2eSource ?? '').length >= 3, {
    path: ['co2eSource'],
    message: 'admin.v.factorSource',
  });
export type CategoryPatch = z.output<typeof categoryPatchSchema>;
export type CategoryPatchInput = z.input<typeof categoryPatchSchema>;
