import { z } from 'zod';
import { PART_TYPES } from '../salvage/constants';

const text = (max: number) =>
  z
    .string()
    .trim()
    .max(max)
    .optional()
    .transform((v) => v ?? '');
/** A rating; its messages are the same for every rating (the form shows them beside the field). */
const optionalNumber = () =>
  z.preprocess(
    (v) =>
      v === '' || v === null || v === undefined ? undefined : typeof v === 'string' ? v.trim().replace(',', '.') : v,
    z.coerce
      .number({ error: 'bench.tool.salvage.notNumber' })
      .positive('validation.number.aboveZero')
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
  symptom: z.string({ error: 'bench.tool.v.symptom' }).trim().min(3, 'bench.tool.v.symptom').max(2000),
  measured: text(2000),
  faultyPart: text(200),
  fix: z.string({ error: 'bench.tool.v.fix' }).trim().min(3, 'bench.tool.v.fix').max(2000),
});

export const ratingsSchema = z.object({
  polarity: z.enum(['NPN', 'PNP', 'N', 'P']).optional(),
  voltageV: optionalNumber(),
  currentA: optionalNumber(),
  powerW: optionalNumber(),
  resistanceOhm: optionalNumber(),
  capacitanceF: optionalNumber(),
  temperatureC: optionalNumber(),
  tolerancePct: optionalNumber(),
});

export const salvagePartSchema = z.object({
  type: z.enum(PART_TYPES, { error: 'bench.tool.v.kind' }),
  value: z.string({ error: 'bench.tool.v.value' }).trim().min(1, 'bench.tool.v.value').max(120),
  ratings: ratingsSchema.default({}),
  package: text(40),
  pinout: text(20),
  quantity: z.coerce
    .number({ error: 'bench.tool.v.howMany' })
    .int('bench.tool.v.whole')
    .min(1, 'bench.tool.v.atLeastOne')
    .max(10000),
  box: z.string({ error: 'bench.tool.v.box' }).trim().min(1, 'bench.tool.v.box').max(60),
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
    message: 'validation.salvage.change',
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
