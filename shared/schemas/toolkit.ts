import { z } from 'zod';
import { PART_TYPES } from '../salvage/constants';

const text = (max: number) =>
  z
    .string()
    .trim()
    .max(max)
    .optional()
    .transform((v) => v ?? '');
const optionalNumber = (label: string) =>
  z.preprocess(
    (v) =>
      v === '' || v === null || v === undefined ? undefined : typeof v === 'string' ? v.trim().replace(',', '.') : v,
    z.coerce
      .number({ error: `Enter the ${label} as a number.` })
      .positive(`The ${label} is above 0.`)
      .max(1e9)
      .optional(),
  );

export const knowledgeQuery = z.object({
  q: z
    .string()
    .trim()
    .max(200)
    .optional()
    .transform((v) => v ?? ''),
  categoryId: z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().int().positive().optional()),
  brand: z
    .string()
    .trim()
    .max(80)
    .optional()
    .transform((v) => v ?? ''),
  model: z
    .string()
    .trim()
    .max(80)
    .optional()
    .transform((v) => v ?? ''),
  scope: z.enum(['mine', 'network']).default('network'),
});

export const writeupSchema = z.object({
  symptom: z.string({ error: 'Describe the symptom.' }).trim().min(3, 'Describe the symptom.').max(2000),
  measured: text(2000),
  faultyPart: text(200),
  fix: z
    .string({ error: 'Say what fixed it (or why it could not be fixed).' })
    .trim()
    .min(3, 'Say what fixed it (or why it could not be fixed).')
    .max(2000),
});

export const ratingsSchema = z.object({
  polarity: z.enum(['NPN', 'PNP', 'N', 'P']).optional(),
  voltageV: optionalNumber('voltage'),
  currentA: optionalNumber('current'),
  powerW: optionalNumber('power'),
  resistanceOhm: optionalNumber('resistance'),
  capacitanceF: optionalNumber('capacitance'),
  temperatureC: optionalNumber('temperature'),
  tolerancePct: optionalNumber('tolerance'),
});

export const salvagePartSchema = z.object({
  type: z.enum(PART_TYPES, { error: 'Choose the kind of part.' }),
  value: z
    .string({ error: 'Give its value or a short description.' })
    .trim()
    .min(1, 'Give its value or a short description.')
    .max(120),
  ratings: ratingsSchema.default({}),
  package: text(40),
  pinout: text(20),
  quantity: z.coerce.number({ error: 'Enter how many.' }).int('Enter a whole number.').min(1, 'At least 1.').max(10000),
  box: z.string({ error: 'Say which box it is in.' }).trim().min(1, 'Say which box it is in.').max(60),
  sourceItemId: z.coerce.number().int().positive().optional(),
  notes: text(300),
});
export type SalvagePartInput = z.input<typeof salvagePartSchema>;
export type WriteupInput = z.input<typeof writeupSchema>;

export const salvageUpdateSchema = z
  .object({
    quantity: z.coerce.number().int().min(0).max(10000).optional(),
    box: z.string().trim().min(1).max(60).optional(),
    notes: z.string().trim().max(300).optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), {
    message: 'Change at least one of quantity, box or notes.',
  });

export const takeSchema = z.object({
  itemId: z.coerce.number().int().positive().optional(),
  quantity: z.coerce.number().int().min(1).max(100).default(1),
});

export const substituteQuery = z
  .object({
    type: z.enum(PART_TYPES),
    package: z
      .string()
      .trim()
      .max(40)
      .optional()
      .transform((v) => v ?? ''),
    pinout: z
      .string()
      .trim()
      .max(20)
      .optional()
      .transform((v) => v ?? ''),
  })
  .merge(ratingsSchema);

export const sharingSchema = z.object({ share: z.boolean() });
