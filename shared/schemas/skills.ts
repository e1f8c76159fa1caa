import { z } from 'zod';
import { EQUIPMENT, SKILLS } from '../constants';

export const levelSchema = z.union([z.literal(1), z.literal(2), z.literal(3)], {
  error: 'validation.skills.level',
});

/** A volunteer's own skills, kit and notes ("My skills"). */
export const profileSchema = z.object({
  skills: z.partialRecord(z.enum(SKILLS), levelSchema),
  kit: z.array(z.enum(EQUIPMENT)).max(EQUIPMENT.length),
  notes: z.string().trim().max(2000).default(''),
});
export type ProfileInput = z.input<typeof profileSchema>;
