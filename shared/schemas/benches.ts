import { z } from 'zod';
import { EQUIPMENT } from '../constants';

/** The tables in the hall, in order: a venue's usual layout or one event's copy of it. */
export const benchesSchema = z
  .array(
    z.object({
      id: z.number().int().positive().optional(),
      name: z.string().trim().min(1, 'validation.bench.name').max(80),
      seats: z.number().int('validation.number.whole').min(1, 'validation.bench.seats').max(20),
      equipment: z.array(z.enum(EQUIPMENT)).max(EQUIPMENT.length),
    }),
  )
  .max(60, 'validation.bench.tooMany');
export const layoutSchema = z.object({ benches: benchesSchema });
export type BenchesInput = z.input<typeof benchesSchema>;
