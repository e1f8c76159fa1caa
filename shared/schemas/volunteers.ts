import { z } from 'zod';
import { EQUIPMENT, SKILLS } from '../constants';

export const levelSchema = z.union([z.literal(1), z.literal(2), z.literal(3)], {
  error: 'Levels are 1 (learning), 2 (capable) or 3 (expert).',
});

export const profileSchema = z.object({
  skills: z.partialRecord(z.enum(SKILLS), levelSchema),
  kit: z.array(z.enum(EQUIPMENT)).max(EQUIPMENT.length),
  notes: z.string().trim().max(2000).default(''),
});
export type ProfileInput = z.input<typeof profileSchema>;

export const myShiftSchema = z
  .object({
    coming: z.boolean(),
    startsAt: z.iso
      .datetime({ offset: true })
      .transform((s) => new Date(s))
      .optional(),
    endsAt: z.iso
      .datetime({ offset: true })
      .transform((s) => new Date(s))
      .optional(),
  })
  .refine((v) => !v.startsAt || !v.endsAt || v.endsAt > v.startsAt, {
    path: ['endsAt'],
    message: 'Your shift must end after it starts.',
  });

export const seatSchema = z.object({ benchId: z.number().int().positive().nullable() });

export const benchesSchema = z
  .array(
    z.object({
      id: z.number().int().positive().optional(),
      name: z.string().trim().min(1, 'Name the bench.').max(80),
      seats: z.number().int('Use a whole number.').min(1, 'A bench has at least one seat.').max(20),
      equipment: z.array(z.enum(EQUIPMENT)).max(EQUIPMENT.length),
    }),
  )
  .max(60, 'At most 60 benches.');

export const placementSchema = z.object({
  userId: z.number().int().positive(),
  benchId: z.number().int().positive(),
  locked: z.boolean().default(true),
});
export const lockSchema = z.object({ locked: z.boolean() });
export const runSchema = z.object({ slotId: z.number().int().positive().optional() });
export const askSchema = z.object({
  skills: z.array(z.enum(SKILLS)).min(1, 'Choose at least one skill.').max(SKILLS.length),
});
