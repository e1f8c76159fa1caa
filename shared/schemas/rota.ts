import { z } from 'zod';
import { SKILLS } from '../constants';

/** A volunteer's answer for one session: coming or not, and the hours (within the opening hours). */
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
  .refine((v) => !(v.startsAt instanceof Date) || !(v.endsAt instanceof Date) || v.endsAt > v.startsAt, {
    path: ['endsAt'],
    message: 'validation.shift.endAfterStart',
  });

/** Seats a coming fixer at one bench, or lets them move freely (null). */
export const seatSchema = z.object({ benchId: z.number().int().positive().nullable() });

export const askSchema = z.object({
  skills: z.array(z.enum(SKILLS)).min(1, 'validation.skills.required').max(SKILLS.length),
});
