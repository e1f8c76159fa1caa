import { z } from 'zod';

export const placementSchema = z.object({
  userId: z.number().int().positive(),
  benchId: z.number().int().positive(),
  locked: z.boolean().default(true),
});
export const lockSchema = z.object({ locked: z.boolean() });
export const runSchema = z.object({ slotId: z.number().int().positive().optional() });
